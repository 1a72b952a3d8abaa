import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { layoutSheets, sheetLayoutSteps } from '../../../shared/layout/sheetOptimiser.ts';
import { STANDARD_SHEET } from '../../../shared/layout/sheetInput.ts';
import type { SheetPartInput, SheetStock } from '../../../shared/layout/sheetTypes.ts';
import { isInputError } from '../../../shared/errors.ts';
import { isGuillotine, sheetProblems, usableRect } from './layoutCheck.ts';

const IN = 25.4;

const part = (id: string, lengthMm: number, widthMm: number, quantity = 1, grain: SheetPartInput['grain'] = 'none'): SheetPartInput => ({
  id, name: id, lengthMm, widthMm, quantity, grain,
});

const sheet = (lengthMm: number, widthMm: number, count: number | null = null, offcut = false): SheetStock => ({
  id: `s${lengthMm}x${widthMm}`, name: `${lengthMm} × ${widthMm}`, lengthMm, widthMm, count, offcut,
});

const partArb = fc.record({
  id: fc.constantFrom('a', 'b', 'c', 'd', 'e'),
  lengthMm: fc.integer({ min: 1, max: 1200 }),
  widthMm: fc.integer({ min: 1, max: 700 }),
  quantity: fc.integer({ min: 0, max: 6 }),
  grain: fc.constantFrom('length', 'width', 'none'),
}).map((p) => ({ ...p, name: p.id }) as SheetPartInput);

const instanceArb = fc.record({
  parts: fc.array(partArb, { minLength: 1, maxLength: 6 }).map((ps) => ps.map((p, i) => ({ ...p, id: `${p.id}${i}` }))),
  sheetLength: fc.integer({ min: 300, max: 2500 }),
  sheetWidth: fc.integer({ min: 200, max: 1300 }),
  kerfMm: fc.constantFrom(0, 1, 3.2, 4),
  trimMm: fc.constantFrom(0, 5, 6.35),
});

describe('layoutSheets', () => {
  it('never overlaps parts, keeps every part inside the trimmed sheet and a kerf from its neighbours', () => {
    fc.assert(
      fc.property(instanceArb, ({ parts, sheetLength, sheetWidth, kerfMm, trimMm }) => {
        const layout = layoutSheets(parts, { stock: [sheet(sheetLength, sheetWidth)], kerfMm, trimMm, attempts: 2 });
        for (const s of layout.sheets) expect(sheetProblems(s, kerfMm)).toEqual([]);
      }),
      { numRuns: 2000 },
    );
    // Thousands of runs take a while on a slow machine; the limit only keeps a hang from passing silently.
  }, 120_000);

  it('places every instance exactly once or reports it', () => {
    fc.assert(
      fc.property(instanceArb, ({ parts, sheetLength, sheetWidth, kerfMm, trimMm }) => {
        const layout = layoutSheets(parts, { stock: [sheet(sheetLength, sheetWidth)], kerfMm, trimMm, attempts: 3 });
        const seen = [...layout.sheets.flatMap((s) => s.parts), ...layout.unplaced].map((p) => `${p.partId}#${p.instance}`).sort();
        const expected = parts.flatMap((p) => Array.from({ length: p.quantity }, (_, i) => `${p.id}#${i}`)).sort();
        expect(seen).toEqual(expected);
      }),
      { numRuns: 1000 },
    );
  }, 120_000);

  it('makes layouts that edge-to-edge saw cuts can separate (guillotine)', () => {
    fc.assert(
      fc.property(instanceArb, ({ parts, sheetLength, sheetWidth, kerfMm, trimMm }) => {
        const layout = layoutSheets(parts, { stock: [sheet(sheetLength, sheetWidth)], kerfMm, trimMm, attempts: 3 });
        for (const s of layout.sheets) expect(isGuillotine(s.parts, usableRect(s), kerfMm)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  }, 120_000);

  it('turns a part only where its face grain allows', () => {
    fc.assert(
      fc.property(instanceArb, ({ parts, sheetLength, sheetWidth, kerfMm, trimMm }) => {
        const layout = layoutSheets(parts, { stock: [sheet(sheetLength, sheetWidth)], kerfMm, trimMm, attempts: 3 });
        const grainOf = new Map(parts.map((p) => [p.id, p.grain]));
        for (const p of layout.sheets.flatMap((s) => s.parts)) {
          if (grainOf.get(p.partId) === 'length') expect(p.rotated).toBe(false);
          if (grainOf.get(p.partId) === 'width') expect(p.rotated).toBe(true);
        }
      }),
      { numRuns: 1000 },
    );
  }, 120_000);

  it('never uses fewer sheets than the area lower bound', () => {
    fc.assert(
      fc.property(instanceArb, ({ parts, sheetLength, sheetWidth, kerfMm, trimMm }) => {
        const layout = layoutSheets(parts, { stock: [sheet(sheetLength, sheetWidth)], kerfMm, trimMm, attempts: 3 });
        expect(layout.sheetsBought).toBeGreaterThanOrEqual(layout.lowerBound);
      }),
      { numRuns: 500 },
    );
  });

  it('reports a part larger than any sheet instead of dropping it', () => {
    const layout = layoutSheets([part('top', 100 * IN, 30 * IN), part('shelf', 30 * IN, 12 * IN, 2)]);
    expect(layout.unplaced).toHaveLength(1);
    expect(layout.unplaced[0]).toMatchObject({ partId: 'top', reason: 'larger-than-stock' });
    expect(layout.unplaced[0]?.message).toMatch(/larger than every sheet/);
    expect(layout.sheets.flatMap((s) => s.parts).map((p) => p.partId)).toEqual(['shelf', 'shelf']);
  });

  it('reports a part that fits only when turned against its grain', () => {
    // 60 × 40 in fits a 48 × 96 in sheet only across it, which grain `length` forbids.
    const layout = layoutSheets([part('side', 40 * IN, 60 * IN, 1, 'length')]);
    expect(layout.unplaced.map((u) => u.reason)).toEqual(['larger-than-stock']);
  });

  it('leaves exactly one kerf between two parts that fill a sheet end to end', () => {
    const kerfMm = 3;
    const layout = layoutSheets([part('half', 500, 300, 2, 'length')], { stock: [sheet(1003, 300)], kerfMm, trimMm: 0 });
    expect(layout.sheetsBought).toBe(1);
    const xs = layout.sheets[0]!.parts.map((p) => p.x).sort((a, b) => a - b);
    expect(xs).toEqual([0, 503]);
  });

  it('needs a second sheet when the kerf does not fit between two parts', () => {
    const layout = layoutSheets([part('half', 500, 300, 2, 'length')], { stock: [sheet(1002, 300)], kerfMm: 3, trimMm: 0 });
    expect(layout.sheetsBought).toBe(2);
  });

  it('uses an offcut in stock before buying a sheet', () => {
    const layout = layoutSheets([part('shelf', 600, 300, 1)], { stock: [sheet(700, 400, 1, true), STANDARD_SHEET] });
    expect(layout.offcutsUsed).toBe(1);
    expect(layout.sheetsBought).toBe(0);
    expect(layout.sheets[0]?.offcut).toBe(true);
  });

  it('reports the area lower bound of Martello & Vigo (1998), L0 = ⌈Σ area / sheet area⌉', () => {
    // 3 parts of 24 × 48 in on 48 × 96 in with no trim: 3 × 1152 / 4608 = 0.75 → 1 sheet.
    const one = layoutSheets([part('p', 24 * IN, 48 * IN, 3)], { trimMm: 0, kerfMm: 0 });
    expect(one.lowerBound).toBe(1);
    // 5 parts: 5 × 1152 / 4608 = 1.25 → 2 sheets.
    const two = layoutSheets([part('p', 24 * IN, 48 * IN, 5)], { trimMm: 0, kerfMm: 0 });
    expect(two.lowerBound).toBe(2);
    expect(two.sheetsBought).toBe(2);
  });

  it('repeats the same layout for the same seed', () => {
    const parts = [part('a', 700, 400, 5), part('b', 300, 250, 7), part('c', 1200, 90, 3)];
    const first = layoutSheets(parts, { seed: 7, attempts: 30 });
    const second = layoutSheets(parts, { seed: 7, attempts: 30 });
    expect(second).toEqual(first);
  });

  it('stops when asked and returns the best layout so far, marked cancelled', () => {
    const parts = [part('a', 700, 400, 9), part('b', 300, 250, 17), part('c', 1200, 90, 13)];
    let calls = 0;
    // Two sheet sizes: the run cannot stop early at a lower bound, so only the stop ends it.
    const layout = layoutSheets(parts, { attempts: 500, stock: [sheet(1000, 600, 2, true), STANDARD_SHEET] }, { onProgress: () => calls++, shouldStop: () => calls >= 3 });
    expect(layout.cancelled).toBe(true);
    expect(layout.attemptsRun).toBe(3);
    expect(layout.sheets.flatMap((s) => s.parts)).toHaveLength(39);
  });

  it('can be stepped in chunks, as a worker would, and stopped through next(true)', () => {
    const steps = sheetLayoutSteps([part('a', 700, 400, 9), part('b', 300, 250, 17)], { attempts: 500, stock: [sheet(1000, 600, 2, true), STANDARD_SHEET] });
    const first = steps.next();
    expect(first.done).toBe(false);
    const end = steps.next(true);
    expect(end.done).toBe(true);
    if (end.done) expect(end.value.cancelled).toBe(true);
  });

  it('names the field and the limit for bad input', () => {
    const bad = [
      () => layoutSheets([part('a', -1, 100)]),
      () => layoutSheets([part('a', 100, 100, 1.5)]),
      () => layoutSheets([part('a', 100, 100)], { kerfMm: Number.NaN }),
      () => layoutSheets([part('a', 100, 100)], { stock: [sheet(100, 10)], trimMm: 6 }),
    ];
    const fields = bad.map((run) => {
      try {
        run();
        return 'no error';
      } catch (error) {
        expect(isInputError(error)).toBe(true);
        return isInputError(error) ? error.field : 'other';
      }
    });
    expect(fields).toEqual(['parts[0].lengthMm', 'parts[0].quantity', 'kerfMm', 'trimMm']);
  });
});
