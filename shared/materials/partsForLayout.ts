/**
 * The engine's parts as the layouts want them. Solid parts go to boards at their rough size;
 * a part glued up from boards becomes its boards, kept together as one grain-match group; a
 * solid part wider than the widest board is treated as a glue-up of enough boards; instances in a
 * grain-matched run (a column of drawer fronts) keep their run and order. Sheet parts
 * go to sheets at their finished size, turned only where their face grain allows.
 */
import { assert } from '../assert.ts';
import type { GrainMatch, Part } from '../engine/types.ts';
import type { BoardPartInput } from '../layout/boardTypes.ts';
import type { FaceGrain, SheetPartInput } from '../layout/sheetTypes.ts';
import { SHEET_GOODS, isSheetGoodId } from '../wood/sheetGoods.ts';

/** The board inputs for one solid part; `widestBoardMm` is the widest board on offer. */
export function boardPartsFor(part: Part, widestBoardMm: number): BoardPartInput[] {
  const boards = part.glueUp?.boards ?? (part.rough.widthMm > widestBoardMm ? Math.ceil(part.rough.widthMm / widestBoardMm) : 1);
  if (part.grainMatch) return runPartsFor(part, part.grainMatch, boards);
  if (boards <= 1) {
    return [{ id: part.id, name: part.name, quantity: part.quantity, lengthMm: part.lengthMm, widthMm: part.widthMm, thicknessMm: part.thicknessMm, roughLengthMm: part.rough.lengthMm, roughWidthMm: part.rough.widthMm }];
  }
  // One group per glued-up instance: the boards of one lid match each other.
  return Array.from({ length: part.quantity }, (_, instance) => ({
    id: part.quantity === 1 ? `${part.id}-board` : `${part.id}-${instance + 1}-board`,
    name: part.quantity === 1 ? `${part.name} board` : `${part.name} ${instance + 1} board`,
    quantity: boards,
    lengthMm: part.lengthMm,
    widthMm: part.widthMm / boards,
    thicknessMm: part.thicknessMm,
    roughLengthMm: part.rough.lengthMm,
    roughWidthMm: part.rough.widthMm / boards,
    matchGroup: `${part.id}#${instance + 1}`,
  }));
}

/**
 * The sheet input for one sheet part. The engine's `grain` on a sheet part says which way its
 * face veneer runs; MDF has no face grain, so its parts may turn either way.
 */
export function sheetPartFor(part: Part): SheetPartInput {
  const sheetId = part.material.kind === 'sheet' ? part.material.sheetId : '';
  const isMdf = isSheetGoodId(sheetId) && SHEET_GOODS[sheetId].kind === 'mdf';
  const grain: FaceGrain = isMdf ? 'none' : part.grain;
  return { id: part.id, name: part.name, lengthMm: part.lengthMm, widthMm: part.widthMm, quantity: part.quantity, grain };
}

// One input per instance, at its place in its run; the boards of a glued-up instance follow one
// another at that place, so the run still comes end to end from one board.
function runPartsFor(part: Part, runs: readonly GrainMatch[], boards: number): BoardPartInput[] {
  assert(runs.length === part.quantity, `part ${part.id}: ${runs.length} grain-match entries for ${part.quantity} instances`);
  const sizes = { lengthMm: part.lengthMm, thicknessMm: part.thicknessMm, roughLengthMm: part.rough.lengthMm };
  return runs.map((run, instance) => {
    const grainMatch = { group: run.group, order: run.order, ...(run.note === undefined ? {} : { note: run.note }) };
    if (boards <= 1) {
      return { id: part.id, name: part.name, quantity: 1, firstInstance: instance, ...sizes, widthMm: part.widthMm, roughWidthMm: part.rough.widthMm, grainMatch };
    }
    return {
      id: part.quantity === 1 ? `${part.id}-board` : `${part.id}-${instance + 1}-board`,
      name: part.quantity === 1 ? `${part.name} board` : `${part.name} ${instance + 1} board`,
      quantity: boards, ...sizes, widthMm: part.widthMm / boards, roughWidthMm: part.rough.widthMm / boards, grainMatch,
    };
  });
}
