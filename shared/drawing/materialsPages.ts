/**
 * The plan set's materials pages, read from shared/materials' takeoff (boards and sheets laid
 * out by shared/layout): what the layouts use against what the parts need, cost and shopping
 * list where a price list is given, then the cutting diagrams of every sheet and board, drawn
 * to scale with each part named and sized, defects marked and grain-matched runs bracketed.
 * Laid out on the workshop's stock when one is given (as the Materials page does), else on the
 * default stock; the page says which.
 */
import type { PieceResult } from '../engine/types.ts';
import { boardDiagram, sheetDiagram } from '../layout/diagram.ts';
import { costOf, type ExtraItem } from '../materials/cost.ts';
import { centsText } from '../materials/money.ts';
import type { PriceList } from '../materials/priceList.ts';
import { shoppingList } from '../materials/shoppingList.ts';
import { DEFAULT_STOCK_SETTINGS, DEFECT_NAMES, takeoffOptionsFor, type StockSettings } from '../materials/stockSettings.ts';
import { materialsTakeoff, type MaterialsTakeoff } from '../materials/takeoff.ts';
import { boardInput, diagramPartSize, drawDiagram, matchRunBandMm, sheetInput, type DiagramInput } from './cuttingDiagram.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { drawingArea, sheetSizeMm } from './paper.ts';
import { usualScales } from './scale.ts';
import { materialsBlocks } from './schedules.ts';
import type { FlowBlock, PlacedView, Rect, Sheet, SheetSpec, TableBlock, TextBlock } from './types.ts';

/** What the materials pages are built from; without a takeoff or a stock the default stock is laid out. */
export interface PlanSetMaterials {
  /** A takeoff already run; `stock` then only describes it. */
  takeoff?: MaterialsTakeoff;
  /**
   * The workshop's stock, laid out with `takeoffOptionsFor(stock)` at the usual effort as the
   * Materials page does: boards on hand first and around their defects, its board and sheet
   * sizes, kerf and trim. A bad value throws the InputError `takeoffOptionsFor` names.
   */
  stock?: StockSettings;
  /** Whose stock it is, for the page: e.g. `the workshop's stock` or `stock file shop.json`. */
  stockSource?: string;
  /** The workshop's price list: the pages then carry the cost and a priced shopping list. */
  priceList?: PriceList;
  /** Hardware and finish to cost, by price-list id. */
  extras?: readonly ExtraItem[];
}

type SheetDraft = Omit<Sheet, 'number'>;

/** Clear space between stacked diagrams, mm. */
const DIAGRAM_GAP_MM = 6;
/** Height of the title and first rows of a key table, mm: a page keeps it for a key. */
const KEY_MIN_MM = 24;
/**
 * A key table's title, head and spacing, and each of its rows, mm: a 7.5 pt line at 1.15 leading
 * with 1 mm padding above and below is 5.0 mm; a little over, so a key does not spill.
 */
const KEY_EXTRA_MM = 16;
const KEY_ROW_MM = 5.2;

/** Height of a key of `rows` numbered parts, mm; none without rows. */
const keyHeightMm = (rows: number): number => (rows ? KEY_EXTRA_MM + rows * KEY_ROW_MM : 0);

const percent = (share: number): string => `${(share * 100).toFixed(0)} %`;

function boardLengthText(mm: number, units: DrawingUnits): string {
  const feet = mm / 304.8;
  return units === 'in' && Math.abs(feet - Math.round(feet)) < 1e-6 ? `${Math.round(feet)} ft` : lengthText(mm, units);
}

function draft(spec: SheetSpec, name: string, flow: readonly FlowBlock[], views: readonly PlacedView[] = [], flowArea?: Rect): SheetDraft {
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name, widthMm, heightMm, views, flow, primitives: [], flowArea: flowArea ?? drawingArea(spec) };
}

/**
 * Narrowest column the summary's widest tables read in, mm: the eight columns of the boards
 * table at 7.5 pt keep their figures on one line.
 */
const MIN_SUMMARY_COLUMN_MM = 115;

/** Columns of the summary page: two where the page is wide enough (landscape), so it fits one page. */
const summaryColumns = (spec: SheetSpec): number => (drawingArea(spec).w >= 2 * MIN_SUMMARY_COLUMN_MM ? 2 : 1);

/** Boards and sheets the layouts use against what the parts need, and anything left unplaced. */
function takeoffBlocks(takeoff: MaterialsTakeoff, units: DrawingUnits): TableBlock[] {
  const blocks: TableBlock[] = [];
  if (takeoff.boards.length) {
    blocks.push({
      type: 'table', title: 'Boards — laid out',
      head: ['Species', 'Stock', 'Boards', 'Bd ft bought', 'Bd ft to buy', 'Bd ft rough parts', 'Bd ft finished', 'Finished / bought'],
      rows: [
        ...takeoff.boards.map((b) => [
          b.speciesName, `${b.quarters}/4`, String(b.layout.boards.length), b.layout.boardFeetBought.toFixed(1), b.layout.boardFeetToBuy.toFixed(1),
          b.layout.boardFeetRough.toFixed(1), b.layout.boardFeetFinished.toFixed(1), b.layout.boardFeetBought > 0 ? percent(b.layout.boardFeetFinished / b.layout.boardFeetBought) : '—',
        ]),
        ['Total', '', String(takeoff.boards.reduce((n, b) => n + b.layout.boards.length, 0)), takeoff.boardFeetBought.toFixed(1), '', '', takeoff.boardFeetFinished.toFixed(1),
          takeoff.boardFeetBought > 0 ? percent(takeoff.boardFeetFinished / takeoff.boardFeetBought) : '—'],
      ],
      numericColumns: [2, 3, 4, 5, 6, 7],
      footnote: 'Board feet by NHLA rules (under 1 in thick counts as 1 in). Bought: the boards the diagrams use; to buy: less boards already in stock; finished: the true volume of the finished parts / 144 in³.',
    });
  }
  if (takeoff.sheets.length) {
    const kerf = takeoff.sheets[0]!.layout.kerfMm;
    const trim = takeoff.sheets[0]!.layout.trimMm;
    blocks.push({
      type: 'table', title: 'Sheets — laid out',
      head: ['Sheet good', 'Sheets used', 'Bought', 'Lower bound', 'Yield'],
      rows: takeoff.sheets.map((s) => [s.sheetName, String(s.layout.sheets.length), String(s.layout.sheetsBought), String(s.layout.lowerBound), percent(s.layout.yield)]),
      numericColumns: [1, 2, 3, 4],
      footnote: `Lower bound: no layout can use fewer sheets (area and large-part bounds). Yield: part area / sheet area used. Saw kerf ${lengthText(kerf, units)}, ${lengthText(trim, units)} trimmed off each factory edge.`,
    });
  }
  const unplaced = [...takeoff.boards.flatMap((b) => b.layout.unplaced), ...takeoff.sheets.flatMap((s) => s.layout.unplaced)];
  if (unplaced.length) {
    blocks.push({
      type: 'table', title: 'Parts not on any diagram',
      head: ['Part', 'Size', 'Why'],
      rows: unplaced.map((u) => [`${u.name} #${u.instance + 1}`, `${lengthText(u.lengthMm, units)} × ${lengthText(u.widthMm, units)}`, u.message]),
      numericColumns: [1],
    });
  }
  return blocks;
}

const listText = (values: readonly string[]): string =>
  values.length <= 1 ? (values[0] ?? '') : `${values.slice(0, -1).join(', ')} and ${values[values.length - 1]}`;

/** What the layouts cut from: sheet and board sizes, offcuts and boards on hand, kerf and trim. */
function stockBlock(stock: StockSettings, source: string, units: DrawingUnits): TextBlock {
  const len = (mm: number) => boardLengthText(mm, units);
  // Defects counted by kind in the diagrams' words: `1 knot and 2 checks`.
  const kinds = new Map<string, number>();
  for (const d of stock.boardsInStock.flatMap((b) => b.defects)) kinds.set(DEFECT_NAMES[d.kind], (kinds.get(DEFECT_NAMES[d.kind]) ?? 0) + 1);
  const defects = listText([...kinds].map(([name, n]) => `${n} ${name}${n === 1 ? '' : 's'}`));
  const paragraphs = [
    `Laid out on ${source}: sheets ${lengthText(Math.min(stock.sheetWidthMm, stock.sheetLengthMm), units)} × ${lengthText(Math.max(stock.sheetWidthMm, stock.sheetLengthMm), units)}; boards for sale ${listText(stock.boardLengthsMm.map(len))} long, ${listText(stock.boardWidthsMm.map((w) => lengthText(w, units)))} wide; saw kerf ${lengthText(stock.kerfMm, units)}, ${lengthText(stock.trimMm, units)} trimmed off each factory edge of a sheet.`,
  ];
  if (stock.boardsInStock.length || stock.offcuts.length) {
    const onHand = stock.boardsInStock.length
      ? `${stock.boardsInStock.length} board${stock.boardsInStock.length === 1 ? '' : 's'} on hand, cut before any is bought${defects ? ` and around the ${defects} marked on them (in red on the diagrams)` : ''}`
      : '';
    const offcuts = stock.offcuts.length ? `${stock.offcuts.reduce((n, o) => n + o.count, 0)} sheet offcut(s) used before full sheets` : '';
    paragraphs.push(`${listText([onHand, offcuts].filter(Boolean))}.`.replace(/^./, (c) => c.toUpperCase()));
  }
  return { type: 'text', title: 'Stock', paragraphs };
}

/** Grain-matched runs that could not come whole from one board, and why: their brackets are red on the diagrams. */
function splitBlock(takeoff: MaterialsTakeoff): TableBlock[] {
  const rows = takeoff.boards.flatMap((b) => b.layout.splitWarnings.map((w) => [`${b.speciesName} ${b.quarters}/4`, w.label, w.message]));
  return rows.length
    ? [{ type: 'table', title: 'Grain-matched runs split over boards', head: ['Stock', 'Run', 'Why'], rows, numericColumns: [], footnote: 'Their brackets on the cutting diagrams are drawn in red. Choose wider or longer boards to keep a run from one board.' }]
    : [];
}

/** Cost by line and the shopping list; without a price list, the list alone with no prices. */
function buyingBlocks(takeoff: MaterialsTakeoff, materials: PlanSetMaterials): TableBlock[] {
  const priced = materials.priceList !== undefined;
  const cost = costOf(takeoff, materials.priceList ?? { currency: 'USD', items: [] }, materials.extras ?? []);
  const list = shoppingList(takeoff, cost);
  const money = (cents: number | null): string => (cents === null ? '—' : centsText(cents));
  const cur = cost.currency;
  const blocks: TableBlock[] = [];
  if (priced) {
    blocks.push({
      type: 'table', title: `Cost (${cur})`,
      head: ['Item', 'Quantity', 'Unit', 'Unit price', 'Cost', 'Waste'],
      rows: [
        ...cost.lines.map((l) => [l.description, l.unit === 'bd ft' ? l.quantity.toFixed(1) : String(l.quantity), l.unit, money(l.unitPriceCents), money(l.costCents), l.wasteFactor === null ? '' : percent(l.wasteFactor)]),
        ['Total', '', '', '', centsText(cost.totals.total), ''],
      ],
      numericColumns: [1, 3, 4, 5],
      ...(cost.missingPrices.length ? { footnote: `No price in the list for: ${cost.missingPrices.join(', ')} — not in the total.` } : {}),
    });
  }
  blocks.push({
    type: 'table', title: priced ? `Shopping list (${cur})` : 'Shopping list',
    head: priced ? ['Item', 'Size', 'Qty', 'Unit', 'Bd ft', 'Unit price', 'Cost'] : ['Item', 'Size', 'Qty', 'Unit', 'Bd ft'],
    rows: list.rows.map((r) => {
      const row = [r.item, r.size, String(r.quantity), r.unit, r.boardFeet === null ? '' : r.boardFeet.toFixed(1)];
      return priced ? [...row, money(r.unitPriceCents), money(r.costCents)] : row;
    }),
    numericColumns: priced ? [2, 4, 5, 6] : [2, 4],
    footnote: priced
      ? `Total of priced lines ${centsText(list.totalCents)} ${cur}${list.unpriced ? `; ${list.unpriced} line(s) without a price` : ''}. Lumber is priced by the board foot of the boards bought.`
      : 'No price list was given: add the workshop\'s price list to cost the job. Boards already in stock are left off.',
  });
  return blocks;
}

/** The largest usual scale at which every diagram of `inputs` fits `area` on its own. */
function diagramScale(inputs: readonly DiagramInput[], area: Rect, units: DrawingUnits): number {
  const longest = Math.max(...inputs.map((d) => d.lengthMm));
  const scales = usualScales(units);
  return scales.find((s) => longest / s <= area.w && Math.max(...inputs.map((d) => diagramHeightMm(d, s))) + 3 <= area.h - KEY_MIN_MM) ?? scales[scales.length - 1]!;
}

/** Paper height of `d` at 1:`scale` with its title line and any grain-match brackets under it, mm. */
function diagramHeightMm(d: DiagramInput, scale: number): number {
  return 5 + d.widthMm / scale + matchRunBandMm(d.matchRuns ?? [], d.lengthMm, scale);
}

/**
 * Diagrams stacked down as many pages as they need, each page with a key to its numbered parts
 * under them: a diagram goes on the next page when it and the key rows it adds would not fit.
 */
function diagramSheets(inputs: readonly DiagramInput[], name: string, spec: SheetSpec, units: DrawingUnits): SheetDraft[] {
  if (!inputs.length) return [];
  const area = drawingArea(spec);
  const scale = diagramScale(inputs, area, units);
  const pages: DiagramInput[][] = [[]];
  let y = area.y;
  let keyRows = 0;
  for (const d of inputs) {
    const h = diagramHeightMm(d, scale);
    const tagged = drawDiagram(d, scale, [0, 0], units).tagOnly.length;
    const key = Math.max(KEY_MIN_MM, keyHeightMm(keyRows + tagged));
    if (y + h + DIAGRAM_GAP_MM > area.y + area.h - key && pages[pages.length - 1]!.length) {
      pages.push([]);
      y = area.y;
      keyRows = 0;
    }
    pages[pages.length - 1]!.push(d);
    y += h + DIAGRAM_GAP_MM;
    keyRows += tagged;
  }
  return pages.map((page, i) => {
    let at = area.y;
    const views: PlacedView[] = [];
    const keyRows: string[][] = [];
    for (const d of page) {
      const drawn = drawDiagram(d, scale, [area.x, at], units);
      views.push(drawn.view);
      for (const p of drawn.tagOnly) keyRows.push([d.title.split(':')[0]!, String(p.tag), p.name, diagramPartSize(p, units)]);
      at = drawn.view.frame.y + drawn.view.frame.h + DIAGRAM_GAP_MM;
    }
    const flow: FlowBlock[] = keyRows.length
      ? [{ type: 'table', title: 'Numbered parts (too small to name on the diagram)', head: ['Diagram', 'No.', 'Part', 'Length × width'], rows: keyRows, numericColumns: [1, 3] }]
      : [];
    const pageName = pages.length > 1 ? `${name} (${i + 1} of ${pages.length})` : name;
    return draft(spec, pageName, flow, views, { x: area.x, y: at, w: area.w, h: area.y + area.h - at });
  });
}


/**
 * The materials summary page and the cutting-diagram pages of `result`. Without
 * `materials.takeoff`, lays out `materials.stock`, or the default stock without one.
 */
export function materialsSheets(result: PieceResult, spec: SheetSpec, units: DrawingUnits, materials: PlanSetMaterials = {}): SheetDraft[] {
  const takeoff = materials.takeoff ?? materialsTakeoff(result, materials.stock ? takeoffOptionsFor(materials.stock) : {});
  const stock = materials.stock
    ? stockBlock(materials.stock, materials.stockSource ?? 'the workshop\'s stock', units)
    : stockBlock(DEFAULT_STOCK_SETTINGS, 'the default stock (no workshop stock was given)', units);
  const summary: SheetDraft = {
    ...draft(spec, 'Materials', [stock, ...takeoffBlocks(takeoff, units), ...splitBlock(takeoff), ...buyingBlocks(takeoff, materials), ...materialsBlocks(result)]),
    flowColumns: summaryColumns(spec),
    tightTables: true,
  };
  const sheets = takeoff.sheets.flatMap((s) => diagramSheets(
    s.layout.sheets.map((plan, i) => sheetInput(
      `sheet-${s.sheetId}-${i + 1}`,
      `Sheet ${i + 1} of ${s.layout.sheets.length}${plan.offcut ? ' (offcut)' : ''}: ${lengthText(plan.lengthMm, units)} × ${lengthText(plan.widthMm, units)}, yield ${percent(plan.yield)}, face grain along the length`,
      sheetDiagram(plan, s.layout.kerfMm),
    )),
    `Cutting diagrams: ${s.sheetName}`, spec, units,
  ));
  const boards = takeoff.boards.flatMap((b) => diagramSheets(
    b.layout.boards.map((plan, i) => boardInput(
      `board-${b.speciesId}-${b.quarters}-${i + 1}`,
      `Board ${i + 1} of ${b.layout.boards.length}${plan.inStock ? ' (in stock)' : ''}: ${boardLengthText(plan.lengthMm, units)} × ${lengthText(plan.widthMm, units)}, ${plan.boardFeet.toFixed(1)} bd ft, yield ${percent(plan.yield)}`,
      boardDiagram(plan, b.layout.kerfMm, b.layout.splitGroups),
    )),
    `Cutting diagrams: ${b.speciesName} ${b.quarters}/4`, spec, units,
  ));
  return [summary, ...sheets, ...boards];
}
