import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { existsSync } from 'node:fs';
import { launchBrowser, SCREENSHOT_DIR } from '../support/browser.ts';
import { startTestServer } from '../support/testApp.ts';

let server: Awaited<ReturnType<typeof startTestServer>>;
let browser: Awaited<ReturnType<typeof launchBrowser>>;

beforeAll(async () => {
  if (!existsSync('dist/index.html')) throw new Error('Build the client first (npm test does: vite build)');
  server = await startTestServer();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe('the home page', () => {
  it('tells a visitor what Casewright does and shows the server is up', async () => {
    const page = await browser.context.newPage();
    await page.goto(server.url);
    const heading = await page.getByRole('heading', { level: 1 }).textContent();
    expect(heading).toContain('chests, dressers and cabinets');
    const body = await page.locator('main').innerText();
    for (const phrase of ['Every part and joint', 'Wood that moves', 'Fit the room', 'Plans to build from', 'tip over']) {
      expect(body).toContain(phrase);
    }
    await page.getByText('Server and database up').waitFor({ timeout: 10_000 });
    // The dimensions are set in the shipped JetBrains Mono, not a fallback font.
    await page.evaluate(() => document.fonts.ready);
    const monoLoaded = await page.evaluate(() => document.fonts.check('12px "JetBrains Mono"'));
    expect(monoLoaded).toBe(true);
    await page.screenshot({ path: join(SCREENSHOT_DIR, 'home.png'), fullPage: true });
    await page.close();
  });

  it('answers an unknown address with the not-found page', async () => {
    const page = await browser.context.newPage();
    await page.goto(`${server.url}/no/such/page`);
    const text = await page.locator('main').innerText();
    expect(text).toContain('No drawing at this address');
    await page.close();
  });
});
