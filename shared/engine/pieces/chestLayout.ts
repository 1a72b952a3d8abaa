/**
 * The chest's governing dimensions, worked out once from its parameters: where every rail,
 * groove, panel and the lid sit so that the case over its legs is exactly the width and depth
 * asked for and the closed lid's top is exactly the height asked for. Validation and the
 * builder read the same numbers, so what is checked is what gets built.
 */
import { getSheetGood } from '../../wood/sheetGoods.ts';
import { panelFloatMm, type PanelFloatMm } from '../../wood/float.ts';
import type { Climate } from '../../wood/climate.ts';
import type { SpeciesId } from '../../wood/species.ts';
import type { SheetGoodId } from '../../wood/sheetGoods.ts';
import type { HingeRecess } from '../constructions/lid.ts';

/** The chest's parameters, typed; see `CHEST_PARAMS` for meaning, defaults and ranges (mm). */
export interface ChestParams {
  width: number; depth: number; height: number;
  legSize: number; footHeight: number;
  stockThickness: number; topRailWidth: number; bottomRailWidth: number;
  frontStileCount: number; sideStileCount: number; stileWidth: number;
  grooveWidth: number; legGrooveDepth: number; frameGrooveDepth: number;
  railTongueLength: number; tongueClearance: number; legGrooveStop: number; backGrooveOffset: number;
  panelMaterial: 'plywood' | 'solid'; panelSheet: SheetGoodId; panelThickness: number; panelGrain: 'horizontal' | 'vertical';
  bottomSheet: SheetGoodId; cleatWidth: number; cleatThickness: number; bottomClearance: number;
  lidThickness: number; lidOverhangFront: number; lidOverhangSide: number; lidOverhangBack: number;
  lidBoardWidth: number; battenCount: number; battenWidth: number; battenThickness: number;
  battenSlots: boolean; screwDiameter: number;
  hingeType: 'lid-support' | 'butt'; hingeCount: number; hingeLength: number; hingeLeafWidth: number;
  hingeLeafThickness: number; hingeRecess: HingeRecess; hingeTorqueRatingNm: number;
  fingerNotch: boolean; fingerNotchWidth: number; fingerNotchDepth: number;
  species: SpeciesId; childAccess: boolean;
  lengthAllowance: number; widthAllowance: number; thicknessAllowance: number;
  maxBoardLength: number; maxBoardWidth: number;
}

/**
 * Gap kept between a lid batten's ends and the top rails' inner faces: 1/8 in, so the lid
 * closes without the battens touching the rails. Casewright's allowance.
 */
export const BATTEN_END_CLEARANCE_MM = 3.175;

/** Panel float of one wall's panels, across the grain. */
export interface WallFloat {
  /** Width across the grain used for the float (the widest panel of the wall), mm. */
  acrossGrainWidthMm: number;
  /** Shallowest groove the panel's moving edges sit in, mm. */
  grooveDepthMm: number;
  float: PanelFloatMm;
}

/** Every governing dimension of a chest, mm, world coordinates (see `types.ts`). */
export interface ChestLayout {
  p: ChestParams;
  L: number; T: number;
  /** Lid stands this far proud when the hinge leaves are not let in. */
  hingeGapMm: number;
  legLengthMm: number;
  spanXMm: number; spanYMm: number;
  frontInsetMm: number; sideInsetMm: number; backInsetMm: number;
  /** Rail inner faces: the inside of the case's walls. */
  inner: { left: number; right: number; front: number; back: number };
  /** Top of the bottom rail (panel opening bottom) and bottom of the top rail. */
  panelZ: [number, number];
  bayXMm: number; bayYMm: number;
  panelThicknessMm: number;
  panelSheetName: string | null;
  bottomThicknessMm: number;
  hingeLineYMm: number;
  hingeCentresX: number[];
  lidRecessMm: number; railRecessMm: number;
  lidBox: { min: [number, number, number]; max: [number, number, number] };
  battenYRange: [number, number];
  floats: { frontBack: WallFloat; side: WallFloat };
}

function wallFloat(p: ChestParams, climate: Climate, bayMm: number, openingHeightMm: number): WallFloat {
  const solid = p.panelMaterial === 'solid';
  const vertical = solid && p.panelGrain === 'vertical';
  // Horizontal grain: the panel moves up and down into the rail grooves. Vertical: sideways,
  // into a leg groove on one side and a stile or leg groove on the other, the shallower ruling.
  const acrossGrainWidthMm = vertical ? bayMm + p.legGrooveDepth + p.frameGrooveDepth : openingHeightMm + 2 * p.frameGrooveDepth;
  const grooveDepthMm = vertical ? Math.min(p.legGrooveDepth, p.frameGrooveDepth) : p.frameGrooveDepth;
  const float = panelFloatMm({
    panelWidthMm: acrossGrainWidthMm,
    material: solid ? p.species : p.panelSheet,
    sawn: 'unknown',
    grooveDepthMm,
    climate,
  });
  return { acrossGrainWidthMm, grooveDepthMm, float };
}

/** Works out a chest's layout from checked parameters and the climate. */
export function chestLayout(p: ChestParams, climate: Climate): ChestLayout {
  const L = p.legSize;
  const T = p.stockThickness;
  const hingeGapMm = p.hingeRecess === 'none' ? 2 * p.hingeLeafThickness : 0;
  const legLengthMm = p.height - p.lidThickness;
  const spanXMm = p.width - 2 * L;
  const spanYMm = p.depth - 2 * L;
  // Rail tongues are centred on the rails and the leg grooves centred on the legs' faces, so a
  // rail's centre plane lies half a leg in from the outside; the back may be moved outward.
  const frontInsetMm = L / 2 - T / 2;
  const sideInsetMm = frontInsetMm;
  const backInsetMm = L / 2 - p.backGrooveOffset - T / 2;
  const inner = {
    left: sideInsetMm + T,
    right: p.width - sideInsetMm - T,
    front: frontInsetMm + T,
    back: p.depth - backInsetMm - T,
  };
  const panelZ: [number, number] = [p.footHeight + p.bottomRailWidth, legLengthMm - p.topRailWidth];
  const bayXMm = (spanXMm - p.frontStileCount * p.stileWidth) / (p.frontStileCount + 1);
  const bayYMm = (spanYMm - p.sideStileCount * p.stileWidth) / (p.sideStileCount + 1);
  const sheet = p.panelMaterial === 'plywood' ? getSheetGood(p.panelSheet, 'panelSheet') : null;
  const panelThicknessMm = sheet ? sheet.thicknessMm : p.panelThickness;
  const bottomThicknessMm = getSheetGood(p.bottomSheet, 'bottomSheet').thicknessMm;

  const hingeLineYMm = p.depth - backInsetMm;
  const first = L + p.hingeLength;
  const last = p.width - L - p.hingeLength;
  const hingeCentresX = Array.from({ length: p.hingeCount }, (_, i) => first + ((last - first) * i) / (p.hingeCount - 1));
  const lidRecessMm = p.hingeRecess === 'lid' ? 2 * p.hingeLeafThickness : p.hingeRecess === 'both' ? p.hingeLeafThickness : 0;
  const railRecessMm = p.hingeRecess === 'back-rail' ? 2 * p.hingeLeafThickness : p.hingeRecess === 'both' ? p.hingeLeafThickness : 0;
  const lidZ0 = legLengthMm + hingeGapMm;
  const lidBox = {
    min: [-p.lidOverhangSide, -p.lidOverhangFront, lidZ0] as [number, number, number],
    max: [p.width + p.lidOverhangSide, p.depth + p.lidOverhangBack, lidZ0 + p.lidThickness] as [number, number, number],
  };
  const battenYRange: [number, number] = [inner.front + BATTEN_END_CLEARANCE_MM, inner.back - BATTEN_END_CLEARANCE_MM];
  const openingHeightMm = panelZ[1] - panelZ[0];
  const frontBack = wallFloat(p, climate, bayXMm, openingHeightMm);
  // Only panels with vertical grain move across their bay; the others move up and down the
  // same opening in every wall, so the sides share the front's float.
  const side = p.panelMaterial === 'solid' && p.panelGrain === 'vertical' ? wallFloat(p, climate, bayYMm, openingHeightMm) : frontBack;
  return {
    p, L, T, hingeGapMm, legLengthMm, spanXMm, spanYMm, frontInsetMm, sideInsetMm, backInsetMm, inner, panelZ,
    bayXMm, bayYMm, panelThicknessMm, panelSheetName: sheet?.name ?? null, bottomThicknessMm,
    hingeLineYMm, hingeCentresX, lidRecessMm, railRecessMm, lidBox, battenYRange,
    floats: { frontBack, side },
  };
}
