import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planGlueUp, type GlueUpArrangement } from '../../../shared/wood/glueUp.ts';
import { seasonalSwing } from '../../../shared/wood/movement.ts';

const WIDTH_TOLERANCE_MM = 1e-6;
const CLIMATE = { buildMcPercent: 8, lowMcPercent: 6, highMcPercent: 10 };

describe('planGlueUp', () => {
  it('uses the fewest boards no wider than the limit, equal widths', () => {
    const plan = planGlueUp({ panelWidthMm: 500, maxBoardWidthMm: 150, arrangement: 'equal', species: 'black-cherry', sawn: 'flat', climate: CLIMATE });
    expect(plan.boardCount).toBe(4);
    expect(plan.boardWidthsMm).toEqual([125, 125, 125, 125]);
    expect(plan.boardWidths[0]?.text.mm).toBe('125 mm');
  });

  it('puts the widest boards in the middle', () => {
    const plan = planGlueUp({ panelWidthMm: 500, maxBoardWidthMm: 150, arrangement: 'widest-middle', species: 'black-cherry', sawn: 'flat', climate: CLIMATE });
    expect(plan.boardWidthsMm).toEqual([100, 150, 150, 100]);
    const odd = planGlueUp({ panelWidthMm: 400, maxBoardWidthMm: 150, arrangement: 'widest-middle', species: 'black-cherry', sawn: 'flat', climate: CLIMATE });
    expect(odd.boardWidthsMm).toEqual([125, 150, 125]);
  });

  it('does not add a board when the width is an exact multiple', () => {
    const plan = planGlueUp({ panelWidthMm: 0.1 * 3 * 1000, maxBoardWidthMm: 100, arrangement: 'equal', species: 'white-oak', sawn: 'flat', climate: CLIMATE });
    expect(plan.boardCount).toBe(3);
  });

  it('moves as one board of the full width', () => {
    const plan = planGlueUp({ panelWidthMm: 600, maxBoardWidthMm: 140, arrangement: 'equal', species: 'white-oak', sawn: 'flat', climate: CLIMATE });
    const whole = seasonalSwing({ widthMm: 600, species: 'white-oak', sawn: 'flat', climate: CLIMATE });
    expect(plan.movement.totalMm).toBe(whole.totalMm);
  });

  it('always sums to the panel width with no board over the limit (property)', () => {
    const cases = fc.record({
      panelWidthMm: fc.double({ min: 50, max: 3000, noNaN: true }),
      maxBoardWidthMm: fc.double({ min: 40, max: 400, noNaN: true }),
      arrangement: fc.constantFrom<GlueUpArrangement>('equal', 'widest-middle'),
    });
    fc.assert(
      fc.property(cases, ({ panelWidthMm, maxBoardWidthMm, arrangement }) => {
        const plan = planGlueUp({ panelWidthMm, maxBoardWidthMm, arrangement, species: 'black-walnut', sawn: 'flat', climate: CLIMATE });
        const sum = plan.boardWidthsMm.reduce((total, width) => total + width, 0);
        return (
          plan.boardWidthsMm.length === plan.boardCount &&
          Math.abs(sum - panelWidthMm) < WIDTH_TOLERANCE_MM &&
          plan.boardWidthsMm.every((width) => width > 0 && width <= maxBoardWidthMm + WIDTH_TOLERANCE_MM)
        );
      }),
    );
  });

  it('rejects an unknown arrangement', () => {
    expect(() =>
      planGlueUp({ panelWidthMm: 500, maxBoardWidthMm: 150, arrangement: 'random' as GlueUpArrangement, species: 'black-cherry', sawn: 'flat', climate: CLIMATE }),
    ).toThrow(/equal or widest-middle/);
  });
});
