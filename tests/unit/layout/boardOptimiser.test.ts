import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutBoards } from '../../../shared/layout/boardOptimiser.ts';
import type { BoardPartInput, BoardStock } from '../../../shared/layout/boardTypes.ts';
import { boardProblems } from './layoutCheck.ts';

const IN = 25.4;
// Board feet are sums of a few products; this is far below what a maker reads (0.01 BF).
const BF_TOLERANCE = 1e-9;

const board = (id: string, lengthMm: number, widthMm: number, count: number | null = null, inStock = false, defects: BoardStock['defects'] = []): BoardStock => ({
  id, name: id, lengthMm, widthMm, count, inStock, defects,
});

describe('layoutBoards', () => {
  it('matches hand arithmetic for the board feet of a small chest frame', () => {
    // Invented demo-like parts, 4/4 stock, boards 96 × 7 in, kerf 1/8 in (rough sizes given):
    //   4 long rails  38 × 3 × 3/4 finished, 39 × 3 1/4 rough
    //   2 side rails  17 × 3 × 3/4 finished, 18 × 3 1/4 rough
    // Two rips of 3 1/4 fit a 7 in board (3 1/4 + 1/8 + 3 1/4 = 6 5/8). One board takes the
    // four long rails (39 + 1/8 + 39 = 78 1/8 in); 17 3/4 in is left, short of 18, so the side
    // rails need a second board. A single board cannot hold everything, so 2 boards is least.
    // 1 BF = 144 in³; stock under 1 in counts as 1 in (NHLA rules, secondary):
    //   bought   = 2 × 1 × 7 × 96 / 144 = 9.3333 BF
    //   rough    = (4 × 3.25 × 39 + 2 × 3.25 × 18) × 1 / 144 = (507 + 117) / 144 = 4.3333 BF
    //   finished = (4 × 0.75 × 3 × 38 + 2 × 0.75 × 3 × 17) / 144 = (342 + 76.5) / 144 = 2.90625 BF
    const parts: BoardPartInput[] = [
      { id: 'rail', name: 'Long rail', quantity: 4, lengthMm: 38 * IN, widthMm: 3 * IN, thicknessMm: 0.75 * IN, roughLengthMm: 39 * IN, roughWidthMm: 3.25 * IN },
      { id: 'side-rail', name: 'Side rail', quantity: 2, lengthMm: 17 * IN, widthMm: 3 * IN, thicknessMm: 0.75 * IN, roughLengthMm: 18 * IN, roughWidthMm: 3.25 * IN },
    ];
    const layout = layoutBoards(parts, { stock: [board('b', 96 * IN, 7 * IN)], kerfMm: 0.125 * IN, quarters: 4 });
    expect(layout.boards).toHaveLength(2);
    expect(layout.boardFeetBought).toBeCloseTo(9.333333333, 6);
    expect(Math.abs(layout.boardFeetRough - 624 / 144)).toBeLessThan(BF_TOLERANCE);
    expect(Math.abs(layout.boardFeetFinished - 2.90625)).toBeLessThan(BF_TOLERANCE);
  });

  it('adds the milling allowance to parts that give no rough size', () => {
    const layout = layoutBoards([{ id: 'a', name: 'A', quantity: 1, lengthMm: 500, widthMm: 80, thicknessMm: 19 }], {
      allowance: { lengthMm: 25, widthMm: 6 },
    });
    expect(layout.boards[0]?.parts[0]).toMatchObject({ length: 525, width: 86 });
  });

  it('reports a part longer or wider than any board instead of dropping it', () => {
    const layout = layoutBoards([
      { id: 'long', name: 'Long', quantity: 1, lengthMm: 3000, widthMm: 80, thicknessMm: 19 },
      { id: 'ok', name: 'Ok', quantity: 2, lengthMm: 500, widthMm: 80, thicknessMm: 19 },
    ]);
    expect(layout.unplaced.map((u) => [u.partId, u.reason])).toEqual([['long', 'larger-than-stock']]);
    expect(layout.boards.flatMap((b) => b.parts).map((p) => p.partId)).toEqual(['ok', 'ok']);
  });

  it('keeps a grain-match group on one board', () => {
    const parts: BoardPartInput[] = [
      { id: 'front', name: 'Drawer front', quantity: 3, lengthMm: 400, widthMm: 120, thicknessMm: 19, matchGroup: 'fronts' },
      { id: 'rail', name: 'Rail', quantity: 6, lengthMm: 900, widthMm: 60, thicknessMm: 19 },
    ];
    const layout = layoutBoards(parts, { stock: [board('b', 2438, 305)] });
    const boardsWithFronts = layout.boards.filter((b) => b.parts.some((p) => p.matchGroup === 'fronts'));
    expect(boardsWithFronts).toHaveLength(1);
    expect(boardsWithFronts[0]?.parts.filter((p) => p.partId === 'front')).toHaveLength(3);
    expect(layout.splitGroups).toEqual([]);
  });

  it('says when a grain-match group cannot come from one board, and still places every part', () => {
    const layout = layoutBoards([{ id: 'lid', name: 'Lid board', quantity: 5, lengthMm: 1067, widthMm: 103, thicknessMm: 19, matchGroup: 'lid' }], {
      stock: [board('b', 2438, 152)],
    });
    expect(layout.splitGroups).toEqual(['lid']);
    expect(layout.boards.flatMap((b) => b.parts)).toHaveLength(5);
  });

  it('cuts around a defect marked on a board in stock, and uses stock before buying', () => {
    const knot = { startMm: 400, endMm: 460, note: 'loose knot' };
    const layout = layoutBoards([{ id: 'a', name: 'A', quantity: 2, lengthMm: 350, widthMm: 80, thicknessMm: 19, roughLengthMm: 380, roughWidthMm: 90 }], {
      stock: [board('stock', 900, 100, 1, true, [knot]), board('buy', 2438, 152)],
      kerfMm: 3,
    });
    expect(layout.boards).toHaveLength(1);
    expect(layout.boards[0]?.inStock).toBe(true);
    expect(layout.boardFeetToBuy).toBe(0);
    const xs = layout.boards[0]!.parts.map((p) => p.x).sort((a, b) => a - b);
    expect(xs).toEqual([0, 463]);
  });

  it('never overlaps parts or defects and keeps a kerf between neighbours (random instances)', () => {
    const partArb = fc.record({
      lengthMm: fc.integer({ min: 50, max: 1500 }),
      widthMm: fc.integer({ min: 20, max: 200 }),
      quantity: fc.integer({ min: 1, max: 5 }),
      grouped: fc.boolean(),
    });
    const defectArb = fc.record({ start: fc.integer({ min: 0, max: 2000 }), len: fc.integer({ min: 5, max: 200 }), from: fc.integer({ min: 0, max: 100 }), w: fc.integer({ min: 5, max: 150 }) });
    fc.assert(
      fc.property(fc.array(partArb, { minLength: 1, maxLength: 5 }), fc.array(defectArb, { maxLength: 3 }), fc.constantFrom(0, 3, 3.2), (specs, defectSpecs, kerfMm) => {
        const defects = defectSpecs.map((d) => ({ startMm: d.start, endMm: Math.min(2438, d.start + d.len), fromEdgeMm: d.from, toEdgeMm: Math.min(203, d.from + d.w) }));
        const parts = specs.map((p, i) => ({ id: `p${i}`, name: `p${i}`, quantity: p.quantity, lengthMm: p.lengthMm, widthMm: p.widthMm, thicknessMm: 19, ...(p.grouped ? { matchGroup: `g${i}` } : {}) }));
        const layout = layoutBoards(parts, { stock: [board('stock', 2438, 203, 2, true, defects), board('buy', 2438, 203)], kerfMm, attempts: 2 });
        expect(layout.boards.flatMap((b) => boardProblems(b, kerfMm))).toEqual([]);
        const placed = layout.boards.flatMap((b) => b.parts).length + layout.unplaced.length;
        expect(placed).toBe(specs.reduce((n, p) => n + p.quantity, 0));
      }),
      { numRuns: 1000 },
    );
    // Thousands of runs take a while on a slow machine; the limit only keeps a hang from passing silently.
  }, 120_000);
});
