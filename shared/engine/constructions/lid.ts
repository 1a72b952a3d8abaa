/**
 * A solid lid glued up from boards, its grain running side to side, held flat by cross battens
 * screwed through slots so the lid can move across its grain, and hung on hinges whose leaves
 * are let into the lid and/or the back rail so the lid closes down flat.
 */
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, GlueUpPlan, Material } from '../types.ts';

/** Where hinge leaves are let in. */
export type HingeRecess = 'lid' | 'back-rail' | 'both' | 'none';

/** A batten screw: its place along the batten and the slot (or hole) it needs. */
export interface BattenScrew {
  /** World Y of the screw (mm). */
  yMm: number;
  /** Distance across the lid's grain from the fixed line (mm). */
  distanceFromFixedLineMm: number;
  /** Slot length along Y (mm); the shank diameter for a round hole. */
  slotLengthMm: number;
  /** Where the screw sits at build, from the slot's end nearer the fixed line (mm). */
  screwFromNearEndMm: number;
}

/** Options for {@link lidWithBattens}; world coordinates, mm. */
export interface LidOptions {
  /** The lid's world box (overhangs included), closed. */
  box: Box3;
  material: Material;
  glueUp: GlueUpPlan;
  /** Battens: count, size, and the Y range and X range they must stay inside. */
  battens: { count: number; widthMm: number; thicknessMm: number; yRange: [number, number]; xRange: [number, number] };
  /** Screw positions and slots along each batten (the same on every batten). */
  screws: readonly BattenScrew[];
  screwDiameterMm: number;
  /** Hinges: X centres, leaf length, leaf width, the hinge line (world Y) and recess depths. */
  hinges: { centresX: readonly number[]; lengthMm: number; leafWidthMm: number; lineYMm: number; lidRecessMm: number; railRecessMm: number };
  backRail: PartDraft;
  explodeMm: number;
}

/** The lid, its battens and their joints. */
export interface Lid {
  lid: PartDraft;
  battens: PartDraft[];
  drafts: PartDraft[];
  joints: JointDraft[];
}

/** Hinge recesses to cut in the top edge of the back rail, whose world box is `railBox`. */
export function hingeRailRecesses(h: LidOptions['hinges'], railBox: Box3): FeatureDraft[] {
  if (h.railRecessMm <= 0) return [];
  return h.centresX.map((x, i) => ({
    id: `hinge-recess-${i + 1}`, type: 'recess', label: 'recess for a hinge leaf', faceDir: '+Z',
    removed: [boxBetween([x - h.lengthMm / 2, Math.max(railBox.min[1], h.lineYMm - h.leafWidthMm), railBox.max[2] - h.railRecessMm], [x + h.lengthMm / 2, h.lineYMm, railBox.max[2]])],
  }));
}

/** Builds the lid and its battens, with the hinge recesses in the lid. */
export function lidWithBattens(o: LidOptions): Lid {
  const [lx0, ly0, lz0] = o.box.min;
  const [lx1, ly1, lz1] = o.box.max;
  const h = o.hinges;
  const lidRecesses: FeatureDraft[] = h.lidRecessMm > 0
    ? h.centresX.map((x, i) => ({
      id: `hinge-recess-${i + 1}`, type: 'recess', label: 'recess for a hinge leaf', faceDir: '-Z',
      removed: [boxBetween([x - h.lengthMm / 2, h.lineYMm - h.leafWidthMm, lz0], [x + h.lengthMm / 2, h.lineYMm, lz0 + h.lidRecessMm])],
    }))
    : [];
  const lid: PartDraft = {
    group: 'lid', member: 'lid', label: 'lid', role: 'lid', material: o.material, grain: 'length',
    size: [lx1 - lx0, ly1 - ly0, lz1 - lz0], axes: { length: '+X', width: '+Y', thickness: '+Z' }, world: o.box,
    explodeMm: [0, 0, 2 * o.explodeMm], features: lidRecesses, glueUp: o.glueUp,
    notes: [`Glue up from ${o.glueUp.boards} boards; grain side to side.`],
    name: () => ({ id: 'lid', name: 'Lid' }),
  };

  const b = o.battens;
  const joints: JointDraft[] = [];
  const span = b.xRange[1] - b.xRange[0];
  const gap = (span - b.count * b.widthMm) / (b.count + 1);
  const r = o.screwDiameterMm / 2;
  const battens = Array.from({ length: b.count }, (_, i) => {
    const x0 = b.xRange[0] + gap * (i + 1) + b.widthMm * i;
    const xc = x0 + b.widthMm / 2;
    const slots: FeatureDraft[] = o.screws.map((s, k) => {
      const round = s.slotLengthMm <= o.screwDiameterMm + 1e-9;
      // The slot's near end faces the fixed line (the back); the screw sits `screwFromNearEnd` in.
      const nearEnd = s.yMm + s.screwFromNearEndMm;
      const removed = [boxBetween([xc - r, nearEnd - s.slotLengthMm, lz0 - b.thicknessMm], [xc + r, nearEnd, lz0])];
      return round
        ? { id: `hole-${k + 1}`, type: 'hole', label: 'screw hole at the fixed line', faceDir: '-Z', removed: [boxBetween([xc - r, s.yMm - r, lz0 - b.thicknessMm], [xc + r, s.yMm + r, lz0])], diameterMm: o.screwDiameterMm }
        : { id: `slot-${k + 1}`, type: 'slot', label: 'screw slot: lets the lid move across its grain', faceDir: '-Z', removed, diameterMm: o.screwDiameterMm, slot: { lengthMm: s.slotLengthMm, alongDir: '+Y' } };
    });
    const draft: PartDraft = {
      group: 'batten', member: 'batten', label: `lid batten ${i + 1}`, role: 'batten', material: o.material, grain: 'length',
      size: [b.yRange[1] - b.yRange[0], b.widthMm, b.thicknessMm], axes: { length: '+Y', width: '-X', thickness: '+Z' },
      world: boxBetween([x0, b.yRange[0], lz0 - b.thicknessMm], [x0 + b.widthMm, b.yRange[1], lz0]),
      explodeMm: [0, 0, 1.4 * o.explodeMm], features: slots,
      notes: ['Screw to the lid through the slots; glue, if any, only at the back screw.'],
      name: () => ({ id: 'batten', name: 'Lid batten' }),
    };
    joints.push({
      type: 'batten-screwed', a: { draft, featureIds: slots.map((s) => s.id) }, b: { draft: lid, featureIds: [] },
      clearanceMm: 0, glued: false, floating: true, note: 'Screwed through slots so the lid can swell and shrink across its grain.',
    });
    return draft;
  });

  joints.push({
    type: 'hinge', a: { draft: lid, featureIds: lidRecesses.map((f) => f.id) }, b: { draft: o.backRail, featureIds: h.railRecessMm > 0 ? h.centresX.map((_, i) => `hinge-recess-${i + 1}`) : [] },
    clearanceMm: 0, glued: false, floating: false, note: `${h.centresX.length} hinges along the back rail.`,
  });
  return { lid, battens, drafts: [lid, ...battens], joints };
}
