import { describe, expect, it } from 'vitest';
import { layoutBoards } from '../../../shared/layout/boardOptimiser.ts';
import type { BoardPartInput } from '../../../shared/layout/boardTypes.ts';
import { MAX_LABEL_MM, boardDiagram, matchRunsOf } from '../../../shared/layout/diagram.ts';

const KERF = 3;
const stock = [{ id: 'b', name: 'Board', lengthMm: 2438, widthMm: 203, count: null, inStock: false, defects: [] }];
const front = (order: number, group = 'col-1', note = 'drawer fronts, column 1'): BoardPartInput => ({
  id: `${group}-${order}`, name: `Front ${order}`, quantity: 1, lengthMm: 500, widthMm: 150, thicknessMm: 19, roughLengthMm: 520, roughWidthMm: 160, grainMatch: { group, order, note },
});

describe('matchRunsOf', () => {
  it('brackets a run from its first part to its last with its note and the places it holds', () => {
    const layout = layoutBoards([front(1), front(2), front(3)], { stock, kerfMm: KERF });
    const runs = matchRunsOf(layout.boards[0]!);
    // 3 × 520 + 2 × 3 = 1566 mm from the board's end.
    expect(runs).toEqual([{ group: 'col-1', text: 'grain-matched: drawer fronts, column 1 (1–3)', fromMm: 0, toMm: 1566, labelMm: expect.any(Number), partial: false }]);
    expect(runs[0]!.labelMm).toBeGreaterThan(0);
    expect(runs[0]!.labelMm).toBeLessThanOrEqual(MAX_LABEL_MM);
  });

  it('marks a run the layout had to split, and shows only the places this board holds', () => {
    // Five fronts end to end need 5 × 520 + 4 × 3 = 2612 mm: more than the 2438 mm board.
    const layout = layoutBoards([1, 2, 3, 4, 5].map((o) => front(o)), { stock, kerfMm: KERF });
    expect(layout.splitGroups).toEqual(['col-1']);
    const runs = layout.boards.flatMap((b) => boardDiagram(b, KERF, layout.splitGroups).matchRuns);
    expect(runs.length).toBeGreaterThan(1);
    expect(runs.every((r) => r.partial && r.text.endsWith(', split over boards'))).toBe(true);
  });

  it('gives no bracket to parts outside any run, and lists several runs in order along the board', () => {
    const layout = layoutBoards([front(1, 'a', 'fronts A'), front(2, 'a', 'fronts A'), front(1, 'b', 'fronts B'), { id: 'rail', name: 'Rail', quantity: 1, lengthMm: 300, widthMm: 50, thicknessMm: 19 }], { stock, kerfMm: KERF });
    const d = boardDiagram(layout.boards[0]!, KERF);
    expect(d.matchRuns.map((r) => r.group).sort()).toEqual(['a', 'b']);
    expect(d.matchRuns.map((r) => r.fromMm)).toEqual([...d.matchRuns.map((r) => r.fromMm)].sort((x, y) => x - y));
    expect(d.parts.find((p) => p.partId === 'rail')?.matchOrder).toBeNull();
    expect(d.parts.filter((p) => p.matchGroup === 'a').map((p) => p.matchOrder).sort()).toEqual([1, 2]);
  });
});
