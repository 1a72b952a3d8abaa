/**
 * The solid woods Casewright knows, with their published properties and where each came from.
 * Dimensional-change coefficients are per 1 % moisture content (WH2010 Table 13-5); total
 * shrinkage green to oven-dry (WH2010 Table 4-3) serves the movement equation outside its
 * 6–14 % range; specific gravity is at 12 % moisture content (WH2010 Table 5-3). Where a value
 * is from memory its source says "unconfirmed" and the editor shows it as approximate.
 */
import { InputError } from '../errors.ts';
import { densityKgM3 } from './density.ts';
import type { SourceNote } from './source.ts';

/** The ids of the species in {@link SPECIES}. */
export type SpeciesId =
  | 'yellow-poplar'
  | 'hard-maple'
  | 'soft-maple'
  | 'black-cherry'
  | 'black-walnut'
  | 'northern-red-oak'
  | 'white-oak'
  | 'white-ash'
  | 'yellow-birch'
  | 'eastern-white-pine'
  | 'american-beech'
  | 'basswood';

/** Total shrinkage from green to oven-dry, in percent of the green dimension. */
export interface TotalShrinkage {
  radialPercent: number;
  tangentialPercent: number;
  volumetricPercent: number;
}

/** A solid wood and its properties. */
export interface Species {
  id: SpeciesId;
  /** Display name, e.g. `Black cherry`. */
  name: string;
  /** Change in width per 1 % moisture content, flat-sawn (tangential); WH2010 Eq. 13-2. */
  coefficientTangential: number;
  /** Change in width per 1 % moisture content, quarter-sawn (radial); WH2010 Eq. 13-2. */
  coefficientRadial: number;
  /** Green to oven-dry shrinkage (%), used by the total-shrinkage form outside 6–14 % MC. */
  totalShrinkage: TotalShrinkage;
  /** Specific gravity on oven-dry weight and volume at 12 % moisture content. */
  specificGravity12: number;
  /** Density at 12 % moisture content (kg/m³), derived: 1000 · G₁₂ · 1.12. */
  densityKgM3At12: number;
  /** Modulus of elasticity in bending at 12 % MC (MPa), or null where no value is held. */
  modulusOfElasticityMPa: number | null;
  /** Display colour for the 3D view and drawings: Casewright's own choice, not a measured value. */
  toneHex: string;
  /** Where each group of numbers came from. */
  source: {
    coefficients: SourceNote;
    totalShrinkage: SourceNote;
    specificGravity: SourceNote;
    modulusOfElasticity: SourceNote;
  };
}

const T13_5 = 'WH2010 Table 13-5 (FPL-GTR-190)';
const T4_3 = 'WH2010 Table 4-3 (FPL-GTR-190)';
const T5_3 = 'WH2010 Table 5-3 (FPL-GTR-190)';
const MOE_FROM_MEMORY: SourceNote = {
  ref: T5_3,
  confidence: 'unconfirmed',
  note: 'from memory, approximate; confirm against WH2010 Table 5-3 before relying on it',
};

const confirmed = (ref: string, note?: string): SourceNote => (note ? { ref, confidence: 'confirmed', note } : { ref, confidence: 'confirmed' });
const secondary = (ref: string): SourceNote => ({ ref, confidence: 'secondary', note: 'from a reprint of the table' });
const fromMemory = (ref: string): SourceNote => ({ ref, confidence: 'unconfirmed', note: 'from memory, approximate' });

type SpeciesRow = Omit<Species, 'densityKgM3At12'>;

const ROWS: SpeciesRow[] = [
  {
    id: 'yellow-poplar', name: 'Yellow-poplar',
    coefficientRadial: 0.00158, coefficientTangential: 0.00289,
    totalShrinkage: { radialPercent: 4.6, tangentialPercent: 8.2, volumetricPercent: 12.7 },
    specificGravity12: 0.42, modulusOfElasticityMPa: 10_900, toneHex: '#cdbf8a',
    source: { coefficients: fromMemory(T13_5), totalShrinkage: confirmed(T4_3), specificGravity: fromMemory(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'hard-maple', name: 'Hard maple (sugar maple)',
    coefficientRadial: 0.00165, coefficientTangential: 0.00353,
    totalShrinkage: { radialPercent: 4.8, tangentialPercent: 9.9, volumetricPercent: 14.7 },
    specificGravity12: 0.63, modulusOfElasticityMPa: 12_600, toneHex: '#e8d6ae',
    source: { coefficients: confirmed(T13_5, 'sugar maple row'), totalShrinkage: fromMemory(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'soft-maple', name: 'Soft maple (red maple)',
    coefficientRadial: 0.00137, coefficientTangential: 0.00289,
    totalShrinkage: { radialPercent: 4.0, tangentialPercent: 8.2, volumetricPercent: 12.6 },
    specificGravity12: 0.54, modulusOfElasticityMPa: 11_300, toneHex: '#dcc49c',
    source: { coefficients: confirmed(T13_5, 'red maple row stands for soft maple'), totalShrinkage: fromMemory(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'black-cherry', name: 'Black cherry',
    coefficientRadial: 0.00126, coefficientTangential: 0.00248,
    totalShrinkage: { radialPercent: 3.7, tangentialPercent: 7.1, volumetricPercent: 11.5 },
    specificGravity12: 0.50, modulusOfElasticityMPa: 10_300, toneHex: '#b8693f',
    source: { coefficients: confirmed(T13_5), totalShrinkage: confirmed(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'black-walnut', name: 'Black walnut',
    coefficientRadial: 0.00190, coefficientTangential: 0.00274,
    totalShrinkage: { radialPercent: 5.5, tangentialPercent: 7.8, volumetricPercent: 12.8 },
    specificGravity12: 0.55, modulusOfElasticityMPa: 11_600, toneHex: '#5e3d26',
    source: { coefficients: confirmed(T13_5), totalShrinkage: confirmed(T4_3), specificGravity: fromMemory(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'northern-red-oak', name: 'Northern red oak',
    coefficientRadial: 0.00158, coefficientTangential: 0.00369,
    totalShrinkage: { radialPercent: 4.0, tangentialPercent: 8.6, volumetricPercent: 13.7 },
    specificGravity12: 0.63, modulusOfElasticityMPa: 12_500, toneHex: '#c88f66',
    source: { coefficients: confirmed(T13_5, 'commercial red oak row'), totalShrinkage: fromMemory(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'white-oak', name: 'White oak',
    coefficientRadial: 0.00180, coefficientTangential: 0.00365,
    totalShrinkage: { radialPercent: 5.6, tangentialPercent: 10.5, volumetricPercent: 16.3 },
    specificGravity12: 0.68, modulusOfElasticityMPa: 12_300, toneHex: '#c6a574',
    source: { coefficients: confirmed(T13_5, 'commercial white oak row'), totalShrinkage: confirmed(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'white-ash', name: 'White ash',
    coefficientRadial: 0.00169, coefficientTangential: 0.00274,
    totalShrinkage: { radialPercent: 4.9, tangentialPercent: 7.8, volumetricPercent: 13.3 },
    specificGravity12: 0.60, modulusOfElasticityMPa: 12_000, toneHex: '#dcc8a0',
    source: { coefficients: confirmed(T13_5), totalShrinkage: confirmed(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'yellow-birch', name: 'Yellow birch',
    coefficientRadial: 0.00256, coefficientTangential: 0.00338,
    totalShrinkage: { radialPercent: 7.3, tangentialPercent: 9.5, volumetricPercent: 16.8 },
    specificGravity12: 0.62, modulusOfElasticityMPa: 13_900, toneHex: '#dbb98c',
    source: { coefficients: confirmed(T13_5), totalShrinkage: confirmed(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'eastern-white-pine', name: 'Eastern white pine',
    coefficientRadial: 0.00071, coefficientTangential: 0.00212,
    totalShrinkage: { radialPercent: 2.1, tangentialPercent: 6.1, volumetricPercent: 8.2 },
    specificGravity12: 0.35, modulusOfElasticityMPa: 8_500, toneHex: '#e9d09c',
    source: { coefficients: fromMemory(T13_5), totalShrinkage: fromMemory(T4_3), specificGravity: fromMemory(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'american-beech', name: 'American beech',
    coefficientRadial: 0.00190, coefficientTangential: 0.00431,
    totalShrinkage: { radialPercent: 5.5, tangentialPercent: 11.9, volumetricPercent: 17.2 },
    specificGravity12: 0.64, modulusOfElasticityMPa: 11_900, toneHex: '#d9ad80',
    source: { coefficients: confirmed(T13_5), totalShrinkage: fromMemory(T4_3), specificGravity: secondary(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
  {
    id: 'basswood', name: 'Basswood',
    coefficientRadial: 0.00230, coefficientTangential: 0.00330,
    totalShrinkage: { radialPercent: 6.6, tangentialPercent: 9.3, volumetricPercent: 15.8 },
    specificGravity12: 0.37, modulusOfElasticityMPa: 10_100, toneHex: '#ecdfbd',
    source: { coefficients: confirmed(T13_5), totalShrinkage: fromMemory(T4_3), specificGravity: fromMemory(T5_3), modulusOfElasticity: MOE_FROM_MEMORY },
  },
];

/** Every species by id, with density at 12 % derived from its specific gravity. */
export const SPECIES: Readonly<Record<SpeciesId, Species>> = Object.freeze(
  Object.fromEntries(
    ROWS.map((row) => [row.id, Object.freeze({ ...row, densityKgM3At12: Math.round(densityKgM3(row.specificGravity12, 12)) })]),
  ) as Record<SpeciesId, Species>,
);

/** The species ids, in the library's display order. */
export const SPECIES_IDS: readonly SpeciesId[] = ROWS.map((row) => row.id);

/** True when `id` names a species in {@link SPECIES}. */
export function isSpeciesId(id: string): id is SpeciesId {
  return Object.hasOwn(SPECIES, id);
}

/** Looks up a species; an unknown id is an {@link InputError} that lists the valid ids. */
export function getSpecies(id: string, field = 'species'): Species {
  if (!isSpeciesId(id)) {
    throw new InputError(field, `unknown species "${id}"; choose one of: ${SPECIES_IDS.join(', ')}`, SPECIES_IDS.join(', '));
  }
  return SPECIES[id];
}
