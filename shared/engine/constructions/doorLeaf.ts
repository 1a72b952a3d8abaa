/**
 * One door leaf: a slab (glued-up solid wood or a sheet), or a small frame-and-panel built by
 * the same {@link frameAndPanelFace} as a chest's sides, with its two stiles as the posts. The
 * stiles' grooves run through (a door's stub-tenon joint shows no stop), the rails' stub tenons
 * fill them, and the panel floats. Hinges are cut into the leaf: 35 mm cups for overlay doors,
 * shallow leaf recesses on the edge for inset butt hinges.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, GlueUpPlan, Material, PartRole } from '../types.ts';
import type { FrontBox } from './frontGrid.ts';
import { frameAndPanelFace, type FacePanelSpec } from './frameAndPanelFace.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** Hinges cut into a door: cup bores (overlay) or butt-hinge leaf recesses (inset). */
export interface DoorHinges {
  kind: 'cup' | 'butt';
  /** Hinge centres along the door's height, world Z. */
  centresZ: readonly number[];
}

/** A door's frame: stock and member sizes (mm). */
export interface DoorFrameSpec {
  stock: Material;
  stileWidthMm: number;
  railWidthMm: number;
  grooveWidthMm: number;
  grooveDepthMm: number;
  tongueClearanceMm: number;
  panel: FacePanelSpec;
}

/** Options for {@link doorLeaf}. */
export interface DoorLeafOptions {
  front: FrontBox;
  /** Instance name within the doors, e.g. `left-door`. */
  member: string;
  style: 'slab' | 'frame-and-panel';
  slab: { material: Material; glueUp?: GlueUpPlan };
  frame: DoorFrameSpec;
  hinges: DoorHinges;
  explodeMm: number;
}

/** The leaf's parts, joints and the part that carries the hinges. */
export interface DoorLeaf {
  drafts: PartDraft[];
  joints: JointDraft[];
  hingePart: PartDraft;
  panels: PartDraft[];
}

/** A 35 mm cup, 1/2 in deep, its rim 1/8 in from the door's edge: common practice, from memory. */
export const CUP_DIAMETER_MM = 35;
export const CUP_DEPTH_MM = 12.7;
export const CUP_RIM_FROM_EDGE_MM = 3.175;
/** A cabinet butt hinge 2-1/2 in long, leaf 5/8 in wide, let in 1/16 in: common practice, from memory. */
export const BUTT_LENGTH_MM = 63.5;
export const BUTT_LEAF_WIDTH_MM = 15.875;
export const BUTT_RECESS_MM = 1.5875;

/** Hinges a door this tall takes: two up to 40 in, three to 60 in, four above. Common practice, no published source. */
export function hingeCountFor(heightMm: number): number {
  return heightMm <= 40 * 25.4 ? 2 : heightMm <= 60 * 25.4 ? 3 : 4;
}

/** Hinge centres for a door from `z0` to `z1`: 3 in from each end, the rest evenly between. Common practice. */
export function hingeCentres(z0: number, z1: number): number[] {
  const n = hingeCountFor(z1 - z0);
  const inset = Math.min(3 * 25.4, (z1 - z0) / 4);
  return Array.from({ length: n }, (_, i) => z0 + inset + ((z1 - z0 - 2 * inset) * i) / (n - 1));
}

function hingeCuts(h: DoorHinges, world: Box3, side: 'left' | 'right'): FeatureDraft[] {
  const [x0, y0] = world.min;
  const [x1, y1] = world.max;
  const edge = side === 'left' ? x0 : x1;
  const inward = side === 'left' ? 1 : -1;
  return h.centresZ.map((z, i) => {
    if (h.kind === 'cup') {
      const cx = edge + inward * (CUP_RIM_FROM_EDGE_MM + CUP_DIAMETER_MM / 2);
      const r = CUP_DIAMETER_MM / 2;
      return {
        id: `hinge-cup-${i + 1}`, idTemplate: 'hinge-cup-{n}', type: 'hole', label: '35 mm hinge cup', faceDir: '+Y', diameterMm: CUP_DIAMETER_MM,
        removed: [boxBetween([cx - r, y1 - CUP_DEPTH_MM, z - r], [cx + r, y1, z + r])],
      };
    }
    return {
      id: `hinge-recess-${i + 1}`, idTemplate: 'hinge-recess-{n}', type: 'recess', label: 'recess for a butt hinge leaf', faceDir: side === 'left' ? '-X' : '+X',
      removed: [boxBetween([edge, y0, z - BUTT_LENGTH_MM / 2], [edge + inward * BUTT_RECESS_MM, y0 + BUTT_LEAF_WIDTH_MM, z + BUTT_LENGTH_MM / 2])],
    };
  });
}

const ROLE_OF: Partial<Record<PartRole, PartRole>> = { rail: 'door-frame', stile: 'door-frame', panel: 'door-panel' };

/** Builds one door leaf. */
export function doorLeaf(o: DoorLeafOptions): DoorLeaf {
  const f = o.front;
  const world = boxBetween([f.x[0], f.y[0], f.z[0]], [f.x[1], f.y[1], f.z[1]]);
  const explode: [number, number, number] = [0, -o.explodeMm, 0];
  if (o.style === 'slab') {
    const door = plainPart({
      group: 'door/slab', member: o.member, label: o.member.replace('-', ' '), role: 'door', material: o.slab.material,
      grain: o.slab.material.kind === 'solid' ? 'length' : 'none', world, axes: { length: '+Z', width: '+X', thickness: '+Y' },
      explodeMm: explode, features: hingeCuts(o.hinges, world, f.hinge), name: fixedName('door', 'Door'),
      notes: [`Hinged on the ${f.hinge}.`], ...(o.slab.glueUp ? { glueUp: o.slab.glueUp } : {}),
    });
    return { drafts: [door], joints: [], hingePart: door, panels: [] };
  }

  const fr = o.frame;
  const T = f.y[1] - f.y[0];
  const sw = fr.stileWidthMm;
  const face = frameAndPanelFace({
    wall: o.member, groupId: 'door', groupName: 'Door', frame: { origin: [f.x[0] + sw, f.y[0], 0], u: '+X', w: '-Y' },
    spanMm: f.x[1] - f.x[0] - 2 * sw, stock: fr.stock, stockThicknessMm: T, railInsetMm: 0,
    bottomRail: { bottomMm: f.z[0], widthMm: fr.railWidthMm }, topRail: { topMm: f.z[1], widthMm: fr.railWidthMm },
    stileCount: 0, stileWidthMm: sw, grooveWidthMm: fr.grooveWidthMm, postGrooveDepthMm: fr.grooveDepthMm, frameGrooveDepthMm: fr.grooveDepthMm,
    railTongueLengthMm: fr.grooveDepthMm - fr.tongueClearanceMm, tongueClearanceMm: fr.tongueClearanceMm, postGrooveStopMm: 0,
    panel: fr.panel, explodeMm: o.explodeMm,
  });
  // The face's parts serve as door parts: the same drafts with door roles, joints re-pointed.
  const renamed = new Map<PartDraft, PartDraft>(face.drafts.map((d) => [d, { ...d, role: ROLE_OF[d.role] ?? d.role }]));
  const re = (d: PartDraft): PartDraft => renamed.get(d) ?? d;
  const stiles = (['left', 'right'] as const).map((end) => {
    const groove = face.postGrooves.find((g) => g.end === end)!;
    const sWorld = end === 'left' ? boxBetween([f.x[0], f.y[0], f.z[0]], [f.x[0] + sw, f.y[1], f.z[1]]) : boxBetween([f.x[1] - sw, f.y[0], f.z[0]], [f.x[1], f.y[1], f.z[1]]);
    const features: FeatureDraft[] = [
      { id: 'groove-panel', type: 'groove', label: 'groove for the rail tongues and the panel, run through', faceDir: groove.faceDir, removed: [groove.box] },
      ...(f.hinge === end ? hingeCuts(o.hinges, sWorld, end) : []),
    ];
    return plainPart({
      group: 'door/stile', member: o.member, label: `${o.member.replace('-', ' ')} ${end} stile`, role: 'door-frame', material: fr.stock, grain: 'length',
      // Both stiles face the same way (back face to +Y) so the two hinge stiles of a pair come out as one part.
      world: sWorld, axes: end === 'left' ? { length: '+Z', width: '+X', thickness: '+Y' } : { length: '-Z', width: '-X', thickness: '+Y' },
      explodeMm: explode, features, name: f.hinge === end ? fixedName('door-hinge-stile', 'Door hinge stile') : fixedName('door-stile', 'Door stile'),
      notes: f.hinge === end ? [`Hinge stile: the door hangs on the ${end}.`] : [],
    });
  });
  const joints: JointDraft[] = face.joints.map((j) => ({ ...j, a: { ...j.a, draft: re(j.a.draft) }, b: { ...j.b, draft: re(j.b.draft) } }));
  for (const c of face.postContacts) {
    joints.push({
      type: c.type, a: { draft: re(c.draft), featureIds: c.featureIds }, b: { draft: stiles[c.end === 'left' ? 0 : 1]!, featureIds: ['groove-panel'] },
      clearanceMm: c.clearanceMm, glued: c.glued, floating: c.floating, note: c.note,
    });
  }
  return {
    drafts: [...stiles, ...face.drafts.map(re)], joints,
    hingePart: stiles[f.hinge === 'left' ? 0 : 1]!, panels: face.panels.map(re),
  };
}
