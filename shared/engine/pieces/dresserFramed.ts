/**
 * The dresser built like the chest: four corner legs from the floor to the underside of the
 * top, frame-and-panel sides and back made by the chest's own frame-and-panel face, and between
 * the front legs a web frame under each row of drawers (front and back rails tenoned into the
 * legs, runners tenoned into the rails). Drawers ride on the runners, or on metal slides screwed
 * to spacers on the runners that bring the mounting face out to the legs' inner faces; the top is
 * screwed up through the top web frame, fixed at the front and slotted at the back.
 */
import { InputError } from '../../errors.ts';
import type { Climate } from '../../wood/climate.ts';
import { panelFloatMm, type PanelFloatMm } from '../../wood/float.ts';
import { glueUpBoardWidthsMm } from '../../wood/glueUp.ts';
import { getSheetGood, type SheetGoodId } from '../../wood/sheetGoods.ts';
import { getSpecies } from '../../wood/species.ts';
import { assemble, type JointDraft, type PartDraft } from '../assembly.ts';
import { caseTop, stretcherFasteners } from '../constructions/caseTop.ts';
import { cornerLegs } from '../constructions/cornerLegs.ts';
import { drawerBox, drawerNamer } from '../constructions/drawerBox.ts';
import { frameAndPanelFace, type FacePanelSpec } from '../constructions/frameAndPanelFace.ts';
import { frontGrainMatch, frontGrid, type FrameWidths, type FrontGrid } from '../constructions/frontGrid.ts';
import { plainPart } from '../constructions/plainPart.ts';
import { SLIDE_SPACER_HEIGHT_MM, slideSpacers, type SlideSpacerPlacement } from '../constructions/slideSpacers.ts';
import { SLIDE_RULES, slideLengthFor } from '../constructions/slides.ts';
import { webFrame } from '../constructions/webFrame.ts';
import { boxBetween, boxSize, boxUnion } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { WallFrame } from '../geometry/wallFrame.ts';
import type { Check, Material, Opening } from '../types.ts';
import { drawerFitChecks, drawerTravelCheck, undermountSetUpCheck } from '../checks/drawerFit.ts';
import { frontClearanceChecks, legAndRailRevealChecks, revealChecks } from '../checks/fronts.ts';
import { railTongueCheck, stoppedGrooveCheck } from '../checks/joinery.ts';
import { panelFloatCheck } from '../checks/panelFloat.ts';
import { stockSizeChecks } from '../checks/stock.ts';
import { tipOverCheck } from '../checks/tipOver.ts';
import { drawerStockGlueUp, type CaseBuild } from './caseBuild.ts';
import { MIN_OPENING_MM, type DrawerPlan, type TopPlan } from './caseLayout.ts';
import { roughSizer } from './chest.ts';
import { drawerOpening, instanceRefs } from './openings.ts';
import type { DresserParams } from './dresserParams.ts';

/** Shoulders beside each web-frame tenon: 1/8 in. Common practice, no published source. */
const SHOULDER_MM = 25.4 / 8;
/** Least tenon or runner bearing the layout accepts: 3 mm. Casewright's limit. */
const MIN_TENON_MM = 3;

/** The framed dresser's extra parameters, typed. */
export interface FramedParams {
  legSize: number; footHeight: number; stockThickness: number; topRailWidth: number; bottomRailWidth: number;
  sideStileCount: number; stileWidth: number; grooveWidth: number; legGrooveDepth: number; frameGrooveDepth: number;
  railTongueLength: number; tongueClearance: number; legGrooveStop: number;
  panelMaterial: 'plywood' | 'solid'; panelSheet: SheetGoodId; panelThickness: number; panelGrain: 'horizontal' | 'vertical';
  webFrameRailDepth: number; runnerWidth: number;
}

type P = DresserParams & FramedParams;

const r = (n: number): number => Math.round(n * 100) / 100;
function fail(field: string, message: string, limit: string): never {
  throw new InputError(field, `${message}; must be ${limit}`, limit);
}

/** The governing dimensions of a framed dresser (world mm). */
export interface FramedLayout {
  L: number; T: number; legLengthMm: number; insetMm: number;
  inner: { left: number; right: number; back: number };
  grid: FrontGrid;
  frame: FrameWidths;
  bands: [number, number][];
  runnersX: [number, number][];
  backRailY: [number, number];
  panel: { thicknessMm: number; sheet: boolean };
  floats: { side: { across: number; groove: number; float: PanelFloatMm }; back: { across: number; groove: number; float: PanelFloatMm } };
  drawers: { row: number; col: number; opening: { x: [number, number]; z: [number, number] }; box: { x: [number, number]; y: [number, number]; z: [number, number] }; availableDepthMm: number }[];
  /** Spacers the metal slides screw to, each row's left to right; none on wooden runners. */
  spacers: SlideSpacerPlacement[];
}

function wallFloat(p: P, climate: Climate, spanMm: number, count: number, openingHeightMm: number): { across: number; groove: number; float: PanelFloatMm } {
  const solid = p.panelMaterial === 'solid';
  const vertical = solid && p.panelGrain === 'vertical';
  const bay = (spanMm - count * p.stileWidth) / (count + 1);
  const across = vertical ? bay + p.legGrooveDepth + p.frameGrooveDepth : openingHeightMm + 2 * p.frameGrooveDepth;
  const groove = vertical ? Math.min(p.legGrooveDepth, p.frameGrooveDepth) : p.frameGrooveDepth;
  return { across, groove, float: panelFloatMm({ panelWidthMm: across, material: solid ? p.species : p.panelSheet, sawn: 'unknown', grooveDepthMm: groove, climate }) };
}

/**
 * How far overlay fronts lap the rails between rows and the mullions (mm). They lap the legs and
 * the top and bottom web frames by the overlay; the rails between rows are only a stock
 * thickness tall, so where two overlays do not fit on one, each front laps it by half of what
 * leaves it showing as much as the top and bottom rails show (never less than the gap between
 * fronts), and the mullions likewise as much as the legs: neighbours meet without overlapping
 * and the reveals stay even.
 */
function framedOverlayLaps(p: Pick<P, 'overlay' | 'frontGap'>, frame: FrameWidths): { railMm: number; mullionMm: number } {
  const shows = (outerMm: number) => Math.max(p.frontGap, outerMm - p.overlay);
  return {
    railMm: Math.min(p.overlay, (frame.midRailMm - shows(Math.min(frame.topRailMm, frame.bottomRailMm))) / 2),
    mullionMm: Math.min(p.overlay, (frame.mullionMm - shows(frame.stileMm)) / 2),
  };
}

function meetOverRails(grid: FrontGrid, p: P, frame: FrameWidths): FrontGrid {
  if (p.frontMount !== 'overlay') return grid;
  const lap = framedOverlayLaps(p, frame);
  const lastRow = grid.rows.length - 1;
  const lastCol = grid.columns.length - 1;
  const cells = grid.cells.map((cell) => ({
    ...cell,
    fronts: cell.fronts.map((f) => ({
      ...f,
      x: [cell.col === 0 ? f.x[0] : cell.x[0] - lap.mullionMm, cell.col === lastCol ? f.x[1] : cell.x[1] + lap.mullionMm] as [number, number],
      z: [cell.row === lastRow ? f.z[0] : cell.z[0] - lap.railMm, cell.row === 0 ? f.z[1] : cell.z[1] + lap.railMm] as [number, number],
    })),
  }));
  return { ...grid, cells };
}

/** Works out the layout, or throws an InputError naming the parameter and the limit. */
export function framedLayout(p: P, top: TopPlan, drawers: DrawerPlan, rows: number, columns: number, rowHeights: (a: number) => number[], rowField: string, climate: Climate): FramedLayout {
  const L = p.legSize;
  const T = p.stockThickness;
  const gw = p.grooveWidth;
  if (2 * L + 2 * MIN_OPENING_MM > p.width) fail('legSize', `legs of ${r(L)} mm leave no room between them in a ${r(p.width)} mm width`, `at most ${r((p.width - 2 * MIN_OPENING_MM) / 2)} mm`);
  if (T > L) fail('stockThickness', `rails ${r(T)} mm thick are thicker than the legs`, `at most ${r(L)} mm`);
  if (gw >= T - 2) fail('grooveWidth', `a ${r(gw)} mm groove leaves no walls in ${r(T)} mm stock`, `at most ${r(T - 2)} mm`);
  const deepest = L / 2 - gw / 2;
  if (p.legGrooveDepth > deepest) fail('legGrooveDepth', `${r(p.legGrooveDepth)} mm grooves on two faces of a ${r(L)} mm leg run into each other`, `at most ${r(deepest)} mm`);
  if (p.railTongueLength > p.legGrooveDepth) fail('railTongueLength', `a ${r(p.railTongueLength)} mm tenon is longer than the ${r(p.legGrooveDepth)} mm leg groove and mortise are deep`, `at most ${r(p.legGrooveDepth)} mm`);
  const narrowRail = Math.min(p.topRailWidth, p.bottomRailWidth);
  if (p.frameGrooveDepth + p.legGrooveStop + 6.35 > narrowRail) fail('frameGrooveDepth', `a ${r(p.frameGrooveDepth)} mm groove and ${r(p.legGrooveStop)} mm stop leave too little tenon on a ${r(narrowRail)} mm rail`, `at most ${r(narrowRail - p.legGrooveStop - 6.35)} mm`);
  if (p.tongueClearance >= p.frameGrooveDepth - 1) fail('tongueClearance', 'the clearance leaves no tongue', `less than ${r(p.frameGrooveDepth - 1)} mm`);
  if (p.sideStileCount > 0 && 2 * p.frameGrooveDepth + 6.35 > p.stileWidth) fail('stileWidth', 'the centre stiles would be cut through by their grooves', `at least ${r(2 * p.frameGrooveDepth + 6.35)} mm`);
  const legLengthMm = p.height - top.thicknessMm;
  if (legLengthMm < p.footHeight + p.bottomRailWidth + p.topRailWidth + MIN_OPENING_MM) fail('footHeight', `the foot and side rails do not fit in ${r(legLengthMm)} mm of leg`, `at most ${r(legLengthMm - p.bottomRailWidth - p.topRailWidth - MIN_OPENING_MM)} mm`);
  const insetMm = L / 2 - T / 2;
  const inner = { left: insetMm + T, right: p.width - insetMm - T, back: p.depth - insetMm - T };
  const rd = p.webFrameRailDepth;
  if (rd < L + p.frameGrooveDepth) fail('webFrameRailDepth', `${r(rd)} mm rails leave the runners inside the front legs`, `at least ${r(L + p.frameGrooveDepth)} mm`);
  if (inner.back - 2 * rd < MIN_OPENING_MM) fail('depth', `${r(p.depth)} mm leaves no room for runners between the web-frame rails`, `at least ${r(p.depth + MIN_OPENING_MM - (inner.back - 2 * rd))} mm`);
  if (insetMm - 2 * SHOULDER_MM < MIN_TENON_MM) fail('legSize', `${r(L)} mm legs leave the back rails no tenon`, `at least ${r(T + 2 * (2 * SHOULDER_MM + MIN_TENON_MM))} mm`);
  const panelT = p.panelMaterial === 'plywood' ? getSheetGood(p.panelSheet, 'panelSheet').thicknessMm : p.panelThickness;
  if (panelT > (T + gw) / 2 + 1e-9) fail(p.panelMaterial === 'plywood' ? 'panelSheet' : 'panelThickness', `a ${r(panelT)} mm panel would stand inside the rails' inner face`, `at most ${r((T + gw) / 2)} mm`);
  const openingH = legLengthMm - p.topRailWidth - p.footHeight - p.bottomRailWidth;
  if (p.depth - 2 * L < MIN_OPENING_MM) fail('depth', 'the legs leave no side panels', `at least ${r(2 * L + MIN_OPENING_MM)} mm`);
  if (p.sideStileCount * p.stileWidth + (p.sideStileCount + 1) * 25.4 > p.depth - 2 * L) fail('sideStileCount', 'the centre stiles do not fit in the sides', 'fewer');
  const floats = { side: wallFloat(p, climate, p.depth - 2 * L, p.sideStileCount, openingH), back: wallFloat(p, climate, p.width - 2 * L, 0, openingH) };
  for (const [wall, f] of Object.entries(floats)) {
    if (f.float.gapEachSideMm + 0.5 > f.groove) fail('frameGrooveDepth', `the ${wall} panels need ${r(f.float.gapEachSideMm)} mm of float each side, which leaves no tongue in a ${r(f.groove)} mm groove`, `at least ${r(f.float.gapEachSideMm + 0.5)} mm, or a plywood panel`);
  }
  if (p.frontMount === 'overlay' && p.overlay > T) fail('overlay', `a ${r(p.overlay)} mm overlay reaches past the ${r(T)} mm web-frame rails into the top`, `at most ${r(T)} mm`);

  const frame: FrameWidths = { stileMm: L, topRailMm: T, bottomRailMm: T, midRailMm: T, mullionMm: p.faceFrameMullion };
  const z: [number, number] = [p.footHeight, legLengthMm];
  const avail = legLengthMm - p.footHeight - (rows + 1) * T;
  const heights = rowHeights(avail);
  heights.forEach((h, i) => {
    if (!(h >= MIN_OPENING_MM)) fail(rowField, `row ${i + 1} would be only ${r(h)} mm tall out of ${r(avail)} mm for ${rows} rows`, `a value that leaves every row at least ${r(MIN_OPENING_MM)} mm`);
  });
  const colW = (p.width - 2 * L - (columns - 1) * p.faceFrameMullion) / columns;
  if (colW < 2 * MIN_OPENING_MM) fail('drawerColumns', `${columns} columns leave openings only ${r(colW)} mm wide`, `openings at least ${r(2 * MIN_OPENING_MM)} mm wide`);
  const grid = meetOverRails(frontGrid({ x: [0, p.width], z, frame, rowHeightsMm: heights, columns, leaves: 1, mount: p.frontMount, revealMm: p.reveal, overlayMm: p.overlay, gapMm: p.frontGap, frontThicknessMm: p.frontThickness }), p, frame);
  const bands: [number, number][] = [[legLengthMm - T, legLengthMm], ...grid.rows.map((row) => [row[0] - T, row[0]] as [number, number])];

  // The runners are laid out for wooden runners whatever the slide: on slides they carry the spacers.
  const c = SLIDE_RULES['wood-runners'].sideClearanceMm;
  const st = drawers.sideThicknessMm;
  const reach = c + st + SHOULDER_MM + MIN_TENON_MM;
  const runnersX: [number, number][] = [
    [inner.left, Math.max(L + reach, inner.left + p.runnerWidth)],
    ...grid.columns.slice(1).map((col, i) => [grid.columns[i]![1] - c - st, col[0] + c + st] as [number, number]),
    [Math.min(p.width - L - reach, inner.right - p.runnerWidth), inner.right],
  ];
  const backRailY: [number, number] = [inner.back - rd, inner.back];
  const inset = p.frontMount === 'inset';
  const y0 = inset ? p.frontThickness : 0;
  const runners = drawers.slide === 'wood-runners';
  // On slides the box stands the slide's clearance in from each side of the opening, which the spacers make flush.
  const slideGap = SLIDE_RULES[drawers.slide].sideClearanceMm;
  const availableDepthMm = inner.back - y0 - drawers.rearClearanceMm;
  const length = drawers.depthMm > 0 ? drawers.depthMm : slideLengthFor(drawers.slide, availableDepthMm);
  if (length === null) fail('depth', `the case leaves ${r(availableDepthMm)} mm for the drawers, less than the shortest ${drawers.slide} slide`, `deep enough for a ${r(SLIDE_RULES[drawers.slide].lengthsMm![0]!)} mm slide, or wooden runners`);
  if (length < 2 * st + 25.4) fail(drawers.depthMm > 0 ? 'drawerDepth' : 'depth', `a ${r(length)} mm drawer is too shallow`, `at least ${r(2 * st + 25.4)} mm`);
  const drawersOut = grid.cells.map((cell) => {
    const bx: [number, number] = [cell.x[0] + slideGap, cell.x[1] - slideGap];
    const bz: [number, number] = [runners ? cell.z[0] : cell.z[0] + drawers.bottomClearanceMm, cell.z[1] - drawers.topClearanceMm];
    const where = `row ${cell.row + 1}${columns > 1 ? `, column ${cell.col + 1}` : ''}`;
    if (bx[1] - bx[0] < 4 * st + 25.4) fail('drawerSideThickness', `the drawer box in ${where} would be only ${r(bx[1] - bx[0])} mm wide`, 'thinner drawer sides, or wider openings');
    if (bz[1] - bz[0] < drawers.bottomSetUpMm + 25.4 + 6) fail('drawerTopClearance', 'the drawer boxes would be too short for their bottoms', 'smaller, or taller rows');
    return { row: cell.row, col: cell.col, opening: { x: cell.x, z: cell.z }, box: { x: bx, y: [y0, y0 + length] as [number, number], z: bz }, availableDepthMm };
  });
  if (drawers.bottomGrooveDepthMm > st / 2 + 1e-9) fail('drawerBottomGroove', 'the groove cuts more than half through the drawer stock', `at most ${r(st / 2)} mm`);
  const spacers = runners ? [] : spacerLayout(p, L, T, inner, grid, y0 + length);
  return {
    L, T, legLengthMm, insetMm, inner, grid, frame, bands, runnersX, backRailY,
    panel: { thicknessMm: panelT, sheet: p.panelMaterial === 'plywood' }, floats, drawers: drawersOut, spacers,
  };
}

/**
 * The slide spacers of each row (world mm), standing on the web frame under it. At the sides a
 * strip fills the step from the side frame's inner face to the legs' inner faces (the rails sit
 * centred on the legs, so the step is half of leg less rail thickness); it runs from the back of
 * the front leg, where the slide's front end screws to the leg itself, to the slide's back end,
 * stopping at the back leg. Between columns a block as wide as the mullion runs from behind it.
 */
function spacerLayout(p: P, L: number, T: number, inner: FramedLayout['inner'], grid: FrontGrid, slideEndY: number): SlideSpacerPlacement[] {
  const columns = grid.columns.length;
  const sideEndY = Math.min(slideEndY, p.depth - L);
  if (sideEndY - L < 25.4) fail('drawerDepth', `the slides end ${r(slideEndY)} mm from the front, leaving their spacers no length behind the ${r(L)} mm legs`, `a drawer depth of at least ${r(L + 25.4)} mm, or 0 for the longest slide that fits`);
  return grid.rows.flatMap((row, ri) => {
    const z: [number, number] = [row[0], row[0] + Math.min(SLIDE_SPACER_HEIGHT_MM, row[1] - row[0])];
    const out: SlideSpacerPlacement[] = [{ row: ri, boundary: 0, kind: 'side', x: [inner.left, L], y: [L, sideEndY], z }];
    for (let k = 1; k < columns; k++) out.push({ row: ri, boundary: k, kind: 'centre', x: [grid.columns[k - 1]![1], grid.columns[k]![0]], y: [T, slideEndY], z });
    out.push({ row: ri, boundary: columns, kind: 'side', x: [p.width - L, inner.right], y: [L, sideEndY], z });
    return out;
  });
}

/** Builds the framed dresser. */
export function buildFramedDresser(p: P, top: TopPlan, d: DrawerPlan, rows: number, columns: number, rowHeights: (a: number) => number[], rowField: string, climate: Climate, layout?: FramedLayout): CaseBuild {
  const lay = layout ?? framedLayout(p, top, d, rows, columns, rowHeights, rowField, climate);
  const { L, T } = lay;
  const species = getSpecies(p.species);
  const solid: Material = { kind: 'solid', speciesId: species.id, speciesName: species.name };
  const sheet = (id: SheetGoodId): Material => ({ kind: 'sheet', sheetId: id, sheetName: getSheetGood(id).name });
  const explodeMm = 0.15 * Math.max(p.width, p.depth, p.height);
  const joints: JointDraft[] = [];
  const drafts: PartDraft[] = [];

  // Sides and back: the chest's frame-and-panel face between the legs.
  const panelFor = (float: PanelFloatMm): FacePanelSpec => (p.panelMaterial === 'solid'
    ? { material: solid, thicknessMm: lay.panel.thicknessMm, grain: p.panelGrain, gapAcrossGrainMm: float.gapEachSideMm, gapAlongGrainMm: p.tongueClearance }
    : { material: sheet(p.panelSheet), thicknessMm: lay.panel.thicknessMm, grain: 'none', gapAcrossGrainMm: float.gapEachSideMm, gapAlongGrainMm: float.gapEachSideMm });
  const wall = (name: 'back' | 'left' | 'right', frame: WallFrame) => frameAndPanelFace({
    wall: name, groupId: name === 'back' ? 'back' : 'side', groupName: name === 'back' ? 'Back' : 'Side', frame,
    spanMm: name === 'back' ? p.width - 2 * L : p.depth - 2 * L, stock: solid, stockThicknessMm: T, railInsetMm: lay.insetMm,
    bottomRail: { bottomMm: p.footHeight, widthMm: p.bottomRailWidth }, topRail: { topMm: lay.legLengthMm, widthMm: p.topRailWidth },
    stileCount: name === 'back' ? 0 : p.sideStileCount, stileWidthMm: p.stileWidth, grooveWidthMm: p.grooveWidth,
    postGrooveDepthMm: p.legGrooveDepth, frameGrooveDepthMm: p.frameGrooveDepth, railTongueLengthMm: p.railTongueLength,
    tongueClearanceMm: p.tongueClearance, postGrooveStopMm: p.legGrooveStop, panel: panelFor(name === 'back' ? lay.floats.back.float : lay.floats.side.float), explodeMm,
  });
  const walls = [
    wall('back', { origin: [p.width - L, p.depth, 0], u: '-X', w: '+Y' }),
    wall('left', { origin: [0, p.depth - L, 0], u: '-Y', w: '-X' }),
    wall('right', { origin: [p.width, L, 0], u: '+Y', w: '+X' }),
  ];

  // Web frames, the top one drilled and slotted for the top's screws.
  const fixedLineY = p.webFrameRailDepth / 2;
  const frames = lay.bands.map((band, i) => webFrame({
    index: i, z: band, x: [L, p.width - L], frontRailY: [0, p.webFrameRailDepth], backRailY: lay.backRailY,
    ends: { kind: 'tenon', mortiseDepthMm: p.legGrooveDepth, railTongueLengthMm: p.railTongueLength, backLegY: [p.depth - L, p.depth] },
    runnersX: lay.runnersX, material: solid, grooveWidthMm: p.grooveWidth,
    grooveDepthMm: p.frameGrooveDepth, tongueClearanceMm: p.tongueClearance, shoulderMm: SHOULDER_MM, explodeMm: explodeMm * 0.5,
    ...(i === 0 ? { railFeatures: (which: 'front' | 'back', world) => stretcherFasteners(which, world, { fixedLineYMm: fixedLineY, screwDiameterMm: p.screwDiameter, species: top.material === 'solid' ? species.id : null, climate }) } : {}),
  }));

  // Legs with the sides' and back's grooves and the web frames' mortises; mortises get their own names.
  const mortises = frames.flatMap((f) => f.mortises);
  const legs = cornerLegs({ widthMm: p.width, depthMm: p.depth, legSizeMm: L, legLengthMm: lay.legLengthMm, material: solid, grooves: [...walls.flatMap((w) => w.postGrooves), ...mortises.map((m) => m.groove)], explodeMm });
  const mortiseBoxes = new Set(mortises.map((m) => m.groove.box));
  const renamed = new Map<PartDraft, PartDraft>();
  for (const leg of legs.drafts) {
    const features: FeatureDraft[] = leg.features.map((f) => (mortiseBoxes.has(f.removed[0]!) ? { ...f, id: `mortise-${f.removed[0]!.min[2]}-${f.removed[0]!.min[1]}`, idTemplate: 'mortise-{n}', type: 'mortise', label: 'mortise for a web-frame rail' } : f));
    renamed.set(leg, { ...leg, features });
  }
  const owner = (g: (typeof mortises)[number]['groove']) => {
    const o = legs.grooveOwner(g);
    const leg = renamed.get(o.draft)!;
    const feature = leg.features.find((f) => f.removed[0] === g.box)!;
    return { draft: leg, featureId: feature.id };
  };
  drafts.push(...renamed.values(), ...walls.flatMap((w) => w.drafts), ...frames.flatMap((f) => f.drafts));
  for (const w of walls) {
    joints.push(...w.joints);
    for (const contact of w.postContacts) {
      const o = owner(w.postGrooves.find((g) => g.end === contact.end)!);
      joints.push({ type: contact.type, a: { draft: contact.draft, featureIds: contact.featureIds }, b: { draft: o.draft, featureIds: [o.featureId] }, clearanceMm: contact.clearanceMm, glued: contact.glued, floating: contact.floating, note: contact.note });
    }
  }
  for (const f of frames) joints.push(...f.joints);
  for (const m of mortises) {
    const o = owner(m.groove);
    joints.push({ type: 'stub-tenon', a: { draft: m.rail, featureIds: [m.tongueId] }, b: { draft: o.draft, featureIds: [o.featureId] }, clearanceMm: p.legGrooveDepth - p.railTongueLength, glued: true, floating: false, note: 'Rail tenon glued into the leg mortise.' });
  }

  // Mullions between drawers in a row, dowelled to the rails above and below.
  lay.grid.rows.forEach((row, ri) => lay.grid.columns.slice(1).forEach((col, ci) => {
    const m = plainPart({
      group: 'mullion', member: `row-${ri + 1}`, label: `mullion, row ${ri + 1}, ${ci + 1}`, role: 'face-frame', material: solid, grain: 'length',
      world: boxBetween([lay.grid.columns[ci]![1], 0, row[0]], [col[0], T, row[1]]), axes: { length: '+Z', width: '+X', thickness: '+Y' },
      explodeMm: [0, -explodeMm * 0.5, 0], name: drawerNamer('mullion', 'Mullion'),
    });
    drafts.push(m);
    joints.push({ type: 'pocket-screw', a: { draft: m, featureIds: [] }, b: { draft: frames[ri]!.frontRail, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Dowelled and glued between the rails.' });
  }));

  // Top.
  const topBox = boxBetween([-top.overhang.side, -top.overhang.front, p.height - top.thicknessMm], [p.width + top.overhang.side, p.depth + top.overhang.back, p.height]);
  const topDepth = boxSize(topBox)[1];
  const glue = top.material === 'solid' && topDepth > top.boardWidthMm ? glueUpBoardWidthsMm({ panelWidthMm: topDepth, maxBoardWidthMm: top.boardWidthMm, arrangement: 'equal' }) : null;
  const topBuilt = caseTop({ box: topBox, material: top.material === 'solid' ? solid : sheet(p.carcassSheet), ...(glue ? { glueUp: { boards: glue.length, boardWidthMm: glue[0]! } } : {}), stretchers: [frames[0]!.frontRail, frames[0]!.backRail], explodeMm });
  drafts.push(...topBuilt.drafts);
  joints.push(...topBuilt.joints);

  // Spacers for metal slides, on the runners of the web frame under each row.
  const spacers = slideSpacers({ spacers: lay.spacers, material: solid, runnerUnder: (row, boundary) => frames[row + 1]!.runners[boundary]!, explodeMm: explodeMm * 0.2 });
  drafts.push(...spacers.drafts);
  joints.push(...spacers.joints);
  const rule = SLIDE_RULES[d.slide];

  // Drawers on the web frames; fronts wider than the widest board are glued up, as on the carcass dresser.
  const glueUpFor = (widthMm: number) => {
    if (widthMm <= p.maxBoardWidth) return {};
    const widths = glueUpBoardWidthsMm({ panelWidthMm: widthMm, maxBoardWidthMm: p.maxBoardWidth, arrangement: 'equal' });
    return { glueUp: { boards: widths.length, boardWidthMm: widths[0]! } };
  };
  const dSpecies = getSpecies(d.species);
  const stock: Material = { kind: 'solid', speciesId: dSpecies.id, speciesName: dSpecies.name };
  const bottomSheet = getSheetGood(d.bottomSheet, 'drawerBottomSheet');
  const fronts: { facts: Parameters<typeof frontClearanceChecks>[0][number]; draft: PartDraft }[] = [];
  const fitFacts: { where: string; drafts: PartDraft[]; dl: FramedLayout['drawers'][number] }[] = [];
  for (const dl of lay.drawers) {
    const fb = lay.grid.cells.find((c) => c.row === dl.row && c.col === dl.col)!.fronts[0]!;
    const where = `row ${dl.row + 1}${columns > 1 ? `, column ${dl.col + 1}` : ''}`;
    const front = plainPart({
      group: 'drawer/face', member: `row-${dl.row + 1}`, label: `drawer front, ${where}`, role: 'drawer-front', material: solid, grain: 'length',
      world: boxBetween([fb.x[0], fb.y[0], fb.z[0]], [fb.x[1], fb.y[1], fb.z[1]]), axes: { length: '+X', width: '+Z', thickness: '-Y' },
      explodeMm: [0, -explodeMm, 0], name: drawerNamer('drawer-front', 'Drawer front'), notes: ['Screwed to the box from inside.'], ...glueUpFor(fb.z[1] - fb.z[0]),
      grainMatch: frontGrainMatch(fb, columns),
    });
    const box = drawerBox({
      box: boxBetween([dl.box.x[0], dl.box.y[0], dl.box.z[0]], [dl.box.x[1], dl.box.y[1], dl.box.z[1]]), row: dl.row + 1, where, stock,
      sideThicknessMm: d.sideThicknessMm, endThicknessMm: d.sideThicknessMm, joinery: d.joinery, bottom: { sheet: sheet(d.bottomSheet), thicknessMm: bottomSheet.thicknessMm },
      bottomGrooveDepthMm: d.bottomGrooveDepthMm, bottomSetUpMm: d.bottomSetUpMm, bottomClearanceMm: 25.4 / 32, glueUpFor: drawerStockGlueUp(p), explodeMm: explodeMm * 0.4,
    });
    drafts.push(front, ...box.drafts);
    joints.push(...box.joints, { type: 'front-screwed', a: { draft: front, featureIds: [] }, b: { draft: box.front, featureIds: [] }, clearanceMm: 0, glued: false, floating: false, note: 'Screwed from inside the box.' });
    const frame = frames[dl.row + 1]!;
    for (const [i, side] of [[0, dl.col], [1, dl.col + 1]] as const) {
      const support = d.slide === 'wood-runners' ? frame.runners[side]! : spacers.at(dl.row, side);
      const note = d.slide === 'wood-runners' ? rule.note : `${rule.note} The slide screws to the spacer behind the leg or mullion, and at its front end to the leg or mullion.`;
      joints.push({ type: 'drawer-slide', a: { draft: box.sides[i]!, featureIds: [] }, b: { draft: support, featureIds: [] }, clearanceMm: rule.sideClearanceMm, glued: false, floating: false, note });
    }
    fronts.push({ facts: { id: `drawer-${dl.row + 1}-${dl.col + 1}`, label: `drawer front (${where})`, partIds: [], kind: 'drawer', hinge: 'left', x: fb.x, z: fb.z, thicknessMm: p.frontThickness }, draft: front });
    fitFacts.push({ where, drafts: [front, ...box.drafts], dl });
  }

  const assembled = assemble(drafts, joints, roughSizer(p));
  const idsOf = (list: readonly PartDraft[]): string[] => [...new Set(list.map((x) => assembled.partIdOf.get(x)!))];
  const bbox = boxUnion(drafts.map((x) => x.world));
  const checks: Check[] = [
    panelFloatCheck(idsOf(walls.slice(1).flatMap((w) => w.panels)), 'side', lay.floats.side.across, lay.floats.side.groove, lay.floats.side.float),
    panelFloatCheck(idsOf(walls[0]!.panels), 'back', lay.floats.back.across, lay.floats.back.groove, lay.floats.back.float),
    ...railTongueCheck(idsOf(walls.flatMap((w) => [w.topRail, w.bottomRail])), p.railTongueLength, p.legGrooveDepth),
    ...stoppedGrooveCheck(idsOf([...renamed.values()]), p.legGrooveStop),
    ...fitFacts.flatMap((f) => drawerFitChecks({
      id: `${f.dl.row + 1}-${f.dl.col + 1}`, where: f.where, partIds: idsOf(f.drafts), openingHeightMm: f.dl.opening.z[1] - f.dl.opening.z[0],
      boxHeightMm: f.dl.box.z[1] - f.dl.box.z[0], availableDepthMm: f.dl.availableDepthMm, boxDepthMm: f.dl.box.y[1] - f.dl.box.y[0], slide: d.slide, rule,
    })),
    ...undermountSetUpCheck(idsOf(fitFacts.flatMap((f) => f.drafts.filter((x) => x.role === 'drawer-side'))), d.slide, d.bottomSetUpMm),
    ...drawerTravelCheck(fitFacts.map((f) => ({ partIds: idsOf(f.drafts), boxDepthMm: f.dl.box.y[1] - f.dl.box.y[0] })), d.slide),
    ...(p.frontMount === 'inset'
      ? revealChecks(idsOf(fronts.map((f) => f.draft)), lay.frame, p.frontMount, p.reveal, p.overlay, rows, columns)
      : legAndRailRevealChecks(idsOf(fronts.map((f) => f.draft)), lay.frame, p.overlay, p.frontGap, framedOverlayLaps(p, lay.frame), rows, columns)),
    ...frontClearanceChecks(fronts.map((f) => ({ ...f.facts, partIds: idsOf([f.draft]) }))),
    ...stockSizeChecks(assembled.parts, p.maxBoardLength, p.maxBoardWidth),
    tipOverCheck(idsOf([...renamed.values()]), 'dresser', p.height, p.depth),
  ];
  const openings: Opening[] = fitFacts.map((f) => drawerOpening(`drawer-${f.dl.row + 1}-${f.dl.col + 1}`, instanceRefs(assembled, f.drafts), f.dl.box.y[1] - f.dl.box.y[0]));

  return { parts: assembled.parts, joints: assembled.joints, placements: assembled.placements, checks, bboxMm: boxSize(bbox), bboxMinMm: bbox.min, openings };
}
