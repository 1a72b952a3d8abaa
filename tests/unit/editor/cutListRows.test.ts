import { describe, expect, it } from 'vitest';
import type { CutListGroup } from '../../../shared/engine/types.ts';
import { cutListTable, roughBoardFeet } from '../../../src/editor/cutListRows.ts';

const IN = 25.4;
const BF_TOLERANCE = 1e-9;

describe('roughBoardFeet', () => {
  it('gives 6 board feet for a 1 × 9 × 96 in board', () => {
    // National Hardwood Lumber Association rules (secondary): 1 × 9 × 96 in = 6 BF.
    expect(Math.abs(roughBoardFeet([96 * IN, 9 * IN, 1 * IN], 1) - 6)).toBeLessThan(BF_TOLERANCE);
  });

  it('counts stock under an inch thick as an inch', () => {
    // NHLA rules (secondary): thickness under 1 in counts as 1 in.
    expect(roughBoardFeet([96 * IN, 9 * IN, 0.5 * IN], 1)).toBeCloseTo(roughBoardFeet([96 * IN, 9 * IN, 1 * IN], 1), 12);
  });

  it('multiplies by the quantity', () => {
    expect(roughBoardFeet([48 * IN, 6 * IN, 2 * IN], 4)).toBeCloseTo(4 * (2 * 6 * 48) / 144, 12);
  });
});

describe('cutListTable', () => {
  const groups: CutListGroup[] = [
    {
      material: 'White oak 4/4',
      materialKind: 'solid',
      rows: [
        { partId: 'rail', name: 'Rail', quantity: 4, finished: [900, 76, 19], rough: [925, 83, 25.4], grain: 'length', notes: [] },
        { partId: 'stile', name: 'Stile', quantity: 2, finished: [300, 64, 19], rough: [325, 70, 25.4], grain: 'length', notes: [] },
        { partId: 'batten', name: 'Batten', quantity: 2, finished: [400, 51, 19], rough: [425, 57, 25.4], grain: 'length', notes: [] },
      ],
    },
    {
      material: 'Hardwood plywood 1/2',
      materialKind: 'sheet',
      rows: [{ partId: 'bottom', name: 'Bottom', quantity: 1, finished: [950, 420, 12], rough: [950, 420, 12], grain: 'none', notes: [] }],
    },
  ];

  it('keeps the engine order when no column is chosen', () => {
    expect(cutListTable(groups, null)[0]?.rows.map((r) => r.partId)).toEqual(['rail', 'stile', 'batten']);
  });

  it('sorts rows within their group by a numeric column, either way', () => {
    expect(cutListTable(groups, { key: 'length', direction: 'asc' })[0]?.rows.map((r) => r.partId)).toEqual(['stile', 'batten', 'rail']);
    expect(cutListTable(groups, { key: 'length', direction: 'desc' })[0]?.rows.map((r) => r.partId)).toEqual(['rail', 'batten', 'stile']);
  });

  it('sorts by name alphabetically', () => {
    expect(cutListTable(groups, { key: 'name', direction: 'asc' })[0]?.rows.map((r) => r.name)).toEqual(['Batten', 'Rail', 'Stile']);
  });

  it('gives sheet goods no board feet and sums a solid group', () => {
    const table = cutListTable(groups, null);
    expect(table[1]?.boardFeet).toBe(0);
    const solid = table[0];
    expect(solid?.boardFeet).toBeCloseTo((solid?.rows ?? []).reduce((s, r) => s + r.boardFeet, 0), 12);
    expect(solid?.boardFeet).toBeGreaterThan(0);
  });
});
