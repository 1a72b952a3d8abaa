/**
 * The editor's 3D view as a maker uses it: a new maker starts a workshop and a chest, then
 * clicks a part in 3D, picks one from the cut list, explodes the piece, cuts it away and turns
 * to preset views. Each step is checked on the canvas's own pixels and in the page's state, and
 * a screenshot of each lands in screenshots/ to be looked at.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { buildPiece, defaultSpec } from '../../shared/engine/index.ts';
import { launchBrowser, SCREENSHOT_DIR } from '../support/browser.ts';
import { lookAtCanvas, settleCanvas, type CanvasLook } from '../support/canvasLook.ts';
import { startTestServer } from '../support/testApp.ts';

let server: Awaited<ReturnType<typeof startTestServer>>;
let browser: Awaited<ReturnType<typeof launchBrowser>>;
let page: Page;

const VIEW = '[data-testid="piece-view"]';
const CANVAS = `${VIEW} canvas`;

beforeAll(async () => {
  if (!existsSync('dist/index.html')) throw new Error('Build the client first (npm test does: vite build)');
  server = await startTestServer();
  browser = await launchBrowser();
  page = await browser.context.newPage();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

/** What the canvas shows, from its pixels (the view keeps its drawing buffer). */
const look = (): Promise<CanvasLook> => lookAtCanvas(page, CANVAS);

/** Mean difference (0–255) between two coarse pictures. */
const difference = (a: CanvasLook, b: CanvasLook): number => a.thumb.reduce((sum, v, i) => sum + Math.abs(v - b.thumb[i]!), 0) / a.thumb.length;

const settle = (): Promise<void> => settleCanvas(page);

async function shot(name: string) {
  await page.locator(VIEW).screenshot({ path: join(SCREENSHOT_DIR, `${name}.png`) });
}

// Software WebGL on a busy two-core machine can take a minute for the four preset views; the
// limit only stops a hung browser, it does not measure speed.
describe('the 3D view in the design editor', { timeout: 300_000 }, () => {
  let assembled: CanvasLook;

  it('draws a new chest: every part instance the engine places, in wood on the paper', async () => {
    await page.goto(`${server.url}/register`);
    await page.getByLabel('Your name').fill('Ines Tamura');
    await page.getByLabel('E-mail').fill(`ines.${Date.now()}@example.com`);
    await page.getByLabel('Password').fill('a long enough password');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByLabel('Workshop name').fill('Tamura Woodshop');
    await page.getByRole('button', { name: 'Start the workshop' }).click();
    await page.getByRole('link', { name: 'New design' }).first().click();
    await page.getByLabel('Title of the new design').fill('Blanket chest for the 3D view');
    await page.getByRole('button', { name: 'Create and open' }).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);

    await page.locator(CANVAS).waitFor({ timeout: 60_000 });
    await settle();
    const expected = buildPiece(defaultSpec('chest')).placements.length;
    expect(Number(await page.locator(VIEW).getAttribute('data-part-count'))).toBe(expected);
    assembled = await look();
    expect(assembled.inked).toBeGreaterThan(0.08);
    // Nothing is selected yet, so there is (almost) no pencil red.
    expect(assembled.red).toBeLessThan(0.002);
    await shot('scene-assembled');
  });

  it('selects the part under a click in red, and marks its cut-list row', async () => {
    await page.getByRole('button', { name: 'Front' }).click();
    await settle();
    const box = (await page.locator(CANVAS).boundingBox())!;
    // The middle of the front view is wood (a panel or the centre stile), never paper.
    await page.mouse.click(box.x + box.width / 2, box.y + box.height * 0.55);
    await page.waitForFunction((sel) => document.querySelector(sel)?.getAttribute('data-selected-part') !== '', VIEW);
    const partId = (await page.locator(VIEW).getAttribute('data-selected-part'))!;
    await settle();
    expect(await page.locator(`tr[data-part-row="${partId}"]`).first().getAttribute('aria-selected')).toBe('true');
    const selected = await look();
    expect(selected.red).toBeGreaterThan(0.003);
    await shot('scene-selected-by-click');

    // A click on bare paper clears the selection.
    await page.mouse.click(box.x + 8, box.y + 8);
    await page.waitForFunction((sel) => document.querySelector(sel)?.getAttribute('data-selected-part') === '', VIEW);
  });

  it('shows a part picked in the cut list in red in 3D', async () => {
    await page.locator('table[aria-label="Cut list"] tr[data-part-row="leg"]').click();
    await page.waitForFunction((sel) => document.querySelector(sel)?.getAttribute('data-selected-part') === 'leg', VIEW);
    await settle();
    expect((await look()).red).toBeGreaterThan(0.005);
    await shot('scene-leg-from-table');
    await page.locator('table[aria-label="Cut list"] tr[data-part-row="leg"]').click();
    await page.waitForFunction((sel) => document.querySelector(sel)?.getAttribute('data-selected-part') === '', VIEW);
  });

  it('spreads the parts apart when exploded, and keeps every part in view', async () => {
    await page.getByRole('button', { name: '¾' }).click();
    await settle();
    const before = await look();
    await page.getByRole('slider').first().fill('1');
    await settle();
    const exploded = await look();
    await shot('scene-exploded');
    expect(difference(exploded, before)).toBeGreaterThan(4);
    // The camera refits on the spread parts: nothing (the lid above all) runs off an edge.
    expect(exploded.inkBox.y0).toBeGreaterThan(0.01);
    expect(exploded.inkBox.x0).toBeGreaterThan(0.01);
    expect(exploded.inkBox.x1).toBeLessThan(0.99);
    expect(exploded.inkBox.y1).toBeLessThan(0.99);
    await page.getByRole('slider').first().fill('0');
    await settle();
    expect(difference(await look(), before)).toBeLessThan(2);
  });

  it('cuts the piece away to show its inside, and closes it again', async () => {
    const before = await look();
    await page.getByLabel('Cut-away').selectOption('y');
    await settle();
    const cut = await look();
    expect(difference(cut, before)).toBeGreaterThan(4);
    await shot('scene-cutaway');
    await page.getByRole('button', { name: 'Front' }).click();
    await settle();
    await shot('scene-cutaway-front');
    await page.getByLabel('Cut-away').selectOption('');
    await page.getByRole('button', { name: '¾' }).click();
    await settle();
    expect(difference(await look(), before)).toBeLessThan(2);
  });

  it('turns to each preset view, each a different picture', async () => {
    const looks: CanvasLook[] = [];
    for (const name of ['Front', 'Side', 'Top', '¾']) {
      await page.getByRole('button', { name, exact: true }).click();
      await settle();
      looks.push(await look());
      await shot(`scene-view-${name === '¾' ? 'three-quarter' : name.toLowerCase()}`);
    }
    for (let i = 0; i < looks.length; i++) {
      for (let j = i + 1; j < looks.length; j++) expect(difference(looks[i]!, looks[j]!)).toBeGreaterThan(3);
    }
  });
});
