/** All derived outputs of a built piece, computed from its parts and joints. */
import type { DerivedOutputs, Joint, Part, PieceKind } from '../types.ts';
import { boardFeetBySpecies } from './boardFeet.ts';
import { cutList } from './cutList.ts';
import { glueUpStages } from './glueUp.ts';
import { joinerySchedule } from './joinery.ts';
import { sheetArea } from './sheetArea.ts';

/** Cut list, joinery schedule, board feet, sheet area and glue-up stages. */
export function deriveOutputs(kind: PieceKind, parts: readonly Part[], joints: readonly Joint[]): DerivedOutputs {
  return {
    cutList: cutList(parts),
    joinery: joinerySchedule(parts, joints),
    boardFeet: boardFeetBySpecies(parts),
    sheetArea: sheetArea(parts),
    glueUp: glueUpStages(kind, parts),
  };
}
