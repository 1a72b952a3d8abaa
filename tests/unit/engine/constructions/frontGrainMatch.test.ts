import { describe, expect, it } from 'vitest';
import { frontGrainMatch } from '../../../../shared/engine/constructions/frontGrid.ts';

describe('frontGrainMatch', () => {
  it('puts each column of a bank in its own run, ordered from the top row down', () => {
    expect(frontGrainMatch({ row: 0, col: 1 }, 2)).toEqual({ group: 'drawer-fronts-column-2', order: 1, note: 'drawer fronts, column 2' });
    expect(frontGrainMatch({ row: 3, col: 0 }, 2)).toEqual({ group: 'drawer-fronts-column-1', order: 4, note: 'drawer fronts, column 1' });
  });

  it('names a single-column bank without a column number', () => {
    expect(frontGrainMatch({ row: 2, col: 0 }, 1).note).toBe('drawer fronts');
  });
});
