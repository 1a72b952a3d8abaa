import { describe, expect, it } from 'vitest';
import { doorSweepMm, frontClearanceChecks, MIN_FRONT_GAP_MM, type FrontFacts } from '../../../../shared/engine/checks/fronts.ts';

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
