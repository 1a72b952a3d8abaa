/**
 * The glue-up sequence in stages: what to glue first, what can be glued at the same time, and
 * which parts go in dry because they must float. A frame-and-panel case is glued as two end
 * assemblies first (legs, side rails and stiles around floating side panels), then joined by the
 * front and back; the bottom and lid come last.
 */
import type { GlueUpStage, Part, PieceKind } from '../types.ts';
import { caseGlueUpStages } from './caseGlueUp.ts';

const isSide = (p: Part): boolean => p.id.startsWith('side-') || p.id.startsWith('left-') || p.id.startsWith('right-');
const isFrontBack = (p: Part): boolean => /^(front|back)(-back)?-/.test(p.id) && (p.role === 'rail' || p.role === 'stile' || p.role === 'panel');

/** Glue-up stages for a built piece of `kind`. */
export function glueUpStages(kind: PieceKind, parts: readonly Part[]): GlueUpStage[] {
  if (kind !== 'chest') return caseGlueUpStages(parts);
  // One pass sorting part ids into the stages' lists, each in part order: this runs on every
  // rebuild, and a filter per list read every part a dozen times.
  const glued: Part[] = [];
  const sideFrame: string[] = [];
  const sidePanels: string[] = [];
  const frontBackFrame: string[] = [];
  const frontBackPanels: string[] = [];
  const legs: string[] = [];
  const cleats: string[] = [];
  const bottoms: string[] = [];
  const lidAndBattens: string[] = [];
  const lidAndBackRails: string[] = [];
  const lids: string[] = [];
  for (const p of parts) {
    if (p.glueUp) glued.push(p);
    const side = isSide(p);
    const frontBack = isFrontBack(p);
    const frame = p.role === 'rail' || p.role === 'stile';
    if (side && frame) sideFrame.push(p.id);
    if (side && p.role === 'panel') sidePanels.push(p.id);
    if (frontBack && p.role !== 'panel') frontBackFrame.push(p.id);
    if (frontBack && p.role === 'panel') frontBackPanels.push(p.id);
    if (p.role === 'leg') legs.push(p.id);
    if (p.role === 'cleat') cleats.push(p.id);
    if (p.role === 'bottom') bottoms.push(p.id);
    if (p.role === 'batten' || p.role === 'lid') lidAndBattens.push(p.id);
    if (p.role === 'lid' || (p.id.startsWith('back-') && p.role === 'rail')) lidAndBackRails.push(p.id);
    if (p.role === 'lid') lids.push(p.id);
  }
  return [
    {
      stage: 1, title: 'Panels from boards, and the two end assemblies',
      steps: [
        ...glued.map((p) => ({ title: `Edge-glue the ${p.name.toLowerCase()} from ${p.glueUp!.boards} boards`, partIds: [p.id], notes: ['Alternate clamps above and below; flatten after the glue cures.'] })),
        { title: 'Glue each end: two legs, the side rails and stiles, with the side panels in dry', partIds: [...legs, ...sideFrame, ...sidePanels], notes: ['Glue only the tongues of the rails and stiles; keep glue out of the panel grooves.', 'Check each end for square across its diagonals.'] },
      ],
      floatingPartIds: sidePanels,
    },
    {
      stage: 2, title: 'Join the ends with the front and back',
      steps: [{ title: 'Glue the front and back rails and stiles into the ends, with the front and back panels in dry', partIds: [...frontBackFrame, ...frontBackPanels, ...legs], notes: ['Dry-fit first; check the case for square and flat on a flat surface.'] }],
      floatingPartIds: frontBackPanels,
    },
    {
      stage: 3, title: 'Cleats and bottom',
      steps: [
        { title: 'Glue and screw the cleats inside the bottom rails', partIds: cleats, notes: ['Cleat tops level with each other so the bottom sits flat.'] },
        { title: 'Drop the bottom in onto the cleats', partIds: bottoms, notes: ['No glue: screw it to the cleats if it must not lift.'] },
      ],
      floatingPartIds: bottoms.slice(),
    },
    {
      stage: 4, title: 'Lid battens and hinges',
      steps: [
        { title: 'Screw the battens to the lid through their slots', partIds: lidAndBattens, notes: ['Screws at the centre of each slot; glue, if any, only at the back screw.'] },
        { title: 'Hang the lid on its hinges', partIds: lidAndBackRails, notes: ['Fit the lid support and check that it holds the lid open in any position.'] },
      ],
      floatingPartIds: lids,
    },
  ];
}
