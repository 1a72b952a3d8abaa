/**
 * The plan set as sheets: cover, overall views, exploded view, one drawing per distinct part,
 * then the cut list, joinery, materials, glue-up, hardware, finishing, wood movement and safety
 * pages. Pure data; `svg.ts` and the PDF renderer draw it.
 */
import type { PieceResult } from '../engine/types.ts';
import { fitArrangement } from './arrange.ts';
import { isometricView } from './axonometric.ts';
import { finishAreaM2, finishingBlocks } from './finishing.ts';
import { hardwareBlocks, lidTorque } from './hardware.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { materialsSheets, type PlanSetMaterials } from './materialsPages.ts';
import { movementBlocks } from './movementSummary.ts';
import { overallView } from './overallViews.ts';
import { drawingArea, sheetSizeMm } from './paper.ts';
import { partLetters } from './partLetters.ts';
import { partSheet } from './partSheet.ts';
import { safetyBlocks } from './safety.ts';
import { cutListBlocks, glueUpBlocks, joineryBlock } from './schedules.ts';
import type { FlowBlock, PlacedView, PlanSetModel, Rect, Sheet, SheetSpec, TitleBlockInfo } from './types.ts';

/** What a plan set is built with. */
export interface PlanSetOptions {
  title: string;
  revision: string;
  /** ISO date, YYYY-MM-DD; today when absent. */
  date?: string;
  workshopName: string;
  sheet: SheetSpec;
  units: DrawingUnits;
  /** Takeoff, price list and extras for the materials pages; the default stock is laid out without one. */
  materials?: PlanSetMaterials;
}


type SheetDraft = Omit<Sheet, 'number'>;

function emptySheet(spec: SheetSpec, name: string, flow: readonly FlowBlock[] = [], flowArea?: Rect): SheetDraft {
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name, widthMm, heightMm, views: [], flow, primitives: [], flowArea: flowArea ?? drawingArea(spec) };
}

function scalesOf(views: readonly PlacedView[]): string {
  return [...new Set(views.map((v) => v.scaleText))].join(', ');
}

/**
 * The overall views: top above front, right side beside it (third-angle projection) on one
 * sheet; or, when that buys a larger scale, front and side on one sheet and the top on its own.
 */
export function overallSheets(result: PieceResult, spec: SheetSpec, units: DrawingUnits): SheetDraft[] {
  const front = overallView(result, 'front', units);
  const side = overallView(result, 'side', units);
  const top = overallView(result, 'top', units);
  const area = drawingArea(spec);
  const together = fitArrangement(
    [{ view: front, place: 'anchor' }, { view: side, place: 'right' }, { view: top, place: 'above', offsetMm: top.bounds.x - front.bounds.x }],
    area, units,
  );
  const pair = fitArrangement([{ view: front, place: 'anchor' }, { view: side, place: 'right' }], area, units);
  if (pair[0]!.scale >= together[0]!.scale) return [{ ...emptySheet(spec, 'Overall views'), views: together }];
  const alone = fitArrangement([{ view: top, place: 'anchor' }], area, units);
  return [{ ...emptySheet(spec, 'Overall views'), views: pair }, { ...emptySheet(spec, 'Top view'), views: alone }];
}

/** A sheet holding one overall view alone, for an SVG of that view. */
export function singleViewSheet(result: PieceResult, view: 'front' | 'side' | 'top' | 'exploded', spec: SheetSpec, units: DrawingUnits): SheetDraft {
  const model = view === 'exploded'
    ? isometricView(result, { id: 'exploded', title: 'Exploded view', exploded: true, letters: partLetters(result) })
    : overallView(result, view, units);
  const views = fitArrangement([{ view: model, place: 'anchor' }], drawingArea(spec), units);
  return { ...emptySheet(spec, model.title), views };
}

function coverSheet(result: PieceResult, spec: SheetSpec, units: DrawingUnits, contents: readonly string[]): SheetDraft {
  const area = drawingArea(spec);
  const landscape = spec.orientation === 'landscape';
  const viewArea: Rect = landscape ? { ...area, w: area.w * 0.6 } : { ...area, h: area.h * 0.55 };
  const flowArea: Rect = landscape ? { x: area.x + area.w * 0.62, y: area.y, w: area.w * 0.38, h: area.h } : { x: area.x, y: area.y + area.h * 0.57, w: area.w, h: area.h * 0.43 };
  const iso = isometricView(result, { id: 'cover', title: 'Assembled', exploded: false });
  const views = fitArrangement([{ view: iso, place: 'anchor' }], viewArea, units);
  const [w, d, h] = result.bboxMm;
  const torque = lidTorque(result);
  const pieces = result.parts.reduce((n, p) => n + p.quantity, 0);
  const sheetFt2 = result.derived.sheetArea.reduce((n, s) => n + s.areaFt2, 0);
  const rows: string[][] = [
    ['Overall width', lengthText(w, units)],
    ['Overall depth', lengthText(d, units)],
    ['Overall height', lengthText(h, units)],
    ['Distinct parts / pieces', `${result.parts.length} / ${pieces}`],
    ['Solid wood', `${result.derived.boardFeet.total.toFixed(1)} bd ft`],
    ['Sheet goods', `${sheetFt2.toFixed(1)} ft²`],
    ['Finish area', `${(finishAreaM2(result) / 0.09290304).toFixed(0)} ft²`],
  ];
  if (torque) rows.push(['Lid torque, closed', `${torque.torqueNm.toFixed(1)} N·m`]);
  const flow: FlowBlock[] = [
    { type: 'table', title: 'Key numbers', head: ['Item', 'Value'], rows, numericColumns: [1] },
    { type: 'text', title: 'Contents', paragraphs: contents, bullets: true },
  ];
  return { ...emptySheet(spec, 'Cover', flow, flowArea), views };
}

function explodedSheet(result: PieceResult, spec: SheetSpec, units: DrawingUnits, letters: ReadonlyMap<string, string>): SheetDraft {
  const area = drawingArea(spec);
  const landscape = spec.orientation === 'landscape';
  const viewArea: Rect = landscape ? { ...area, w: area.w * 0.66 } : { ...area, h: area.h * 0.62 };
  const flowArea: Rect = landscape ? { x: area.x + area.w * 0.68, y: area.y, w: area.w * 0.32, h: area.h } : { x: area.x, y: area.y + area.h * 0.64, w: area.w, h: area.h * 0.36 };
  const iso = isometricView(result, { id: 'exploded', title: 'Exploded view', exploded: true, letters });
  const views = fitArrangement([{ view: iso, place: 'anchor' }], viewArea, units);
  const legend: FlowBlock = {
    type: 'table', title: 'Parts', head: ['', 'Part', 'Qty'],
    rows: result.parts.map((p) => [letters.get(p.id) ?? '', p.name, String(p.quantity)]), numericColumns: [2],
  };
  return { ...emptySheet(spec, 'Exploded view', [legend], flowArea), views };
}

/** Today's date as YYYY-MM-DD. */
function today(): string {
  return new Date().toISOString().slice(0, 10);
}

/** Builds the whole plan set for `result`. */
export function buildPlanSet(result: PieceResult, opts: PlanSetOptions): PlanSetModel {
  const info: TitleBlockInfo = { title: opts.title, revision: opts.revision, date: opts.date ?? today(), units: opts.units, workshopName: opts.workshopName };
  const { sheet: spec, units } = opts;
  const letters = partLetters(result);
  const flowSheet = (name: string, flow: readonly FlowBlock[]): SheetDraft => emptySheet(spec, name, flow);

  const body: SheetDraft[] = [
    ...overallSheets(result, spec, units),
    explodedSheet(result, spec, units, letters),
    ...result.parts.map((p) => partSheet(p, letters.get(p.id)!, spec, units)),
    flowSheet('Cut list', cutListBlocks(result, units, letters)),
    flowSheet('Joinery schedule', [joineryBlock(result, units)]),
    ...materialsSheets(result, spec, units, opts.materials),
    flowSheet('Glue-up sequence', glueUpBlocks(result)),
    flowSheet('Hardware', hardwareBlocks(result, units)),
    flowSheet('Finishing schedule', finishingBlocks(result)),
    flowSheet('Wood movement', movementBlocks(result, units)),
    flowSheet('Safety notes', safetyBlocks(result)),
  ];
  const partNames = body.filter((s) => s.name.startsWith('Part ')).map((s) => s.name);
  // Continuation pages of one group (cutting diagrams of one material) are listed once.
  const contents = [...new Set(body.filter((s) => !s.name.startsWith('Part ')).map((s) => s.name.replace(/ \(\d+ of \d+\)$/, '')))];
  if (partNames.length) contents.splice(2, 0, `Part drawings ${letters.get(result.parts[0]!.id)}–${letters.get(result.parts[result.parts.length - 1]!.id)} (${partNames.length})`);
  const cover = coverSheet(result, spec, units, contents);
  const sheets: Sheet[] = [cover, ...body].map((s, i) => ({ ...s, number: i + 1 }));
  return { info, sheet: spec, sheets };
}

/** The scales a sheet's views are drawn at, for its title block; `as shown` when it has none. */
export function sheetScaleText(sheet: Sheet): string {
  return sheet.views.length ? scalesOf(sheet.views) : 'none';
}
