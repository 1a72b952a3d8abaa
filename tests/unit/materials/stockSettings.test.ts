import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece, type PieceSpec } from '../../../shared/engine/index.ts';
import { isInputError } from '../../../shared/errors.ts';
import { rectsOverlap } from '../../../shared/layout/rect.ts';
import { DEFAULT_STOCK_SETTINGS, boardDefectFor, sheetSizeName, stockBoardId, takeoffOptionsFor, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import { materialsTakeoff } from '../../../shared/materials/takeoff.ts';

const IN = 25.4;
// Positions are sums of two typed lengths; far below a saw's accuracy.
const MM_TOLERANCE = 1e-9;

const spec = JSON.parse(readFileSync(new URL('../../fixtures/specs/chest-blanket-coastal.json', import.meta.url), 'utf8')) as PieceSpec;
const result = buildPiece(spec);
const solid = result.parts.find((p) => p.material.kind === 'solid' && p.rough.quarters === 4)!;
const speciesId = solid.material.kind === 'solid' ? solid.material.speciesId : '';

const knotty: StockSettings = {
  ...DEFAULT_STOCK_SETTINGS,
  boardsInStock: [
    { label: 'A1', speciesId, quarters: 4, lengthMm: 96 * IN, widthMm: 8 * IN, defects: [{ kind: 'knot', fromEndMm: 40 * IN, fromEdgeMm: 3 * IN, lengthMm: 2 * IN, widthMm: 2 * IN }] },
    { speciesId: 'hard-maple', quarters: 4, lengthMm: 60 * IN, widthMm: 6 * IN, defects: [] },
  ],
};

describe('boardDefectFor', () => {
  it('turns a marked defect into the region the board layout cuts around', () => {
    const region = boardDefectFor({ kind: 'check', fromEndMm: 10 * IN, fromEdgeMm: 1 * IN, lengthMm: 6 * IN, widthMm: 0.25 * IN });
    expect(region.startMm).toBe(10 * IN);
    expect(Math.abs(region.endMm - 16 * IN)).toBeLessThan(MM_TOLERANCE);
    expect(region.fromEdgeMm).toBe(1 * IN);
    expect(Math.abs(region.toEdgeMm! - 1.25 * IN)).toBeLessThan(MM_TOLERANCE);
    expect(region.note).toBe('check');
  });
});

describe('takeoffOptionsFor', () => {
  it('offers the boards on hand of a species and thickness first, with their defects, then the sizes for sale', () => {
    const stock = takeoffOptionsFor(knotty).boardStock!(speciesId, 4);
    expect(stock[0]).toMatchObject({ id: stockBoardId(0), name: 'Board in stock “A1” 96 × 8 in', inStock: true, count: 1 });
    expect(stock[0]!.defects).toEqual([boardDefectFor(knotty.boardsInStock[0]!.defects[0]!)]);
    expect(stock.slice(1).every((b) => !b.inStock)).toBe(true);
    expect(takeoffOptionsFor(knotty).boardStock!(speciesId, 8).some((b) => b.inStock)).toBe(false);
  });

  it('gives a layout that uses the board on hand and places no part over its knot', () => {
    const takeoff = materialsTakeoff(result, { ...takeoffOptionsFor(knotty, 'quick') });
    const boards = takeoff.boards.find((b) => b.speciesId === speciesId && b.quarters === 4)!.layout.boards;
    const onHand = boards.find((b) => b.stockId === stockBoardId(0));
    expect(onHand).toBeDefined();
    const knot = onHand!.defects[0]!;
    const region = { x: knot.startMm, y: knot.fromEdgeMm!, length: knot.endMm - knot.startMm, width: knot.toEdgeMm! - knot.fromEdgeMm! };
    expect(onHand!.parts.length).toBeGreaterThan(0);
    for (const p of onHand!.parts) expect(rectsOverlap(p, region), `${p.name} over the knot`).toBe(false);
  });

  it('refuses a defect outside its board with an InputError naming the row and field', () => {
    const bad: StockSettings = { ...knotty, boardsInStock: [{ ...knotty.boardsInStock[0]!, defects: [{ kind: 'knot', fromEndMm: 95 * IN, fromEdgeMm: 0, lengthMm: 2 * IN, widthMm: 1 * IN }] }] };
    let thrown: unknown;
    try {
      takeoffOptionsFor(bad);
    } catch (error) {
      thrown = error;
    }
    expect(isInputError(thrown)).toBe(true);
    expect((thrown as { field: string }).field).toBe('boardsInStock[0].defects[0].lengthMm');
    expect((thrown as { limit: string }).limit).toBe('at most 25.4 mm from there');
  });

  it('refuses an effort it does not know', () => {
    expect(() => takeoffOptionsFor(DEFAULT_STOCK_SETTINGS, 'forever' as 'quick')).toThrow(/quick, standard or thorough/);
  });
});

describe('sheetSizeName', () => {
  const saleName = (sheetLengthMm: number, sheetWidthMm: number) =>
    takeoffOptionsFor({ ...DEFAULT_STOCK_SETTINGS, sheetLengthMm, sheetWidthMm }).sheetStock!('hardwood-plywood-3/4').find((s) => !s.offcut)!.name;

  it('names an inch sheet in whole inches, narrow side first', () => {
    expect(saleName(96 * IN, 48 * IN)).toBe('Sheet 48 × 96 in');
  });

  it('names a metric sheet in millimetres, not in inches with decimals', () => {
    expect(saleName(2440, 1220)).toBe('Sheet 1220 × 2440 mm');
  });

  it('names any other size in inches to the nearest 1/16', () => {
    expect(sheetSizeName(24.5 * IN, 30.0625 * IN)).toBe('24 1/2 × 30 1/16 in');
    // 1225.3 mm is 48.240 in, nearest 1/16 is 48 1/4.
    expect(sheetSizeName(1225.3, 2438.4)).toBe('48 1/4 × 96 in');
  });

  it('names offcuts the same way', () => {
    const offcuts = takeoffOptionsFor({ ...DEFAULT_STOCK_SETTINGS, offcuts: [{ sheetId: 'mdf-3/4', lengthMm: 900, widthMm: 600, count: 1 }] }).sheetStock!('mdf-3/4');
    expect(offcuts[0]!.name).toBe('Offcut 600 × 900 mm');
  });
});
