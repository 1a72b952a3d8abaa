/**
 * A sheet-goods bottom resting on cleats screwed and glued inside the bottom rails, notched at
 * its corners around legs that stand inside the rails' inner faces.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, Material, WorldAxis } from '../types.ts';

/** Options for {@link bottomOnCleats}; lengths in mm, world coordinates. */
export interface BottomOnCleatsOptions {
  widthMm: number;
  depthMm: number;
  legSizeMm: number;
  /** Inner faces of the bottom rails: left and right X, front and back Y. */
  inner: { left: number; right: number; front: number; back: number };
  /** Height of the bottom's top face (flush with the bottom rails' top edges). */
  topMm: number;
  sheet: Material;
  sheetThicknessMm: number;
  clearanceMm: number;
  cleatStock: Material;
  /** Cleat size: height (vertical) and thickness (how far it stands in from the rail). */
  cleatHeightMm: number;
  cleatThicknessMm: number;
  screwDiameterMm: number;
  /** The rail drafts the cleats are fixed to, by wall. */
  rails: { front: PartDraft; back: PartDraft; left: PartDraft; right: PartDraft };
  /** The leg drafts, by corner, for the notch joints. */
  legs: readonly PartDraft[];
  explodeMm: number;
}

/** The bottom, its cleats and their joints. */
export interface BottomOnCleats {
  bottom: PartDraft;
  cleats: PartDraft[];
  drafts: PartDraft[];
  joints: JointDraft[];
  /** Room left at the narrowest point for the bottom to drop in square (mm). */
  dropInClearanceMm: number;
}

/** Screws every 8 in or closer, at least two: common practice, no published source. */
const SCREW_SPACING_MM = 8 * 25.4;

/** Builds the notched bottom and its four cleats. */
export function bottomOnCleats(o: BottomOnCleatsOptions): BottomOnCleats {
  const L = o.legSizeMm;
  const c = o.clearanceMm;
  const z1 = o.topMm;
  const z0 = z1 - o.sheetThicknessMm;
  const x0 = o.inner.left + c;
  const x1 = o.inner.right - c;
  const y0 = o.inner.front + c;
  const y1 = o.inner.back - c;

  const notches: FeatureDraft[] = [];
  const corners = [
    { id: 'front-left', bx: [x0, L + c], by: [y0, L + c] },
    { id: 'front-right', bx: [o.widthMm - L - c, x1], by: [y0, L + c] },
    { id: 'back-left', bx: [x0, L + c], by: [o.depthMm - L - c, y1] },
    { id: 'back-right', bx: [o.widthMm - L - c, x1], by: [o.depthMm - L - c, y1] },
  ] as const;
  for (const k of corners) {
    if (k.bx[1] - k.bx[0] <= 1e-9 || k.by[1] - k.by[0] <= 1e-9) continue;
    notches.push({
      id: `notch-${k.id}`, type: 'notch', label: `notch around the ${k.id} leg`, faceDir: '+Z',
      removed: [boxBetween([k.bx[0], k.by[0], z0], [k.bx[1], k.by[1], z1])],
    });
  }
  const bottom: PartDraft = {
    group: 'bottom', member: 'bottom', label: 'bottom', role: 'bottom', material: o.sheet, grain: 'none',
    size: [x1 - x0, y1 - y0, o.sheetThicknessMm], axes: { length: '+X', width: '+Y', thickness: '+Z' },
    world: boxBetween([x0, y0, z0], [x1, y1, z1]), explodeMm: [0, 0, o.explodeMm],
    features: notches, notes: ['Drops in after the case is glued up; rests on the cleats.'],
    name: () => ({ id: 'bottom', name: 'Bottom' }),
  };

  const cz1 = z0;
  const cz0 = z0 - o.cleatHeightMm;
  const ct = o.cleatThicknessMm;
  const sideY0 = Math.max(L, o.inner.front + ct);
  const sideY1 = Math.min(o.depthMm - L, o.inner.back - ct);
  const cleatSpecs: { wall: 'front' | 'back' | 'left' | 'right'; box: Box3; outward: WorldAxis; long: boolean }[] = [
    { wall: 'front', box: boxBetween([L, o.inner.front, cz0], [o.widthMm - L, o.inner.front + ct, cz1]), outward: '-Y', long: true },
    { wall: 'back', box: boxBetween([L, o.inner.back - ct, cz0], [o.widthMm - L, o.inner.back, cz1]), outward: '+Y', long: true },
    { wall: 'left', box: boxBetween([o.inner.left, sideY0, cz0], [o.inner.left + ct, sideY1, cz1]), outward: '-X', long: false },
    { wall: 'right', box: boxBetween([o.inner.right - ct, sideY0, cz0], [o.inner.right, sideY1, cz1]), outward: '+X', long: false },
  ];
  const joints: JointDraft[] = [];
  const cleats = cleatSpecs.map(({ wall, box, outward, long }) => {
    const length = long ? box.max[0] - box.min[0] : box.max[1] - box.min[1];
    const count = Math.max(2, Math.ceil(length / SCREW_SPACING_MM) + 1);
    const inset = Math.min(50, length / 4);
    const zc = (cz0 + cz1) / 2;
    const r = o.screwDiameterMm / 2;
    const inward = outward[0] === '-' ? 1 : -1;
    const face = inward > 0 ? (long ? box.max[1] : box.max[0]) : long ? box.min[1] : box.min[0];
    const back = inward > 0 ? (long ? box.min[1] : box.min[0]) : long ? box.max[1] : box.max[0];
    const holes: FeatureDraft[] = Array.from({ length: count }, (_, i) => {
      const s = (long ? box.min[0] : box.min[1]) + inset + ((length - 2 * inset) * i) / (count - 1);
      const a: [number, number, number] = long ? [s - r, back, zc - r] : [back, s - r, zc - r];
      const b: [number, number, number] = long ? [s + r, face, zc + r] : [face, s + r, zc + r];
      return {
        id: `hole-${i + 1}`, idTemplate: 'hole-{n}', type: 'hole', label: 'screw clearance hole into the rail', faceDir: `${inward > 0 ? '+' : '-'}${long ? 'Y' : 'X'}` as WorldAxis,
        removed: [boxBetween(a, b)], diameterMm: o.screwDiameterMm,
      };
    });
    // Length along the wall's u (the viewer's right from outside), thickness outward: the same
    // cleat reads the same way on every wall, so identical cleats merge.
    const AXES = {
      front: { length: '+X', width: '+Z', thickness: '-Y' },
      back: { length: '-X', width: '+Z', thickness: '+Y' },
      left: { length: '-Y', width: '+Z', thickness: '-X' },
      right: { length: '+Y', width: '+Z', thickness: '+X' },
    } as const;
    const axes = AXES[wall];
    const size: [number, number, number] = [length, o.cleatHeightMm, ct];
    const draft: PartDraft = {
      group: long ? 'cleat-long' : 'cleat-short', member: wall, label: `${wall} cleat`, role: 'cleat', material: o.cleatStock, grain: 'length',
      size, axes, world: box, explodeMm: o.rails[wall].explodeMm, features: holes, notes: ['Glue and screw to the bottom rail: long grain to long grain.'],
      name: (members) => (new Set(members).size > 1
        ? { id: long ? 'front-back-cleat' : 'side-cleat', name: long ? 'Front/back cleat' : 'Side cleat' }
        : { id: `${members[0]}-cleat`, name: `${members[0]!.charAt(0).toUpperCase()}${members[0]!.slice(1)} cleat` }),
    };
    joints.push({
      type: 'cleat-screwed', a: { draft, featureIds: holes.map((h) => h.id) }, b: { draft: o.rails[wall], featureIds: [] },
      clearanceMm: 0, glued: true, floating: false, note: 'Glued and screwed along the rail: the grain runs the same way, so the joint can be glued.',
    });
    joints.push({
      type: 'bottom-on-cleats', a: { draft: bottom, featureIds: [] }, b: { draft, featureIds: [] },
      clearanceMm: c, glued: false, floating: false, note: 'The bottom rests on the cleat; screw it down if it must not lift.',
    });
    return draft;
  });
  for (const leg of o.legs) {
    const notch = notches.find((n) => n.id === `notch-${leg.member}`);
    if (!notch) continue;
    joints.push({
      type: 'notch-around-leg', a: { draft: bottom, featureIds: [notch.id] }, b: { draft: leg, featureIds: [] },
      clearanceMm: c, glued: false, floating: false, note: 'Notch clears the leg so the bottom drops in square.',
    });
  }
  return { bottom, cleats, drafts: [bottom, ...cleats], joints, dropInClearanceMm: c };
}
