import { describe, expect, it } from 'vitest';
import { boardFeet, boardFeetBySpecies } from '../../../../shared/engine/derived/boardFeet.ts';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';

const BF_TOLERANCE = 1e-9;

describe('boardFeet', () => {
  it('counts 144 cubic inches as one board foot: 1 × 9 × 96 in is 6 BF (NHLA rules, secondary)', () => {
    expect(boardFeet(1, 9, 96)).toBeCloseTo(6, 9);
    expect(boardFeet(1, 12, 12)).toBeCloseTo(1, 9);
  });

  it('counts stock under 1 in thick as 1 in (NHLA rules, secondary)', () => {
    expect(boardFeet(0.75, 9, 96)).toBeCloseTo(6, 9);
    expect(boardFeet(2, 9, 96)).toBeCloseTo(12, 9);
  });
});

describe('boardFeetBySpecies', () => {
  it('sums rough sizes per species and stock thickness, thickness rounded up to the quarter', () => {
    const r = buildPiece(defaultSpec('chest'));
    const oak = r.derived.boardFeet.bySpecies.find((s) => s.speciesId === 'white-oak')!;
    // Legs: 1-3/4 in + 1/8 in allowance = 1-7/8 in → 8/4 stock (2 in thick).
    // 4 legs × 2 in × (1-3/4 + 1/4) in wide × (22-1/4 + 1) in long / 144 = 4 × 2 × 2 × 23.25 / 144.
    expect(oak.byThickness['8/4']).toBeCloseTo((4 * 2 * 2 * 23.25) / 144, 9);
    // 3/4 in + 1/8 in = 7/8 in → 4/4 (makers commonly mill 4/4 to 3/4 in: common practice).
    expect(Object.keys(oak.byThickness).sort()).toEqual(['4/4', '8/4']);
    const sum = Object.values(oak.byThickness).reduce((a, b) => a + b, 0);
    expect(Math.abs(sum - oak.total)).toBeLessThan(BF_TOLERANCE);
  });

  it('leaves sheet goods out of board feet', () => {
    const r = buildPiece(defaultSpec('chest'));
    const withoutSheets = boardFeetBySpecies(r.parts.filter((p) => p.material.kind === 'solid'));
    expect(Math.abs(withoutSheets.total - r.derived.boardFeet.total)).toBeLessThan(BF_TOLERANCE);
  });
});
