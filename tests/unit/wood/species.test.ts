import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { getSpecies, SPECIES, SPECIES_IDS } from '../../../shared/wood/species.ts';

const COEFFICIENT_TOLERANCE = 1e-12;

const REQUIRED_IDS = [
  'yellow-poplar', 'hard-maple', 'soft-maple', 'black-cherry', 'black-walnut',
  'northern-red-oak', 'white-oak', 'white-ash', 'yellow-birch', 'eastern-white-pine',
];

describe('SPECIES', () => {
  it('holds every species the issue requires', () => {
    for (const id of REQUIRED_IDS) expect(SPECIES_IDS).toContain(id);
  });

  it('names a table and a confidence for every group of numbers', () => {
    for (const species of Object.values(SPECIES)) {
      for (const note of Object.values(species.source)) {
        expect(note.ref).toMatch(/WH2010 Table \d+-\d+/);
        expect(['confirmed', 'secondary', 'unconfirmed']).toContain(note.confidence);
      }
    }
  });

  it('marks every modulus of elasticity as from memory, since none is confirmed yet', () => {
    for (const species of Object.values(SPECIES)) {
      expect(species.source.modulusOfElasticity.confidence).toBe('unconfirmed');
      expect(species.source.modulusOfElasticity.note).toMatch(/from memory/);
    }
  });

  // WH2010 Table 13-5 (FPL-GTR-190), C_R and C_T per 1 % MC — confirmed.
  it.each([
    ['white-ash', 0.00169, 0.00274],
    ['yellow-birch', 0.00256, 0.00338],
    ['black-cherry', 0.00126, 0.00248],
    ['soft-maple', 0.00137, 0.00289],
    ['hard-maple', 0.00165, 0.00353],
    ['northern-red-oak', 0.00158, 0.00369],
    ['white-oak', 0.0018, 0.00365],
    ['black-walnut', 0.0019, 0.00274],
    ['american-beech', 0.0019, 0.00431],
    ['basswood', 0.0023, 0.0033],
  ])('carries the WH2010 Table 13-5 coefficients for %s', (id, radial, tangential) => {
    const species = getSpecies(id);
    expect(Math.abs(species.coefficientRadial - radial)).toBeLessThan(COEFFICIENT_TOLERANCE);
    expect(Math.abs(species.coefficientTangential - tangential)).toBeLessThan(COEFFICIENT_TOLERANCE);
    expect(species.source.coefficients.confidence).toBe('confirmed');
  });

  // WH2010 Table 5-3 (FPL-GTR-190), specific gravity at 12 % — secondary.
  it.each([
    ['black-cherry', 0.5],
    ['soft-maple', 0.54],
    ['hard-maple', 0.63],
    ['white-ash', 0.6],
    ['yellow-birch', 0.62],
    ['northern-red-oak', 0.63],
    ['white-oak', 0.68],
    ['american-beech', 0.64],
  ])('carries the WH2010 Table 5-3 specific gravity for %s', (id, gravity) => {
    expect(getSpecies(id).specificGravity12).toBe(gravity);
    expect(getSpecies(id).source.specificGravity.confidence).toBe('secondary');
  });

  it('derives density at 12 % from specific gravity (WH2010 Chapter 4)', () => {
    // 1000 kg/m³ × 0.68 × 1.12 = 761.6 kg/m³, rounded.
    expect(SPECIES['white-oak'].densityKgM3At12).toBe(762);
  });

  it('gives every species a wood tone as a hex colour', () => {
    for (const species of Object.values(SPECIES)) expect(species.toneHex).toMatch(/^#[0-9a-f]{6}$/);
  });
});

describe('getSpecies', () => {
  it('rejects an unknown id, listing the valid ones', () => {
    let caught: unknown;
    try {
      getSpecies('teak');
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught)).toBe(true);
    if (isInputError(caught)) {
      expect(caught.field).toBe('species');
      expect(caught.message).toContain('white-oak');
    }
  });

  it('does not treat inherited object keys as species', () => {
    expect(() => getSpecies('toString')).toThrow(/unknown species/);
  });
});
