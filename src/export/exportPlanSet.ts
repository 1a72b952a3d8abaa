/**
 * What the editor's Export menu calls. The plan set's PDF code (jsPDF, the font) loads only
 * when a plan set is exported; the SVG, CSV and JSON exports are small and synchronous.
 */
import type { PlanSetOptions } from '../../shared/drawing/planSet.ts';
import type { PaperSize, SheetSpec } from '../../shared/drawing/types.ts';
import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import type { PriceList } from '../../shared/materials/priceList.ts';
import type { StockSettings } from '../../shared/materials/stockSettings.ts';
import { extrasOf, suggestedQuantities } from '../materials/extras.ts';
import { cutListCsv } from './cutListCsv.ts';
import { specJson } from './specJson.ts';
import { viewSvg, type SvgViewId } from './viewSvg.ts';

/** Options of a plan-set export. */
export interface ExportPlanSetOptions {
  title: string;
  revision: string;
  workshopName: string;
  sheet: SheetSpec;
  units: 'in' | 'mm';
  /** The workshop's price list; the materials pages are costed when it prices anything. */
  priceList?: PriceList | null;
  /**
   * The workshop's stock: the materials pages and cutting diagrams are laid out on it as the
   * Materials page lays them out (boards on hand and their defects, sizes, kerf and trim).
   * Without it, the default stock.
   */
  stock?: StockSettings | null;
  /** Told after each sheet: sheets done of the total. */
  onProgress?: (done: number, total: number) => void;
}

/** Default sheet: Letter landscape for inch drawings, A4 landscape for metric. */
export function defaultSheet(units: 'in' | 'mm'): SheetSpec {
  const size: PaperSize = units === 'in' ? 'letter' : 'a4';
  return { size, orientation: 'landscape' };
}

/**
 * What the plan set is built with: the title block's fields; the workshop's stock to lay the
 * materials out on; and the workshop's price list with the hardware and finish the Materials
 * page starts from (finish for the schedule's coats), when the list prices anything. An empty
 * or missing list leaves the materials pages unpriced; a missing stock lays out the default.
 */
export function planSetOptions(result: PieceResult, opts: ExportPlanSetOptions): PlanSetOptions {
  const base: PlanSetOptions = { title: opts.title, revision: opts.revision, workshopName: opts.workshopName, sheet: opts.sheet, units: opts.units };
  const list = opts.priceList;
  const priced = list && list.items.length > 0 ? { priceList: list, extras: extrasOf(list, suggestedQuantities(result, list)) } : null;
  const stock = opts.stock ? { stock: opts.stock, stockSource: opts.workshopName ? `the stock of ${opts.workshopName}` : 'the workshop\'s stock' } : null;
  if (!priced && !stock) return base;
  return { ...base, materials: { ...stock, ...priced } };
}

/** The whole plan set as a PDF blob. */
export async function exportPlanSet(result: PieceResult, opts: ExportPlanSetOptions): Promise<Blob> {
  const [{ buildPlanSet }, { renderPlanSetPdf }, { monoFontsBrowser }] = await Promise.all([
    import('../../shared/drawing/planSet.ts'),
    import('./planSetPdf.ts'),
    import('./fontsBrowser.ts'),
  ]);
  const model = buildPlanSet(result, planSetOptions(result, opts));
  opts.onProgress?.(0, model.sheets.length);
  const bytes = await renderPlanSetPdf(model, await monoFontsBrowser(), opts.onProgress);
  return new Blob([bytes], { type: 'application/pdf' });
}

/** One view as an SVG blob, on its own sheet with a title block. */
export function exportSvg(
  result: PieceResult,
  view: SvgViewId,
  opts: { title: string; revision: string; workshopName: string; units: 'in' | 'mm'; sheet?: SheetSpec },
): Blob {
  const info = { title: opts.title, revision: opts.revision, workshopName: opts.workshopName, units: opts.units, date: new Date().toISOString().slice(0, 10) };
  return new Blob([viewSvg(result, view, info, opts.sheet ?? defaultSheet(opts.units))], { type: 'image/svg+xml' });
}

/** The cut list as a CSV blob (UTF-8 with a byte-order mark so spreadsheets read the × and ″). */
export function exportCutListCsv(result: PieceResult, units: 'in' | 'mm'): Blob {
  return new Blob(['\uFEFF', cutListCsv(result, units)], { type: 'text/csv;charset=utf-8' });
}

/** The design's spec as a JSON blob that `validateSpec` (and `plan spec.json`) reads back. */
export function exportSpecJson(spec: PieceSpec): Blob {
  return new Blob([specJson(spec)], { type: 'application/json' });
}
