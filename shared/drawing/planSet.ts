/**
 * The plan set as sheets: cover, overall views, exploded view, one drawing per distinct part,
 * then the cut list, joinery, materials, glue-up, hardware, finishing, wood movement and safety
 * pages. Pure data; `svg.ts` and the PDF renderer draw it.
 */
import type { Part, PieceResult } from '../engine/types.ts';
import { arrangeAt, centreIn, fitArrangement, type Arrangement } from './arrange.ts';
import { isometricView } from './axonometric.ts';
import { featureFaceText, featureKindText, featureSizeText } from './featureText.ts';
import { finishAreaM2, finishingBlocks } from './finishing.ts';
import { hardwareBlocks, lidTorque } from './hardware.ts';
import { lengthText, partSizeText, type DrawingUnits } from './lengthText.ts';
import { materialsSheets, type PlanSetMaterials } from './materialsPages.ts';
import { movementBlocks } from './movementSummary.ts';
import { overallView } from './overallViews.ts';
import { drawingArea, sheetSizeMm } from './paper.ts';
import { partLetters } from './partLetters.ts';
import { partViews } from './partViews.ts';
import { rectUnion } from './rects.ts';
import { safetyBlocks } from './safety.ts';
import { usualScales } from './scale.ts';
import { cutListBlocks, glueUpBlocks, joineryBlock } from './schedules.ts';
import type { FlowBlock, Label, PlacedView, PlanSetModel, Primitive, Rect, Sheet, SheetSpec, TitleBlockInfo } from './types.ts';

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

/** Height of a part sheet's heading, mm. */
const HEADING_MM = 16;
/** Share of the drawing area's height part views may always take, however long the feature table. */
const PART_VIEWS_MIN_SHARE = 0.66;
/** Height a feature-table row and the table's title and footnote take, mm (7.5 pt rows). */
const TABLE_ROW_MM = 4.6;
const TABLE_EXTRA_MM = 22;

type SheetDraft = Omit<Sheet, 'number'>;

function emptySheet(spec: SheetSpec, name: string, flow: readonly FlowBlock[] = [], flowArea?: Rect): SheetDraft {
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name, widthMm, heightMm, views: [], flow, primitives: [], flowArea: flowArea ?? drawingArea(spec) };
}

function scalesOf(views: readonly PlacedView[]): string {
  return [...new Set(views.map((v) => v.scaleText))].join(', ');
}

/** The overall views sheet: top above front, right side beside it (third-angle projection). */
export function overallSheet(result: PieceResult, spec: SheetSpec, units: DrawingUnits): SheetDraft {
  const front = overallView(result, 'front', units);
  const side = overallView(result, 'side', units);
  const top = overallView(result, 'top', units);
  const views = fitArrangement(
    [{ view: front, place: 'anchor' }, { view: side, place: 'right' }, { view: top, place: 'above', offsetMm: top.bounds.x - front.bounds.x }],
    drawingArea(spec), units,
  );
  return { ...emptySheet(spec, 'Overall views'), views };
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
    { type: 'table', title: 'Key numbers', head: ['', ''], rows, numericColumns: [1] },
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

/** Lays out a part's three views: main scale for face and edge, the end view as large as fits. */
function fitPartViews(part: Part, area: Rect, units: DrawingUnits, maxHeight: number): PlacedView[] {
  const { face, edge, end } = partViews(part, units);
  const scales = usualScales(units);
  for (const s of scales) {
    for (const e of scales.filter((x) => x <= s && x * 4 >= s)) {
      const arrangement: Arrangement[] = [{ view: face, place: 'anchor' }, { view: edge, place: 'below' }, { view: end, place: 'right', scale: e }];
      const { views, frame } = arrangeAt(arrangement, s);
      if (frame.w <= area.w && frame.h <= area.h) return centreIn(views, frame, area, true);
    }
  }
  // Nothing fits beside the cut table: let the views take the page down to the title block; the
  // table then starts below them and continues on the next page.
  for (const s of scales) {
    const { views, frame } = arrangeAt([{ view: face, place: 'anchor' }, { view: edge, place: 'below' }, { view: end, place: 'right' }], s);
    if ((frame.w <= area.w && frame.h <= maxHeight) || s === scales[scales.length - 1]) return centreIn(views, frame, area, true);
  }
  throw new Error('Assertion failed: usualScales is never empty');
}

function partSheet(part: Part, letter: string, spec: SheetSpec, units: DrawingUnits): SheetDraft {
  const area = drawingArea(spec);
  // The views get what the cut table and notes leave, so the page holds both without a continuation.
  const flowNeed = (part.features.length ? TABLE_EXTRA_MM + part.features.length * TABLE_ROW_MM : 0) + (part.notes.length ? 10 + part.notes.length * 5 : 0);
  const viewsH = Math.max((area.h - HEADING_MM) * PART_VIEWS_MIN_SHARE, area.h - HEADING_MM - flowNeed);
  const viewsArea: Rect = { x: area.x, y: area.y + HEADING_MM, w: area.w, h: viewsH };
  const views = fitPartViews(part, viewsArea, units, area.h - HEADING_MM);
  const used = rectUnion(views.map((v) => v.frame));
  const flowTop = used.y + used.h + 4;
  const material = part.material.kind === 'solid' ? part.material.speciesName : part.material.sheetName;
  const grain = part.grain === 'length' ? 'grain along the length' : part.grain === 'width' ? 'grain across the width' : 'sheet good';
  const heading: Label[] = [
    { type: 'label', at: [area.x, area.y + 5], text: `${letter}  ${part.name}`, sizePt: 13, anchor: 'start', font: 'sans', bold: true },
    { type: 'label', at: [area.x, area.y + 10.5], text: `${part.quantity} off   finished ${partSizeText(part, units)}   ${material}, ${grain}${part.glueUp ? `, glued up from ${part.glueUp.boards} boards` : ''}`, sizePt: 8.5, anchor: 'start', font: 'mono' },
  ];
  const flow: FlowBlock[] = [];
  if (part.features.length) {
    flow.push({
      type: 'table', title: 'Cuts on this part',
      head: ['Cut', 'Where', 'Sizes', 'For'],
      rows: part.features.map((f) => [featureKindText(f), featureFaceText(f), featureSizeText(f, units), f.label]),
      numericColumns: [],
    });
  }
  // Notes and the key to face names go under the heading, so the page never spills a line onto another.
  const key = 'Faces A/B: broad faces; edges A/B: long edges; ends A/B: ends, end A at the left of the face view; offsets from the A side.';
  heading.push({ type: 'label', at: [area.x, area.y + 14.5], text: part.notes.length ? `Notes: ${part.notes.map((n) => n.replace(/\.$/, '')).join('; ')}.  ${key}` : key, sizePt: 6.5, anchor: 'start', font: 'sans' });
  const primitives: Primitive[] = [...heading];
  return { ...emptySheet(spec, `Part ${letter}: ${part.name}`, flow, { x: area.x, y: flowTop, w: area.w, h: area.y + area.h - flowTop }), views, primitives };
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
    overallSheet(result, spec, units),
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
