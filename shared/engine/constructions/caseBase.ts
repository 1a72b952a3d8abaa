/**
 * What a case stands on: a plinth (a box of four boards under the carcass), a toe kick (the
 * same box set back at the front so feet fit under a work surface), four square legs, or
 * nothing (a wall cabinet hangs).
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { Box3, Material } from '../types.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** The kinds of base. */
export type BaseType = 'plinth' | 'toe-kick' | 'legs' | 'none';

/** Options for {@link caseBase}; world coordinates, mm. */
export interface CaseBaseOptions {
  type: BaseType;
  /** The footprint under the carcass and the base's height: X, Y, and Z from 0. */
  box: Box3;
  /** How far the front board stands back from the carcass front (toe kick). */
  setbackMm: number;
  material: Material;
  thicknessMm: number;
  legSizeMm: number;
  explodeMm: number;
}

/** The base's parts and joints. */
export interface CaseBase {
  drafts: PartDraft[];
  joints: JointDraft[];
}

/** Builds the base. */
export function caseBase(o: CaseBaseOptions): CaseBase {
  const [x0, y0, z0] = o.box.min;
  const [x1, y1, z1] = o.box.max;
  const grain = o.material.kind === 'solid' ? 'length' : 'none';
  const down: [number, number, number] = [0, 0, -o.explodeMm];
  if (o.type === 'none') return { drafts: [], joints: [] };
  if (o.type === 'legs') {
    const L = o.legSizeMm;
    const corners = [['front-left', x0, y0], ['front-right', x1 - L, y0], ['back-left', x0, y1 - L], ['back-right', x1 - L, y1 - L]] as const;
    const drafts = corners.map(([corner, x, y]) => plainPart({
      group: 'base/leg', member: corner, label: `${corner} foot`, role: 'base', material: o.material, grain,
      world: boxBetween([x, y, z0], [x + L, y + L, z1]), axes: { length: '+Z', width: '+X', thickness: '+Y' },
      explodeMm: down, name: fixedName('foot', 'Foot'), notes: ['Glue and screw to the carcass bottom through a corner block.'],
    }));
    return { drafts, joints: [] };
  }
  const t = o.thicknessMm;
  const fy = y0 + o.setbackMm;
  const board = (which: 'front' | 'back' | 'left' | 'right'): PartDraft => {
    const long = which === 'front' || which === 'back';
    const world = which === 'front' ? boxBetween([x0, fy, z0], [x1, fy + t, z1])
      : which === 'back' ? boxBetween([x0, y1 - t, z0], [x1, y1, z1])
        : which === 'left' ? boxBetween([x0, fy + t, z0], [x0 + t, y1 - t, z1]) : boxBetween([x1 - t, fy + t, z0], [x1, y1 - t, z1]);
    const name = o.type === 'toe-kick' ? (long ? fixedName(`toe-kick-${which}`, `Toe kick ${which}`) : fixedName('toe-kick-end', 'Toe kick end'))
      : long ? fixedName(`plinth-${which}`, `Plinth ${which}`) : fixedName('plinth-end', 'Plinth end');
    return plainPart({
      group: `base/${long ? which : 'end'}`, member: which, label: `${o.type === 'toe-kick' ? 'toe kick' : 'plinth'} ${which}`, role: 'base', material: o.material, grain,
      world, axes: long ? { length: '+X', width: '+Z', thickness: '-Y' } : which === 'left' ? { length: '+Y', width: '+Z', thickness: '+X' } : { length: '-Y', width: '+Z', thickness: '-X' },
      explodeMm: down, name,
    });
  };
  const [front, back, left, right] = (['front', 'back', 'left', 'right'] as const).map(board) as [PartDraft, PartDraft, PartDraft, PartDraft];
  const joints: JointDraft[] = [];
  for (const end of [left, right]) {
    for (const long of [front, back]) {
      joints.push({ type: 'butt-screwed', a: { draft: end, featureIds: [] }, b: { draft: long, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Glued and screwed, with a glue block inside the corner.' });
    }
  }
  return { drafts: [front, back, left, right], joints };
}
