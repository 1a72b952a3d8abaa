// `npm start`: install what is missing, start the app's own PostgreSQL on 127.0.0.1 (data in
// .data/pg, kept between runs), migrate and seed the demo, build the client, and serve it
// with the API. Ctrl-C stops everything this script started.
import { spawn, spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNodeModules } from './lib/bootstrap.mjs';
import { chooseDataDir, startCluster } from './lib/postgres.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
process.chdir(root);

const PG_PORT = Number(process.env.CASEWRIGHT_PG_PORT ?? 54329);
const PORT = Number(process.env.PORT ?? 5180);
const HOST = process.env.HOST ?? '127.0.0.1';
const devMode = process.argv.includes('--dev');

ensureNodeModules(root);
const cluster = await startCluster({ dataDir: chooseDataDir(join(root, '.data', 'pg')), port: PG_PORT, durable: true, database: 'casewright' });
const env = { ...process.env, DATABASE_URL: cluster.url, PORT: String(PORT), HOST, NODE_ENV: process.env.NODE_ENV ?? 'development' };

const children = [];
let stopping = false;
function stopAll(code = 0) {
  if (stopping) return;
  stopping = true;
  for (const child of children) if (child.exitCode === null) child.kill('SIGTERM');
  const waitForChildren = children.map((c) => (c.exitCode === null ? new Promise((r) => c.once('exit', r)) : null)).filter(Boolean);
  Promise.race([Promise.all(waitForChildren), new Promise((r) => setTimeout(r, 8000))]).then(() => {
    if (cluster.startedHere) {
      process.stderr.write('[start] stopping PostgreSQL\n');
      cluster.stop();
    }
    process.exit(code);
  });
}
process.on('SIGINT', () => stopAll(0));
process.on('SIGTERM', () => stopAll(0));

function runStep(name, args) {
  process.stderr.write(`[start] ${name}\n`);
  const result = spawnSync(process.execPath, args, { stdio: 'inherit', env });
  if (result.status !== 0) {
    process.stderr.write(`[start] ${name} failed\n`);
    stopAll(1);
    return false;
  }
  return true;
}

if (runStep('migrating and seeding the database', ['--import', 'tsx', 'server/db/setup.ts'])) {
  if (devMode) {
    const api = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { stdio: 'inherit', env: { ...env, PORT: String(PORT + 1) } });
    const vite = spawn(process.execPath, ['node_modules/vite/bin/vite.js', '--host', HOST, '--port', String(PORT)], { stdio: 'inherit', env: { ...env, API_PORT: String(PORT + 1) } });
    children.push(api, vite);
    console.log(`\nCasewright (dev) is at http://${HOST}:${PORT}/  (API on ${PORT + 1})`);
  } else if (runStep('building the client', ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn'])) {
    const api = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { stdio: 'inherit', env });
    children.push(api);
    api.once('exit', (code) => {
      if (!stopping) stopAll(code ?? 1);
    });
    api.stdout?.on('data', () => {});
    waitUntilServing().then(printWelcome, (error) => {
      process.stderr.write(`[start] ${error.message}\n`);
      stopAll(1);
    });
  }
}

/** Poll the API's health until it answers, so the welcome lines follow a server that is up. */
async function waitUntilServing(timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(`http://${HOST}:${PORT}/api/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server did not answer on http://${HOST}:${PORT}/api/health within ${timeoutMs / 1000} s`);
}

function printWelcome() {
  const demo = JSON.parse(readFileSync(join(root, 'server/db/demo-accounts.json'), 'utf8'));
  const lines = demo.accounts.map((a) => `    ${a.role.padEnd(9)} ${a.email}`).join('\n');
  console.log(`
Casewright is running at http://${HOST}:${PORT}/
  API health: http://${HOST}:${PORT}/api/health
  Demo sign-ins (invented people), password "${demo.password}":
${lines}
Press Ctrl-C to stop the app and its PostgreSQL.
`);
}
