import { describe, expect, it } from 'vitest';
import { lidSupportCheck, lidTorqueNm, N_PER_LBF, NM_PER_LBF_IN } from '../../../../shared/engine/checks/lidSupport.ts';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import { getSpecies } from '../../../../shared/wood/species.ts';

const TORQUE_TOLERANCE_LBF_IN = 0.01;

describe('lidTorqueNm', () => {
  // Hinge manufacturers' sizing guides (secondary, REFERENCE.md §5): a 2 lb lid 10 in deep needs
  // 10.0 in·lb closed and 8.66 in·lb at 30°; its centre of gravity is 5 in from the hinge.
  const weightN = 2 * N_PER_LBF;
  const cogMm = 5 * 25.4;

  it('gives 10.0 lbf·in for a 2 lb, 10 in deep lid, closed', () => {
    expect(Math.abs(lidTorqueNm(weightN, cogMm, 0) / NM_PER_LBF_IN - 10)).toBeLessThan(TORQUE_TOLERANCE_LBF_IN);
  });

  it('gives 8.66 lbf·in for the same lid at 30°', () => {
    expect(Math.abs(lidTorqueNm(weightN, cogMm, 30) / NM_PER_LBF_IN - 8.66)).toBeLessThan(TORQUE_TOLERANCE_LBF_IN);
  });

  it('converts 1 lbf·in to 0.1130 N·m', () => {
    expect(NM_PER_LBF_IN).toBeCloseTo(0.113, 4);
  });
});

describe('lidSupportCheck', () => {
  const facts = { lidIds: ['lid'], massKg: 8, cogDistanceMm: 250, densityKgM3: 750, hingeType: 'lid-support' as const, hingeCount: 2 };

  it('says what each hinge must hold when no rating is given', () => {
    const c = lidSupportCheck({ ...facts, ratingPerHingeNm: 0 });
    expect(c.severity).toBe('info');
    expect(c.numbers.perHingeNm).toBeCloseTo((8 * 9.80665 * 0.25) / 2, 9);
    expect(c.fix).toMatch(/at least 9\.8 N·m/);
  });

  it('warns with the fix when the hinges are rated too low', () => {
    const c = lidSupportCheck({ ...facts, ratingPerHingeNm: 5 });
    expect(c.severity).toBe('warning');
    expect(c.fix).toMatch(/rated at least 9\.8 N·m each, or 4 of the ones you have/);
  });

  it('passes hinges strong enough', () => {
    expect(lidSupportCheck({ ...facts, ratingPerHingeNm: 10 }).severity).toBe('info');
  });

  it('weighs the built lid from its species density and puts the torque on the hinge line', () => {
    const spec = defaultSpec('chest');
    const oak = buildPiece(spec).checks.find((c) => c.id === 'lid-support')!;
    const cherry = buildPiece({ ...spec, params: { ...spec.params, species: 'black-cherry' } }).checks.find((c) => c.id === 'lid-support')!;
    // Same size, so mass scales with the species' density at 12 % MC (from WH2010 Table 5-3
    // specific gravities, as the wood library holds them).
    expect(oak.numbers.massKg! / cherry.numbers.massKg!).toBeCloseTo(getSpecies('white-oak').densityKgM3At12 / getSpecies('black-cherry').densityKgM3At12, 9);
    expect(oak.numbers.densityKgM3).toBe(getSpecies('white-oak').densityKgM3At12);
    expect(oak.numbers.torqueNm).toBeCloseTo(oak.numbers.weightN! * (oak.numbers.cogDistanceMm! / 1000), 9);
  });
});
