import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildPiece } from '../../../../shared/engine/index.ts';
import type { PieceResult, PieceSpec } from '../../../../shared/engine/types.ts';
import { isInputError } from '../../../../shared/errors.ts';
import { brokenChestSpec, sensibleChestSpec } from '../helpers/arbitraries.ts';
import { overlappingPairs } from '../helpers/solids.ts';
import { tongueFitProblems } from '../helpers/tongueFit.ts';

const SIZE_TOLERANCE_MM = 1e-6;
const RUNS = 2000;
// Thousands of builds with geometry checks take tens of seconds on a busy machine.
const PROPERTY_TIMEOUT_MS = 600_000;

/** Builds `spec`, or null when validation refuses it (with an InputError and nothing else). */
function tryBuild(spec: PieceSpec): PieceResult | null {
  try {
    return buildPiece(spec);
  } catch (error) {
    if (isInputError(error)) return null;
    throw error;
  }
}

function numbersIn(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) for (const v of value) numbersIn(v, out);
  else if (value && typeof value === 'object') for (const v of Object.values(value)) numbersIn(v, out);
  return out;
}

describe('buildPiece (chest) over random sensible specs', () => {
  it('builds most sensible specs (the generator is not mostly refused)', () => {
    const samples = fc.sample(sensibleChestSpec, { numRuns: 300, seed: 7 });
    const built = samples.filter((s) => tryBuild(s) !== null).length;
    expect(built / samples.length).toBeGreaterThan(0.5);
  }, PROPERTY_TIMEOUT_MS);

  it('never gives NaN or a non-positive size, and the box is the size asked for plus the lid overhangs', () => {
    fc.assert(
      fc.property(sensibleChestSpec, (spec) => {
        const r = tryBuild(spec);
        fc.pre(r !== null);
        const result = r!;
        // Everything derived comes from parts, joints and placements; the cut list and joinery
        // tables repeat their numbers, so checking these (and the derived totals) covers them.
        const core = [result.parts, result.joints, result.placements, result.checks, result.bboxMm, result.bboxMinMm, result.derived.boardFeet, result.derived.sheetArea];
        expect(numbersIn(core).every(Number.isFinite)).toBe(true);
        for (const p of result.parts) {
          expect(Math.min(p.lengthMm, p.widthMm, p.thicknessMm, p.rough.lengthMm, p.rough.widthMm, p.rough.thicknessMm)).toBeGreaterThan(0);
          for (const f of p.features) for (const b of f.removed) for (let i = 0; i < 3; i++) expect(b.max[i]! - b.min[i]!).toBeGreaterThan(0);
        }
        const p = result.spec.params as Record<string, number | string>;
        const raised = p.hingeRecess === 'none' ? 2 * (p.hingeLeafThickness as number) : 0;
        expect(Math.abs(result.bboxMm[0] - ((p.width as number) + 2 * (p.lidOverhangSide as number)))).toBeLessThan(SIZE_TOLERANCE_MM);
        expect(Math.abs(result.bboxMm[1] - ((p.depth as number) + (p.lidOverhangFront as number) + (p.lidOverhangBack as number)))).toBeLessThan(SIZE_TOLERANCE_MM);
        expect(Math.abs(result.bboxMm[2] - ((p.height as number) + raised))).toBeLessThan(SIZE_TOLERANCE_MM);
        // The case over its legs: the legs' outer faces are at 0 and at the width and depth.
        const legs = result.placements.filter((pl) => result.parts.find((x) => x.id === pl.partId)?.role === 'leg');
        const leg = result.parts.find((x) => x.role === 'leg')!;
        expect(Math.max(...legs.map((pl) => pl.positionMm[0])) + leg.widthMm).toBeCloseTo(p.width as number, 6);
        expect(Math.max(...legs.map((pl) => pl.positionMm[1])) + leg.widthMm).toBeCloseTo(p.depth as number, 6);
      }),
      { numRuns: RUNS, seed: 42 },
    );
  }, PROPERTY_TIMEOUT_MS);

  it('seats every tongue in its groove with the stated clearance, and parts overlap only where cut away', () => {
    fc.assert(
      fc.property(sensibleChestSpec, (spec) => {
        const r = tryBuild(spec);
        fc.pre(r !== null && !r.checks.some((c) => c.severity === 'error'));
        // A panel thinner than its groove is loose, not wrong: it carries its own warning.
        const loose = r!.checks.some((c) => c.id === 'panel-thinner-than-groove');
        const problems = tongueFitProblems(r!).filter((p) => !(loose && p.reason.startsWith('tongue is not as thick')));
        expect(problems).toEqual([]);
        expect(overlappingPairs(r!)).toEqual([]);
      }),
      { numRuns: RUNS, seed: 43 },
    );
  }, PROPERTY_TIMEOUT_MS);
});

describe('buildPiece (chest) over random broken specs', () => {
  it('throws an InputError naming a field, never another kind of error and never NaN', () => {
    fc.assert(
      fc.property(brokenChestSpec, (spec) => {
        try {
          const result = buildPiece(spec as PieceSpec);
          // Some "broken" specs are in fact valid (e.g. a random value inside its range).
          expect(numbersIn(result).every(Number.isFinite)).toBe(true);
        } catch (error) {
          expect(isInputError(error)).toBe(true);
          expect((error as { field: string }).field.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: RUNS, seed: 44 },
    );
  }, PROPERTY_TIMEOUT_MS);
});
