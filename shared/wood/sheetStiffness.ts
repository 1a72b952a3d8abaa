/**
 * Bending stiffness (modulus of elasticity) of sheet goods, for shelf sag. Plywood's stiffness
 * along its face grain is lower than the face species' because the cross plies carry little of
 * the bending; MDF's is lower still. These are typical values from memory, approximate: sheet
 * makers publish their own, and they vary with the core and the number of plies.
 */
import type { SourceNote } from './source.ts';
import type { SheetGoodId } from './sheetGoods.ts';

/** A sheet good's modulus of elasticity in bending along its length (MPa) and its source. */
export interface SheetStiffness {
  modulusOfElasticityMPa: number;
  source: SourceNote;
}

const TYPICAL: SourceNote = {
  ref: 'typical published values for the panel type',
  confidence: 'unconfirmed',
  note: 'from memory, approximate; use the sheet maker\'s figure when you have it',
};

const PLYWOOD_HARDWOOD_MPA = 7_600;
const PLYWOOD_SOFTWOOD_MPA = 7_000;
const MDF_MPA = 3_500;

const TABLE: Readonly<Record<SheetGoodId, number>> = {
  'hardwood-plywood-1/4': PLYWOOD_HARDWOOD_MPA,
  'hardwood-plywood-1/2': PLYWOOD_HARDWOOD_MPA,
  'hardwood-plywood-3/4': PLYWOOD_HARDWOOD_MPA,
  'softwood-plywood-1/2': PLYWOOD_SOFTWOOD_MPA,
  'softwood-plywood-3/4': PLYWOOD_SOFTWOOD_MPA,
  'mdf-1/4': MDF_MPA,
  'mdf-1/2': MDF_MPA,
  'mdf-3/4': MDF_MPA,
};

/** The bending modulus of sheet good `id` along its face grain (MPa), with its source. */
export function sheetStiffness(id: SheetGoodId): SheetStiffness {
  return { modulusOfElasticityMPa: TABLE[id], source: TYPICAL };
}
