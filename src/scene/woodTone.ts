/** The display tone of what a part is cut from, from the wood library. */
import type { Material } from '../../shared/engine/types.ts';
import { getSheetGood } from '../../shared/wood/sheetGoods.ts';
import { getSpecies } from '../../shared/wood/species.ts';

/** `#rrggbb` of the part's species or sheet good (Casewright's own display colours). */
export function materialToneHex(material: Material): string {
  return material.kind === 'solid' ? getSpecies(material.speciesId, 'material.speciesId').toneHex : getSheetGood(material.sheetId, 'material.sheetId').toneHex;
}
