// What `npm start` and `npm test` install when it is missing: npm packages from the lockfile,
// and (as root, from Debian's packages) Chromium and poppler for the browser and PDF tests.
import { existsSync, statSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

function step(message) {
  process.stderr.write(`[setup] ${message}\n`);
}

/** `npm ci` when node_modules is absent or older than package-lock.json. */
export function ensureNodeModules(root) {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  step('installing npm packages from package-lock.json (npm ci)');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) throw new Error('npm ci failed');
}

let aptUpdated = false;
/** Install Debian packages (as root) when `probe` is absent. */
export function ensureDebianPackages(probe, packages) {
  if (existsSync(probe)) return;
  if (!isRoot) throw new Error(`${probe} is missing; install ${packages.join(' ')} from Debian's packages`);
  step(`installing ${packages.join(', ')} from Debian's packages`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    aptUpdated = true;
  }
  const result = spawnSync('apt-get', ['install', '-y', '-qq', ...packages], { stdio: 'inherit', env });
  if (result.status !== 0 || !existsSync(probe)) throw new Error(`installing ${packages.join(' ')} failed`);
}

/** Chromium for the browser tests and poppler for reading PDFs back. */
export function ensureTestTools() {
  ensureDebianPackages('/usr/bin/chromium', ['chromium']);
  ensureDebianPackages('/usr/bin/pdftoppm', ['poppler-utils']);
}
