/**
 * Boards on hand, as a maker enters one: on the demo chest's Materials page the owner adds a
 * white-oak board with a knot, saves, reloads and finds it kept for the workshop, and sees the
 * layout cut that board around the knot. When the designer saves the stock while the owner is
 * editing it, the owner's Save is refused with a notice naming who saved it and when, and the
 * owner saves over it or loads theirs. The demo workshop's stock is put back afterwards, and
 * the demo reviewer (the client) then finds the stock read-only.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { QueryTypes } from 'sequelize';
import { rectsOverlap } from '../../shared/layout/rect.ts';
import type { StockSettings } from '../../shared/materials/stockSettings.ts';
import { SCREENSHOT_DIR } from '../support/browser.ts';
import { openDemoBrowser, type DemoBrowser } from '../support/demoBrowser.ts';

const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as { password: string; accounts: { role: string; email: string }[] };
const owner = demo.accounts.find((a) => a.role === 'owner')!;
const reviewer = demo.accounts.find((a) => a.role === 'reviewer')!;
const designer = demo.accounts.find((a) => a.role === 'designer')!;
const CHEST_TITLE = 'Blanket chest, white oak';
const LABEL = 'Rack 7 wide oak';
const IN = 25.4;
// Lengths typed in inches come back as mm products of 25.4.
const MM_TOLERANCE = 1e-6;

let server: DemoBrowser['server'];
let browser: DemoBrowser['browser'];
let page: Page;
let workshopId = '';
let designId = '';
let original: StockSettings | null = null;

beforeAll(async () => {
  ({ server, browser, page } = await openDemoBrowser());
});
afterAll(async () => {
  if (page && original) await restoreStock();
  await browser?.close();
  await server?.close();
});

/** Puts the demo workshop's stock back as it was (as the owner), so other browser tests see the seeded stock. */
async function restoreStock(): Promise<number> {
  const status = await page.evaluate(async ({ id, stock }) => {
    const { csrfToken } = await (await fetch('/api/auth/csrf')).json();
    const { version } = await (await fetch(`/api/workshops/${id}/stock`)).json();
    return (await fetch(`/api/workshops/${id}/stock`, { method: 'PUT', headers: { 'Content-Type': 'application/json', 'x-csrf-token': csrfToken }, body: JSON.stringify({ version, stock }) })).status;
  }, { id: workshopId, stock: original });
  original = null;
  return status;
}

async function signIn(email: string): Promise<void> {
  await page.goto(`${server.url}/signin`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

const shot = (name: string, fullPage = false) => page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage });

async function readStock(): Promise<StockSettings> {
  return page.evaluate(async (id) => (await (await fetch(`/api/workshops/${id}/stock`)).json()).stock, workshopId);
}

describe('Boards on hand', () => {
  it('adds a white-oak board with a knot, saves it for the workshop and finds it after a reload', async () => {
    await signIn(owner.email);
    const chestId = await page.evaluate(async (title) => {
      const get = async (path: string) => (await fetch(path)).json();
      const me = await get('/api/auth/me');
      const id = me.workshops.find((w: { name: string }) => w.name === 'Tidewater Joinery').id;
      const list = await get(`/api/workshops/${id}/designs?kind=chest`);
      return { workshop: id as string, design: list.designs.find((d: { title: string }) => d.title === title).id as string };
    }, CHEST_TITLE);
    workshopId = chestId.workshop;
    designId = chestId.design;
    original = await readStock();
    const n = original.boardsInStock.length + 1;

    await page.goto(`${server.url}/designs/${chestId.design}/materials`);
    await page.locator('figure.board-diagram').first().waitFor();
    await page.getByRole('button', { name: 'Add a board' }).click();
    await page.getByLabel(`Board ${n} label`).fill(LABEL);
    await page.getByLabel(`Board ${n} species`).selectOption('white-oak');
    await page.getByLabel(`Board ${n} thickness`).selectOption('4');
    await page.getByLabel(`Board ${n} length`).fill('10 ft');
    await page.getByLabel(`Board ${n} length`).press('Enter');
    await page.getByLabel(`Board ${n} width`).fill('11 in');
    await page.getByLabel(`Board ${n} width`).press('Enter');
    await page.locator(`[data-board-row="${n}"]`).getByRole('button', { name: 'Add a defect' }).click();
    const knot = `Board ${n} defect 1`;
    await page.getByLabel(`${knot} kind`).selectOption('knot');
    for (const [field, text] of [['from the end', '30 in'], ['from the edge', '4 in'], ['length', '2 in'], ['width', '2 in']] as const) {
      await page.getByLabel(`${knot} ${field}`).fill(text);
      await page.getByLabel(`${knot} ${field}`).press('Enter');
    }
    // A knot that would run past the board's far end is named on its row, and Save waits.
    await page.getByLabel(`${knot} from the end`).fill('119 in');
    await page.getByLabel(`${knot} from the end`).press('Enter');
    const problem = page.locator('#boards-on-hand [role="alert"]');
    await problem.waitFor();
    expect(await problem.innerText()).toMatch(new RegExp(`Board on hand ${n}, defect 1: length runs knot 1 past the far end of the board`));
    expect(await page.getByRole('button', { name: 'Save stock' }).first().isDisabled()).toBe(true);
    await shot('materials-knot-past-end');
    await page.getByLabel(`${knot} from the end`).fill('30 in');
    await page.getByLabel(`${knot} from the end`).press('Enter');
    await problem.waitFor({ state: 'detached' });
    await page.getByTestId('stock-save-bar').first().getByText('Unsaved changes').waitFor();
    await page.getByRole('button', { name: 'Save stock' }).first().click();
    await page.getByTestId('stock-save-bar').first().getByText('Saved for the workshop').waitFor();

    const saved = (await readStock()).boardsInStock[n - 1]!;
    expect(saved).toMatchObject({ label: LABEL, speciesId: 'white-oak', quarters: 4 });
    expect(Math.abs(saved.lengthMm - 120 * IN)).toBeLessThan(MM_TOLERANCE);
    expect(saved.defects).toHaveLength(1);
    expect(saved.defects[0]!.kind).toBe('knot');
    expect(Math.abs(saved.defects[0]!.fromEndMm - 30 * IN)).toBeLessThan(MM_TOLERANCE);

    await page.reload();
    await page.locator('figure.board-diagram').first().waitFor();
    expect(await page.getByLabel(`Board ${n} label`).inputValue()).toBe(LABEL);
    expect(await page.getByLabel(`${knot} kind`).inputValue()).toBe('knot');
    await page.locator('#boards-on-hand').scrollIntoViewIfNeeded();
    await shot('materials-boards-on-hand');
  });

  it('lays out parts on the new board, draws its knot and places no part over it', async () => {
    const figure = page.locator(`figure.board-diagram:has(figcaption:has-text("“${LABEL}”"))`);
    await figure.waitFor();
    const stock = await readStock();
    const n = stock.boardsInStock.length;
    await expect.poll(() => page.locator(`[data-board-row="${n}"] [data-usage]`).innerText()).toMatch(/^board \d+ of White oak 4\/4$/);
    expect(await figure.locator('[data-defect="knot"]').count()).toBe(1);
    expect(await figure.locator('[data-part]').count()).toBeGreaterThan(0);
    // The knot's hatched rectangle and each part's rectangle, in the board's own millimetres.
    const boxes = await figure.evaluate((el) => {
      const box = (r: Element | null) => (r ? { x: Number(r.getAttribute('x')), y: Number(r.getAttribute('y')), length: Number(r.getAttribute('width')), width: Number(r.getAttribute('height')) } : null);
      return { knot: box(el.querySelector('[data-defect] rect')), parts: [...el.querySelectorAll('[data-part] > rect')].map(box) };
    });
    const want = { x: 30 * IN, y: 4 * IN, length: 2 * IN, width: 2 * IN };
    for (const key of ['x', 'y', 'length', 'width'] as const) expect(Math.abs(boxes.knot![key] - want[key]), key).toBeLessThan(MM_TOLERANCE);
    for (const part of boxes.parts) expect(rectsOverlap(part!, boxes.knot!)).toBe(false);
    await figure.scrollIntoViewIfNeeded();
    await shot('materials-board-with-knot');
  });

  it('names who saved the stock while the owner was editing, then saves the owner\'s over it or loads theirs', async () => {
    const rows = await server.sequelize.query<{ id: string; name: string }>('SELECT id, name FROM users WHERE email = :email', { type: QueryTypes.SELECT, replacements: { email: designer.email } });
    const { id: designerId, name: designerName } = rows[0]!;
    // The designer's save, made elsewhere while the owner's draft is open: straight to the row, as the API would write it.
    const designerSaves = (trimMm: number) => server.sequelize.query(
      `UPDATE workshop_stock SET stock = jsonb_set(stock, '{trimMm}', to_jsonb(:trimMm::numeric)), updated_by = :designerId, updated_at = clock_timestamp() WHERE workshop_id = :workshopId`,
      { replacements: { trimMm, designerId, workshopId } },
    );
    const notice = page.getByRole('alertdialog', { name: new RegExp(`^${designerName} saved the stock at .+ while you were editing$`) });
    const kerf = async (text: string) => {
      await page.getByLabel('Kerf').fill(text);
      await page.getByLabel('Kerf').press('Enter');
      await page.getByTestId('stock-save-bar').first().getByText('Unsaved changes').waitFor();
    };
    await page.reload();
    await page.locator('figure.board-diagram').first().waitFor();
    const before = await readStock();

    await kerf('1/16 in');
    await designerSaves(5);
    await page.getByRole('button', { name: 'Save stock' }).first().click();
    await notice.waitFor();
    expect((await readStock()).trimMm).toBe(5);
    await shot('materials-stock-conflict');
    await notice.getByRole('button', { name: 'Save mine over theirs' }).click();
    await notice.waitFor({ state: 'detached' });
    await page.getByTestId('stock-save-bar').first().getByText('Saved for the workshop').waitFor();
    const mine = await readStock();
    // The whole draft replaced theirs: the owner's kerf, and the trim as the owner's page had it.
    expect(Math.abs(mine.kerfMm - IN / 16)).toBeLessThan(MM_TOLERANCE);
    expect(mine.trimMm).toBe(before.trimMm);

    await kerf('3/32 in');
    await designerSaves(4);
    await page.getByRole('button', { name: 'Save stock' }).first().click();
    await notice.waitFor();
    await notice.getByRole('button', { name: 'Load theirs (drop my changes)' }).click();
    await notice.waitFor({ state: 'detached' });
    expect(await page.getByTestId('stock-save-bar').first().innerText()).toContain(`by ${designerName}`);
    expect(await page.getByTestId('stock-save-bar').first().getByText('Unsaved changes').count()).toBe(0);
    const theirs = await readStock();
    expect(theirs.trimMm).toBe(4);
    expect(Math.abs(theirs.kerfMm - IN / 16)).toBeLessThan(MM_TOLERANCE);
  });

  it('shows the stock to the client read-only: no Save, no Add, fields disabled', async () => {
    expect(await restoreStock()).toBe(200);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(reviewer.email);
    await page.goto(`${server.url}/designs/${designId}/materials`);
    await page.locator('figure.board-diagram').first().waitFor();
    await page.getByText("Only the workshop's owners and designers can change its stock.").first().waitFor();
    expect(await page.getByRole('button', { name: 'Save stock' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Add a board' }).count()).toBe(0);
    expect(await page.getByLabel('Board 1 label').isDisabled()).toBe(true);
    expect(await page.getByLabel('Kerf').isDisabled()).toBe(true);
    await shot('materials-stock-read-only');
  });
});
