/**
 * The dresser: a carcass of sheet goods (face frame or frameless), a bank of drawers in rows and
 * columns with graduated heights, drawer boxes sized from their openings for the slides, and a
 * top fastened so it can move. Built by the shared carcass-piece builder.
 */
import { DEFAULT_CLIMATE, type Climate } from '../../wood/climate.ts';
import { graduatedHeights } from '../constructions/graduatedHeights.ts';
import type { ParamValue, PieceSpec } from '../types.ts';
import { tipOverCheck } from '../checks/tipOver.ts';
import { buildCase, type CaseBuild } from './caseBuild.ts';
import { caseLayout, type CaseLayout, type CasePlan } from './caseLayout.ts';
import { buildFramedDresser, framedLayout, type FramedLayout, type FramedParams } from './dresserFramed.ts';
import { MAX_DRAWER_ROWS, type DresserParams } from './dresserParams.ts';

/** The carcass-piece plan a dresser's parameters describe. */
export function dresserPlan(params: Readonly<Record<string, ParamValue>>, climate: Climate): CasePlan {
  const p = params as unknown as DresserParams;
  const listed = Array.from({ length: MAX_DRAWER_ROWS }, (_, i) => p[`rowHeight${i + 1}`] as number);
  const rowField = { equal: 'drawerRows', arithmetic: 'graduationStep', geometric: 'graduationRatio', listed: `rowHeight${Math.max(1, p.drawerRows - 1)}` }[p.drawerGraduation];
  return {
    kind: 'dresser', p, climate,
    top: {
      material: p.topMaterial, thicknessMm: p.topThickness,
      overhang: { front: p.topOverhangFront, side: p.topOverhangSide, back: p.topOverhangBack },
      boardWidthMm: p.topBoardWidth, stretcherWidthMm: p.stretcherWidth,
    },
    baseType: p.baseType, rows: p.drawerRows, columns: p.drawerColumns, leaves: 1,
    rowHeights: (totalMm) => graduatedHeights({ totalMm, rows: p.drawerRows, graduation: p.drawerGraduation, stepMm: p.graduationStep, ratio: p.graduationRatio, listedMm: listed }),
    rowField,
    contents: {
      kind: 'drawers',
      drawers: {
        slide: p.slideType, sideThicknessMm: p.drawerSideThickness, joinery: p.drawerJoinery, bottomSheet: p.drawerBottomSheet,
        bottomGrooveDepthMm: p.drawerBottomGroove, bottomSetUpMm: p.drawerBottomSetUp, topClearanceMm: p.drawerTopClearance,
        bottomClearanceMm: p.drawerBottomClearance, depthMm: p.drawerDepth, rearClearanceMm: p.drawerRearClearance, species: p.drawerSpecies,
        webFrames: p.webFrames === 'none' ? null : { dustPanelSheet: p.webFrames === 'dust-panel' ? p.dustPanelSheet : null, railDepthMm: p.webFrameRailDepth, runnerWidthMm: p.runnerWidth },
      },
    },
  };
}

/** A dresser's worked layout (mm): the frame-and-panel one or the sheet-goods carcass one. */
export type DresserLayout = { framed: true; layout: FramedLayout } | { framed: false; layout: CaseLayout };

/**
 * Throws an InputError for the first combination of dresser parameters that cannot be built;
 * returns the layout the check worked out, so `buildDresser` need not work it out again.
 */
export function validateDresserCombinations(params: Readonly<Record<string, ParamValue>>, climate: Climate = DEFAULT_CLIMATE): DresserLayout {
  const plan = dresserPlan(params, climate);
  if (isFramed(plan)) return { framed: true, layout: framedLayout(...framedArgs(plan)) };
  return { framed: false, layout: caseLayout(plan) };
}

const isFramed = (plan: CasePlan): boolean => (plan.p as DresserParams).caseConstruction === 'frame-and-panel';

function framedArgs(plan: CasePlan): Parameters<typeof framedLayout> {
  const d = plan.contents.kind === 'drawers' ? plan.contents.drawers : null;
  return [plan.p as DresserParams & FramedParams, plan.top!, d!, plan.rows, plan.columns, plan.rowHeights, plan.rowField, plan.climate];
}

/**
 * Builds a dresser from a spec already checked by `validateSpec`; `layout` is the one those
 * checks worked out for this spec, worked out here when not given.
 */
export function buildDresser(spec: PieceSpec, layout?: DresserLayout): CaseBuild {
  const plan = dresserPlan(spec.params as Record<string, ParamValue>, spec.climate ?? DEFAULT_CLIMATE);
  if (isFramed(plan)) return buildFramedDresser(...framedArgs(plan), layout?.framed ? layout.layout : undefined);
  return buildCase(plan, { pieceChecks: (ids) => [tipOverCheck(ids.filter((id) => id.includes('side') || id === 'top'), 'dresser', plan.p.height, plan.p.depth)] }, layout && !layout.framed ? layout.layout : undefined);
}
