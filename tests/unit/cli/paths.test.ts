import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';
import { fromUserCwd } from '../../../server/cli/paths.ts';

const HERE = dirname(fileURLToPath(import.meta.url));
/** Found from this file, so the test runs from any working folder. */
const FIXTURES = resolve(HERE, '../../fixtures');
const REPOSITORY = resolve(HERE, '../../..');

let userDir: string;
const captured = captureCliOutput();

beforeEach(() => {
  // A folder other than the repository, standing for where the user typed `npm run ...`.
  userDir = mkdtempSync(join(tmpdir(), 'casewright-cwd-'));
  mkdirSync(join(userDir, 'specs'));
  copyFileSync(join(FIXTURES, 'specs/chest-toy-maple.json'), join(userDir, 'specs/toy.json'));
  copyFileSync(join(FIXTURES, 'rooms/coastal-bedroom.json'), join(userDir, 'room.json'));
  vi.stubEnv('INIT_CWD', userDir);
});

afterEach(() => {
  vi.unstubAllEnvs();
  rmSync(userDir, { recursive: true, force: true });
});

describe('fromUserCwd', () => {
  it('reads a relative path from INIT_CWD and leaves an absolute one alone', () => {
    expect(fromUserCwd('specs/toy.json')).toBe(join(userDir, 'specs/toy.json'));
    expect(fromUserCwd('/var/x.json')).toBe('/var/x.json');
  });

  it('falls back to the working folder when npm did not set INIT_CWD', () => {
    vi.stubEnv('INIT_CWD', undefined);
    expect(fromUserCwd('a.json')).toBe(join(process.cwd(), 'a.json'));
  });
});

describe('casewright commands with relative paths', () => {
  it('cutlist reads a spec file relative to where the user ran npm', async () => {
    expect(await runCli(['cutlist', 'specs/toy.json', '--json'])).toBe(0);
    expect(captured.stderr).toBe('');
    expect((JSON.parse(captured.stdout) as { piece: { kind: string } }).piece.kind).toBe('chest');
  });

  it('plan writes --out beside the user, not in the repository', async () => {
    expect(await runCli(['plan', 'specs/toy.json', '--format', 'csv', '--out', 'toy.csv'])).toBe(0);
    expect(existsSync(join(userDir, 'toy.csv'))).toBe(true);
    expect(existsSync(resolve(REPOSITORY, 'toy.csv'))).toBe(false);
    expect(readFileSync(join(userDir, 'toy.csv'), 'utf8')).toContain('Finished length (in)');
  });

  it('layout reads --parts relative to the user', async () => {
    writeFileSync(join(userDir, 'parts.csv'), 'name,quantity,length,width,thickness,material\nShelf,2,30in,11in,1/2in,hardwood-plywood-1/2\n');
    expect(await runCli(['layout', '--parts', 'parts.csv', '--json'])).toBe(0);
    expect(captured.stderr).toBe('');
    expect(captured.stdout).toContain('Shelf');
  });

  it('fit reads the spec and --room relative to the user', async () => {
    expect(await runCli(['fit', 'specs/toy.json', '--room', 'room.json', '--json'])).toBe(0);
    expect(captured.stderr).toBe('');
  });

  it('plan reads --prices relative to the user and names a bad line of it', async () => {
    writeFileSync(join(userDir, 'prices.csv'), 'kind,item,thickness,price\nlumber,white-oak,4/4,9.50\nlumber,white-oak,4/4,lots\n');
    expect(await runCli(['plan', 'chest', '--prices', 'prices.csv', '--out', 'chest.pdf'])).toBe(2);
    expect(captured.stderr).toMatch(/--prices: .*line 3/);
    expect(existsSync(join(userDir, 'chest.pdf'))).toBe(false);
  });

  it('names the path as typed when the file is missing', async () => {
    expect(await runCli(['cutlist', 'specs/missing.json'])).toBe(2);
    expect(captured.stderr).toContain('"specs/missing.json"');
  });
});
