/**
 * Four square corner legs from the floor up, each with the stopped grooves the faces between
 * them ask for. Left and right legs turn so that identical legs come out as one part.
 */
import { assert } from '../../assert.ts';
import type { PartDraft, PartNamer } from '../assembly.ts';
import { boxBetween, boxContains } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import { localFaceOf, type AxisMap } from '../geometry/placement.ts';
import type { Material, Vec3 } from '../types.ts';
import type { PostGroove } from './frameAndPanelFace.ts';

/** The four corners, named as a maker stands at the front. */
export type Corner = 'front-left' | 'front-right' | 'back-left' | 'back-right';

/** Options for {@link cornerLegs}; lengths in mm. */
export interface CornerLegsOptions {
  widthMm: number;
  depthMm: number;
  legSizeMm: number;
  legLengthMm: number;
  material: Material;
  grooves: readonly PostGroove[];
  explodeMm: number;
}

/** The legs and a way to find the leg and groove feature a face's post groove landed in. */
export interface CornerLegs {
  drafts: PartDraft[];
  grooveOwner: (groove: PostGroove) => { draft: PartDraft; featureId: string };
}

const CORNERS: readonly { corner: Corner; sx: 1 | -1; sy: 1 | -1 }[] = [
  { corner: 'front-left', sx: 1, sy: 1 },
  { corner: 'front-right', sx: -1, sy: 1 },
  { corner: 'back-left', sx: 1, sy: -1 },
  { corner: 'back-right', sx: -1, sy: -1 },
];

const legNamer: PartNamer = (members) => {
  if (members.length === 4) return { id: 'leg', name: 'Leg' };
  const ends = [...new Set(members.map((m) => m.split('-')[0]))];
  if (members.length === 2 && ends.length === 1) return { id: `${ends[0]}-leg`, name: `${ends[0] === 'front' ? 'Front' : 'Back'} leg` };
  const id = `${[...new Set(members)].join('-')}-leg`;
  return { id, name: id.charAt(0).toUpperCase() + id.slice(1).replace(/-/g, ' ') };
};

/** Builds the corner legs and cuts each face's post grooves into them. */
export function cornerLegs(o: CornerLegsOptions): CornerLegs {
  const L = o.legSizeMm;
  const owners = new Map<PostGroove, { draft: PartDraft; featureId: string }>();
  const drafts = CORNERS.map(({ corner, sx, sy }) => {
    const x0 = sx > 0 ? 0 : o.widthMm - L;
    const y0 = sy > 0 ? 0 : o.depthMm - L;
    const world = boxBetween([x0, y0, 0], [x0 + L, y0 + L, o.legLengthMm]);
    const inX = sx > 0 ? '+X' : '-X';
    const inY = sy > 0 ? '+Y' : '-Y';
    // Both inner faces map to edge-b and face-b whichever corner it is; the order that keeps
    // the turn a rotation depends on the corner.
    const axes: AxisMap = sx * sy > 0 ? { length: '+Z', width: inX, thickness: inY } : { length: '+Z', width: inY, thickness: inX };
    const mine = o.grooves.filter((g) => boxContains(world, g.box, 1e-6));
    const features: FeatureDraft[] = mine.map((g) => ({
      id: `groove-${localFaceOf(axes, g.faceDir)}`,
      type: 'stopped-groove',
      label: 'stopped groove for a rail tongue and a panel edge',
      faceDir: g.faceDir,
      removed: [g.box],
    }));
    features.sort((a, b) => a.id.localeCompare(b.id));
    const explode: Vec3 = [-sx * o.explodeMm, -sy * o.explodeMm, 0];
    const draft: PartDraft = {
      group: 'legs', member: corner, label: `${corner} leg`, role: 'leg', material: o.material, grain: 'length',
      size: [o.legLengthMm, L, L], axes, world, explodeMm: explode, features, notes: [], name: legNamer,
    };
    mine.forEach((g, i) => owners.set(g, { draft, featureId: features.find((f) => f.removed[0] === g.box)?.id ?? `groove-${i}` }));
    return draft;
  });
  return {
    drafts,
    grooveOwner: (groove) => {
      const owner = owners.get(groove);
      assert(owner, 'every post groove lies inside a leg');
      return owner;
    },
  };
}
