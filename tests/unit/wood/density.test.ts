import { describe, expect, it } from 'vitest';
import { densityKgM3, densityLbFt3 } from '../../../shared/wood/density.ts';

const DENSITY_TOLERANCE_LB_FT3 = 0.005;

describe('densityLbFt3', () => {
  it('gives 27.97 lb/ft³ for specific gravity 0.40 at 12 % (WH2010 Chapter 4, secondary)', () => {
    expect(Math.abs(densityLbFt3(0.4, 12) - 27.97)).toBeLessThan(DENSITY_TOLERANCE_LB_FT3);
  });
});

describe('densityKgM3', () => {
  it('agrees with the lb/ft³ form through the density of water', () => {
    // 1 lb/ft³ = 16.0185 kg/m³
    expect(densityKgM3(0.4, 12)).toBeCloseTo(densityLbFt3(0.4, 12) * 16.0185, 0);
  });
});
