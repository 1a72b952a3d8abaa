/**
 * Sheet goods: plywood (hardwood and softwood faces) and MDF at the thickness they actually
 * measure, which for plywood is under the size it is sold as. Their width hardly changes with
 * moisture (plywood's cross-laminated veneers restrain each other; MDF's fibres lie in every
 * direction), so Casewright's stated model is `movement: 'negligible'`: such panels get a small
 * fit clearance, never a seasonal float.
 */
import { InputError } from '../errors.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { SourceNote } from './source.ts';

/** The ids of the sheet goods in {@link SHEET_GOODS}: kind and trade (nominal) thickness. */
export type SheetGoodId =
  | 'hardwood-plywood-1/4'
  | 'hardwood-plywood-1/2'
  | 'hardwood-plywood-3/4'
  | 'softwood-plywood-1/2'
  | 'softwood-plywood-3/4'
  | 'mdf-1/4'
  | 'mdf-1/2'
  | 'mdf-3/4';

/** A sheet material at one thickness. */
export interface SheetGood {
  id: SheetGoodId;
  /** Display name, e.g. `Hardwood plywood, 3/4 (23/32 in actual)`. */
  name: string;
  kind: 'plywood' | 'mdf';
  /** Face veneer of plywood; null for MDF. */
  face: 'hardwood' | 'softwood' | null;
  /** The size it is sold as, e.g. `3/4`. */
  nominal: string;
  /** Thickness it actually measures, in mm. */
  thicknessMm: number;
  /** Thickness it actually measures, in inches. */
  thicknessIn: number;
  /** The movement model: width change with moisture is treated as negligible, not computed. */
  movement: 'negligible';
  /** Why the movement is negligible and what the engine does about it. */
  movementNote: string;
  /** Specific gravity (approximate; varies by maker and core). */
  specificGravity: number;
  /** Density in kg/m³ (approximate). */
  densityKgM3: number;
  /** Display colour for the 3D view: Casewright's own choice. */
  toneHex: string;
  source: { thickness: SourceNote; density: SourceNote };
}

const PLYWOOD_MOVEMENT =
  'Cross-laminated veneers hold the width nearly constant as moisture changes; treated as negligible (not zero): the panel gets a small fit clearance, not a seasonal float.';
const MDF_MOVEMENT =
  'Fibres lie in every direction, so the width changes little with moisture; treated as negligible (not zero): the panel gets a small fit clearance, not a seasonal float. Keep MDF dry: its thickness swells when wet.';

const PS1_THICKNESS: SourceNote = {
  ref: 'NIST PS 1 (structural plywood) performance categories',
  confidence: 'secondary',
  note: 'sold as 1/2 and 3/4, commonly 15/32 and 23/32 in actual',
};
const HARDWOOD_THICKNESS: SourceNote = {
  ref: 'common practice, no published source',
  confidence: 'unconfirmed',
  note: 'hardwood plywood is commonly about 1/32 in under its trade size; measure the sheet you buy',
};
const MDF_THICKNESS: SourceNote = {
  ref: 'common practice, no published source',
  confidence: 'unconfirmed',
  note: 'MDF is commonly sold at its full trade thickness; measure the sheet you buy',
};
const DENSITY_FROM_MEMORY: SourceNote = { ref: 'manufacturers’ typical values', confidence: 'unconfirmed', note: 'from memory, approximate' };

function sheet(
  id: SheetGoodId,
  kind: SheetGood['kind'],
  face: SheetGood['face'],
  nominal: string,
  thicknessIn: number,
  specificGravity: number,
  toneHex: string,
  thickness: SourceNote,
): SheetGood {
  const kindName = kind === 'mdf' ? 'MDF' : `${face === 'hardwood' ? 'Hardwood' : 'Softwood'} plywood`;
  const actual = thicknessIn * 32;
  const actualText = Number.isInteger(actual) && kind === 'plywood' ? ` (${actual}/32 in actual)` : '';
  return Object.freeze({
    id,
    name: `${kindName}, ${nominal}${actualText}`,
    kind,
    face,
    nominal,
    thicknessMm: Number((thicknessIn * MM_PER_INCH).toPrecision(12)),
    thicknessIn,
    movement: 'negligible',
    movementNote: kind === 'mdf' ? MDF_MOVEMENT : PLYWOOD_MOVEMENT,
    specificGravity,
    densityKgM3: Math.round(specificGravity * 1000),
    toneHex,
    source: { thickness, density: DENSITY_FROM_MEMORY },
  });
}

const ROWS: SheetGood[] = [
  sheet('hardwood-plywood-1/4', 'plywood', 'hardwood', '1/4', 7 / 32, 0.68, '#d9c19b', HARDWOOD_THICKNESS),
  sheet('hardwood-plywood-1/2', 'plywood', 'hardwood', '1/2', 15 / 32, 0.68, '#d9c19b', PS1_THICKNESS),
  sheet('hardwood-plywood-3/4', 'plywood', 'hardwood', '3/4', 23 / 32, 0.68, '#d9c19b', PS1_THICKNESS),
  sheet('softwood-plywood-1/2', 'plywood', 'softwood', '1/2', 15 / 32, 0.5, '#dbb77f', PS1_THICKNESS),
  sheet('softwood-plywood-3/4', 'plywood', 'softwood', '3/4', 23 / 32, 0.5, '#dbb77f', PS1_THICKNESS),
  sheet('mdf-1/4', 'mdf', null, '1/4', 1 / 4, 0.75, '#a88a68', MDF_THICKNESS),
  sheet('mdf-1/2', 'mdf', null, '1/2', 1 / 2, 0.75, '#a88a68', MDF_THICKNESS),
  sheet('mdf-3/4', 'mdf', null, '3/4', 3 / 4, 0.75, '#a88a68', MDF_THICKNESS),
];

/** Every sheet good by id. */
export const SHEET_GOODS: Readonly<Record<SheetGoodId, SheetGood>> = Object.freeze(
  Object.fromEntries(ROWS.map((row) => [row.id, row])) as Record<SheetGoodId, SheetGood>,
);

/** The sheet-good ids, in display order. */
export const SHEET_GOOD_IDS: readonly SheetGoodId[] = ROWS.map((row) => row.id);

/** True when `id` names a sheet good in {@link SHEET_GOODS}. */
export function isSheetGoodId(id: string): id is SheetGoodId {
  return Object.hasOwn(SHEET_GOODS, id);
}

/** Looks up a sheet good; an unknown id is an {@link InputError} that lists the valid ids. */
export function getSheetGood(id: string, field = 'sheetGood'): SheetGood {
  if (!isSheetGoodId(id)) {
    throw new InputError(field, `unknown sheet good "${id}"; choose one of: ${SHEET_GOOD_IDS.join(', ')}`, SHEET_GOOD_IDS.join(', '));
  }
  return SHEET_GOODS[id];
}
