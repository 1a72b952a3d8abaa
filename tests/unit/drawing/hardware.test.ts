import { describe, expect, it } from 'vitest';
import { lbfInFromNm, lidTorque, lidTorqueNm } from '../../../shared/drawing/hardware.ts';
import { sampleResult } from './support/sampleResult.ts';

const LB = 0.45359237;
const TOL_LBF_IN = 0.05;

describe('lidTorqueNm', () => {
  it('gives weight × depth / 2 for a uniform lid, closed', () => {
    // Hinge manufacturers' sizing guides (secondary, REFERENCE §5): a 2 lb lid 10 in deep needs 10.0 in·lb closed.
    expect(Math.abs(lbfInFromNm(lidTorqueNm(2 * LB, 254)) - 10.0)).toBeLessThan(TOL_LBF_IN);
    // The same lid at 30° open: 8.66 in·lb (× cos 30°).
    expect(Math.abs(lbfInFromNm(lidTorqueNm(2 * LB, 254)) * Math.cos(Math.PI / 6) - 8.66)).toBeLessThan(TOL_LBF_IN);
  });
});

describe('lidTorque', () => {
  it('weighs the lid with its battens and measures its depth front to back', () => {
    const t = lidTorque(sampleResult());
    expect(t).not.toBeNull();
    // The sample lid is 511 mm deep (1050 × 511 × 20 mm) with two 420 × 50 × 19 mm battens.
    expect(t!.depthMm).toBeCloseTo(511, 6);
    const volumeM3 = (1050 * 511 * 20 + 2 * 420 * 50 * 19) * 1e-9;
    expect(t!.massKg / volumeM3).toBeGreaterThan(500);
    expect(t!.torqueNm).toBeCloseTo(lidTorqueNm(t!.massKg, 511), 9);
  });
});
