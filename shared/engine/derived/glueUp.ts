/**
 * The glue-up sequence in stages: what to glue first, what can be glued at the same time, and
 * which parts go in dry because they must float. A frame-and-panel case is glued as two end
 * assemblies first (legs, side rails and stiles around floating side panels), then joined by the
 * front and back; the bottom and lid come last.
 */
import type { GlueUpStage, Part, PieceKind } from '../types.ts';
import { caseGlueUpStages } from './caseGlueUp.ts';

const ids = (parts: readonly Part[], test: (p: Part) => boolean): string[] => parts.filter(test).map((p) => p.id);
const isSide = (p: Part): boolean => p.id.startsWith('side-') || p.id.startsWith('left-') || p.id.startsWith('right-');
const isFrontBack = (p: Part): boolean => /^(front|back)(-back)?-/.test(p.id) && (p.role === 'rail' || p.role === 'stile' || p.role === 'panel');

/** Glue-up stages for a built piece of `kind`. */
export function glueUpStages(kind: PieceKind, parts: readonly Part[]): GlueUpStage[] {
  if (kind !== 'chest') return caseGlueUpStages(parts);
  const glued = parts.filter((p) => p.glueUp);
  const sideFrame = ids(parts, (p) => isSide(p) && (p.role === 'rail' || p.role === 'stile'));
  const sidePanels = ids(parts, (p) => isSide(p) && p.role === 'panel');
  const frontBackFrame = ids(parts, (p) => isFrontBack(p) && p.role !== 'panel');
  const frontBackPanels = ids(parts, (p) => isFrontBack(p) && p.role === 'panel');
  const legs = ids(parts, (p) => p.role === 'leg');
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
        { title: 'Glue and screw the cleats inside the bottom rails', partIds: ids(parts, (p) => p.role === 'cleat'), notes: ['Cleat tops level with each other so the bottom sits flat.'] },
        { title: 'Drop the bottom in onto the cleats', partIds: ids(parts, (p) => p.role === 'bottom'), notes: ['No glue: screw it to the cleats if it must not lift.'] },
      ],
      floatingPartIds: ids(parts, (p) => p.role === 'bottom'),
    },
    {
      stage: 4, title: 'Lid battens and hinges',
      steps: [
        { title: 'Screw the battens to the lid through their slots', partIds: ids(parts, (p) => p.role === 'batten' || p.role === 'lid'), notes: ['Screws at the centre of each slot; glue, if any, only at the back screw.'] },
        { title: 'Hang the lid on its hinges', partIds: ids(parts, (p) => p.role === 'lid' || p.id.startsWith('back-') && p.role === 'rail'), notes: ['Fit the lid support and check that it holds the lid open in any position.'] },
      ],
      floatingPartIds: ids(parts, (p) => p.role === 'lid'),
    },
  ];
}
