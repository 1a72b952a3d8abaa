import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { runCli } from '../../../server/cli/main.ts';
import type { BoardPlan } from '../../../shared/layout/boardTypes.ts';
import type { MaterialsTakeoff } from '../../../shared/materials/takeoff.ts';
import { captureCliOutput } from '../../support/cliOutput.ts';

/** The fixtures folder, found from this file so the test runs from any working folder. */
const FIXTURES = resolve(dirname(fileURLToPath(import.meta.url)), '../../fixtures');
const SPEC = resolve(FIXTURES, 'specs/chest-toy-maple.json');
const STOCK_FILE = resolve(FIXTURES, 'stock/small-shop.json');
/** The fixture as the stock API returns it: `{ stock, updatedAt, updatedBy, version }`. */
const WRAPPED = JSON.parse(readFileSync(STOCK_FILE, 'utf8')) as { stock: Record<string, unknown> & { boardsInStock: { defects: Record<string, unknown>[] }[] } };
const MM_TOLERANCE = 1e-6;
const IN = 25.4;

const captured = captureCliOutput();
let dir: string;

beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'casewright-stock-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

/** Writes `content` (JSON unless it is text already) to a file in the scratch folder and returns its path. */
function scratch(name: string, content: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

async function layoutJson(args: string[]): Promise<MaterialsTakeoff> {
  const code = await runCli(['layout', ...args, '--json']);
  expect(captured.stderr).toBe('');
  expect(code).toBe(0);
  const takeoff = JSON.parse(captured.stdout) as MaterialsTakeoff;
  captured.stdout = '';
  return takeoff;
}

/** No part of `plan` covers any of its defects. */
function clearOfDefects(plan: BoardPlan): boolean {
  return plan.defects.every((d) => {
    const [y0, y1] = [d.fromEdgeMm ?? 0, d.toEdgeMm ?? plan.widthMm];
    return plan.parts.every((p) => p.x >= d.endMm || p.x + p.length <= d.startMm || p.y >= y1 || p.y + p.width <= y0);
  });
}

const mapleBoards = (takeoff: MaterialsTakeoff) => takeoff.boards.find((b) => b.speciesId === 'soft-maple' && b.quarters === 4)!.layout;
const plywood = (takeoff: MaterialsTakeoff) => takeoff.sheets.find((s) => s.sheetId === 'hardwood-plywood-1/2')!.layout;

describe('casewright layout --stock', () => {
  it('cuts the boards on hand first, around their defects, and takes sheets, offcuts, kerf and trim from the file', async () => {
    const usual = await layoutJson([SPEC]);
    const stocked = await layoutJson([SPEC, '--stock', STOCK_FILE]);
    expect(mapleBoards(usual).boards.some((b) => b.inStock)).toBe(false);
    const boards = mapleBoards(stocked).boards;
    expect(boards[0]?.inStock).toBe(true);
    expect(boards.filter((b) => b.inStock).map((b) => b.stockName)).toEqual([expect.stringContaining('Rack A'), expect.stringContaining('Rack B')]);
    expect(boards[0]!.defects).toEqual([expect.objectContaining({ startMm: 1000, endMm: 1040, fromEdgeMm: 80, toEdgeMm: 120, note: 'knot' })]);
    expect(boards.every(clearOfDefects)).toBe(true);
    expect(Math.abs(mapleBoards(stocked).kerfMm - 3)).toBeLessThan(MM_TOLERANCE);
    // The chest's plywood fits the 1000 × 900 mm offcut, so no sheet is bought; without the file it takes a sheet.
    expect(plywood(usual).sheetsBought).toBe(1);
    expect(plywood(stocked)).toMatchObject({ sheetsBought: 0, offcutsUsed: 1 });
    expect(Math.abs(plywood(stocked).trimMm - 6)).toBeLessThan(MM_TOLERANCE);
  });

  it('reads the stock alone as well as wrapped the way the API returns it, to the same layout', async () => {
    const wrapped = await layoutJson([SPEC, '--stock', STOCK_FILE]);
    const alone = await layoutJson([SPEC, '--stock', scratch('alone.json', WRAPPED.stock)]);
    expect(alone).toEqual(wrapped);
  });

  it('lays a parts list out on the boards on hand, and prints each defect cut around', async () => {
    const parts = scratch('parts.csv', 'name,quantity,length,width,thickness,material\nRail,4,30in,3in,3/4in,soft-maple\n');
    const takeoff = await layoutJson(['--parts', parts, '--stock', STOCK_FILE]);
    const layout = mapleBoards(takeoff);
    expect(layout.boards.length).toBeGreaterThan(0);
    expect(layout.boards.every((b) => b.inStock)).toBe(true);
    expect(layout.boards.every(clearOfDefects)).toBe(true);
    expect(await runCli(['layout', '--parts', parts, '--stock', STOCK_FILE, '--units', 'mm'])).toBe(0);
    expect(captured.stdout).toContain('Board in stock “Rack A”');
    expect(captured.stdout).toContain('cut around knot: 1000 mm to 1040 mm from the end, 80 mm to 120 mm from the edge');
  });

  it('lets --kerf and --sheet override the file and keeps the rest of it', async () => {
    const parts = scratch('panel.csv', 'name,quantity,length,width,thickness,material\nPanel,1,100in,50in,1/2in,hardwood-plywood-1/2\nRail,2,30in,3in,3/4in,soft-maple\n');
    const fromFile = await layoutJson(['--parts', parts, '--stock', STOCK_FILE]);
    // A 100 × 50 in panel is larger than the file's 2440 × 1220 mm sheet and its offcut.
    expect(plywood(fromFile).unplaced.length).toBe(1);
    const overridden = await layoutJson(['--parts', parts, '--stock', STOCK_FILE, '--sheet', '60x120in', '--kerf', '1/16in']);
    expect(plywood(overridden).unplaced).toEqual([]);
    expect(Math.abs(plywood(overridden).sheets[0]!.lengthMm - 120 * IN)).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(plywood(overridden).kerfMm - IN / 16)).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(plywood(overridden).trimMm - 6)).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(mapleBoards(overridden).kerfMm - IN / 16)).toBeLessThan(MM_TOLERANCE);
    expect(mapleBoards(overridden).boards[0]?.inStock).toBe(true);
  });

  it('documents the stock file in its help', async () => {
    expect(await runCli(['layout', '--help'])).toBe(0);
    for (const field of ['--stock <file>', 'boardsInStock', 'defects', 'fromEndMm', 'kerfMm, trimMm', '{ "stock": { ... }']) expect(captured.stdout).toContain(field);
  });
});

describe('casewright layout --stock refuses a bad stock file', () => {
  const board = WRAPPED.stock.boardsInStock[0]!;
  const knotPastTheEnd = { ...WRAPPED, stock: { ...WRAPPED.stock, boardsInStock: [{ ...board, defects: [{ ...board.defects[0], fromEndMm: 3000 }] }] } };
  const { boardWidthsMm: _widths, ...noWidths } = WRAPPED.stock;
  const cases: [string, unknown, string][] = [
    ['a knot past the end of its board', knotPastTheEnd, '--stock stock.boardsInStock[0].defects[0].fromEndMm: puts knot 1 beyond the far end'],
    ['a kerf written as text', { ...WRAPPED.stock, kerfMm: '1/8in' }, '--stock kerfMm: must be a number (millimetres)'],
    ['a missing list of board widths', noWidths, '--stock boardWidthsMm:'],
    ['an unknown field', { ...WRAPPED.stock, effort: 'thorough' }, '--stock: '],
    ['an array', [WRAPPED.stock], '--stock: '],
    ['text that is not JSON', '{ "stock": ', 'is not JSON'],
  ];
  it.each(cases)('refuses %s with exit code 2, naming the field, and prints nothing on stdout', async (_what, content, message) => {
    const code = await runCli(['layout', SPEC, '--stock', scratch('bad.json', content), '--json']);
    expect(code).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toContain(message);
  });

  it('names a file it cannot read as typed', async () => {
    expect(await runCli(['layout', SPEC, '--stock', join(dir, 'missing.json')])).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toContain(`--stock: cannot read "${join(dir, 'missing.json')}"`);
  });

  it('names a value an override leaves impossible: an offcut the --trim leaves nothing of', async () => {
    const file = scratch('narrow.json', { ...WRAPPED.stock, offcuts: [{ sheetId: 'hardwood-plywood-1/2', lengthMm: 1000, widthMm: 150, count: 1 }] });
    expect(await runCli(['layout', SPEC, '--stock', file, '--trim', '3.5in'])).toBe(2);
    expect(captured.stdout).toBe('');
    expect(captured.stderr).toContain('--stock offcuts[0].widthMm (with --sheet, --kerf and --trim applied): is too small for the edge trim');
  });
});
