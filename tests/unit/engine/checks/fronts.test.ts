import { describe, expect, it } from 'vitest';
import { doorSweepMm, frontClearanceChecks, legAndRailRevealChecks, MIN_FRONT_GAP_MM, type FrontFacts } from '../../../../shared/engine/checks/fronts.ts';

const MM_TOLERANCE = 1e-9;

const front = (id: string, x: [number, number], kind: FrontFacts['kind'] = 'drawer', hinge: FrontFacts['hinge'] = 'left'): FrontFacts => ({
  id, label: id, partIds: [id], kind, hinge, x, z: [0, 200], thicknessMm: 19,
});

describe('doorSweepMm', () => {
  it('is √(w² + t²) − w: a 300 × 19 mm door sweeps about 0.6 mm past its closed edge', () => {
    // √(300² + 19²) = √90 361 = 300.60106; less 300 = 0.60106 mm (Pythagoras, by hand).
    expect(Math.abs(doorSweepMm(300, 19) - 0.60106)).toBeLessThan(1e-4);
  });
});

describe('frontClearanceChecks', () => {
  it('calls overlapping fronts an error with the overlap', () => {
    const checks = frontClearanceChecks([front('a', [0, 310]), front('b', [300, 600])]);
    const c = checks.find((x) => x.id.startsWith('fronts-collide'));
    expect(c?.severity).toBe('error');
    expect(Math.abs(c!.numbers.gapMm! + 10)).toBeLessThan(MM_TOLERANCE);
  });

  it('warns when drawer fronts are closer than the least gap', () => {
    const checks = frontClearanceChecks([front('a', [0, 300]), front('b', [300.3, 600])]);
    expect(checks.some((x) => x.id.startsWith('fronts-rub') && x.numbers.minGapMm === MIN_FRONT_GAP_MM)).toBe(true);
  });

  it('warns when a door\'s free edge cannot swing past its neighbour, and not when the gap is enough', () => {
    const tight = frontClearanceChecks([front('a', [0, 300], 'door', 'left'), front('b', [300.4, 600.4], 'door', 'right')]);
    expect(tight.some((x) => x.id.startsWith('door-hits-neighbour'))).toBe(true);
    const roomy = frontClearanceChecks([front('a', [0, 300], 'door', 'left'), front('b', [303, 603], 'door', 'right')]);
    expect(roomy).toEqual([]);
  });

  it('ignores a door\'s hinge edge: only the free edge sweeps', () => {
    // a hangs on its right edge and b on its left: the edges facing each other are hinge edges.
    const checks = frontClearanceChecks([front('a', [0, 300], 'door', 'right'), front('b', [301, 601], 'door', 'left')]);
    expect(checks.some((x) => x.id.startsWith('door-hits-neighbour'))).toBe(false);
  });
});

describe('legAndRailRevealChecks', () => {
  // A leg-and-rail case: 44.45 mm legs, 19.05 mm rails, a 50.8 mm mullion, 12.7 mm overlay.
  const frame = { stileMm: 44.45, topRailMm: 19.05, bottomRailMm: 19.05, midRailMm: 19.05, mullionMm: 50.8 };

  it('passes when the rails show alike and the legs and mullions show alike, though legs show more than rails', () => {
    // Rails: 19.05 − 12.7 = 6.35 top and bottom; 19.05 − 2 × 6.35 = 6.35 between rows. Legs 31.75; mullion 50.8 − 2 × 9.525 = 31.75.
    expect(legAndRailRevealChecks([], frame, 12.7, 3.175, { railMm: 6.35, mullionMm: 9.525 }, 3, 2)).toEqual([]);
  });

  it('warns with both spreads when the fronts lap the rail between rows fully', () => {
    const [c] = legAndRailRevealChecks([], frame, 12.7, 3.175, { railMm: 7.9375, mullionMm: 9.525 }, 3, 2);
    expect(c?.severity).toBe('warning');
    // Between rows 19.05 − 15.875 = 3.175 against 6.35 at the top and bottom.
    expect(Math.abs(c!.numbers.railSpreadMm! - 3.175)).toBeLessThan(MM_TOLERANCE);
    expect(Math.abs(c!.numbers.uprightSpreadMm!)).toBeLessThan(MM_TOLERANCE);
  });
});

