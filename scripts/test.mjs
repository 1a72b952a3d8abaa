// `npm test`: install what is missing, start a throwaway PostgreSQL on a free port in a
// temporary folder, then type-check, lint, build the client and run every vitest project
// (unit, integration against the real database, browser tests in Chromium). The cluster is
// stopped and removed even when a step fails; the run ends with vitest's summary.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNodeModules, ensureTestTools } from './lib/bootstrap.mjs';
import { freePort, startCluster } from './lib/postgres.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
process.chdir(root);

ensureNodeModules(root);
ensureTestTools();

const base = mkdtempSync(join(tmpdir(), 'casewright-test-'));
let cluster;
let failed = [];

function cleanUp() {
  try {
    cluster?.stop();
  } finally {
    rmSync(base, { recursive: true, force: true });
  }
}
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    cleanUp();
    process.exit(130);
  });
}

function step(name, cmd, args, env = {}) {
  process.stderr.write(`\n[test] ${name}\n`);
  const result = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  if (result.status !== 0) failed.push(name);
  return result.status;
}

try {
  cluster = await startCluster({ dataDir: join(base, 'pg'), port: await freePort(), durable: false, database: 'casewright_test' });
  const env = { DATABASE_URL: cluster.url, NODE_ENV: 'test' };
  step('type-check (tsc)', 'npx', ['tsc', '-p', 'tsconfig.json'], env);
  step('lint (eslint)', 'npx', ['eslint', '.', '--max-warnings=0'], env);
  step('build the client (vite build)', 'npx', ['vite', 'build', '--logLevel', 'warn'], { ...env, NODE_ENV: 'production' });
  step('tests (vitest: unit, integration, e2e)', 'npx', ['vitest', 'run'], env);
} catch (error) {
  failed.push(error instanceof Error ? error.message : String(error));
} finally {
  cleanUp();
}

if (failed.length > 0) {
  process.stderr.write(`\n[test] failed: ${failed.join('; ')}\n`);
  process.exit(1);
}
