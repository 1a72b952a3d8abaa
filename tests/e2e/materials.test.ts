/**
 * The Materials page as the demo owner meets it: open the demo chest's materials, see its sheet
 * diagram and numbers, cancel a thorough run and keep its best layouts, upload a price list with
 * a bad line (the line is named, nothing is saved), then a good one, and see the cost. Expected
 * numbers come from the same shared code the browser runs, never typed in by hand.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { buildPiece } from '../../shared/engine/index.ts';
import { validateSpec } from '../../shared/engine/params.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { costOf } from '../../shared/materials/cost.ts';
import { centsText } from '../../shared/materials/money.ts';
import { parsePriceListCsv } from '../../shared/materials/priceListCsv.ts';
import { takeoffOptionsFor, type StockSettings } from '../../shared/materials/stockSettings.ts';
import { materialsTakeoff } from '../../shared/materials/takeoff.ts';
import { DEMO_PRICE_LIST } from '../../server/db/demoPriceList.ts';
import { SCREENSHOT_DIR } from '../support/browser.ts';
import { openDemoBrowser, type DemoBrowser } from '../support/demoBrowser.ts';

const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as { password: string; accounts: { role: string; email: string }[] };
const owner = demo.accounts.find((a) => a.role === 'owner')!;
const CHEST_TITLE = 'Blanket chest, white oak';

// Invented prices for the test, not market prices.
const BAD_CSV = 'kind,item,thickness,price,unit,name\nlumber,white-oak,4/4,9.40,,\nlumber,white-oak,eight quarters,12.00,,\nsheet,hardwood-plywood-1/2,,71.00,,\n';
const GOOD_CSV = 'kind,item,thickness,price,unit,name\nlumber,white-oak,4/4,9.40,,\nlumber,white-oak,8/4,12.00,,\nsheet,hardwood-plywood-1/2,,71.00,,\n';

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

const shot = (name: string, fullPage = false) => page.screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`), fullPage });

async function chest(): Promise<{ id: string; workshopId: string; spec: PieceSpec; stock: StockSettings }> {
  return page.evaluate(async (title) => {
    const get = async (path: string) => (await fetch(path, { headers: { Accept: 'application/json' } })).json();
    const me = await get('/api/auth/me');
    const workshopId = me.workshops.find((w: { name: string }) => w.name === 'Tidewater Joinery').id;
    const list = await get(`/api/workshops/${workshopId}/designs?kind=chest`);
    const id = list.designs.find((d: { title: string }) => d.title === title).id;
    const detail = await get(`/api/designs/${id}`);
    const { stock } = await get(`/api/workshops/${workshopId}/stock`);
    return { id, workshopId, spec: detail.headRevision.spec, stock };
  }, CHEST_TITLE);
}

describe('Materials page', () => {
  it('shows the demo chest cut from sheets and boards, with its numbers, to the demo owner', async () => {
    await page.goto(`${server.url}/signin`);
    await page.getByLabel('E-mail').fill(owner.email);
    await page.getByLabel('Password').fill(demo.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Sign out' }).waitFor();
    const { id, spec, stock } = await chest();
    await page.goto(`${server.url}/designs/${id}/materials`);
    await page.locator('figure.sheet-diagram').first().waitFor();

    const result = buildPiece(validateSpec(spec));
    // The workshop's own stock (the demo's boards on hand and offcut), as the page lays out on.
    const expected = materialsTakeoff(result, takeoffOptionsFor(stock));
    const sheetParts = expected.sheets.flatMap((s) => s.layout.sheets.flatMap((p) => p.parts.map((x) => x.name)));
    const drawn = await page.locator('figure.sheet-diagram [data-part]').evaluateAll((els) => els.map((e) => e.getAttribute('data-part')));
    expect(drawn.sort()).toEqual(sheetParts.sort());
    expect(await page.locator('figure.sheet-diagram [data-cut]').count()).toBe(expected.sheets.flatMap((s) => s.layout.sheets.flatMap((p) => p.cuts)).length);
    const numbers = page.getByRole('table', { name: 'Numbers by material' });
    const plywood = expected.sheets[0]!;
    await expect.poll(() => numbers.locator(`[data-sheet-good="${plywood.sheetId}"]`).innerText()).toContain(`≥ ${plywood.layout.lowerBound} sheet`);
    expect(await page.locator('figure.board-diagram').count()).toBe(expected.boards.reduce((n, b) => n + b.layout.boards.length, 0));
    await shot('materials-diagrams');
    await shot('materials-full', true);
  });

  it('cancels a thorough run and keeps the best layouts found so far', async () => {
    // Click Cancel the moment the progress bar appears, as a hurried maker would.
    await page.evaluate(() => {
      const observer = new MutationObserver(() => {
        const button = document.querySelector<HTMLButtonElement>('[data-testid="layout-progress"] button');
        if (button) {
          button.click();
          observer.disconnect();
        }
      });
      observer.observe(document.body, { childList: true, subtree: true });
    });
    await page.getByLabel('Layout effort').selectOption('thorough');
    await page.getByText('Stopped early: these are the best layouts found before you cancelled.').waitFor();
    expect(await page.locator('figure.sheet-diagram').count()).toBeGreaterThan(0);
    await shot('materials-cancelled');
    await page.getByLabel('Layout effort').selectOption('standard');
    await page.getByText('Stopped early: these are the best layouts').waitFor({ state: 'detached' });
  });

  it('refuses a price-list CSV with a bad line, naming it and saving nothing', async () => {
    await page.getByLabel('Upload a price list CSV').setInputFiles({ name: 'prices.csv', mimeType: 'text/csv', buffer: Buffer.from(BAD_CSV) });
    const errors = page.getByTestId('csv-errors');
    await errors.waitFor();
    expect(await errors.innerText()).toMatch(/Line 3 \(thickness\)/);
    const saved = await page.evaluate(async () => {
      const me = await (await fetch('/api/auth/me')).json();
      const workshopId = me.workshops.find((w: { name: string }) => w.name === 'Tidewater Joinery').id;
      return (await (await fetch(`/api/workshops/${workshopId}/price-list`)).json()).priceList;
    });
    expect(saved.items).toEqual(DEMO_PRICE_LIST.items);
    await errors.scrollIntoViewIfNeeded();
    await shot('materials-csv-errors');
  });

  it('replaces the price list from a good CSV and shows the cost from it', async () => {
    await page.getByLabel('Upload a price list CSV').setInputFiles({ name: 'prices.csv', mimeType: 'text/csv', buffer: Buffer.from(GOOD_CSV) });
    await page.getByText('Saved 3 prices from prices.csv.').waitFor();
    const { spec, stock } = await chest();
    const takeoff = materialsTakeoff(buildPiece(validateSpec(spec)), takeoffOptionsFor(stock));
    const parsed = parsePriceListCsv(GOOD_CSV);
    if (!parsed.ok) throw new Error('the test CSV must be good');
    const cost = costOf(takeoff, parsed.priceList);
    await expect.poll(() => page.getByTestId('cost-total').innerText()).toBe(`${centsText(cost.totals.total)} USD`);
    expect(cost.missingPrices).toEqual([]);
    await page.getByRole('heading', { name: 'Cost' }).scrollIntoViewIfNeeded();
    await shot('materials-cost');
  });
});
