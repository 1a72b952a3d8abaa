/**
 * The design editor as a new maker meets it: sign in with the demo designer, open the demo's
 * white-oak blanket chest, resize it, break a panel float, save, reload, compare the saved
 * revision with the one before, fork; then the reviewer approves the new revision.
 * Expected numbers come from the same engine the browser runs, never typed in by hand.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { buildPiece } from '../../shared/engine/index.ts';
import { paramDefs, validateSpec } from '../../shared/engine/params.ts';
import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import { formatLength, parseLength } from '../../shared/units/index.ts';
import { SCREENSHOT_DIR } from '../support/browser.ts';
import { openDemoBrowser, type DemoBrowser } from '../support/demoBrowser.ts';

interface DemoAccounts {
  password: string;
  accounts: { role: string; email: string; name: string }[];
}
const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as DemoAccounts;
const account = (role: string) => {
  const found = demo.accounts.find((a) => a.role === role);
  if (!found) throw new Error(`no demo ${role}`);
  return found;
};

const NEW_WIDTH_TEXT = '41 1/2"';
const CHEST_TITLE = 'Blanket chest, white oak';
// Lengths on screen are rounded to 1/16 in (the default display precision).
const INCH = { unit: 'in', precision: 16 } as const;
const SIXTEENTH_MM = 25.4 / 16;

let server: DemoBrowser['server'];
let browser: DemoBrowser['browser'];
let page: Page;

beforeAll(async () => {
  ({ server, browser, page } = await openDemoBrowser());
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function shot(name: string) {
  await page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage: false });
}

async function signIn(role: string) {
  const who = account(role);
  await page.goto(`${server.url}/signin`);
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

async function signOut() {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('link', { name: 'Sign in' }).first().waitFor();
}

/** The design's head spec as the API stores it, read through the signed-in page. */
async function headSpec(designId: string): Promise<{ spec: PieceSpec; head: number }> {
  return page.evaluate(async (id) => {
    const response = await fetch(`/api/designs/${id}`, { headers: { Accept: 'application/json' } });
    const body = await response.json();
    return { spec: body.headRevision.spec, head: body.head.number };
  }, designId);
}

function build(spec: PieceSpec): PieceResult {
  return buildPiece(validateSpec(spec));
}

/** Text of the finished-length cell of a part's cut-list row. */
async function cutLength(partId: string): Promise<string> {
  return (await page.locator(`table[aria-label="Cut list"] tr[data-part-row="${partId}"] td[data-col="length"]`).innerText()).trim();
}

async function waitForCutLength(partId: string, text: string) {
  await page.waitForFunction(
    ([id, expected]) => document.querySelector(`table[aria-label="Cut list"] tr[data-part-row="${id}"] td[data-col="length"]`)?.textContent?.trim() === expected,
    [partId, text] as const,
  );
}

/** Find a groove depth that leaves a panel too little float, by asking the engine. */
function shallowGroove(spec: PieceSpec): { key: string; label: string; valueMm: number; panelMaterial?: string } {
  for (const panelMaterial of [undefined, 'solid']) {
    const base: PieceSpec = panelMaterial ? { ...spec, params: { ...spec.params, panelMaterial } } : spec;
    for (const key of ['frameGrooveDepth', 'legGrooveDepth']) {
      const def = paramDefs('chest').find((d) => d.key === key);
      if (!def || def.min === undefined) continue;
      const start = Number(base.params[key] ?? def.default);
      for (let depth = start - SIXTEENTH_MM / 2; depth >= def.min; depth -= SIXTEENTH_MM / 2) {
        // Only depths the form shows exactly at 1/32 in.
        const candidate = { ...base, params: { ...base.params, [key]: depth } };
        try {
          const result = build(candidate);
          if (result.checks.some((c) => c.id.startsWith('panel-float') && c.severity === 'warning')) {
            return { key, label: def.label, valueMm: depth, ...(panelMaterial ? { panelMaterial } : {}) };
          }
        } catch {
          // a depth the piece cannot be built with; try the next
        }
      }
    }
  }
  throw new Error('no groove depth makes the panel float fall short');
}

describe('the design editor', () => {
  let designId = '';
  let forkId = '';
  /** The chest's head revision when it was opened; the save makes the next one. */
  let opened = 0;

  it('signs the demo designer in and shows the workshop as cards with drawings', async () => {
    await signIn('designer');
    await page.waitForURL(/\/workshops\/[0-9a-f-]{36}$/);
    await page.locator('ul li', { has: page.locator('svg[role="img"]') }).first().waitFor();
    const cards = page.locator('main ul > li');
    expect(await cards.count()).toBeGreaterThan(0);
    await page.evaluate(() => document.fonts.ready);
    await shot('workshop');
  });

  it('opens the demo chest, changes the width by typing, and the rails follow by the right amount', async () => {
    await page.getByRole('link', { name: CHEST_TITLE, exact: true }).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    designId = page.url().split('/').pop() ?? '';
    await page.locator('table[aria-label="Cut list"]').waitFor();

    const { spec, head } = await headSpec(designId);
    opened = head;
    const before = build(spec);
    const widened = build({ ...spec, params: { ...spec.params, width: parseLength(NEW_WIDTH_TEXT) } });
    const rails = widened.parts.filter((p) => p.role === 'rail');
    const changed = rails.filter((p) => {
      const old = before.parts.find((q) => q.id === p.id);
      return old && Math.abs(old.lengthMm - p.lengthMm) > 1e-6;
    });
    expect(changed.length).toBeGreaterThan(0);

    for (const rail of rails) {
      const old = before.parts.find((q) => q.id === rail.id);
      if (old) expect(await cutLength(rail.id)).toBe(formatLength(old.lengthMm, INCH));
    }

    const width = page.getByLabel('Width over the legs');
    await width.click();
    await width.fill('');
    await width.pressSequentially(NEW_WIDTH_TEXT);
    for (const rail of changed) await waitForCutLength(rail.id, formatLength(rail.lengthMm, INCH));
    for (const rail of changed) {
      const old = before.parts.find((q) => q.id === rail.id);
      if (!old) continue;
      const shownDelta = parseLength(await cutLength(rail.id)) - parseLength(formatLength(old.lengthMm, INCH));
      // The rails grow with the width over the legs (front and back rails by exactly the change).
      expect(Math.abs(shownDelta - (rail.lengthMm - old.lengthMm))).toBeLessThanOrEqual(SIXTEENTH_MM + 1e-9);
    }

    // Undo and redo from the keyboard take the whole typed value back and forth.
    await page.keyboard.press('Control+z');
    await expect.poll(() => width.inputValue()).toBe(formatLength(spec.params.width as number, INCH));
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => width.inputValue()).toBe(NEW_WIDTH_TEXT);
    await shot('editor-width');
  });

  it('marks a bad length in place and keeps it from the engine', async () => {
    const depth = page.getByLabel('Depth over the legs');
    const shown = await depth.inputValue();
    await depth.fill('3"');
    await expect.poll(() => page.locator('[role="alert"]', { hasText: 'at least' }).count()).toBeGreaterThan(0);
    expect(await depth.getAttribute('aria-invalid')).toBe('true');
    await depth.fill(shown);
    await depth.blur();
    expect(await depth.getAttribute('aria-invalid')).toBeNull();
  });

  it('fires the panel-float check when a groove is made shallower than the float needs', async () => {
    const { spec } = await headSpec(designId);
    const edited = { ...spec, params: { ...spec.params, width: parseLength(NEW_WIDTH_TEXT) } };
    const shallow = shallowGroove(edited);
    if (shallow.panelMaterial) await page.getByLabel('Panel material').selectOption(shallow.panelMaterial);
    const field = page.getByLabel(shallow.label);
    await field.fill(formatLength(shallow.valueMm, { unit: 'in', precision: 64 }));
    await field.blur();
    await page.getByRole('tab', { name: /Checks/ }).click();
    const warning = page.locator('[data-check^="panel-float"]', { hasText: 'Warning' }).first();
    await warning.waitFor();
    expect(await warning.innerText()).toMatch(/Fix:/);
    await shot('editor-checks');
  });

  it('saves a revision, keeps it over a reload, and lists both revisions', async () => {
    await page.getByLabel('Revision message').fill('Wider for the hall; shallower grooves to try');
    await page.getByRole('button', { name: 'Save revision' }).click();
    await page.getByRole('heading', { level: 1 }).filter({ hasText: `r${opened + 1}` }).waitFor();
    await page.reload();
    await page.locator('table[aria-label="Cut list"]').waitFor();
    expect(await page.getByLabel('Width over the legs').inputValue()).toBe(NEW_WIDTH_TEXT);
    expect((await headSpec(designId)).head).toBe(opened + 1);
    await page.getByRole('tab', { name: 'History' }).click();
    const revisions = page.locator('[aria-label="Revisions"] > li');
    await revisions.nth(1).waitFor();
    // Every revision is kept: the seeded ones and the new one, newest first.
    expect(await revisions.count()).toBe(opened + 1);
    expect(await revisions.nth(0).innerText()).toContain(`r${opened + 1}`);
    expect(await revisions.nth(0).innerText()).toContain('Wider for the hall');
    expect(await revisions.nth(1).innerText()).toContain(`r${opened}`);
  });

  it('shows the 3D view and it is not blank', async () => {
    const canvas = page.locator('[data-testid="piece-view"] canvas');
    await canvas.waitFor({ timeout: 30_000 });
    await page.locator('canvas[data-camera-settled="true"][data-solids-ready="true"]').waitFor({ timeout: 30_000 });
    const inked = await canvas.evaluate(async (el) => {
      const source = el as HTMLCanvasElement;
      const copy = document.createElement('canvas');
      copy.width = source.width;
      copy.height = source.height;
      const ctx = copy.getContext('2d');
      if (!ctx) return 0;
      ctx.drawImage(source, 0, 0);
      const { data } = ctx.getImageData(0, 0, copy.width, copy.height);
      const [r0, g0, b0] = [data[0] ?? 0, data[1] ?? 0, data[2] ?? 0];
      let differ = 0;
      for (let i = 0; i < data.length; i += 16) {
        if (Math.abs((data[i] ?? 0) - r0) + Math.abs((data[i + 1] ?? 0) - g0) + Math.abs((data[i + 2] ?? 0) - b0) > 30) differ++;
      }
      return differ / (data.length / 16);
    });
    // A drawn piece covers a good share of the view; a blank canvas is one colour.
    expect(inked).toBeGreaterThan(0.02);
    await shot('editor-3d');
  });

  it('compares the two revisions side by side with the changed rows marked', async () => {
    const boxes = page.locator('[aria-label="Revisions"] input[type="checkbox"]');
    await boxes.nth(0).check();
    await boxes.nth(1).check();
    await page.getByRole('link', { name: `Compare r${opened} → r${opened + 1}` }).click();
    await page.locator('table[aria-label="Parameters compared"]').waitFor();
    const widthRow = page.locator('table[aria-label="Parameters compared"] tr', { hasText: 'Width over the legs' });
    expect(await widthRow.getAttribute('data-changed')).toBe('true');
    expect(await widthRow.innerText()).toContain(NEW_WIDTH_TEXT);
    expect(await page.locator('table[aria-label="Parts compared"] tr[data-changed="true"]').count()).toBeGreaterThan(0);
    await shot('compare');
    await page.getByRole('link', { name: /Back to the editor/ }).click();
    await page.locator('table[aria-label="Cut list"]').waitFor();
  });

  it('forks the design into the workshop, and the fork says where it came from', async () => {
    await page.getByRole('tab', { name: 'Fork' }).click();
    await page.getByLabel('Title of the fork').fill('Hall chest, narrow variation');
    await page.getByRole('button', { name: /^Fork r\d+/ }).click();
    await page.waitForURL((url) => url.pathname.startsWith('/designs/') && !url.pathname.endsWith(designId));
    forkId = page.url().split('/').pop() ?? '';
    await page.getByText('forked from').first().waitFor();
    expect(forkId).not.toBe(designId);
    await page.locator('table[aria-label="Cut list"]').waitFor();
    await shot('fork');
  });

  it('fits a tablet in landscape', async () => {
    await page.setViewportSize({ width: 1024, height: 768 });
    await page.goto(`${server.url}/designs/${designId}`);
    await page.locator('table[aria-label="Cut list"]').waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await shot('editor-tablet');
    await page.setViewportSize({ width: 1366, height: 900 });
  });

  it('lets the reviewer approve the saved revision from a read-only editor', async () => {
    await signOut();
    await signIn('reviewer');
    await page.goto(`${server.url}/designs/${designId}`);
    await page.locator('table[aria-label="Cut list"]').waitFor();
    expect(await page.getByLabel('Width over the legs').getAttribute('readonly')).not.toBeNull();
    expect(await page.getByRole('button', { name: 'Save revision' }).count()).toBe(0);
    // Forking is not a reviewer's to do: the fork tab says so rather than offering a form.
    await page.getByRole('tab', { name: 'Fork' }).click();
    await page.getByRole('heading', { name: 'Your role does not allow this' }).waitFor();
    expect(await page.getByLabel('Title of the fork').count()).toBe(0);
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByRole('button', { name: `Approve r${opened + 1}` }).click();
    await page.getByText('Your decision is recorded.').waitFor();
    await page.locator('header').getByText('Approved', { exact: true }).waitFor();
    await shot('review');
  });
});
