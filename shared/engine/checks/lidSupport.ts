/**
 * Lid weight and the torque its supports must hold. Torque about the hinge line = weight ×
 * distance from the hinge to the lid's centre of gravity × cos(angle from horizontal); for a
 * uniform lid the largest torque is closed, weight × depth / 2 (hinge manufacturers' sizing
 * guides, secondary — see REFERENCE.md §5).
 */
import type { Check } from '../types.ts';
import { both, check } from './check.ts';

/** Standard gravity, m/s² (CGPM 1901, exact by definition). */
export const STANDARD_GRAVITY = 9.80665;
/** Newtons in one pound-force: 0.45359237 kg × 9.80665 m/s² (exact by definition). */
export const N_PER_LBF = 0.45359237 * STANDARD_GRAVITY;
/** Newton-metres in one pound-force inch (1 lbf·in ≈ 0.1130 N·m). */
export const NM_PER_LBF_IN = N_PER_LBF * 0.0254;

/** Torque (N·m) a lid of `weightN` whose centre of gravity is `cogDistanceMm` from the hinge puts on its supports at `angleDeg` open. */
export function lidTorqueNm(weightN: number, cogDistanceMm: number, angleDeg = 0): number {
  return weightN * (cogDistanceMm / 1000) * Math.cos((angleDeg * Math.PI) / 180);
}

/** Inputs for {@link lidSupportCheck}. */
export interface LidSupportFacts {
  lidIds: readonly string[];
  massKg: number;
  cogDistanceMm: number;
  densityKgM3: number;
  hingeType: 'lid-support' | 'butt';
  hingeCount: number;
  ratingPerHingeNm: number;
}

/** The lid's weight, the torque closed, and whether the hinges' rating holds it. */
export function lidSupportCheck(f: LidSupportFacts): Check {
  const weightN = f.massKg * STANDARD_GRAVITY;
  const torqueNm = lidTorqueNm(weightN, f.cogDistanceMm, 0);
  const perHingeNm = torqueNm / f.hingeCount;
  const torqueLbfIn = torqueNm / NM_PER_LBF_IN;
  const numbers = {
    massKg: f.massKg, weightN, weightLbf: weightN / N_PER_LBF, densityKgM3: f.densityKgM3,
    cogDistanceMm: f.cogDistanceMm, torqueNm, torqueLbfIn, hingeCount: f.hingeCount,
    perHingeNm, perHingeLbfIn: perHingeNm / NM_PER_LBF_IN, ratingPerHingeNm: f.ratingPerHingeNm,
  };
  const r1 = (n: number) => Math.round(n * 10) / 10;
  const facts = `The lid and battens weigh about ${r1(f.massKg)} kg (${r1(weightN / N_PER_LBF)} lb, from the species' density at 12 % moisture content); their centre of gravity is ${both(f.cogDistanceMm)} from the hinge line, so closed they put ${r1(torqueNm)} N·m (${r1(torqueLbfIn)} lbf·in) on the supports, ${r1(perHingeNm)} N·m (${r1(perHingeNm / NM_PER_LBF_IN)} lbf·in) per hinge.`;
  const title = 'Lid weight and support torque';
  if (f.hingeType === 'butt') {
    return check({
      id: 'lid-support', severity: 'warning', title, partIds: f.lidIds, numbers,
      message: `${facts} Butt hinges do not hold a lid up.`,
      fix: `Fit a lid support (or lid-support hinges) rated for at least ${r1(torqueNm)} N·m in total that holds the lid open in any position.`,
    });
  }
  if (f.ratingPerHingeNm <= 0) {
    return check({
      id: 'lid-support', severity: 'info', title, partIds: f.lidIds, numbers,
      message: `${facts} Enter the hinges' rating to check them.`,
      fix: `Choose lid-support hinges rated for at least ${r1(perHingeNm)} N·m (${r1(perHingeNm / NM_PER_LBF_IN)} lbf·in) each.`,
    });
  }
  if (f.ratingPerHingeNm * f.hingeCount < torqueNm) {
    const needed = Math.ceil(torqueNm / f.ratingPerHingeNm);
    return check({
      id: 'lid-support', severity: 'warning', title, partIds: f.lidIds, numbers,
      message: `${facts} ${f.hingeCount} hinges rated ${r1(f.ratingPerHingeNm)} N·m hold only ${r1(f.ratingPerHingeNm * f.hingeCount)} N·m: the lid will fall.`,
      fix: `Use hinges rated at least ${r1(perHingeNm)} N·m each, or ${needed} of the ones you have, or a lighter lid.`,
    });
  }
  return check({
    id: 'lid-support', severity: 'info', title, partIds: f.lidIds, numbers,
    message: `${facts} ${f.hingeCount} hinges rated ${r1(f.ratingPerHingeNm)} N·m hold ${r1(f.ratingPerHingeNm * f.hingeCount)} N·m: enough.`,
  });
}
