/**
 * A top over a carcass with stretchers: solid wood glued up from boards, or a sheet with banded
 * edges. A solid top moves across its grain (front to back), so it is screwed up through round
 * holes in the front stretcher — its fixed line, which keeps the front overhang true — and
 * through slots in the back stretcher sized by the wood library's fastener-slot rule.
 */
import type { Climate } from '../../wood/climate.ts';
import { fastenerSlotMm } from '../../wood/slots.ts';
import type { SpeciesId } from '../../wood/species.ts';
import type { JointDraft, PartDraft } from '../assembly.ts';
import { boxBetween } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { Box3, GlueUpPlan, Material } from '../types.ts';
import { fixedName, plainPart } from './plainPart.ts';

/** Screws every 8 in or closer, 2 in from the ends, at least two: common practice, no published source. */
const SCREW_SPACING_MM = 8 * 25.4;
const SCREW_END_INSET_MM = 2 * 25.4;

/** What the fasteners need to know about the top and the stretchers (mm). */
export interface TopFastening {
  /** World Y of the fixed line: the front stretcher's centre. */
  fixedLineYMm: number;
  screwDiameterMm: number;
  /** Solid tops move; sheet tops get round holes throughout. */
  species: SpeciesId | null;
  climate: Climate;
}

/** The holes or slots one stretcher needs for the top's screws, in world coordinates. */
export function stretcherFasteners(which: 'front' | 'back', stretcher: Box3, f: TopFastening): FeatureDraft[] {
  const [sx0, sy0, sz0] = stretcher.min;
  const [sx1, sy1, sz1] = stretcher.max;
  const length = sx1 - sx0;
  const count = Math.max(2, Math.ceil((length - 2 * SCREW_END_INSET_MM) / SCREW_SPACING_MM) + 1);
  const inset = Math.min(SCREW_END_INSET_MM, length / 4);
  const yc = (sy0 + sy1) / 2;
  const r = f.screwDiameterMm / 2;
  const distance = Math.abs(yc - f.fixedLineYMm);
  const slot = which === 'back' && f.species
    ? fastenerSlotMm({ distanceFromFixedLineMm: distance, species: f.species, sawn: 'unknown', climate: f.climate, shankDiameterMm: f.screwDiameterMm })
    : null;
  return Array.from({ length: count }, (_, i) => {
    const x = sx0 + inset + ((length - 2 * inset) * i) / (count - 1);
    if (!slot || !slot.needsSlot) {
      return { id: `screw-hole-${i + 1}`, idTemplate: 'screw-hole-{n}', type: 'hole', label: 'screw hole for the top', faceDir: '-Z', diameterMm: f.screwDiameterMm, removed: [boxBetween([x - r, yc - r, sz0], [x + r, yc + r, sz1])] };
    }
    // The slot's near end faces the fixed line (the front); the screw sits where the slot rule puts it.
    const nearEnd = yc - slot.screwFromNearEndMm;
    return {
      id: `screw-slot-${i + 1}`, idTemplate: 'screw-slot-{n}', type: 'slot', label: 'screw slot: lets the top move across its grain', faceDir: '-Z',
      diameterMm: f.screwDiameterMm, slot: { lengthMm: slot.slotLengthMm, alongDir: '+Y' },
      removed: [boxBetween([x - r, nearEnd, sz0], [x + r, nearEnd + slot.slotLengthMm, sz1])],
    };
  });
}

/** Options for {@link caseTop}. */
export interface CaseTopOptions {
  box: Box3;
  material: Material;
  glueUp?: GlueUpPlan;
  stretchers: readonly PartDraft[];
  explodeMm: number;
}

/** The top and its joints to the stretchers. */
export function caseTop(o: CaseTopOptions): { drafts: PartDraft[]; joints: JointDraft[]; top: PartDraft } {
  const solid = o.material.kind === 'solid';
  const top = plainPart({
    group: 'top', member: 'top', label: 'top', role: 'top', material: o.material, grain: solid ? 'length' : 'none',
    world: o.box, axes: { length: '+X', width: '+Y', thickness: '+Z' }, explodeMm: [0, 0, 2 * o.explodeMm],
    name: fixedName('top', 'Top'), ...(o.glueUp ? { glueUp: o.glueUp } : {}),
    notes: solid ? [`Glue up from ${o.glueUp?.boards ?? 1} boards; grain side to side. Screw on through the stretchers: fixed at the front, slotted at the back.`] : ['Band the edges; screw on through the stretchers.'],
  });
  const joints: JointDraft[] = o.stretchers.map((s) => ({
    type: 'top-fastened', a: { draft: s, featureIds: s.features.filter((f) => f.id.startsWith('screw-')).map((f) => f.id) }, b: { draft: top, featureIds: [] },
    clearanceMm: 0, glued: false, floating: solid && s.member === 'back',
    note: solid && s.member === 'back' ? 'Screwed up through slots so the top can swell and shrink across its grain; no glue.' : 'Screwed up through round holes: the top\'s fixed line.',
  }));
  return { drafts: [top], joints, top };
}
