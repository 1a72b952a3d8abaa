/**
 * The cabinet: base, wall or tall; a carcass of sheet goods with a panel top, face frame or
 * frameless, one door or a pair, fixed and adjustable shelves, and (standing cabinets) a base.
 * Built by the shared carcass-piece builder; doors reuse the frame-and-panel face.
 */
import { InputError } from '../../errors.ts';
import { DEFAULT_CLIMATE, type Climate } from '../../wood/climate.ts';
import { getSheetGood } from '../../wood/sheetGoods.ts';
import type { Check, ParamValue, PieceSpec } from '../types.ts';
import { both, check } from '../checks/check.ts';
import { tipOverCheck } from '../checks/tipOver.ts';
import { buildCase, doorPanelFloat, type CaseBuild, type CaseExtras } from './caseBuild.ts';
import { caseLayout, type CaseLayout, type CasePlan } from './caseLayout.ts';
import type { CabinetParams } from './cabinetParams.ts';

/** A 36 in work surface: the usual kitchen counter height. Common practice, no published source. */
export const USUAL_WORK_SURFACE_MM = 36 * 25.4;

const r = (n: number): number => Math.round(n * 100) / 100;

/** The carcass-piece plan a cabinet's parameters describe. */
export function cabinetPlan(params: Readonly<Record<string, ParamValue>>, climate: Climate): CasePlan {
  const p = params as unknown as CabinetParams;
  return {
    kind: 'cabinet', p, climate, top: null,
    baseType: p.cabinetType === 'wall' ? 'none' : p.baseType,
    rows: 1, columns: 1, leaves: p.doorCount === 2 ? 2 : 1,
    rowHeights: (total) => [total], rowField: 'height',
    contents: p.doorCount === 0 ? { kind: 'open' } : { kind: 'doors' },
  };
}

/** Door and shelf options of a cabinet. */
function cabinetExtras(p: CabinetParams): Omit<CaseExtras, 'pieceChecks'> {
  return {
    doors: {
      style: p.doorStyle, slabMaterial: p.slabMaterial, slabSheet: p.slabSheet,
      frame: {
        stileWidthMm: p.doorStileWidth, railWidthMm: p.doorRailWidth, grooveWidthMm: p.doorGrooveWidth, grooveDepthMm: p.doorGrooveDepth,
        tongueClearanceMm: p.doorTongueClearance, panel: p.doorPanel, panelSheet: p.doorPanelSheet, panelThicknessMm: p.doorPanelThickness,
      },
    },
    shelves: {
      adjustable: p.adjustableShelves, fixed: p.fixedShelves, material: p.shelfMaterial, sheet: p.shelfSheet, solidThicknessMm: p.shelfThickness,
      edgeStrip: p.shelfEdgeStrip ? { heightMm: p.edgeStripHeight, thicknessMm: p.edgeStripThickness } : null,
      loadKgPerM: p.shelfLoad, frontSetbackMm: p.shelfFrontSetback, endClearanceMm: p.shelfEndClearance,
      holes: { spacingMm: p.holeSpacing, setbackMm: p.holeSetback, diameterMm: p.holeDiameter, depthMm: p.holeDepth, endMarginMm: p.holeEndMargin },
    },
  };
}

function fail(field: string, message: string, limit: string): never {
  throw new InputError(field, `${message}; must be ${limit}`, limit);
}

/**
 * Throws an InputError for the first combination of cabinet parameters that cannot be built;
 * returns the carcass layout (mm) the checks read, so `buildCabinet` need not work it out again.
 */
export function validateCabinetCombinations(params: Readonly<Record<string, ParamValue>>, climate: Climate = DEFAULT_CLIMATE): CaseLayout {
  const p = params as unknown as CabinetParams;
  const lay = caseLayout(cabinetPlan(params, climate));
  const front = lay.grid.cells[0]!.fronts[0]!;
  if (p.doorCount > 0 && p.doorStyle === 'frame-and-panel') {
    const w = front.x[1] - front.x[0];
    const h = front.z[1] - front.z[0];
    if (2 * p.doorStileWidth + 25.4 > w) fail('doorStileWidth', `two ${r(p.doorStileWidth)} mm stiles leave no panel in a ${r(w)} mm door`, `at most ${r((w - 25.4) / 2)} mm`);
    if (2 * p.doorRailWidth + 25.4 > h) fail('doorRailWidth', `two ${r(p.doorRailWidth)} mm rails leave no panel in a ${r(h)} mm door`, `at most ${r((h - 25.4) / 2)} mm`);
    if (p.doorGrooveWidth >= p.frontThickness - 4) fail('doorGrooveWidth', `a ${r(p.doorGrooveWidth)} mm groove leaves no walls in ${r(p.frontThickness)} mm stock`, `at most ${r(p.frontThickness - 4)} mm`);
    if (p.doorGrooveDepth + 12 > Math.min(p.doorStileWidth, p.doorRailWidth)) fail('doorGrooveDepth', `a ${r(p.doorGrooveDepth)} mm groove is too deep for ${r(Math.min(p.doorStileWidth, p.doorRailWidth))} mm stiles and rails`, `at most ${r(Math.min(p.doorStileWidth, p.doorRailWidth) - 12)} mm`);
    if (p.doorTongueClearance >= p.doorGrooveDepth / 2) fail('doorTongueClearance', 'the clearance leaves too little tongue', `less than ${r(p.doorGrooveDepth / 2)} mm`);
    const panelT = p.doorPanel === 'solid' ? p.doorPanelThickness : getSheetGood(p.doorPanelSheet, 'doorPanelSheet').thicknessMm;
    const most = (p.frontThickness + p.doorGrooveWidth) / 2;
    const { float } = doorPanelFloat(cabinetExtras(p).doors!, w, p.species, climate);
    const need = float.gapEachSideMm + 0.5;
    if (need > p.doorGrooveDepth) fail('doorGrooveDepth', `the door panels need ${r(float.gapEachSideMm)} mm of float each side, which leaves no tongue in a ${r(p.doorGrooveDepth)} mm groove`, `at least ${r(need)} mm (or a plywood panel)`);
    if (panelT > most + 1e-9) fail(p.doorPanel === 'solid' ? 'doorPanelThickness' : 'doorPanelSheet', `a ${r(panelT)} mm panel would stand proud of the door frame's back`, `at most ${r(most)} mm`);
  }
  const shelfT = p.shelfMaterial === 'sheet' ? getSheetGood(p.shelfSheet, 'shelfSheet').thicknessMm : p.shelfThickness;
  const total = p.adjustableShelves + p.fixedShelves;
  const inside = lay.inside;
  if (total > 0) {
    const pitch = (inside.z[1] - inside.z[0]) / (total + 1);
    const strip = p.shelfEdgeStrip ? Math.max(0, p.edgeStripHeight - shelfT) : 0;
    const need = shelfT + strip + 2 * p.holeSpacing + p.holeDiameter;
    if (pitch < need) fail(p.adjustableShelves > 0 ? 'adjustableShelves' : 'fixedShelves', `${total} shelves leave only ${r(pitch)} mm between them`, `fewer shelves (each needs about ${r(need)} mm)`);
    if (p.adjustableShelves > 0) {
      if (inside.z[1] - inside.z[0] < 2 * p.holeEndMargin + p.holeSpacing) fail('holeEndMargin', 'the hole margins leave no room for a row of holes', `at most ${r((inside.z[1] - inside.z[0] - p.holeSpacing) / 2)} mm`);
      const depth = inside.y[1] - inside.y[0];
      if (2 * p.holeSetback + p.holeDiameter > depth) fail('holeSetback', `hole lines ${r(p.holeSetback)} mm in from the front and back cross in a ${r(depth)} mm deep inside`, `at most ${r((depth - p.holeDiameter) / 2)} mm`);
      if (p.holeDepth >= lay.t - 2) fail('holeDepth', `${r(p.holeDepth)} mm holes go through the ${r(lay.t)} mm sides`, `at most ${r(lay.t - 3)} mm`);
      const frontY = Math.max(lay.ffT, p.frontMount === 'inset' && p.doorCount > 0 ? p.frontThickness : 0) + p.shelfFrontSetback;
      const stripBack = frontY + (p.shelfEdgeStrip ? p.edgeStripThickness : 0);
      if (inside.y[0] + p.holeSetback - p.holeDiameter / 2 < stripBack + 1) fail('holeSetback', 'the front hole line sits under the shelf\'s front edge or strip', `at least ${r(stripBack + 1 + p.holeDiameter / 2 - inside.y[0])} mm`);
    }
    if (p.shelfEndClearance * 2 >= inside.x[1] - inside.x[0] - 25) fail('shelfEndClearance', 'too much', 'smaller');
  }
  return lay;
}

function workSurfaceCheck(p: CabinetParams, partIds: readonly string[]): Check[] {
  if (p.cabinetType !== 'base' || p.countertopThickness <= 0) return [];
  const surface = p.height + p.countertopThickness;
  return [check({
    id: 'work-surface', severity: 'info', title: 'Work-surface height', partIds,
    numbers: { cabinetHeightMm: p.height, countertopMm: p.countertopThickness, workSurfaceMm: surface, usualMm: USUAL_WORK_SURFACE_MM },
    message: `The ${both(p.height)} cabinet under a ${both(p.countertopThickness)} countertop puts the work surface at ${both(surface)}; 36 in is usual for a kitchen counter (common practice). The countertop is not among the parts.`,
  })];
}

/**
 * Builds a cabinet from a spec already checked by `validateSpec`; `layout` is the carcass layout
 * those checks worked out for this spec, worked out here when not given.
 */
export function buildCabinet(spec: PieceSpec, layout?: CaseLayout): CaseBuild {
  const plan = cabinetPlan(spec.params as Record<string, ParamValue>, spec.climate ?? DEFAULT_CLIMATE);
  const p = plan.p as CabinetParams;
  return buildCase(plan, {
    ...cabinetExtras(p),
    pieceChecks: (ids) => {
      const sides = ids.filter((id) => id.includes('side'));
      const hung = p.cabinetType === 'wall'
        ? [check({
          id: 'hanging', severity: 'caution', title: 'A wall cabinet must hang on the framing', partIds: sides, numbers: { heightMm: p.height, depthMm: p.depth },
          message: 'A loaded wall cabinet that lets go falls on whoever is below. Hang it on screws into studs or blocking, through a hanging rail or the back, never on drywall anchors alone; follow your local building rules and the fastener maker\'s ratings.',
          fix: 'Add a hanging rail inside the top of the back and screw through it into the studs.',
        })]
        : [tipOverCheck(sides, 'cabinet', p.height, p.depth)];
      return [...hung, ...workSurfaceCheck(p, sides)];
    },
  }, layout);
}
