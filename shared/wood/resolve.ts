/**
 * Accepts a material as an id or an object, so callers in the engine, the editor and the
 * command line can pass whichever they hold.
 */
import { InputError } from '../errors.ts';
import { getSheetGood, isSheetGoodId, SHEET_GOOD_IDS, type SheetGood, type SheetGoodId } from './sheetGoods.ts';
import { getSpecies, isSpeciesId, SPECIES_IDS, type Species, type SpeciesId } from './species.ts';

/** A species given by id or as the object. */
export type SpeciesInput = SpeciesId | Species;

/** A panel material: a species, a sheet good (id or object), or `'plywood'` for any plywood. */
export type MaterialInput = SpeciesId | Species | SheetGoodId | SheetGood | 'plywood' | 'mdf';

/** A material after lookup: solid wood, or a sheet good whose movement is negligible. */
export type ResolvedMaterial = { kind: 'solid'; species: Species } | { kind: 'sheet'; sheetGood: SheetGood | null; name: string };

/** Returns the {@link Species} for an id or object; an unknown id is an InputError on `field`. */
export function resolveSpecies(species: SpeciesInput | string, field = 'species'): Species {
  if (typeof species === 'string') return getSpecies(species, field);
  if (species && typeof species === 'object' && isSpeciesId(species.id)) return species;
  throw new InputError(field, 'must be a species id', SPECIES_IDS.join(', '));
}

/** Resolves a panel material to solid wood or a sheet good; unknown names list the valid ones. */
export function resolveMaterial(material: MaterialInput | string, field = 'material'): ResolvedMaterial {
  if (material === 'plywood') return { kind: 'sheet', sheetGood: null, name: 'Plywood' };
  if (material === 'mdf') return { kind: 'sheet', sheetGood: null, name: 'MDF' };
  if (typeof material === 'string') {
    if (isSpeciesId(material)) return { kind: 'solid', species: getSpecies(material, field) };
    if (isSheetGoodId(material)) {
      const sheetGood = getSheetGood(material, field);
      return { kind: 'sheet', sheetGood, name: sheetGood.name };
    }
    const valid = [...SPECIES_IDS, ...SHEET_GOOD_IDS, 'plywood', 'mdf'].join(', ');
    throw new InputError(field, `unknown material "${material}"; choose a species or sheet good: ${valid}`, valid);
  }
  if (material && typeof material === 'object' && 'movement' in material) return { kind: 'sheet', sheetGood: material, name: material.name };
  return { kind: 'solid', species: resolveSpecies(material, field) };
}
