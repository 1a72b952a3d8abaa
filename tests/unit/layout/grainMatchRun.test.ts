import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { layoutBoards } from '../../../shared/layout/boardOptimiser.ts';
import type { BoardLayout, BoardPartInput, BoardStock, PlacedBoardPart } from '../../../shared/layout/boardTypes.ts';
import { boardProblems, GEOMETRY_TOLERANCE_MM } from './layoutCheck.ts';

const IN = 25.4;
const KERF = 3;

const board = (id: string, lengthMm: number, widthMm: number, count: number | null = null, inStock = false, defects: BoardStock['defects'] = []): BoardStock => ({
  id, name: id, lengthMm, widthMm, count, inStock, defects,
});

// A run's pieces on the board that holds them, sorted by their place along it.
function runParts(layout: BoardLayout, group: string): { boards: number; parts: PlacedBoardPart[] } {
  const holding = layout.boards.filter((b) => b.parts.some((p) => p.matchGroup === group));
  return { boards: holding.length, parts: holding.flatMap((b) => b.parts.filter((p) => p.matchGroup === group)).sort((a, b) => a.x - b.x || a.y - b.y) };
}

function errorField(run: () => unknown): string | null {
  try {
    run();
  } catch (e) {
    return isInputError(e) ? e.field : 'not an InputError';
  }
  return null;
}

describe('layoutBoards with grain-matched runs', () => {
  // Three drawer fronts of one column, given out of order, with rails to share the boards.
  // Rough sizes = finished + 1 in on length and 1/4 in on width (the default allowance).
  const fronts: BoardPartInput[] = [
    { id: 'front-2', name: 'Front, row 2', quantity: 1, lengthMm: 600, widthMm: 150, thicknessMm: 19, grainMatch: { group: 'col-1', order: 2, note: 'drawer fronts, column 1' } },
    { id: 'front-3', name: 'Front, row 3', quantity: 1, lengthMm: 600, widthMm: 175, thicknessMm: 19, grainMatch: { group: 'col-1', order: 3, note: 'drawer fronts, column 1' } },
    { id: 'front-1', name: 'Front, row 1', quantity: 1, lengthMm: 580, widthMm: 125, thicknessMm: 19, grainMatch: { group: 'col-1', order: 1, note: 'drawer fronts, column 1' } },
    { id: 'rail', name: 'Rail', quantity: 6, lengthMm: 900, widthMm: 60, thicknessMm: 19 },
  ];
  const layout = layoutBoards(fronts, { stock: [board('b', 8 * 12 * IN, 8 * IN)], kerfMm: KERF });

  it('cuts a run from one board in its order along the length, a kerf between neighbours, from one edge line', () => {
    const { boards, parts } = runParts(layout, 'col-1');
    expect(boards).toBe(1);
    expect(parts.map((p) => p.partId)).toEqual(['front-1', 'front-2', 'front-3']);
    expect(parts.map((p) => p.matchOrder)).toEqual([1, 2, 3]);
    for (let i = 1; i < parts.length; i++) {
      const before = parts[i - 1]!;
      expect(Math.abs(parts[i]!.x - (before.x + before.length + KERF))).toBeLessThan(GEOMETRY_TOLERANCE_MM);
      expect(parts[i]!.y).toBe(before.y);
    }
    expect(parts.map((p) => p.matchLabel)).toEqual(['drawer fronts, column 1', 'drawer fronts, column 1', 'drawer fronts, column 1']);
  });

  it('adds the milling allowance to each part of the run', () => {
    const { parts } = runParts(layout, 'col-1');
    expect(parts.map((p) => [p.length, p.width])).toEqual([
      [580 + IN, 125 + IN / 4],
      [600 + IN, 150 + IN / 4],
      [600 + IN, 175 + IN / 4],
    ]);
    expect(layout.splitGroups).toEqual([]);
    expect(layout.splitWarnings).toEqual([]);
  });

  it('rips the parts that share a place in the run side by side on one length (the boards of a glued-up front)', () => {
    const glued: BoardPartInput[] = [
      { id: 'top-front', name: 'Top front', quantity: 1, lengthMm: 500, widthMm: 100, thicknessMm: 19, roughLengthMm: 520, roughWidthMm: 105, grainMatch: { group: 'g', order: 1 } },
      { id: 'big-front-board', name: 'Big front board', quantity: 2, lengthMm: 500, widthMm: 90, thicknessMm: 19, roughLengthMm: 520, roughWidthMm: 95, grainMatch: { group: 'g', order: 2 } },
    ];
    const l = layoutBoards(glued, { stock: [board('b', 2438, 254)], kerfMm: KERF });
    const { parts } = runParts(l, 'g');
    const boardsOfBig = parts.filter((p) => p.partId === 'big-front-board');
    expect(boardsOfBig.map((p) => p.x)).toEqual([520 + KERF, 520 + KERF]);
    expect(Math.abs(boardsOfBig[1]!.y - (boardsOfBig[0]!.y + 95 + KERF))).toBeLessThan(GEOMETRY_TOLERANCE_MM);
    expect(boardsOfBig.map((p) => p.matchOrder)).toEqual([2, 2]);
    expect(boardsOfBig.map((p) => p.instance)).toEqual([0, 1]);
  });

  it('starts a run past a knot across the board rather than break it', () => {
    const knot = { startMm: 100, endMm: 160, note: 'knot' };
    const l = layoutBoards(
      [{ id: 'f', name: 'Front', quantity: 3, lengthMm: 500, widthMm: 120, thicknessMm: 19, roughLengthMm: 520, roughWidthMm: 125, grainMatch: { group: 'g', order: 1 } }],
      { stock: [board('stock', 2438, 152, 1, true, [knot])], kerfMm: KERF },
    );
    expect(l.boards).toHaveLength(1);
    // Same order: one length, ripped three ways would need 3 × 125 + 2 × 3 = 381 mm; too wide,
    // so the group is reported split and its parts placed one by one.
    expect(l.splitGroups).toEqual(['g']);
    const ordered: BoardPartInput[] = [1, 2, 3].map((order) => ({ id: `f${order}`, name: `Front ${order}`, quantity: 1, lengthMm: 500, widthMm: 120, thicknessMm: 19, roughLengthMm: 520, roughWidthMm: 125, grainMatch: { group: 'g', order } }));
    const run = layoutBoards(ordered, { stock: [board('stock', 2438, 152, 1, true, [knot])], kerfMm: KERF });
    expect(run.splitGroups).toEqual([]);
    expect(runParts(run, 'g').parts.map((p) => p.x)).toEqual([160 + KERF, 160 + KERF + 520 + KERF, 160 + KERF + 2 * (520 + KERF)]);
  });

  it('reports a run longer than any board, says what board it needs, and still places every part', () => {
    // Four fronts of 800 mm rough end to end: 4 × 800 + 3 × 3 = 3209 mm, more than a 2438 mm board.
    const parts: BoardPartInput[] = [1, 2, 3, 4].map((order) => ({
      id: `front-${order}`, name: `Front ${order}`, quantity: 1, lengthMm: 780, widthMm: 150, thicknessMm: 19, roughLengthMm: 800, roughWidthMm: 160,
      grainMatch: { group: 'col-1', order, note: 'drawer fronts, column 1' },
    }));
    const l = layoutBoards(parts, { stock: [board('b', 2438, 203)], kerfMm: KERF });
    expect(l.splitGroups).toEqual(['col-1']);
    expect(l.splitWarnings).toHaveLength(1);
    const warning = l.splitWarnings[0]!;
    expect(warning.group).toBe('col-1');
    expect(warning.label).toBe('drawer fronts, column 1');
    expect(Math.abs(warning.lengthNeededMm - 3209)).toBeLessThan(GEOMETRY_TOLERANCE_MM);
    expect(warning.widthNeededMm).toBe(160);
    expect(warning.message).toContain('drawer fronts, column 1');
    expect(warning.message).toContain('longest 96"');
    expect(l.boards.flatMap((b) => b.parts)).toHaveLength(4);
    expect(l.unplaced).toEqual([]);
  });

  it('numbers the instances of a part given run by run from its first instance', () => {
    const l = layoutBoards(
      [
        { id: 'f', name: 'Front', quantity: 1, firstInstance: 0, lengthMm: 500, widthMm: 120, thicknessMm: 19, grainMatch: { group: 'a', order: 1 } },
        { id: 'f', name: 'Front', quantity: 1, firstInstance: 1, lengthMm: 500, widthMm: 120, thicknessMm: 19, grainMatch: { group: 'b', order: 1 } },
      ],
      { stock: [board('b', 2438, 203)] },
    );
    expect(l.boards.flatMap((b) => b.parts).map((p) => [p.matchGroup, p.instance]).sort()).toEqual([['a', 0], ['b', 1]]);
  });

  it('refuses a run without a usable order, a part in a run and a match group at once, and a group of both kinds', () => {
    const base = { id: 'f', name: 'Front', quantity: 1, lengthMm: 500, widthMm: 120, thicknessMm: 19 };
    expect(errorField(() => layoutBoards([{ ...base, grainMatch: { group: 'g', order: Number.NaN } }]))).toBe('parts[0].grainMatch.order');
    expect(errorField(() => layoutBoards([{ ...base, grainMatch: { group: '', order: 1 } }]))).toBe('parts[0].grainMatch.group');
    expect(errorField(() => layoutBoards([{ ...base, matchGroup: 'g', grainMatch: { group: 'g', order: 1 } }]))).toBe('parts[0].grainMatch');
    expect(errorField(() => layoutBoards([{ ...base, grainMatch: { group: 'g', order: 1 } }, { ...base, id: 'h', matchGroup: 'g' }]))).toBe('parts (h)');
  });

  it('keeps runs whole whenever a board can hold them, never overlaps and stays on the board (random instances)', () => {
    const LENGTH = 2438;
    const WIDTH = 254;
    const runArb = fc.array(fc.record({ lengthMm: fc.integer({ min: 100, max: 1400 }), widthMm: fc.integer({ min: 40, max: 240 }), boards: fc.integer({ min: 1, max: 2 }) }), { minLength: 1, maxLength: 4 });
    const singleArb = fc.record({ lengthMm: fc.integer({ min: 50, max: 1500 }), widthMm: fc.integer({ min: 20, max: 200 }), quantity: fc.integer({ min: 1, max: 4 }) });
    const defectArb = fc.record({ start: fc.integer({ min: 0, max: 1800 }), len: fc.integer({ min: 5, max: 150 }), from: fc.integer({ min: 0, max: 150 }), w: fc.integer({ min: 5, max: 254 }) });
    fc.assert(
      fc.property(fc.array(runArb, { minLength: 1, maxLength: 3 }), fc.array(singleArb, { maxLength: 4 }), fc.array(defectArb, { maxLength: 2 }), fc.constantFrom(0, 3, 3.2), (runs, singles, defectSpecs, kerfMm) => {
        const defects = defectSpecs.map((d) => ({ startMm: d.start, endMm: d.start + d.len, fromEdgeMm: d.from, toEdgeMm: Math.min(WIDTH, d.from + d.w) }));
        const parts: BoardPartInput[] = [];
        runs.forEach((run, r) => run.forEach((slot, order) => {
          // Given in reverse order, so the layout must sort them.
          parts.unshift({ id: `r${r}-${order}`, name: `r${r}-${order}`, quantity: slot.boards, lengthMm: slot.lengthMm, widthMm: slot.widthMm, thicknessMm: 19, roughLengthMm: slot.lengthMm, roughWidthMm: slot.widthMm, grainMatch: { group: `run-${r}`, order: order + 1 } });
        }));
        singles.forEach((s, i) => parts.push({ id: `s${i}`, name: `s${i}`, quantity: s.quantity, lengthMm: s.lengthMm, widthMm: s.widthMm, thicknessMm: 19, roughLengthMm: s.lengthMm, roughWidthMm: s.widthMm }));
        // A knotty board in stock, and clear boards of the same size to buy as needed.
        const layout = layoutBoards(parts, { stock: [board('stock', LENGTH, WIDTH, 1, true, defects), board('buy', LENGTH, WIDTH)], kerfMm, attempts: 2 });

        runs.forEach((run, r) => {
          // Independently: on a clear board the run fits when its lengths end to end and its widest length fit.
          const slots = run.map((s) => ({ length: s.lengthMm, width: s.boards * s.widthMm + (s.boards - 1) * kerfMm })).filter((s) => s.length <= LENGTH && s.width <= WIDTH);
          const allFit = slots.length === run.length;
          const total = slots.reduce((sum, s) => sum + s.length, 0) + kerfMm * (slots.length - 1);
          const fits = allFit && total <= LENGTH;
          if (!fits) return;
          expect(layout.splitGroups).not.toContain(`run-${r}`);
          const { boards, parts: placed } = runParts(layout, `run-${r}`);
          expect(boards).toBe(1);
          expect(placed).toHaveLength(run.reduce((n, s) => n + s.boards, 0));
          const starts = [...new Set(placed.map((p) => p.x))];
          expect(starts).toHaveLength(run.length);
          run.forEach((slot, order) => {
            const here = placed.filter((p) => p.matchOrder === order + 1);
            expect(here.map((p) => p.partId)).toEqual(Array.from({ length: slot.boards }, () => `r${r}-${order}`));
            expect(here.every((p) => p.x === starts[order])).toBe(true);
            if (order > 0) expect(Math.abs(starts[order]! - (starts[order - 1]! + run[order - 1]!.lengthMm + kerfMm))).toBeLessThan(GEOMETRY_TOLERANCE_MM);
          });
        });
        expect(layout.boards.flatMap((b) => boardProblems(b, kerfMm))).toEqual([]);
        const count = layout.boards.flatMap((b) => b.parts).length + layout.unplaced.length;
        expect(count).toBe(parts.reduce((n, p) => n + p.quantity, 0));
      }),
      { numRuns: 500 },
    );
    // The limit only keeps a hang from passing silently on a slow machine.
  }, 120_000);
});
