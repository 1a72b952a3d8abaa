/**
 * Dressers and cabinets in the editor, as the demo designer meets them: start each from its
 * defaults on the new-design page, see the engine's drawers or doors in the cut list and every
 * placed part in 3D; open the demo's painted mudroom cabinet and see it painted; and a reviewer
 * who opens the new-design page is told their role does not allow it.
 * Expected counts come from the same engine the browser runs.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { buildPiece, defaultSpec } from '../../shared/engine/index.ts';
import type { PieceKind } from '../../shared/engine/types.ts';
import { SCREENSHOT_DIR } from '../support/browser.ts';
import { openDemoBrowser, type DemoBrowser } from '../support/demoBrowser.ts';

interface DemoAccounts {
  password: string;
  accounts: { role: string; email: string }[];
}
const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as DemoAccounts;

const CANVAS = '[data-testid="piece-view"] canvas';

let server: DemoBrowser['server'];
let browser: DemoBrowser['browser'];
let page: Page;
let workshopUrl = '';

beforeAll(async () => {
  ({ server, browser, page } = await openDemoBrowser());
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function signIn(role: string) {
  const who = demo.accounts.find((a) => a.role === role);
  if (!who) throw new Error(`no demo ${role}`);
  await page.goto(`${server.url}/signin`);
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/workshops\/[0-9a-f-]{36}$/);
  workshopUrl = page.url();
}

/** Waits for the 3D view to settle with every cut solid, then the share of non-paper pixels and the mean colour of the rest. */
async function canvasLook(): Promise<{ inked: number; mean: [number, number, number] }> {
  await page.locator('canvas[data-camera-settled="true"][data-solids-ready="true"]').waitFor({ timeout: 60_000 });
  await page.evaluate(() => new Promise<void>((done) => requestAnimationFrame(() => requestAnimationFrame(() => setTimeout(done, 300)))));
  return page.locator(CANVAS).evaluate((el) => {
    const source = el as HTMLCanvasElement;
    const copy = document.createElement('canvas');
    copy.width = source.width;
    copy.height = source.height;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(source, 0, 0);
    const { data } = ctx.getImageData(0, 0, copy.width, copy.height);
    const [r0, g0, b0] = [data[0]!, data[1]!, data[2]!];
    let inked = 0;
    let n = 0;
    const sum: [number, number, number] = [0, 0, 0];
    for (let i = 0; i < data.length; i += 16) {
      n++;
      const [r, g, b] = [data[i]!, data[i + 1]!, data[i + 2]!];
      if (Math.abs(r - r0) + Math.abs(g - g0) + Math.abs(b - b0) > 30) {
        inked++;
        sum[0] += r;
        sum[1] += g;
        sum[2] += b;
      }
    }
    return { inked: inked / n, mean: sum.map((s) => s / Math.max(1, inked)) as [number, number, number] };
  });
}

async function startFromDefaults(kind: PieceKind, title: string) {
  await page.goto(`${workshopUrl}/new?kind=${kind}`);
  await page.getByLabel('Title of the new design').fill(title);
  await page.getByRole('button', { name: 'Create and open' }).click();
  await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
  await page.locator('table[aria-label="Cut list"]').waitFor();
}

describe('dressers and cabinets in the editor', () => {
  it('starts a dresser from its defaults: its drawers in the cut list and every part in 3D', async () => {
    await signIn('designer');
    await startFromDefaults('dresser', 'Chest of drawers for the guest room');
    const built = buildPiece(defaultSpec('dresser'));
    expect(Number(await page.locator('[data-testid="piece-view"]').getAttribute('data-part-count'))).toBe(built.placements.length);
    const drawerSide = built.parts.find((p) => /drawer/.test(p.id) && /side/.test(p.id));
    expect(drawerSide).toBeDefined();
    await page.locator(`table[aria-label="Cut list"] tr[data-part-row="${drawerSide!.id}"]`).waitFor();
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toContain('Chest of drawers for the guest room');
    // The drawer groups of the form come from the engine's metadata.
    await page.locator('form[aria-label="Parameters"] summary', { hasText: 'Drawers' }).first().waitFor();
    // The listed row heights appear only once the heights are listed, one for each row above the bottom.
    const form = page.locator('form[aria-label="Parameters"]');
    expect(await form.getByLabel(/^Listed height, row/).count()).toBe(0);
    await form.getByLabel('Drawer heights', { exact: true }).selectOption('listed');
    await form.getByLabel('Listed height, row 1 (top)').waitFor();
    expect(await form.getByLabel(/^Listed height, row/).count()).toBe(Number(defaultSpec('dresser').params.drawerRows) - 1);
    await form.getByLabel('Drawer heights', { exact: true }).selectOption('arithmetic');
    expect(await form.getByLabel(/^Listed height, row/).count()).toBe(0);
    expect((await canvasLook()).inked).toBeGreaterThan(0.05);
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'dresser-editor.png') });
  });

  it('starts a cabinet from its defaults: doors and shelves in the cut list and every part in 3D', async () => {
    await startFromDefaults('cabinet', 'Base cabinet for the laundry');
    const built = buildPiece(defaultSpec('cabinet'));
    expect(Number(await page.locator('[data-testid="piece-view"]').getAttribute('data-part-count'))).toBe(built.placements.length);
    const door = built.parts.find((p) => /door/.test(p.id));
    expect(door).toBeDefined();
    await page.locator(`table[aria-label="Cut list"] tr[data-part-row="${door!.id}"]`).waitFor();
    // With no doors, the door style and sizes leave the form.
    const form = page.locator('form[aria-label="Parameters"]');
    expect(await form.getByLabel('Door style').count()).toBe(1);
    await form.getByLabel('Doors', { exact: true }).fill('0');
    await expect.poll(() => form.getByLabel('Door style').count()).toBe(0);
    expect(await form.getByLabel('Door stile width').count()).toBe(0);
    await form.getByLabel('Doors', { exact: true }).fill('2');
    await form.getByLabel('Door style').waitFor();
    expect((await canvasLook()).inked).toBeGreaterThan(0.05);
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'cabinet-editor.png') });
  });

  it('draws the demo\'s painted mudroom cabinet in its paint, and a clear finish in wood', async () => {
    await page.goto(workshopUrl);
    await page.getByRole('link', { name: 'Mudroom cabinet, painted maple' }).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    await page.locator('table[aria-label="Cut list"]').waitFor();
    expect(await page.getByLabel('Finish').inputValue()).toBe('paint');
    const paint = page.getByLabel('Paint colour');
    await paint.selectOption({ label: 'Sage green' });
    const painted = await canvasLook();
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'cabinet-painted.png') });
    // Sage green: green above red and blue, where soft maple's tone has red above green.
    expect(painted.mean[1]).toBeGreaterThan(painted.mean[0]);
    await page.getByLabel('Finish').selectOption('clear');
    await page.locator('[aria-label="Paint colour"]').waitFor({ state: 'detached' });
    const clear = await canvasLook();
    expect(clear.mean[0]).toBeGreaterThan(clear.mean[1]);
  });

  it('tells a reviewer their role does not allow starting a design, on the page itself', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('link', { name: 'Sign in' }).first().waitFor();
    await signIn('reviewer');
    expect(await page.getByRole('link', { name: 'New design' }).count()).toBe(0);
    await page.goto(`${workshopUrl}/new?kind=dresser`);
    await page.getByRole('heading', { name: 'Your role does not allow this' }).waitFor();
    expect(await page.locator('main').innerText()).toContain('owner or designer');
    expect(await page.getByRole('button', { name: 'Create and open' }).count()).toBe(0);
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'role-refusal.png') });
  });
});
