import { describe, expect, it } from 'vitest';
import { graduatedHeights } from '../../../../shared/engine/constructions/graduatedHeights.ts';

const MM_TOLERANCE = 1e-9;
const base = { totalMm: 600, rows: 4, stepMm: 0, ratio: 1, listedMm: [] as number[] };

describe('graduatedHeights', () => {
  it('splits the height equally', () => {
    expect(graduatedHeights({ ...base, graduation: 'equal' })).toEqual([150, 150, 150, 150]);
  });

  it('grows each row by the step, the rows adding up to the total', () => {
    // 4·h0 + 25·(0 + 1 + 2 + 3) = 600 → h0 = (600 − 150) / 4 = 112.5
    const h = graduatedHeights({ ...base, graduation: 'arithmetic', stepMm: 25 });
    [112.5, 137.5, 162.5, 187.5].forEach((want, i) => expect(Math.abs(h[i]! - want)).toBeLessThan(MM_TOLERANCE));
  });

  it('grows each row by the ratio', () => {
    // h0 (1 + 2 + 4) = 700 → h0 = 100
    const h = graduatedHeights({ ...base, totalMm: 700, rows: 3, graduation: 'geometric', ratio: 2 });
    [100, 200, 400].forEach((want, i) => expect(Math.abs(h[i]! - want)).toBeLessThan(MM_TOLERANCE));
  });

  it('treats a ratio of 1 as equal rows', () => {
    expect(graduatedHeights({ ...base, graduation: 'geometric', ratio: 1 })).toEqual([150, 150, 150, 150]);
  });

  it('takes listed heights and gives the bottom row what is left', () => {
    expect(graduatedHeights({ ...base, graduation: 'listed', listedMm: [100, 120, 140, 999] })).toEqual([100, 120, 140, 240]);
  });

  it('reports a row that does not fit as a non-positive height for the caller to refuse', () => {
    const h = graduatedHeights({ ...base, graduation: 'arithmetic', stepMm: 200 });
    expect(h[0]).toBeLessThanOrEqual(0);
  });
});
