/** The choices a select shows for a parameter: its own options, or the wood library's names. */
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import { SHEET_GOODS, isSheetGoodId } from '../../shared/wood/sheetGoods.ts';
import { SPECIES, SPECIES_IDS } from '../../shared/wood/species.ts';

/** One choice: the stored value and the words shown. */
export interface Choice {
  value: string;
  label: string;
}

/** Choices for an `enum`, `species` or `sheet` parameter; empty for other kinds. */
export function choicesFor(def: ParamDef): readonly Choice[] {
  switch (def.kind) {
    case 'species':
      return def.options ?? SPECIES_IDS.map((id) => ({ value: id, label: SPECIES[id].name }));
    case 'sheet':
      // The engine lists sheet ids; the library has the names a maker reads.
      return (def.options ?? []).map((option) => ({
        value: option.value,
        label: isSheetGoodId(option.value) && option.label === option.value ? SHEET_GOODS[option.value].name : option.label,
      }));
    case 'enum':
      return def.options ?? [];
    default:
      return [];
  }
}
