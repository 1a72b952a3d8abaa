import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import { SAG_LIMIT_PER_SPAN, shelfSagCheck } from '../../../../shared/engine/checks/shelfSag.ts';
import { getSpecies } from '../../../../shared/wood/species.ts';
import { sheetStiffness } from '../../../../shared/wood/sheetStiffness.ts';

/** The worked example prints its answer to 0.01 mm. */
const WORKED_EXAMPLE_TOLERANCE_MM = 0.005;
const RELATIVE = 1e-9;
/** Standard gravity, m/s² (exact by definition). */
const G = 9.80665;

const facts = { id: 'test', title: 'test shelf', partIds: [], modulusMPa: 200_000, modulusSource: 'test', approximate: false, thicknessMm: 20, thickerEiNmm2: null, thickerLabel: '', withStripEiNmm2: null };

describe('shelfSagCheck', () => {
  it('turns a load in kg per metre into the beam formula and reproduces the uniform-load worked example', () => {
    // Worked example recalled from memory (The Engineering ToolBox, "Beams – Supported at Both
    // Ends – Continuous and Point Loads", example "beam with uniform load, metric units"); the
    // formula is the case "simple beam – uniformly distributed load" in AWC Design Aid No. 6,
    // Beam Design Formulas with Shear and Moment Diagrams. Not read from the page here, so it
    // checks the arithmetic, not a confirmed published value: UB 305 × 127 × 42 steel beam,
    // L = 5000 mm, q = 6 N/mm (= 6000 / 9.80665 kg per metre), I = 81 960 000 mm⁴,
    // E = 200 000 N/mm²: δmax = 5qL⁴/(384EI) = 2.98 mm.
    const c = shelfSagCheck({ ...facts, spanMm: 5000, loadKgPerM: 6000 / G, eiNmm2: 200_000 * 81_960_000 });
    expect(Math.abs(c.numbers.loadNPerMm! - 6)).toBeLessThan(RELATIVE);
    expect(Math.abs(c.numbers.sagMm! - 2.98)).toBeLessThan(WORKED_EXAMPLE_TOLERANCE_MM);
    // Span/384 (1/32 in per foot, common practice, no published source) is 13.02 mm: within it.
    expect(c.numbers.limitMm).toBeCloseTo(5000 * SAG_LIMIT_PER_SPAN, 9);
    expect(c.severity).toBe('info');
  });

  it('warns with the fixes when the sag passes the limit, and the longest span just meets it', () => {
    const c = shelfSagCheck({ ...facts, spanMm: 12_000, loadKgPerM: 6000 / G, eiNmm2: 200_000 * 81_960_000 });
    expect(c.severity).toBe('warning');
    expect(c.fix).toMatch(/centre support/);
    const atLongest = shelfSagCheck({ ...facts, spanMm: c.numbers.longestSpanMm!, loadKgPerM: 6000 / G, eiNmm2: 200_000 * 81_960_000 });
    expect(Math.abs(atLongest.numbers.sagMm! - atLongest.numbers.limitMm!) / atLongest.numbers.limitMm!).toBeLessThan(1e-6);
  });
});

describe('shelf sag in a built cabinet: where its modulus comes from', () => {
  const build = (params: Record<string, unknown>) => {
    const spec = defaultSpec('cabinet');
    return buildPiece({ ...spec, params: { ...spec.params, ...params } });
  };

  it('takes a solid shelf\'s modulus from the species table, named as WH2010 Table 5-3 and marked approximate', () => {
    // shared/REFERENCE.md (section 4) confirms no modulus value from WH2010 Table 5-3, so the
    // species table rightly keeps its values as from memory (unconfirmed): the check must say so.
    const c = build({ shelfMaterial: 'solid', species: 'black-cherry' }).checks.find((x) => x.id.startsWith('shelf-sag'));
    expect(c?.numbers.modulusMPa).toBe(getSpecies('black-cherry').modulusOfElasticityMPa);
    expect(c?.message).toMatch(/WH2010 Table 5-3/);
    expect(c?.message).toMatch(/unconfirmed/);
    expect(c?.message).toMatch(/approximate: the modulus is from memory/);
  });

  it('takes a sheet shelf\'s modulus from the sheet-goods table, marked approximate', () => {
    const c = build({ shelfMaterial: 'sheet' }).checks.find((x) => x.id.startsWith('shelf-sag'));
    expect(c?.numbers.modulusMPa).toBe(sheetStiffness('hardwood-plywood-3/4').modulusOfElasticityMPa);
    expect(sheetStiffness('hardwood-plywood-3/4').source.confidence).toBe('unconfirmed');
    expect(c?.message).toMatch(/approximate: the modulus is from memory/);
  });
});
