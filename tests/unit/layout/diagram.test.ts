import { describe, expect, it } from 'vitest';
import { boardDiagram, fitLabel, sheetDiagram, MIN_LABEL_OF_LENGTH } from '../../../shared/layout/diagram.ts';
import { layoutBoards } from '../../../shared/layout/boardOptimiser.ts';
import { layoutSheets } from '../../../shared/layout/sheetOptimiser.ts';

const IN = 25.4;
const KERF = IN / 8;

describe('sheetDiagram', () => {
  const layout = layoutSheets(
    [
      { id: 'side', name: 'Side', lengthMm: 30 * IN, widthMm: 16 * IN, quantity: 2, grain: 'length' },
      { id: 'shelf', name: 'Shelf', lengthMm: 22 * IN, widthMm: 11 * IN, quantity: 3, grain: 'none' },
    ],
    { kerfMm: KERF, attempts: 10 },
  );
  const d = sheetDiagram(layout.sheets[0]!, KERF);

  it('numbers every saw cut in the order of the layout, each with a kerf-wide band on its line', () => {
    expect(d.cuts.map((c) => c.order)).toEqual(layout.sheets[0]!.cuts.map((_, i) => i + 1));
    for (const c of d.cuts) {
      if (c.x1 === c.x2) expect([c.kerf.x, c.kerf.w]).toEqual([c.x1, KERF]);
      else expect([c.kerf.y, c.kerf.h]).toEqual([c.y1, KERF]);
    }
  });

  it('draws each placed part where the layout put it, with its own length and width even when turned', () => {
    const plan = layout.sheets[0]!;
    expect(d.parts).toHaveLength(plan.parts.length);
    d.parts.forEach((p, i) => {
      const placed = plan.parts[i]!;
      expect([p.x, p.y, p.w, p.h]).toEqual([placed.x, placed.y, placed.length, placed.width]);
      expect(p.lengthMm).toBe(placed.rotated ? placed.width : placed.length);
    });
  });

  it('keeps the trimmed edge out of the usable area', () => {
    expect(d.usable).toEqual({ x: layout.trimMm, y: layout.trimMm, w: d.lengthMm - 2 * layout.trimMm, h: d.widthMm - 2 * layout.trimMm });
  });
});

describe('fitLabel', () => {
  it('fits a label inside its box, or gives 0 (show the tag) when it would be too small to read', () => {
    const box = { x: 0, y: 0, w: 600, h: 300 };
    const fit = fitLabel(box, 'Front panel', 10);
    expect(fit.labelMm).toBeGreaterThan(10);
    expect(fit.labelMm * (fit.lines === 2 ? 2.6 : 1.4)).toBeLessThanOrEqual(box.h + 1e-9);
    expect(fitLabel({ x: 0, y: 0, w: 40, h: 20 }, 'Drawer runner', 2438 * MIN_LABEL_OF_LENGTH).labelMm).toBe(0);
  });

  it('turns the label upright in a tall narrow part', () => {
    expect(fitLabel({ x: 0, y: 0, w: 120, h: 900 }, 'Stile', 5).vertical).toBe(true);
  });
});

describe('boardDiagram', () => {
  it('draws defects across the whole width unless edges are given, and numbers the crosscuts', () => {
    const stock = [{ id: 'b', name: 'Board', lengthMm: 96 * IN, widthMm: 6 * IN, count: 1, inStock: true, defects: [{ startMm: 500, endMm: 560, note: 'loose knot' }] }];
    const layout = layoutBoards([{ id: 'rail', name: 'Rail', quantity: 3, lengthMm: 20 * IN, widthMm: 2 * IN, thicknessMm: 19 }], { stock, kerfMm: KERF });
    const d = boardDiagram(layout.boards[0]!, KERF);
    expect(d.defects).toEqual([{ x: 500, y: 0, w: 60, h: 6 * IN, note: 'loose knot' }]);
    expect(d.crosscuts.map((c) => c.x1)).toEqual(layout.boards[0]!.crosscutsMm);
    expect(d.crosscuts.map((c) => c.order)).toEqual(layout.boards[0]!.crosscutsMm.map((_, i) => i + 1));
  });
});
