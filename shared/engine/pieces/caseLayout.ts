/**
 * The governing dimensions of a carcass piece (dresser or cabinet), worked out once from its
 * checked parameters: where the base, carcass, face frame and top sit, the grid of openings and
 * fronts, and what each drawer box or shelf gets. Impossible combinations throw an InputError
 * naming the parameter and the limit, before anything is built.
 */
import { InputError } from '../../errors.ts';
import type { Climate } from '../../wood/climate.ts';
import { getSheetGood } from '../../wood/sheetGoods.ts';
import type { BaseType } from '../constructions/caseBase.ts';
import { availableHeight, columnWidth, frontGrid, type FrameWidths, type FrontGrid } from '../constructions/frontGrid.ts';
import { SLIDE_RULES, slideLengthFor, type SlideType } from '../constructions/slides.ts';
import type { DrawerJoinery } from '../constructions/drawerBox.ts';
import type { CaseParams } from './caseParams.ts';

/** Least opening for a drawer or door, either way: 2 in. Casewright's limit. */
export const MIN_OPENING_MM = 2 * 25.4;
/** Solid base boards and runners are 3/4 in stock. Common practice, no published source. */
export const SOLID_STOCK_MM = 0.75 * 25.4;

/** A separate top over stretchers (mm). */
export interface TopPlan {
  material: 'solid' | 'sheet';
  thicknessMm: number;
  overhang: { front: number; side: number; back: number };
  boardWidthMm: number;
  stretcherWidthMm: number;
}

/** Drawers in every cell (mm). */
export interface DrawerPlan {
  slide: SlideType;
  sideThicknessMm: number;
  joinery: DrawerJoinery;
  bottomSheet: CaseParams['backSheet'];
  bottomGrooveDepthMm: number;
  bottomSetUpMm: number;
  topClearanceMm: number;
  bottomClearanceMm: number;
  /** 0: the longest slide that fits. */
  depthMm: number;
  rearClearanceMm: number;
  species: CaseParams['species'];
  /** Web frames between the rows, behind the face frame's rails; absent or null: none. */
  webFrames?: WebFramePlan | null;
}

/** Web frames between drawer rows in a face-framed carcass (mm). */
export interface WebFramePlan {
  /** A sheet dust panel in each bay, or an open frame. */
  dustPanelSheet: CaseParams['backSheet'] | null;
  railDepthMm: number;
  runnerWidthMm: number;
}

/** Where the web frames go (world mm): one band per boundary between rows, top first. */
export interface WebFrameLayout {
  bandsZ: [number, number][];
  frontRailY: [number, number];
  backRailY: [number, number];
  /** Side runners and one under each divider, left to right. */
  runnersX: [number, number][];
  grooveWidthMm: number;
  dustPanelSheet: CaseParams['backSheet'] | null;
}

/** Web frames (3/4 in stock) are grooved 1/4 in deep for the runners' tenons and the dust panels. Common practice, no published source. */
export const WEB_FRAME_GROOVE_DEPTH_MM = 0.25 * 25.4;
/** Gap between a web-frame tenon or dust-panel edge and its groove's bottom: 1/16 in. Common practice, no published source. */
export const WEB_FRAME_CLEARANCE_MM = 25.4 / 16;
/** Groove for the runners' tenons in an open web frame: 1/4 in. Common practice, no published source. */
const OPEN_FRAME_GROOVE_MM = 0.25 * 25.4;

/** What fills the grid. */
export type CaseContents =
  | { kind: 'drawers'; drawers: DrawerPlan }
  | { kind: 'doors' }
  | { kind: 'open' };

/** Everything a carcass piece builder is asked for, from its parameters. */
export interface CasePlan {
  kind: 'dresser' | 'cabinet';
  p: CaseParams;
  climate: Climate;
  top: TopPlan | null;
  baseType: BaseType;
  rows: number;
  columns: number;
  leaves: 1 | 2;
  /** Opening (or frameless cell) heights from the height the rows share, top row first. */
  rowHeights: (availableMm: number) => number[];
  /** The parameter to blame when a row comes out too short. */
  rowField: string;
  contents: CaseContents;
}

/** One drawer's box, worked out from its cell (world mm). */
export interface DrawerBoxLayout {
  row: number;
  col: number;
  opening: { x: [number, number]; z: [number, number] };
  box: { x: [number, number]; y: [number, number]; z: [number, number] };
  availableDepthMm: number;
}

/** The layout of a carcass piece. */
export interface CaseLayout {
  plan: CasePlan;
  t: number;
  backThicknessMm: number;
  baseHeightMm: number;
  ffT: number;
  frame: FrameWidths | null;
  carcassBox: { x: [number, number]; y: [number, number]; z: [number, number] };
  /** Carcass inside (as `carcassBox` builds it). */
  inside: { x: [number, number]; y: [number, number]; z: [number, number] };
  grid: FrontGrid;
  dividerXs: number[];
  /** Web frames between the rows, or null. */
  webFrames: WebFrameLayout | null;
  drawers: DrawerBoxLayout[];
}

const r = (n: number): number => Math.round(n * 100) / 100;
function fail(field: string, message: string, limit: string): never {
  throw new InputError(field, `${message}; must be ${limit}`, limit);
}

/** Works out the layout, or throws an InputError for a combination that cannot be built. */
export function caseLayout(plan: CasePlan): CaseLayout {
  const p = plan.p;
  const t = getSheetGood(p.carcassSheet, 'carcassSheet').thicknessMm;
  const bt = getSheetGood(p.backSheet, 'backSheet').thicknessMm;
  const baseHeightMm = plan.baseType === 'none' ? 0 : p.baseHeight;
  if (plan.baseType !== 'none' && p.baseHeight < 10) fail('baseHeight', `a ${r(p.baseHeight)} mm base is no base`, 'at least 10 mm, or choose no base');
  const topT = plan.top?.thicknessMm ?? 0;
  const ffT = p.faceFrame ? p.faceFrameThickness : 0;
  const z: [number, number] = [baseHeightMm, p.height - topT];
  const y: [number, number] = [ffT, p.depth];
  const x: [number, number] = [0, p.width];
  if (!p.faceFrame && p.frontMount === 'inset') fail('frontMount', 'inset fronts sit in a face frame\'s openings; a frameless case takes overlay fronts', 'overlay when there is no face frame');
  if (p.jointDepth >= t / 2 + 1e-9) fail('jointDepth', `a ${r(p.jointDepth)} mm dado or rabbet cuts more than half through the ${r(t)} mm sheet`, `at most ${r(t / 2)} mm`);
  const e = p.carcassJoinery === 'dado' ? p.dadoEndWall : 0;
  const carcassDepth = y[1] - y[0];
  const backBand = p.backFit === 'groove' ? p.backGrooveSetIn + bt : bt;
  if (carcassDepth < backBand + 4 * 25.4) fail('depth', `${r(p.depth)} mm leaves the carcass ${r(carcassDepth)} mm deep behind the face frame, too shallow for its back`, `at least ${r(ffT + backBand + 4 * 25.4)} mm`);
  if (plan.top && p.backFit === 'groove' && plan.top.stretcherWidthMm < backBand + 12) fail('stretcherWidth', 'the back stretcher must hold the back\'s groove', `at least ${r(backBand + 12)} mm`);
  if (plan.top && 2 * plan.top.stretcherWidthMm + backBand > carcassDepth) fail('stretcherWidth', `two ${r(plan.top.stretcherWidthMm)} mm stretchers do not fit in a ${r(carcassDepth)} mm deep carcass`, `at most ${r((carcassDepth - backBand) / 2)} mm`);
  const carcassHeight = z[1] - z[0];
  if (carcassHeight < 2 * (e + t) + MIN_OPENING_MM) fail('height', `${r(p.height)} mm leaves the carcass only ${r(carcassHeight)} mm tall`, `at least ${r(p.height - carcassHeight + 2 * (e + t) + MIN_OPENING_MM)} mm`);
  if (plan.baseType === 'toe-kick' && p.toeKickSetback + 2 * SOLID_STOCK_MM + t > p.depth) fail('toeKickSetback', `a ${r(p.toeKickSetback)} mm toe kick leaves no base under the carcass`, `at most ${r(p.depth - 2 * SOLID_STOCK_MM - t)} mm`);
  if (plan.baseType === 'legs' && 2 * p.footSize > Math.min(p.width, p.depth)) fail('footSize', `${r(p.footSize)} mm feet do not fit under the case`, `at most ${r(Math.min(p.width, p.depth) / 2)} mm`);

  const frame: FrameWidths | null = p.faceFrame
    ? { stileMm: p.faceFrameStile, topRailMm: p.faceFrameTopRail, bottomRailMm: p.faceFrameBottomRail, midRailMm: p.faceFrameMidRail, mullionMm: p.faceFrameMullion }
    : null;
  // The frame's outer rails hide the carcass bottom and top, so nothing stands in the openings.
  if (frame && frame.bottomRailMm < e + t - 1e-9) fail('faceFrameBottomRail', `a ${r(frame.bottomRailMm)} mm bottom rail leaves the carcass bottom showing in the openings`, `at least ${r(e + t)} mm`);
  if (frame && frame.topRailMm < e + t - 1e-9) fail('faceFrameTopRail', `a ${r(frame.topRailMm)} mm top rail leaves the carcass top showing in the openings`, `at least ${r(e + t)} mm`);
  if (frame && p.frontMount === 'overlay') {
    const most = Math.min(frame.stileMm, frame.topRailMm, frame.bottomRailMm);
    if (p.overlay > most + 1e-9) fail('overlay', `a ${r(p.overlay)} mm overlay reaches past the face frame's outer edge`, `at most ${r(most)} mm (the narrowest stile or outer rail)`);
  }
  const colW = columnWidth(x, plan.columns, frame);
  if (colW < MIN_OPENING_MM * 2) fail(plan.kind === 'dresser' ? 'drawerColumns' : 'width', `${plan.columns} columns leave openings only ${r(colW)} mm wide`, `openings at least ${r(MIN_OPENING_MM * 2)} mm wide`);
  const avail = availableHeight(z, plan.rows, frame);
  const heights = plan.rowHeights(avail);
  heights.forEach((h, i) => {
    if (!(h >= MIN_OPENING_MM)) fail(plan.rowField, `row ${i + 1} would be only ${r(h)} mm tall out of ${r(avail)} mm for ${plan.rows} rows`, `a value that leaves every row at least ${r(MIN_OPENING_MM)} mm`);
  });
  const grid = frontGrid({
    x, z, frame, rowHeightsMm: heights, columns: plan.columns, leaves: plan.leaves, mount: p.frontMount,
    revealMm: p.reveal, overlayMm: p.overlay, gapMm: p.frontGap, frontThicknessMm: p.frontThickness,
  });
  for (const cell of grid.cells) {
    for (const f of cell.fronts) {
      if (f.x[1] - f.x[0] < 25 || f.z[1] - f.z[0] < 25) fail(p.frontMount === 'inset' ? 'reveal' : 'frontGap', 'the fronts come out less than 25 mm across', 'a smaller value');
    }
  }

  const inset = p.frontMount === 'inset';
  const backFront = p.backFit === 'groove' ? p.depth - p.backGrooveSetIn - bt : p.depth - bt;
  const inside = { x: [t, p.width - t] as [number, number], y: [ffT, backFront] as [number, number], z: [z[0] + e + t, z[1] - e - t] as [number, number] };
  const dividerXs = plan.contents.kind === 'drawers' && plan.columns > 1 ? grid.columnBoundariesX : [];
  if (frame && dividerXs.length > 0 && frame.mullionMm < t) fail('faceFrameMullion', `a ${r(frame.mullionMm)} mm mullion does not cover the ${r(t)} mm divider behind it`, `at least ${r(t)} mm`);

  const webFrames = plan.contents.kind === 'drawers' ? webFrameLayout(plan, plan.contents.drawers, t, inside, grid, dividerXs, frame) : null;

  const drawers: DrawerBoxLayout[] = [];
  if (plan.contents.kind === 'drawers') {
    const d = plan.contents.drawers;
    const rule = SLIDE_RULES[d.slide];
    if (d.slide === 'wood-runners' && !frame) fail('slideType', 'wooden runners ride level with the face frame\'s rails; a frameless case needs slides', 'side-mount or undermount slides, or a face frame');
    if (d.bottomGrooveDepthMm > d.sideThicknessMm / 2 + 1e-9) fail('drawerBottomGroove', `a ${r(d.bottomGrooveDepthMm)} mm groove cuts more than half through the ${r(d.sideThicknessMm)} mm drawer stock`, `at most ${r(d.sideThicknessMm / 2)} mm`);
    const bottomT = getSheetGood(d.bottomSheet, 'drawerBottomSheet').thicknessMm;
    for (const cell of grid.cells) {
      const last = plan.columns - 1;
      const wallL = cell.col === 0 ? inside.x[0] : dividerXs[cell.col - 1]! + t / 2;
      const wallR = cell.col === last ? inside.x[1] : dividerXs[cell.col]! - t / 2;
      const ox: [number, number] = [Math.max(cell.x[0], wallL), Math.min(cell.x[1], wallR)];
      const oz: [number, number] = [Math.max(cell.z[0], inside.z[0]), Math.min(cell.z[1], inside.z[1])];
      const bx: [number, number] = [ox[0] + rule.sideClearanceMm, ox[1] - rule.sideClearanceMm];
      const bz: [number, number] = [d.slide === 'wood-runners' ? oz[0] : oz[0] + d.bottomClearanceMm, oz[1] - d.topClearanceMm];
      const where = `row ${cell.row + 1}${plan.columns > 1 ? `, column ${cell.col + 1}` : ''}`;
      if (bx[1] - bx[0] < 4 * d.sideThicknessMm + 25.4) fail('drawerSideThickness', `the drawer box in ${where} would be only ${r(bx[1] - bx[0])} mm wide`, 'thinner drawer sides, or wider openings');
      if (bz[1] - bz[0] < d.bottomSetUpMm + bottomT + 25.4) fail('drawerTopClearance', `the drawer box in ${where} would be only ${r(bz[1] - bz[0])} mm tall, too short for its bottom`, 'smaller clearances or taller rows');
      const y0 = inset ? p.frontThickness : 0;
      const availableDepthMm = inside.y[1] - y0 - d.rearClearanceMm;
      const length = d.depthMm > 0 ? d.depthMm : slideLengthFor(d.slide, availableDepthMm);
      if (length === null) fail('depth', `the case leaves ${r(availableDepthMm)} mm for the drawers, less than the shortest ${d.slide} slide`, `deep enough for a ${r(rule.lengthsMm![0]!)} mm slide`);
      if (length < 2 * d.sideThicknessMm + 25.4) fail('drawerDepth', `a ${r(length)} mm drawer is too shallow`, `at least ${r(2 * d.sideThicknessMm + 25.4)} mm, or 0 for the longest that fits`);
      drawers.push({ row: cell.row, col: cell.col, opening: { x: ox, z: oz }, box: { x: bx, y: [y0, y0 + length], z: bz }, availableDepthMm });
    }
  }
  return {
    plan, t, backThicknessMm: bt, baseHeightMm, ffT, frame,
    carcassBox: { x, y, z }, inside, grid, dividerXs, webFrames, drawers,
  };
}

/**
 * Web frames behind the face frame's rails between rows: each band's top is level with the
 * bottom of the opening above, so the drawer above rides on it; the frame is let into dadoes in
 * the sides, and the dividers stop on it. None without a face frame or with one row.
 */
function webFrameLayout(plan: CasePlan, d: DrawerPlan, t: number, inside: CaseLayout['inside'], grid: FrontGrid, dividerXs: readonly number[], frame: FrameWidths | null): WebFrameLayout | null {
  const w = d.webFrames;
  if (!w || !frame || plan.rows < 2) return null;
  const p = plan.p;
  if (frame.midRailMm < SOLID_STOCK_MM - 1e-9) fail('faceFrameMidRail', `a ${r(frame.midRailMm)} mm rail between rows does not hide a ${r(SOLID_STOCK_MM)} mm web frame`, `at least ${r(SOLID_STOCK_MM)} mm, or no web frames`);
  const bandsZ = grid.rows.slice(0, -1).map((row): [number, number] => [row[0] - SOLID_STOCK_MM, row[0]]);
  const frontRailY: [number, number] = [inside.y[0], inside.y[0] + w.railDepthMm];
  const backRailY: [number, number] = [inside.y[1] - w.railDepthMm, inside.y[1]];
  if (backRailY[0] - frontRailY[1] < MIN_OPENING_MM) fail('webFrameRailDepth', `two ${r(w.railDepthMm)} mm rails leave no room for runners in a ${r(inside.y[1] - inside.y[0])} mm deep carcass`, `at most ${r((inside.y[1] - inside.y[0] - MIN_OPENING_MM) / 2)} mm`);
  // Runners reach under the drawer sides when the drawers ride on them.
  const under = SLIDE_RULES[d.slide].sideClearanceMm + d.sideThicknessMm;
  const side = Math.max(w.runnerWidthMm, under);
  const centre = Math.max(w.runnerWidthMm, t + 2 * under);
  const runnersX: [number, number][] = [
    [inside.x[0] - p.jointDepth, inside.x[0] + side],
    ...dividerXs.map((xc): [number, number] => [xc - centre / 2, xc + centre / 2]),
    [inside.x[1] - side, inside.x[1] + p.jointDepth],
  ];
  const leastTenon = 2 * WEB_FRAME_GROOVE_DEPTH_MM + 3;
  if (w.runnerWidthMm < leastTenon) fail('runnerWidth', `a ${r(w.runnerWidthMm)} mm runner leaves no tenon between its shoulders`, `at least ${r(leastTenon)} mm`);
  runnersX.slice(1).forEach((xr, i) => {
    if (xr[0] - runnersX[i]![1] < MIN_OPENING_MM) fail('runnerWidth', `${r(w.runnerWidthMm)} mm runners leave less than ${r(MIN_OPENING_MM)} mm between them`, 'narrower runners, or wider columns');
  });
  const grooveWidthMm = w.dustPanelSheet ? getSheetGood(w.dustPanelSheet, 'dustPanelSheet').thicknessMm : OPEN_FRAME_GROOVE_MM;
  if (grooveWidthMm > SOLID_STOCK_MM / 2) fail('dustPanelSheet', `a ${r(grooveWidthMm)} mm dust panel is too thick for a groove in ${r(SOLID_STOCK_MM)} mm web-frame stock`, `at most ${r(SOLID_STOCK_MM / 2)} mm thick`);
  return { bandsZ, frontRailY, backRailY, runnersX, grooveWidthMm, dustPanelSheet: w.dustPanelSheet };
}
