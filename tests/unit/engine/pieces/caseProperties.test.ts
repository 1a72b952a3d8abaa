import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildPiece } from '../../../../shared/engine/index.ts';
import type { PieceResult, PieceSpec } from '../../../../shared/engine/types.ts';
import { isInputError } from '../../../../shared/errors.ts';
import { brokenCabinetSpec, brokenDresserSpec, sensibleCabinetSpec, sensibleDresserSpec } from '../helpers/caseArbitraries.ts';
import { jointFitProblems } from '../helpers/jointFit.ts';
import { overlappingPairs } from '../helpers/solids.ts';

const SIZE_TOLERANCE_MM = 1e-6;
const RUNS = 500;
// Hundreds of builds with pairwise solid checks take a while on a busy machine.
const PROPERTY_TIMEOUT_MS = 600_000;
const FITTED_JOINTS = ['stub-tenon', 'panel-in-groove', 'tongue-and-dado'] as const;

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

/** The box the parameters ask for: [min, size] on each axis. */
function expectedBox(result: PieceResult): { min: number[]; size: number[] } {
  const p = result.spec.params as Record<string, number | string | boolean>;
  const n = (k: string) => p[k] as number;
  const overlayT = p.frontMount === 'overlay' ? n('frontThickness') : 0;
  if (result.kind === 'dresser') {
    const front = Math.max(n('topOverhangFront'), overlayT);
    return { min: [-n('topOverhangSide'), -front, 0], size: [n('width') + 2 * n('topOverhangSide'), n('depth') + front + n('topOverhangBack'), n('height')] };
  }
  const front = n('doorCount') > 0 ? overlayT : 0;
  return { min: [0, -front, 0], size: [n('width'), n('depth') + front, n('height')] };
}

function checkSensible(result: PieceResult): void {
  expect(numbersIn(result).every(Number.isFinite)).toBe(true);
  for (const p of result.parts) {
    expect(Math.min(p.lengthMm, p.widthMm, p.thicknessMm, p.rough.lengthMm, p.rough.widthMm, p.rough.thicknessMm)).toBeGreaterThan(0);
    for (const f of p.features) for (const b of f.removed) for (let i = 0; i < 3; i++) expect(b.max[i]! - b.min[i]!).toBeGreaterThan(0);
  }
  const want = expectedBox(result);
  for (let i = 0; i < 3; i++) {
    expect(Math.abs(result.bboxMm[i]! - want.size[i]!)).toBeLessThan(SIZE_TOLERANCE_MM);
    expect(Math.abs(result.bboxMinMm[i]! - want.min[i]!)).toBeLessThan(SIZE_TOLERANCE_MM);
  }
}

for (const [kind, sensible, brokenSpec] of [['dresser', sensibleDresserSpec, brokenDresserSpec], ['cabinet', sensibleCabinetSpec, brokenCabinetSpec]] as const) {
  describe(`buildPiece (${kind}) over random sensible specs`, () => {
    it('builds most sensible specs (the generator is not mostly refused)', () => {
      const samples = fc.sample(sensible, { numRuns: 200, seed: 7 });
      expect(samples.filter((s) => tryBuild(s) !== null).length / samples.length).toBeGreaterThan(0.5);
    }, PROPERTY_TIMEOUT_MS);

    it('never gives NaN or a non-positive size, and the box is the size asked for', () => {
      fc.assert(fc.property(sensible, (spec) => {
        const r = tryBuild(spec);
        fc.pre(r !== null);
        checkSensible(r!);
      }), { numRuns: RUNS, seed: 42 });
    }, PROPERTY_TIMEOUT_MS);

    it('seats every tongue in its housing with the stated clearance, and parts overlap only where cut away', () => {
      fc.assert(fc.property(sensible, (spec) => {
        const r = tryBuild(spec);
        fc.pre(r !== null && !r.checks.some((c) => c.severity === 'error'));
        // A panel thinner than its groove is loose, not wrong: it carries its own warning.
        const loose = r!.checks.some((c) => c.id === 'panel-thinner-than-groove');
        expect(jointFitProblems(r!, FITTED_JOINTS).filter((p) => !(loose && p.includes('not as thick')))).toEqual([]);
        expect(overlappingPairs(r!)).toEqual([]);
      }), { numRuns: RUNS, seed: 43 });
    }, PROPERTY_TIMEOUT_MS);
  });

  if (kind === 'dresser') {
    describe('buildPiece (dresser) over random sensible specs, by construction and slide', () => {
      it('builds frame-and-panel dressers on every kind of slide among its samples', () => {
        const built = fc.sample(sensible, { numRuns: 200, seed: 7 }).map(tryBuild).filter((r): r is PieceResult => r !== null);
        const framed = (slide: string) => built.filter((r) => r.spec.params.caseConstruction === 'frame-and-panel' && r.spec.params.slideType === slide);
        for (const slide of ['side-mount', 'undermount', 'wood-runners']) expect(framed(slide).length).toBeGreaterThan(0);
        // On metal slides every framed dresser hangs its drawers on spacers.
        for (const r of [...framed('side-mount'), ...framed('undermount')]) expect(r.parts.some((x) => x.id.includes('slide-spacer'))).toBe(true);
      }, PROPERTY_TIMEOUT_MS);
    });
  }

  describe(`buildPiece (${kind}) over random broken specs`, () => {
    it('throws an InputError naming a field, never another kind of error and never NaN', () => {
      fc.assert(fc.property(brokenSpec, (spec) => {
        try {
          const result = buildPiece(spec as PieceSpec);
          expect(numbersIn(result).every(Number.isFinite)).toBe(true);
        } catch (error) {
          expect(isInputError(error)).toBe(true);
          expect((error as { field: string }).field.length).toBeGreaterThan(0);
        }
      }), { numRuns: RUNS, seed: 44 });
    }, PROPERTY_TIMEOUT_MS);
  });
}
