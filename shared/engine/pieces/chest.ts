/**
 * The frame-and-panel chest with corner legs: four legs from the floor to the underside of the
 * lid; between them on every face a top and a bottom rail with stub tenons in stopped leg
 * grooves, optional centre stiles, and floating panels; a sheet bottom notched around the legs
 * on cleats inside the bottom rails; a glued-up solid lid with an overhang, cross battens
 * screwed through slots, and hinges let into the lid or the back rail.
 *
 * Exact sizes: the case measures `width` × `depth` over its legs; the closed lid's top is
 * `height` above the floor; the lid's overhangs add to the width and depth.
 */
import { DEFAULT_CLIMATE } from '../../wood/climate.ts';
import { glueUpBoardWidthsMm } from '../../wood/glueUp.ts';
import { seasonalSwingMm } from '../../wood/movement.ts';
import { getSheetGood } from '../../wood/sheetGoods.ts';
import { fastenerSlotMm } from '../../wood/slots.ts';
import { getSpecies } from '../../wood/species.ts';
import { assemble, type JointDraft, type PartDraft } from '../assembly.ts';
import { bottomOnCleats } from '../constructions/bottomOnCleats.ts';
import { cornerLegs } from '../constructions/cornerLegs.ts';
import { frameAndPanelFace, type FrameAndPanelFace, type FacePanelSpec } from '../constructions/frameAndPanelFace.ts';
import { hingeRailRecesses, lidWithBattens, type BattenScrew } from '../constructions/lid.ts';
import { boxBetween, boxSize, boxUnion, boxVolume } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { WallFrame } from '../geometry/wallFrame.ts';
import type { Box3, Check, Material, Opening, Part, PieceSpec, RoughSize, Vec3 } from '../types.ts';
import { bottomFitCheck } from '../checks/bottom.ts';
import { childSafetyCheck } from '../checks/childSafety.ts';
import { grooveChecks, panelThicknessCheck, railTongueCheck, stoppedGrooveCheck } from '../checks/joinery.ts';
import { battenSlotCheck, hingeRecessCheck } from '../checks/lid.ts';
import { lidSupportCheck } from '../checks/lidSupport.ts';
import { panelFloatCheck } from '../checks/panelFloat.ts';
import { stockSizeChecks } from '../checks/stock.ts';
import { chestLayout, type ChestLayout, type ChestParams } from './chestLayout.ts';
import { instanceRefs, lidOpening } from './openings.ts';

/** A quarter inch: lumber thickness is sold in quarters (4/4, 5/4, 8/4 ...). */
const QUARTER_MM = 25.4 / 4;
/** Hardwood is sold from 4/4 up; thinner parts are planed or resawn from it. Common practice. */
const MIN_QUARTERS = 4;
/** Batten screws: 1 in in from each end, no more than 6 in apart. Common practice, no published source. */
const BATTEN_SCREW_INSET_MM = 25.4;
const BATTEN_SCREW_SPACING_MM = 6 * 25.4;

/** What the chest builder returns, before derived outputs. */
export interface ChestBuild {
  parts: Part[];
  joints: ReturnType<typeof assemble>['joints'];
  placements: ReturnType<typeof assemble>['placements'];
  checks: Check[];
  bboxMm: Vec3;
  bboxMinMm: Vec3;
  openings: Opening[];
}

/** Rough size for a finished part: allowances on length and width, thickness up to the quarter. */
export function roughSizer(p: Pick<ChestParams, 'lengthAllowance' | 'widthAllowance' | 'thicknessAllowance'>) {
  return (part: Omit<Part, 'rough' | 'quantity'>): RoughSize => {
    if (part.material.kind === 'sheet') return { lengthMm: part.lengthMm, widthMm: part.widthMm, thicknessMm: part.thicknessMm, quarters: 0 };
    const boards = part.glueUp?.boards ?? 1;
    // toFixed keeps 4/4 from becoming 5/4 on binary noise.
    const quarters = Math.max(MIN_QUARTERS, Math.ceil(Number(((part.thicknessMm + p.thicknessAllowance) / QUARTER_MM).toFixed(9))));
    return {
      lengthMm: part.lengthMm + p.lengthAllowance,
      widthMm: part.widthMm + boards * p.widthAllowance,
      thicknessMm: quarters * QUARTER_MM,
      quarters,
    };
  };
}

/**
 * Builds a chest from a spec already checked by `validateSpec`; `layout`, when given, is the
 * one those checks worked out for this spec (so it is not worked out twice).
 */
export function buildChest(spec: PieceSpec, layout?: ChestLayout): ChestBuild {
  const p = spec.params as unknown as ChestParams;
  const climate = spec.climate ?? DEFAULT_CLIMATE;
  const lay = layout ?? chestLayout(p, climate);
  const { L, T } = lay;
  const species = getSpecies(p.species);
  const solid: Material = { kind: 'solid', speciesId: species.id, speciesName: species.name };
  const sheetMaterial = (id: typeof p.panelSheet): Material => ({ kind: 'sheet', sheetId: id, sheetName: getSheetGood(id).name });
  const explodeMm = 0.15 * Math.max(p.width, p.depth, p.height);

  const hinges = {
    centresX: lay.hingeCentresX, lengthMm: p.hingeLength, leafWidthMm: p.hingeLeafWidth,
    lineYMm: lay.hingeLineYMm, lidRecessMm: lay.lidRecessMm, railRecessMm: lay.railRecessMm,
  };
  const fingerNotch = (rail: Box3): FeatureDraft[] => (p.fingerNotch
    ? [{
      id: 'finger-notch', type: 'notch', label: 'finger notch to lift the lid', faceDir: '+Z',
      removed: [boxBetween([p.width / 2 - p.fingerNotchWidth / 2, rail.min[1], rail.max[2] - p.fingerNotchDepth], [p.width / 2 + p.fingerNotchWidth / 2, rail.max[1], rail.max[2]])],
    }]
    : []);

  const panelFor = (floatGap: number): FacePanelSpec => (p.panelMaterial === 'solid'
    ? { material: solid, thicknessMm: lay.panelThicknessMm, grain: p.panelGrain, gapAcrossGrainMm: floatGap, gapAlongGrainMm: p.tongueClearance }
    : { material: sheetMaterial(p.panelSheet), thicknessMm: lay.panelThicknessMm, grain: 'none', gapAcrossGrainMm: floatGap, gapAlongGrainMm: floatGap });

  const wall = (name: 'front' | 'back' | 'left' | 'right', frame: WallFrame, insetMm: number): FrameAndPanelFace => {
    const longWall = name === 'front' || name === 'back';
    const float = longWall ? lay.floats.frontBack : lay.floats.side;
    return frameAndPanelFace({
      wall: name, groupId: longWall ? 'front-back' : 'side', groupName: longWall ? 'Front/back' : 'Side', frame,
      spanMm: longWall ? lay.spanXMm : lay.spanYMm, stock: solid, stockThicknessMm: T, railInsetMm: insetMm,
      bottomRail: { bottomMm: p.footHeight, widthMm: p.bottomRailWidth }, topRail: { topMm: lay.legLengthMm, widthMm: p.topRailWidth },
      stileCount: longWall ? p.frontStileCount : p.sideStileCount, stileWidthMm: p.stileWidth,
      grooveWidthMm: p.grooveWidth, postGrooveDepthMm: p.legGrooveDepth, frameGrooveDepthMm: p.frameGrooveDepth,
      railTongueLengthMm: p.railTongueLength, tongueClearanceMm: p.tongueClearance, postGrooveStopMm: p.legGrooveStop,
      panel: panelFor(float.float.gapEachSideMm), explodeMm,
      ...(name === 'front' ? { topRailFeatures: fingerNotch } : name === 'back' ? { topRailFeatures: (b: Box3) => hingeRailRecesses(hinges, b) } : {}),
    });
  };
  // Each wall seen from outside: u to the viewer's right, w toward the viewer.
  const walls = {
    front: wall('front', { origin: [L, 0, 0], u: '+X', w: '-Y' }, lay.frontInsetMm),
    back: wall('back', { origin: [p.width - L, p.depth, 0], u: '-X', w: '+Y' }, lay.backInsetMm),
    left: wall('left', { origin: [0, p.depth - L, 0], u: '-Y', w: '-X' }, lay.sideInsetMm),
    right: wall('right', { origin: [p.width, L, 0], u: '+Y', w: '+X' }, lay.sideInsetMm),
  };
  const wallList = Object.values(walls);

  const legs = cornerLegs({
    widthMm: p.width, depthMm: p.depth, legSizeMm: L, legLengthMm: lay.legLengthMm, material: solid,
    grooves: wallList.flatMap((w) => w.postGrooves), explodeMm,
  });
  const joints: JointDraft[] = wallList.flatMap((w) => w.joints);
  for (const w of wallList) {
    for (const contact of w.postContacts) {
      const groove = w.postGrooves.find((g) => g.end === contact.end)!;
      const owner = legs.grooveOwner(groove);
      joints.push({
        type: contact.type, a: { draft: contact.draft, featureIds: contact.featureIds }, b: { draft: owner.draft, featureIds: [owner.featureId] },
        clearanceMm: contact.clearanceMm, glued: contact.glued, floating: contact.floating, note: contact.note,
      });
    }
  }

  const bottom = bottomOnCleats({
    widthMm: p.width, depthMm: p.depth, legSizeMm: L, inner: lay.inner, topMm: lay.panelZ[0],
    sheet: sheetMaterial(p.bottomSheet), sheetThicknessMm: lay.bottomThicknessMm, clearanceMm: p.bottomClearance,
    cleatStock: solid, cleatHeightMm: p.cleatWidth, cleatThicknessMm: p.cleatThickness, screwDiameterMm: p.screwDiameter,
    rails: { front: walls.front.bottomRail, back: walls.back.bottomRail, left: walls.left.bottomRail, right: walls.right.bottomRail },
    legs: legs.drafts, explodeMm: explodeMm * 0.5,
  });
  joints.push(...bottom.joints);

  // Lid: glued up from boards, fixed at the hinge line so the hinges stay put; the front moves.
  const lidSize = boxSize(lay.lidBox);
  const lidBoardWidthsMm = glueUpBoardWidthsMm({ panelWidthMm: lidSize[1], maxBoardWidthMm: p.lidBoardWidth, arrangement: 'equal' });
  const battenLength = lay.battenYRange[1] - lay.battenYRange[0];
  const screwCount = Math.max(2, Math.ceil((battenLength - 2 * BATTEN_SCREW_INSET_MM) / BATTEN_SCREW_SPACING_MM) + 1);
  const screws: BattenScrew[] = Array.from({ length: screwCount }, (_, i) => {
    const y = lay.battenYRange[1] - BATTEN_SCREW_INSET_MM - ((battenLength - 2 * BATTEN_SCREW_INSET_MM) * i) / (screwCount - 1);
    const distance = Math.max(0, lay.hingeLineYMm - y);
    // The screw nearest the hinge line fixes the batten: a round hole, whatever the lid does.
    if (!p.battenSlots || i === 0) return { yMm: y, distanceFromFixedLineMm: distance, slotLengthMm: p.screwDiameter, screwFromNearEndMm: p.screwDiameter / 2 };
    const slot = fastenerSlotMm({ distanceFromFixedLineMm: distance, species: species.id, sawn: 'unknown', climate, shankDiameterMm: p.screwDiameter });
    return !slot.needsSlot
      ? { yMm: y, distanceFromFixedLineMm: distance, slotLengthMm: p.screwDiameter, screwFromNearEndMm: p.screwDiameter / 2 }
      : { yMm: y, distanceFromFixedLineMm: distance, slotLengthMm: slot.slotLengthMm, screwFromNearEndMm: slot.screwFromNearEndMm };
  });
  const lid = lidWithBattens({
    box: lay.lidBox, material: solid, glueUp: { boards: lidBoardWidthsMm.length, boardWidthMm: lidBoardWidthsMm[0]! },
    battens: { count: p.battenCount, widthMm: p.battenWidth, thicknessMm: p.battenThickness, yRange: lay.battenYRange, xRange: [L, p.width - L] },
    screws, screwDiameterMm: p.screwDiameter, hinges, backRail: walls.back.topRail, explodeMm,
  });
  joints.push(...lid.joints);

  const drafts: PartDraft[] = [...legs.drafts, ...wallList.flatMap((w) => w.drafts), ...bottom.drafts, ...lid.drafts];
  const assembled = assemble(drafts, joints, roughSizer(p));
  const idsOf = (list: readonly PartDraft[]): string[] => [...new Set(list.map((d) => assembled.partIdOf.get(d)!))];
  const bbox = boxUnion(drafts.map((d) => d.world));

  // Checks, each with its numbers and fix.
  const legIds = idsOf(legs.drafts);
  const railIds = idsOf(wallList.flatMap((w) => [w.topRail, w.bottomRail]));
  const stileIds = idsOf(wallList.flatMap((w) => w.drafts.filter((d) => d.role === 'stile')));
  const outerWall = (inset: number) => inset + (T - p.grooveWidth) / 2;
  const innerWall = (inset: number) => L - inset - (T + p.grooveWidth) / 2;
  const lidSwing = seasonalSwingMm({ widthMm: lidSize[1], species: species.id, sawn: 'unknown', climate });
  const lidMassKg = (boxVolume(lay.lidBox) + lid.battens.reduce((s, b) => s + boxVolume(b.world), 0)) * 1e-9 * species.densityKgM3At12;
  const cogY = (() => {
    const items = [lay.lidBox, ...lid.battens.map((b) => b.world)];
    const total = items.reduce((s, b) => s + boxVolume(b), 0);
    return items.reduce((s, b) => s + boxVolume(b) * (b.min[1] + b.max[1]) / 2, 0) / total;
  })();
  const checks: Check[] = [
    panelFloatCheck(idsOf([...walls.front.panels, ...walls.back.panels]), 'front and back', lay.floats.frontBack.acrossGrainWidthMm, lay.floats.frontBack.grooveDepthMm, lay.floats.frontBack.float),
    panelFloatCheck(idsOf([...walls.left.panels, ...walls.right.panels]), 'side', lay.floats.side.acrossGrainWidthMm, lay.floats.side.grooveDepthMm, lay.floats.side.float),
    ...railTongueCheck(railIds, p.railTongueLength, p.legGrooveDepth),
    ...grooveChecks({
      legSizeMm: L, grooveWidthMm: p.grooveWidth, legGrooveDepthMm: p.legGrooveDepth,
      legOuterWalls: { front: outerWall(lay.frontInsetMm), back: outerWall(lay.backInsetMm), side: outerWall(lay.sideInsetMm) },
      legInnerWalls: { front: innerWall(lay.frontInsetMm), back: innerWall(lay.backInsetMm), side: innerWall(lay.sideInsetMm) },
      stockThicknessMm: T, stileWidthMm: p.stileWidth, frameGrooveDepthMm: p.frameGrooveDepth,
      hasStiles: stileIds.length > 0, legIds, railIds, stileIds,
    }),
    ...stoppedGrooveCheck(legIds, p.legGrooveStop),
    ...panelThicknessCheck(idsOf(wallList.flatMap((w) => w.panels)), lay.panelThicknessMm, p.grooveWidth),
    ...stockSizeChecks(assembled.parts, p.maxBoardLength, p.maxBoardWidth),
    ...hingeRecessCheck(['lid', assembled.partIdOf.get(walls.back.topRail)!], p.hingeRecess, p.hingeLeafThickness),
    ...bottomFitCheck(['bottom'], p.bottomClearance, bottom.bottom.size[0], bottom.bottom.size[1]),
    ...battenSlotCheck(['lid', ...idsOf(lid.battens)], p.battenCount, p.battenSlots, lidSize[1], lidSwing, Math.max(...screws.map((s) => s.slotLengthMm))),
    lidSupportCheck({
      lidIds: ['lid', ...idsOf(lid.battens)], massKg: lidMassKg, cogDistanceMm: lay.hingeLineYMm - cogY, densityKgM3: species.densityKgM3At12,
      hingeType: p.hingeType, hingeCount: p.hingeCount, ratingPerHingeNm: p.hingeTorqueRatingNm,
    }),
    ...childSafetyCheck(['lid'], p.childAccess, p.hingeType),
  ];

  return {
    parts: assembled.parts,
    joints: assembled.joints,
    placements: assembled.placements,
    checks,
    bboxMm: boxSize(bbox),
    bboxMinMm: bbox.min,
    // The hinge pins sit on the back rail's outer face, level with the lid's underside.
    openings: [lidOpening(instanceRefs(assembled, lid.drafts), lay.hingeLineYMm, lay.lidBox.min[2])],
  };
}
