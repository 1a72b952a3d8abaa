import { describe, expect, it } from 'vitest';
import { chooseBreaks } from '../../../shared/drawing/breakView.ts';

describe('chooseBreaks', () => {
  it('shortens a rail on both sides of a notch at its middle, never through a cut', () => {
    // A 949 mm rail, 76 wide: tongues 11 long at the ends, a finger notch from 445 to 505.
    const stations = [11, 445, 505, 938];
    const breaks = chooseBreaks(949, 76, stations);
    expect(breaks).toHaveLength(2);
    for (const b of breaks) for (const s of stations) expect(s <= b.from || s >= b.to, `break ${b.from}–${b.to} through ${s}`).toBe(true);
    expect(breaks[0]!.to).toBeLessThanOrEqual(445);
    expect(breaks[1]!.from).toBeGreaterThanOrEqual(505);
  });

  it('breaks a cleat between its screw holes, at most four times', () => {
    const holes = [60, 220, 380, 540, 700, 860].flatMap((x) => [x - 2, x + 2]);
    const breaks = chooseBreaks(927, 19, holes);
    expect(breaks.length).toBeGreaterThan(1);
    expect(breaks.length).toBeLessThanOrEqual(4);
    expect(breaks.map((b) => b.from)).toEqual([...breaks.map((b) => b.from)].sort((a, b) => a - b));
  });

  it('leaves a short part whole', () => {
    expect(chooseBreaks(300, 120, [])).toEqual([]);
  });
});
