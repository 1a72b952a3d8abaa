import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';

/** The fixtures folder, found from this file so the test runs from any working folder. */
const FIXTURES = resolve(dirname(fileURLToPath(import.meta.url)), '../../fixtures');
const SPEC = resolve(FIXTURES, 'specs/chest-toy-maple.json');
const STOCK_FILE = resolve(FIXTURES, 'stock/small-shop.json');
/** The fixture as the stock API returns it: `{ stock, updatedAt, updatedBy, version }`. */
const WRAPPED = JSON.parse(readFileSync(STOCK_FILE, 'utf8')) as { stock: Record<string, unknown> & { boardsInStock: { defects: Record<string, unknown>[] }[] } };

const captured = captureCliOutput();
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'casewright-plan-stock-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('casewright plan --stock', () => {
  it('lays the materials pages out on the stock file: boards on hand first, their knots and checks drawn, the file named', async () => {
    const out = join(dir, 'chest.pdf');
    expect(await runCli(['plan', SPEC, '--stock', STOCK_FILE, '--out', out])).toBe(0);
    const text = execFileSync('pdftotext', ['-layout', out, '-'], { encoding: 'utf8' });
    expect(text).toContain('Laid out on the stock file small-shop.json');
    // The fixture's two maple boards on hand, with a knot on one and a check on the other.
    expect(text).toMatch(/Board 1 of \d+ \(in stock\)/);
    expect(text).toContain('knot');
    expect(text).toContain('check');
  }, 60_000);

  it('refuses a bad stock file with exit code 2, naming the field, and writes no PDF', async () => {
    const board = WRAPPED.stock.boardsInStock[0]!;
    const bad = { ...WRAPPED, stock: { ...WRAPPED.stock, boardsInStock: [{ ...board, defects: [{ ...board.defects[0], fromEndMm: 3000 }] }] } };
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(bad));
    const out = join(dir, 'bad.pdf');
    expect(await runCli(['plan', SPEC, '--stock', file, '--out', out])).toBe(2);
    expect(captured.stderr).toContain('--stock stock.boardsInStock[0].defects[0].fromEndMm');
    expect(existsSync(out)).toBe(false);
  });

  it('names a stock file it cannot read as typed', async () => {
    const missing = join(dir, 'missing.json');
    expect(await runCli(['plan', SPEC, '--stock', missing, '--out', join(dir, 'x.pdf')])).toBe(2);
    expect(captured.stderr).toContain(`--stock: cannot read "${missing}"`);
  });

  it('documents the stock file in its help', async () => {
    expect(await runCli(['plan', '--help'])).toBe(0);
    for (const field of ['--stock <file>', 'boardsInStock', 'fromEndMm', 'kerfMm, trimMm']) expect(captured.stdout).toContain(field);
  });
});
