/**
 * The set-up every browser test of the demo workshop shares: the real app on a free port with
 * the demo workshop seeded, and one Chromium page to drive it. Needs the built client in dist/.
 */
import { existsSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { seedDemo } from '../../server/db/seed.ts';
import { launchBrowser } from './browser.ts';
import { startTestServer } from './testApp.ts';

export interface DemoBrowser {
  server: Awaited<ReturnType<typeof startTestServer>>;
  browser: Awaited<ReturnType<typeof launchBrowser>>;
  page: Page;
}

/** Starts the server, seeds the demo (idempotent: other browser tests may have seeded this database already) and opens a page; close `browser` then `server` in `afterAll`. */
export async function openDemoBrowser(): Promise<DemoBrowser> {
  if (!existsSync('dist/index.html')) throw new Error('Build the client first (npm test does: vite build)');
  const server = await startTestServer();
  try {
    await seedDemo(server.sequelize);
    const browser = await launchBrowser();
    const page = await browser.context.newPage();
    return { server, browser, page };
  } catch (error) {
    await server.close();
    throw error;
  }
}
