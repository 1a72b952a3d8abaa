/**
 * The editor's answer time: from a parameter change to the tables and the 3D view showing it,
 * measured in Debian's Chromium (software WebGL, the same flags as the browser tests) against the
 * built app, on a throwaway PostgreSQL seeded with the demo. The demo designer opens the demo's
 * blanket chest and sets its width to a new value RUNS times (one input event each); the page's
 * own performance marks give the figures:
 *
 *  - `param-change` (the field's input event) → `tables-drawn` (the cut list shows the new result;
 *    includes the editor's 180 ms typing pause before the engine runs, by design);
 *  - → `piece-drawn` (the first 3D frame of the new result, changed parts as plain boxes);
 *  - → `solids-drawn` (the frame with every part's joinery cut, built in idle time).
 *
 * Figures only; nothing here asserts speed. Needs `vite build` first (dist/) and /usr/bin/chromium.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort, startCluster } from '../../scripts/lib/postgres.mjs';
import { createApp } from '../../server/app.ts';
import { loadConfig } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';
import { migrate } from '../../server/db/migrate.ts';
import { seedDemo } from '../../server/db/seed.ts';
import { launchBrowser } from '../support/browser.ts';

const RUNS = Number(process.env.BENCH_EDITOR_RUNS ?? 15);
/** Widths typed in turn, so every change is a real change. */
const WIDTHS = ['41 1/2"', '43"', '40 1/4"'];

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

function row(name: string, values: number[]): string {
  const sorted = [...values].sort((a, b) => a - b);
  const fmt = (ms: number) => `${ms.toFixed(0)} ms`.padStart(8);
  return `  ${name.padEnd(48)} median ${fmt(percentile(sorted, 50))}  p95 ${fmt(percentile(sorted, 95))}  max ${fmt(sorted.at(-1)!)}  runs ${sorted.length}`;
}

export async function benchEditor(): Promise<string> {
  if (!existsSync('dist/index.html')) return '  skipped: build the client first (npx vite build)';
  const folder = mkdtempSync(join(tmpdir(), 'casewright-bench-editor-'));
  const cluster = await startCluster({ dataDir: join(folder, 'pg'), port: await freePort(), durable: false, database: 'casewright_bench' });
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: cluster.url, HOST: '127.0.0.1', PORT: '0', DB_TIMEOUT_MS: '5000', CLIENT_DIR: 'dist' });
  const sequelize = createSequelize(config.databaseUrl, config.dbTimeoutMs);
  let server: Server | undefined;
  let browser: Awaited<ReturnType<typeof launchBrowser>> | undefined;
  try {
    await migrate(sequelize);
    await seedDemo(sequelize);
    const app = createApp({ config, sequelize });
    server = await new Promise<Server>((resolve) => {
      const s = app.listen(0, '127.0.0.1', () => resolve(s));
    });
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const demo = JSON.parse(readFileSync('server/db/demo-accounts.json', 'utf8')) as { password: string; accounts: { role: string; email: string }[] };

    browser = await launchBrowser();
    const page = await browser.context.newPage();
    await page.goto(`${base}/signin`);
    await page.getByLabel('E-mail').fill(demo.accounts.find((a) => a.role === 'designer')!.email);
    await page.getByLabel('Password').fill(demo.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/workshops\/[0-9a-f-]{36}$/);
    await page.getByRole('link', { name: 'Blanket chest, white oak', exact: true }).click();
    await page.locator('table[aria-label="Cut list"]').waitFor();
    const ready = 'canvas[data-camera-settled="true"][data-solids-ready="true"]';
    await page.locator(ready).waitFor({ timeout: 120_000 });

    const toTables: number[] = [];
    const toPiece: number[] = [];
    const toSolids: number[] = [];
    const width = page.getByLabel('Width over the legs', { exact: true });
    for (let i = 0; i < RUNS; i++) {
      await page.evaluate(() => performance.clearMarks());
      await width.fill(WIDTHS[i % WIDTHS.length]!);
      // Wait for the frame with every cut solid of the new result.
      await page.waitForFunction(() => {
        const change = performance.getEntriesByName('param-change').at(-1);
        return Boolean(change && performance.getEntriesByName('solids-drawn').some((m) => m.startTime > change.startTime));
      }, undefined, { timeout: 120_000 });
      // No named helpers inside: tsx's name-keeping wrapper does not exist in the page.
      const marks = await page.evaluate((names) => {
        const change = performance.getEntriesByName('param-change').at(-1)!.startTime;
        const [tables, piece, solids] = names.map((name) => (performance.getEntriesByName(name).find((m) => m.startTime > change)?.startTime ?? NaN) - change);
        return { tables: tables!, piece: piece!, solids: solids! };
      }, ['tables-drawn', 'piece-drawn', 'solids-drawn']);
      toTables.push(marks.tables);
      toPiece.push(marks.piece);
      toSolids.push(marks.solids);
    }
    return [
      '  Chromium (software WebGL) against the built app; the demo blanket chest, width set by one input event per run',
      row('change → cut list shows it (incl. 180 ms pause)', toTables),
      row('change → first 3D frame of it (plain boxes)', toPiece),
      row('change → 3D frame with every joint cut', toSolids),
    ].join('\n');
  } finally {
    await browser?.close();
    if (server) {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server!.close(() => resolve()));
    }
    await sequelize.close();
    cluster.stop();
    rmSync(folder, { recursive: true, force: true });
  }
}
