/**
 * Builds a carcass piece (dresser or cabinet) from its plan: base, carcass with dividers and
 * shelves, face frame, top, and the drawers or doors in the grid, then the checks. The pieces
 * differ only in what they ask for; every part comes from the shared constructions.
 */
import type { Climate } from '../../wood/climate.ts';
import { panelFloatMm, type PanelFloatMm } from '../../wood/float.ts';
import { glueUpBoardWidthsMm } from '../../wood/glueUp.ts';
import { getSheetGood, type SheetGoodId } from '../../wood/sheetGoods.ts';
import { sheetStiffness } from '../../wood/sheetStiffness.ts';
import { getSpecies, type SpeciesId } from '../../wood/species.ts';
import { assemble, type JointDraft, type PartDraft } from '../assembly.ts';
import { caseBase } from '../constructions/caseBase.ts';
import { caseTop, stretcherFasteners } from '../constructions/caseTop.ts';
import { carcassBox } from '../constructions/carcassBox.ts';
import { doorLeaf, hingeCentres, type DoorFrameSpec } from '../constructions/doorLeaf.ts';
import { drawerBox, drawerNamer } from '../constructions/drawerBox.ts';
import { faceFrame } from '../constructions/faceFrame.ts';
import { frontGrainMatch } from '../constructions/frontGrid.ts';
import { plainPart } from '../constructions/plainPart.ts';
import { shelves as buildShelves, type HoleLine } from '../constructions/shelves.ts';
import { SLIDE_RULES } from '../constructions/slides.ts';
import { webFrame } from '../constructions/webFrame.ts';
import { boxBetween, boxSize, boxUnion } from '../geometry/box.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import { sectionStiffnessNmm2, type SectionPiece } from '../structure/beam.ts';
import type { Check, GlueUpPlan, Material, Opening } from '../types.ts';
import { drawerFitChecks, drawerTravelCheck, undermountSetUpCheck } from '../checks/drawerFit.ts';
import { frontClearanceChecks, revealChecks, type FrontFacts } from '../checks/fronts.ts';
import { panelThicknessCheck } from '../checks/joinery.ts';
import { panelFloatCheck } from '../checks/panelFloat.ts';
import { shelfSagCheck } from '../checks/shelfSag.ts';
import { stockSizeChecks } from '../checks/stock.ts';
import { roughSizer, type ChestBuild } from './chest.ts';
import { doorOpening, drawerOpening, instanceRefs } from './openings.ts';
import { caseLayout, SOLID_STOCK_MM, WEB_FRAME_CLEARANCE_MM, WEB_FRAME_GROOVE_DEPTH_MM, type CaseLayout, type CasePlan } from './caseLayout.ts';

/** Doors of a cabinet (mm). */
export interface DoorOptions {
  style: 'slab' | 'frame-and-panel';
  slabMaterial: 'solid' | 'sheet';
  slabSheet: SheetGoodId;
  frame: Omit<DoorFrameSpec, 'stock' | 'panel'> & { panel: 'solid' | 'plywood'; panelSheet: SheetGoodId; panelThicknessMm: number };
}

/** Shelves of a cabinet (mm, kg/m). */
export interface ShelfOptions {
  adjustable: number;
  fixed: number;
  material: 'sheet' | 'solid';
  sheet: SheetGoodId;
  solidThicknessMm: number;
  edgeStrip: { heightMm: number; thicknessMm: number } | null;
  loadKgPerM: number;
  frontSetbackMm: number;
  endClearanceMm: number;
  holes: HoleLine;
}

/** Extra options only some pieces use. */
export interface CaseExtras {
  doors?: DoorOptions;
  shelves?: ShelfOptions;
  /** Checks only the piece knows (tip-over, work surface), given the built parts' ids. */
  pieceChecks: (partIds: readonly string[], layout: CaseLayout) => Check[];
}

/** The float a door's panel needs: its width across the grain (mm) and the wood library's answer. */
export function doorPanelFloat(dO: DoorOptions, doorWidthMm: number, speciesId: SpeciesId, climate: Climate): { acrossGrain: number; float: PanelFloatMm } {
  // Door panels stand with their grain vertical, so they move side to side into the stiles.
  const acrossGrain = doorWidthMm - 2 * dO.frame.stileWidthMm + 2 * dO.frame.grooveDepthMm;
  const float = panelFloatMm({ panelWidthMm: acrossGrain, material: dO.frame.panel === 'solid' ? speciesId : dO.frame.panelSheet, sawn: 'unknown', grooveDepthMm: dO.frame.grooveDepthMm, climate });
  return { acrossGrain, float };
}

/**
 * Glue-ups for drawer-box parts: a part whose rough width (finished plus the width allowance)
 * is wider than the widest board is glued up from boards that are, each with its allowance.
 */
export function drawerStockGlueUp(p: Pick<CaseBuildParams, 'maxBoardWidth' | 'widthAllowance'>): (widthMm: number) => GlueUpPlan | undefined {
  return (widthMm) => {
    if (widthMm + p.widthAllowance <= p.maxBoardWidth) return undefined;
    const widths = glueUpBoardWidthsMm({ panelWidthMm: widthMm, maxBoardWidthMm: p.maxBoardWidth - p.widthAllowance, arrangement: 'equal' });
    return { boards: widths.length, boardWidthMm: widths[0]! };
  };
}

type CaseBuildParams = CasePlan['p'];

/** What a builder returns before derived outputs: the chest's shape. */
export type CaseBuild = ChestBuild;

/**
 * Builds the piece described by `plan`; `layout` is `caseLayout(plan)` when the spec check
 * already worked it out, worked out here when not given.
 */
export function buildCase(plan: CasePlan, extras: CaseExtras, layout?: CaseLayout): CaseBuild {
  const lay = layout ?? caseLayout(plan);
  const p = plan.p;
  const species = getSpecies(p.species);
  const solid: Material = { kind: 'solid', speciesId: species.id, speciesName: species.name };
  const sheet = (id: SheetGoodId): Material => ({ kind: 'sheet', sheetId: id, sheetName: getSheetGood(id).name });
  const carcassSheet = sheet(p.carcassSheet);
  const explodeMm = 0.15 * Math.max(p.width, p.depth, p.height);
  const t = lay.t;
  const joints: JointDraft[] = [];
  const drafts: PartDraft[] = [];
  const checks: Check[] = [];
  const glueUpFor = (widthMm: number, boardMm: number): GlueUpPlan | undefined => {
    if (widthMm <= boardMm) return undefined;
    const widths = glueUpBoardWidthsMm({ panelWidthMm: widthMm, maxBoardWidthMm: boardMm, arrangement: 'equal' });
    return { boards: widths.length, boardWidthMm: widths[0]! };
  };

  // Shelves first: their dadoes and pin holes go into the carcass sides.
  const sh = extras.shelves;
  const inside = lay.inside;
  const shelfSet = sh && sh.adjustable + sh.fixed > 0 ? (() => {
    const shelfT = sh.material === 'sheet' ? getSheetGood(sh.sheet, 'shelfSheet').thicknessMm : sh.solidThicknessMm;
    const total = sh.adjustable + sh.fixed;
    const h = inside.z[1] - inside.z[0];
    const slots = Array.from({ length: total }, (_, i) => inside.z[0] + ((i + 1) * h) / (total + 1) - shelfT / 2);
    const fixedIdx = new Set(Array.from({ length: sh.fixed }, (_, i) => Math.round(((i + 1) * (total + 1)) / (sh.fixed + 1)) - 1));
    const inset = p.frontMount === 'inset' && plan.contents.kind === 'doors';
    const frontY = Math.max(lay.ffT, inset ? p.frontThickness : 0) + sh.frontSetbackMm;
    return {
      shelfT,
      built: buildShelves({
        inside: boxBetween([inside.x[0], inside.y[0], inside.z[0]], [inside.x[1], inside.y[1], inside.z[1]]),
        frontYMm: frontY, backYMm: inside.y[1], material: sh.material === 'sheet' ? sheet(sh.sheet) : solid, thicknessMm: shelfT,
        edgeStrip: sh.edgeStrip ? { material: solid, ...sh.edgeStrip } : null, endClearanceMm: sh.endClearanceMm, dadoDepthMm: p.jointDepth,
        fixedZ: slots.filter((_, i) => fixedIdx.has(i)), adjustableZ: slots.filter((_, i) => !fixedIdx.has(i)), holes: sh.holes, explodeMm,
      }),
    };
  })() : null;

  // Dadoes across the sides for the web frames between drawer rows.
  const wf = lay.webFrames;
  const webFrameDadoes: FeatureDraft[] = (wf?.bandsZ ?? []).flatMap((band, k) => (['left', 'right'] as const).map((side): FeatureDraft => {
    const xs: [number, number] = side === 'left' ? [inside.x[0] - p.jointDepth, inside.x[0]] : [inside.x[1], inside.x[1] + p.jointDepth];
    return {
      id: `dado-web-frame-${k + 1}`, idTemplate: 'dado-web-frame-{n}', type: 'dado', label: 'dado for a web frame', faceDir: side === 'left' ? '+X' : '-X',
      removed: [boxBetween([xs[0], wf!.frontRailY[0], band[0]], [xs[1], wf!.backRailY[1], band[1]])],
    };
  }));

  // Carcass, with the top's screw holes and slots in its stretchers.
  const top = plan.top;
  const cb = lay.carcassBox;
  const fixedLineY = cb.y[0] + (top?.stretcherWidthMm ?? 0) / 2;
  const carcass = carcassBox({
    box: boxBetween([cb.x[0], cb.y[0], cb.z[0]], [cb.x[1], cb.y[1], cb.z[1]]),
    sheet: carcassSheet, thicknessMm: t, joinery: p.carcassJoinery, jointDepthMm: p.jointDepth, dadoEndWallMm: p.dadoEndWall,
    top: top ? 'stretchers' : 'panel', stretcherWidthMm: top?.stretcherWidthMm ?? 0,
    back: { sheet: sheet(p.backSheet), thicknessMm: lay.backThicknessMm, fit: p.backFit, grooveSetInMm: p.backGrooveSetIn },
    dividerXs: lay.dividerXs, dividerBreaksZ: wf?.bandsZ ?? [], extraFeatures: [...(shelfSet?.built.sideFeatures ?? []), ...webFrameDadoes], edgeBanded: !p.faceFrame,
    ...(top ? { topFeatures: (which: 'top' | 'front' | 'back', world) => stretcherFasteners(which === 'back' ? 'back' : 'front', world, { fixedLineYMm: fixedLineY, screwDiameterMm: p.screwDiameter, species: top.material === 'solid' ? species.id : null, climate: plan.climate }) } : {}),
    explodeMm,
  });
  drafts.push(...carcass.drafts);
  joints.push(...carcass.joints);

  // Web frames in their dadoes; the dividers stand on their centre runners.
  const frames = (wf?.bandsZ ?? []).map((band, k) => webFrame({
    index: k, z: band, x: inside.x, frontRailY: wf!.frontRailY, backRailY: wf!.backRailY, ends: { kind: 'dado', depthMm: p.jointDepth },
    runnersX: wf!.runnersX, material: solid, grooveWidthMm: wf!.grooveWidthMm, grooveDepthMm: WEB_FRAME_GROOVE_DEPTH_MM, tongueClearanceMm: WEB_FRAME_CLEARANCE_MM,
    shoulderMm: WEB_FRAME_GROOVE_DEPTH_MM, ...(wf!.dustPanelSheet ? { dustPanel: { material: sheet(wf!.dustPanelSheet) } } : {}), explodeMm: explodeMm * 0.5,
  }));
  frames.forEach((frame, k) => {
    drafts.push(...frame.drafts);
    joints.push(...frame.joints);
    const dado = `dado-web-frame-${k + 1}`;
    const housed = [frame.frontRail, frame.backRail];
    for (const [side, runner] of [[carcass.left, frame.runners[0]!], [carcass.right, frame.runners[frame.runners.length - 1]!]] as const) {
      for (const part of [...housed, runner]) {
        joints.push({ type: 'dado', a: { draft: part, featureIds: [] }, b: { draft: side, featureIds: [dado] }, clearanceMm: 0, glued: part !== runner, floating: false, note: part === runner ? 'Runner sits in the dado dry, so the frame goes in square.' : 'Rail glued into the side\'s dado.' });
      }
    }
    const [bottom, top] = wf!.bandsZ[k]!;
    lay.dividerXs.forEach((_, i) => {
      for (const z of [bottom - 1, top + 1]) {
        joints.push({ type: 'butt-screwed', a: { draft: carcass.dividerAt(i, z), featureIds: [] }, b: { draft: frame.runners[i + 1]!, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Divider glued and screwed through the web frame\'s runner.' });
      }
    });
  });
  if (shelfSet) {
    drafts.push(...shelfSet.built.drafts);
    joints.push(...shelfSet.built.jointsWith(carcass.left, carcass.right));
  }

  // Base under the whole case.
  if (plan.baseType !== 'none') {
    const base = caseBase({
      type: plan.baseType, box: boxBetween([0, 0, 0], [p.width, p.depth, lay.baseHeightMm]), setbackMm: plan.baseType === 'toe-kick' ? p.toeKickSetback : 0,
      material: plan.baseType === 'toe-kick' ? carcassSheet : solid, thicknessMm: plan.baseType === 'toe-kick' ? t : SOLID_STOCK_MM, legSizeMm: p.footSize, explodeMm,
    });
    drafts.push(...base.drafts);
    joints.push(...base.joints);
    for (const b of base.drafts) joints.push({ type: 'butt-screwed', a: { draft: b, featureIds: [] }, b: { draft: carcass.bottom, featureIds: [] }, clearanceMm: 0, glued: false, floating: false, note: 'Screwed up into the carcass through cleats or corner blocks.' });
  }

  // Face frame.
  const ff = lay.frame ? faceFrame({
    box: boxBetween([0, 0, cb.z[0]], [p.width, lay.ffT, cb.z[1]]), material: solid, stileWidthMm: lay.frame.stileMm,
    rows: lay.grid.rows, columns: lay.grid.columns, explodeMm: explodeMm * 0.6,
  }) : null;
  if (ff) {
    drafts.push(...ff.drafts);
    joints.push(...ff.joints);
    for (const [stile, side] of [[ff.stiles[0]!, carcass.left], [ff.stiles[1]!, carcass.right]] as const) {
      joints.push({ type: 'face-frame-glued', a: { draft: stile, featureIds: [] }, b: { draft: side, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Face frame glued to the carcass front edges; clamp or pin while it sets.' });
    }
  }

  // Top.
  if (top) {
    const box = boxBetween([-top.overhang.side, -top.overhang.front, p.height - top.thicknessMm], [p.width + top.overhang.side, p.depth + top.overhang.back, p.height]);
    const glueUp = top.material === 'solid' ? glueUpFor(boxSize(box)[1], top.boardWidthMm) : undefined;
    const built = caseTop({ box, material: top.material === 'solid' ? solid : carcassSheet, ...(glueUp ? { glueUp } : {}), stretchers: carcass.tops, explodeMm });
    drafts.push(...built.drafts);
    joints.push(...built.joints);
  }

  // Fronts: drawers or doors.
  const fronts: { facts: Omit<FrontFacts, 'partIds'>; draft: PartDraft }[] = [];
  const drawerFacts: { where: string; drafts: PartDraft[]; layout: (typeof lay.drawers)[number] }[] = [];
  const doorPanels: PartDraft[] = [];
  const doorFacts: { id: string; drafts: PartDraft[]; hinge: 'left' | 'right'; x: readonly [number, number]; frontYMm: number; bottomZMm: number }[] = [];
  if (plan.contents.kind === 'drawers') {
    const d = plan.contents.drawers;
    const dSpecies = getSpecies(d.species);
    const stock: Material = { kind: 'solid', speciesId: dSpecies.id, speciesName: dSpecies.name };
    const bottomSheet = getSheetGood(d.bottomSheet, 'drawerBottomSheet');
    for (const dl of lay.drawers) {
      const cell = lay.grid.cells.find((c) => c.row === dl.row && c.col === dl.col)!;
      const fb = cell.fronts[0]!;
      const where = `row ${dl.row + 1}${plan.columns > 1 ? `, column ${dl.col + 1}` : ''}`;
      const member = `row-${dl.row + 1}`;
      const frontHeight = fb.z[1] - fb.z[0];
      const glueUp = glueUpFor(frontHeight, p.maxBoardWidth);
      const front = plainPart({
        group: 'drawer/face', member, label: `drawer front, ${where}`, role: 'drawer-front', material: solid, grain: 'length',
        world: boxBetween([fb.x[0], fb.y[0], fb.z[0]], [fb.x[1], fb.y[1], fb.z[1]]), axes: { length: '+X', width: '+Z', thickness: '-Y' },
        explodeMm: [0, -2.5 * explodeMm * 0.4, 0], name: drawerNamer('drawer-front', 'Drawer front'), ...(glueUp ? { glueUp } : {}),
        grainMatch: frontGrainMatch(fb, plan.columns),
        notes: [`Screwed to the box from inside; ${p.frontMount === 'inset' ? 'set it in its opening with an even reveal' : 'centre it over the opening'} before driving the screws.`],
      });
      const box = drawerBox({
        box: boxBetween([dl.box.x[0], dl.box.y[0], dl.box.z[0]], [dl.box.x[1], dl.box.y[1], dl.box.z[1]]), row: dl.row + 1, where,
        stock, sideThicknessMm: d.sideThicknessMm, endThicknessMm: d.sideThicknessMm, joinery: d.joinery,
        bottom: { sheet: sheet(d.bottomSheet), thicknessMm: bottomSheet.thicknessMm }, bottomGrooveDepthMm: d.bottomGrooveDepthMm,
        bottomSetUpMm: d.bottomSetUpMm, bottomClearanceMm: 25.4 / 32, glueUpFor: drawerStockGlueUp(p), explodeMm: explodeMm * 0.4,
      });
      drafts.push(front, ...box.drafts);
      joints.push(...box.joints);
      joints.push({ type: 'front-screwed', a: { draft: front, featureIds: [] }, b: { draft: box.front, featureIds: [] }, clearanceMm: 0, glued: false, floating: false, note: 'Screwed from inside the box, through oversized holes so the front can be adjusted.' });
      const wall = (side: 'left' | 'right'): PartDraft => {
        const i = side === 'left' ? dl.col - 1 : dl.col;
        if (side === 'left' && dl.col === 0) return carcass.left;
        if (side === 'right' && dl.col === plan.columns - 1) return carcass.right;
        return carcass.dividerAt(i, (dl.box.z[0] + dl.box.z[1]) / 2);
      };
      // A drawer over a web frame rides on its runners.
      const frameUnder = frames[dl.row];
      for (const [i, side] of [[0, 'left'], [1, 'right']] as const) {
        let support = wall(side);
        if (d.slide === 'wood-runners' && frameUnder) {
          support = frameUnder.runners[dl.col + i]!;
        } else if (d.slide === 'wood-runners') {
          const zTop = dl.opening.z[0];
          const zBot = Math.max(inside.z[0], zTop - p.faceFrameMidRail);
          if (zTop - zBot < 1) continue;
          const wx = side === 'left' ? inside.x[0] : inside.x[1];
          const wallX = dl.col === 0 && side === 'left' ? wx : dl.col === plan.columns - 1 && side === 'right' ? wx : side === 'left' ? lay.dividerXs[dl.col - 1]! + t / 2 : lay.dividerXs[dl.col]! - t / 2;
          const inner = side === 'left' ? dl.box.x[0] + d.sideThicknessMm : dl.box.x[1] - d.sideThicknessMm;
          const runner = plainPart({
            group: 'runner', member, label: `runner, ${where}, ${side}`, role: 'runner', material: stock, grain: 'length',
            world: boxBetween([Math.min(wallX, inner), inside.y[0], zBot], [Math.max(wallX, inner), inside.y[1], zTop]),
            axes: side === 'left' ? { length: '+Y', width: '+Z', thickness: '+X' } : { length: '-Y', width: '+Z', thickness: '-X' },
            explodeMm: [0, 0, -explodeMm * 0.2], name: drawerNamer('runner', 'Drawer runner'), notes: ['Screw to the side or divider; wax the top.'],
          });
          drafts.push(runner);
          joints.push({ type: 'butt-screwed', a: { draft: runner, featureIds: [] }, b: { draft: support, featureIds: [] }, clearanceMm: 0, glued: true, floating: false, note: 'Glued and screwed: sheet goods and a runner along them do not move apart.' });
          support = runner;
        }
        joints.push({
          type: 'drawer-slide', a: { draft: box.sides[i]!, featureIds: [] }, b: { draft: support, featureIds: [] }, clearanceMm: SLIDE_RULES[d.slide].sideClearanceMm, glued: false, floating: false,
          note: SLIDE_RULES[d.slide].note + (p.faceFrame && d.slide !== 'wood-runners' ? ' Mount the slides on spacer blocks flush with the face-frame opening.' : ''),
        });
      }
      fronts.push({ facts: { id: `drawer-${dl.row + 1}-${dl.col + 1}`, label: `drawer front (${where})`, kind: 'drawer', hinge: 'left', x: fb.x, z: fb.z, thicknessMm: p.frontThickness }, draft: front });
      drawerFacts.push({ where, drafts: [front, ...box.drafts], layout: dl });
    }
  } else if (plan.contents.kind === 'doors' && extras.doors) {
    const dO = extras.doors;
    const panelMaterial = dO.frame.panel === 'solid' ? solid : sheet(dO.frame.panelSheet);
    const panelT = dO.frame.panel === 'solid' ? dO.frame.panelThicknessMm : getSheetGood(dO.frame.panelSheet, 'doorPanelSheet').thicknessMm;
    const first = lay.grid.cells[0]!.fronts[0]!;
    const { acrossGrain, float } = doorPanelFloat(dO, first.x[1] - first.x[0], species.id, plan.climate);
    const paintNote = p.finish === 'paint' ? 'Prime and paint the panel before glue-up, so no raw line shows when it shrinks; keep paint from gluing it to the frame.' : 'Finish the panel before glue-up, so no unfinished line shows when it shrinks.';
    let n = 0;
    for (const cell of lay.grid.cells) {
      for (const fb of cell.fronts) {
        n += 1;
        const member = cell.fronts.length === 2 ? (fb.leaf === 0 ? 'left-door' : 'right-door') : 'door';
        const slabMaterial = dO.slabMaterial === 'solid' ? solid : sheet(dO.slabSheet);
        const glueUp = dO.slabMaterial === 'solid' ? glueUpFor(fb.x[1] - fb.x[0], p.maxBoardWidth) : undefined;
        const leaf = doorLeaf({
          front: fb, member, style: dO.style, slab: { material: slabMaterial, ...(glueUp ? { glueUp } : {}) },
          frame: {
            ...dO.frame, stock: solid,
            panel: { material: panelMaterial, thicknessMm: panelT, grain: dO.frame.panel === 'solid' ? 'vertical' : 'none', gapAcrossGrainMm: float.gapEachSideMm, gapAlongGrainMm: dO.frame.panel === 'solid' ? dO.frame.tongueClearanceMm : float.gapEachSideMm },
          },
          hinges: { kind: p.frontMount === 'inset' ? 'butt' : 'cup', centresZ: hingeCentres(fb.z[0], fb.z[1]) }, explodeMm: explodeMm * 0.5,
        });
        for (const panel of leaf.panels) panel.notes = [...panel.notes, paintNote];
        drafts.push(...leaf.drafts);
        joints.push(...leaf.joints);
        doorPanels.push(...leaf.panels);
        const hingeTo = ff ? ff.stiles[fb.hinge === 'left' ? 0 : 1]! : fb.hinge === 'left' ? carcass.left : carcass.right;
        joints.push({
          type: 'hinge', a: { draft: leaf.hingePart, featureIds: leaf.hingePart.features.filter((f) => f.id.startsWith('hinge-')).map((f) => f.id) }, b: { draft: hingeTo, featureIds: [] },
          clearanceMm: 0, glued: false, floating: false, note: `${hingeCentres(fb.z[0], fb.z[1]).length} ${p.frontMount === 'inset' ? 'butt hinges' : 'concealed cup hinges'}; the door hangs on the ${fb.hinge}.`,
        });
        doorFacts.push({ id: `door-${n}`, drafts: leaf.drafts, hinge: fb.hinge, x: fb.x, frontYMm: fb.y[0], bottomZMm: fb.z[0] });
        fronts.push({ facts: { id: `door-${n}`, label: `${member.replace('-', ' ')}`, kind: 'door', hinge: fb.hinge, x: fb.x, z: fb.z, thicknessMm: p.frontThickness }, draft: leaf.hingePart });
      }
    }
    if (dO.style === 'frame-and-panel') {
      checks.push({ ...panelFloatCheck([], 'door', acrossGrain, dO.frame.grooveDepthMm, float), partIds: [] });
      checks.push(...panelThicknessCheck([], panelT, dO.frame.grooveWidthMm));
    }
  }

  const assembled = assemble(drafts, joints, roughSizer(p));
  const idOf = (d: PartDraft): string => assembled.partIdOf.get(d)!;
  const idsOf = (list: readonly PartDraft[]): string[] => [...new Set(list.map(idOf))];
  const bbox = boxUnion(drafts.map((d) => d.world));

  // Panel float names its parts now that they have ids.
  checks.forEach((c, i) => {
    if (c.id.startsWith('panel-float') || c.id === 'panel-thinner-than-groove') checks[i] = { ...c, partIds: idsOf(doorPanels) };
  });

  for (const df of drawerFacts) {
    const dl = df.layout;
    checks.push(...drawerFitChecks({
      id: `${dl.row + 1}-${dl.col + 1}`, where: df.where, partIds: idsOf(df.drafts),
      openingHeightMm: dl.opening.z[1] - dl.opening.z[0], boxHeightMm: dl.box.z[1] - dl.box.z[0],
      availableDepthMm: dl.availableDepthMm, boxDepthMm: dl.box.y[1] - dl.box.y[0],
      slide: plan.contents.kind === 'drawers' ? plan.contents.drawers.slide : 'side-mount', rule: SLIDE_RULES[plan.contents.kind === 'drawers' ? plan.contents.drawers.slide : 'side-mount'],
    }));
  }
  if (plan.contents.kind === 'drawers') checks.push(...undermountSetUpCheck(idsOf(drawerFacts.flatMap((f) => f.drafts.filter((x) => x.role === 'drawer-side'))), plan.contents.drawers.slide, plan.contents.drawers.bottomSetUpMm));
  checks.push(...drawerTravelCheck(drawerFacts.map((f) => ({ partIds: idsOf(f.drafts), boxDepthMm: f.layout.box.y[1] - f.layout.box.y[0] })), plan.contents.kind === 'drawers' ? plan.contents.drawers.slide : 'side-mount'));
  const frontIds = idsOf(fronts.map((f) => f.draft));
  checks.push(...revealChecks(frontIds, lay.frame, p.frontMount, p.reveal, p.overlay, plan.rows, plan.columns));
  checks.push(...frontClearanceChecks(fronts.map((f) => ({ ...f.facts, partIds: [idOf(f.draft)] }))));

  if (shelfSet && sh) {
    const seen = new Set<string>();
    for (const s of shelfSet.built.shelves) {
      const id = idOf(s.shelf);
      if (seen.has(id)) continue;
      seen.add(id);
      const depth = s.shelf.world.max[1] - s.shelf.world.min[1];
      const eShelf = sh.material === 'sheet' ? sheetStiffness(sh.sheet) : { modulusOfElasticityMPa: species.modulusOfElasticityMPa ?? 0, source: species.source.modulusOfElasticity };
      const eSolid = species.modulusOfElasticityMPa ?? 0;
      const panelPiece = (thick: number): SectionPiece => ({ widthMm: depth, heightMm: thick, bottomMm: 0, modulusMPa: eShelf.modulusOfElasticityMPa });
      const stripPiece = (thick: number, strip: { heightMm: number; thicknessMm: number }): SectionPiece => ({ widthMm: strip.thicknessMm, heightMm: strip.heightMm, bottomMm: thick - strip.heightMm, modulusMPa: eSolid });
      const section = (thick: number, strip: ShelfOptions['edgeStrip']) => sectionStiffnessNmm2([panelPiece(thick), ...(strip && eSolid > 0 ? [stripPiece(thick, strip)] : [])]);
      const thick = shelfSet.shelfT;
      const thicker = thick + 0.25 * 25.4;
      const suggestedStrip = { heightMm: 1.5 * 25.4, thicknessMm: 0.75 * 25.4 };
      checks.push(shelfSagCheck({
        id, title: `${s.kind} shelf`, partIds: [id, ...(s.strip ? [idOf(s.strip)] : [])], spanMm: s.spanMm, loadKgPerM: sh.loadKgPerM,
        eiNmm2: section(thick, sh.edgeStrip), modulusMPa: eShelf.modulusOfElasticityMPa,
        modulusSource: `${eShelf.source.ref} (${eShelf.source.confidence})`, approximate: eShelf.source.confidence === 'unconfirmed', thicknessMm: thick,
        thickerEiNmm2: section(thicker, sh.edgeStrip), thickerLabel: `${Math.round((thicker / 25.4) * 100) / 100} in thick`,
        withStripEiNmm2: sh.edgeStrip ? null : section(thick, suggestedStrip),
      }));
    }
  }
  checks.push(...stockSizeChecks(assembled.parts, p.maxBoardLength, p.maxBoardWidth));
  checks.push(...extras.pieceChecks(assembled.parts.map((x) => x.id), lay));

  const openings: Opening[] = [
    ...doorFacts.map((f) => doorOpening(f.id, instanceRefs(assembled, f.drafts), f.hinge, f.x, f.frontYMm, f.bottomZMm)),
    ...drawerFacts.map((f) => drawerOpening(`drawer-${f.layout.row + 1}-${f.layout.col + 1}`, instanceRefs(assembled, f.drafts), f.layout.box.y[1] - f.layout.box.y[0])),
  ];

  return { parts: assembled.parts, joints: assembled.joints, placements: assembled.placements, checks, bboxMm: boxSize(bbox), bboxMinMm: bbox.min, openings };
}
