import { describe, expect, it } from 'vitest';
import { availableHeight, frontGrid } from '../../../../shared/engine/constructions/frontGrid.ts';

const MM_TOLERANCE = 1e-9;
const frame = { stileMm: 40, topRailMm: 40, bottomRailMm: 50, midRailMm: 30, mullionMm: 50 };
const base = { x: [0, 1000] as const, z: [100, 900] as const, columns: 2, leaves: 1 as const, revealMm: 2, overlayMm: 10, gapMm: 3, frontThicknessMm: 19 };

describe('frontGrid', () => {
  it('shares the frame\'s inside height among the rows, less the rails between them', () => {
    // 800 − 40 − 50 − 2 × 30 = 650
    expect(availableHeight([100, 900], 3, frame)).toBe(650);
    expect(availableHeight([100, 900], 3, null)).toBe(800);
  });

  it('lays openings between stiles, rails and mullions, top row first', () => {
    const g = frontGrid({ ...base, frame, rowHeightsMm: [300, 340], mount: 'inset' });
    // Columns: (1000 − 80 − 50) / 2 = 435 each, from 40 and from 525.
    expect(g.columns).toEqual([[40, 475], [525, 960]]);
    // Top row from 900 − 40 = 860 down 300; the next starts 30 lower, at 530, and is 340 tall.
    expect(g.rows).toEqual([[560, 860], [190, 530]]);
    expect(g.columnBoundariesX).toEqual([500]);
  });

  it('sets inset fronts the reveal inside the opening, flush with the frame\'s face', () => {
    const g = frontGrid({ ...base, frame, rowHeightsMm: [300, 340], mount: 'inset' });
    const f = g.cells[0]!.fronts[0]!;
    expect(f.x).toEqual([42, 473]);
    expect(f.z).toEqual([562, 858]);
    expect(f.y).toEqual([0, 19]);
  });

  it('laps overlay fronts on the frame and stands them in front of it', () => {
    const g = frontGrid({ ...base, frame, rowHeightsMm: [300, 340], mount: 'overlay' });
    const f = g.cells[0]!.fronts[0]!;
    expect(f.x).toEqual([30, 485]);
    expect(f.y).toEqual([-19, 0]);
  });

  it('splits a pair of doors about the opening\'s centre with the gap between', () => {
    const g = frontGrid({ ...base, frame, columns: 1, leaves: 2, rowHeightsMm: [710], mount: 'overlay' });
    const [a, b] = g.cells[0]!.fronts;
    expect(Math.abs(b!.x[0] - a!.x[1] - 3)).toBeLessThan(MM_TOLERANCE);
    expect(a!.hinge).toBe('left');
    expect(b!.hinge).toBe('right');
  });

  it('frameless: cells divide the front, fronts keep half the gap from every edge', () => {
    const g = frontGrid({ ...base, frame: null, columns: 2, rowHeightsMm: [400, 400], mount: 'overlay' });
    expect(g.cells[0]!.fronts[0]!.x).toEqual([1.5, 498.5]);
    expect(g.cells[1]!.fronts[0]!.x).toEqual([501.5, 998.5]);
  });
});
