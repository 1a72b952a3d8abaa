/**
 * Debian's Chromium driven by playwright-core. Software WebGL (SwiftShader) so three.js renders
 * on a machine with no GPU; background networking off because this machine's network is closed.
 */
import { chromium, type BrowserContext } from 'playwright-core';
import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const CHROMIUM_ARGS = [
  '--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
  '--disable-background-networking', '--disable-component-update', '--disable-sync',
  '--use-angle=swiftshader', '--enable-unsafe-swiftshader',
];

/** Screenshots land here (git-ignored) so a person can look at them after a run. */
export const SCREENSHOT_DIR = join(process.cwd(), 'screenshots');

export async function launchBrowser(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const profile = mkdtempSync(join(tmpdir(), 'casewright-chromium-'));
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    viewport: { width: 1366, height: 900 },
  });
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
