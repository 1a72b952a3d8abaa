/**
 * The plan set's materials pages, read from shared/materials' takeoff (boards and sheets laid
 * out by shared/layout): what the layouts use against what the parts need, cost and shopping
 * list where a price list is given, then the cutting diagrams of every sheet and board, drawn
 * to scale with each part named and sized.
 */
import type { PieceResult } from '../engine/types.ts';
import { boardDiagram, sheetDiagram } from '../layout/diagram.ts';
import { costOf, type ExtraItem } from '../materials/cost.ts';
import { centsText } from '../materials/money.ts';
import type { PriceList } from '../materials/priceList.ts';
import { shoppingList } from '../materials/shoppingList.ts';
import { materialsTakeoff, type MaterialsTakeoff } from '../materials/takeoff.ts';
import { boardInput, diagramPartSize, drawDiagram, sheetInput, type DiagramInput } from './cuttingDiagram.ts';
import { lengthText, type DrawingUnits } from './lengthText.ts';
import { drawingArea, sheetSizeMm } from './paper.ts';
import { usualScales } from './scale.ts';
import { materialsBlocks } from './schedules.ts';
import type { FlowBlock, PlacedView, Rect, Sheet, SheetSpec, TableBlock } from './types.ts';

/** What the materials pages are built from; without a takeoff the default stock is laid out. */
export interface PlanSetMaterials {
  takeoff?: MaterialsTakeoff;
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

const percent = (share: number): string => `${(share * 100).toFixed(0)} %`;

function draft(spec: SheetSpec, name: string, flow: readonly FlowBlock[], views: readonly PlacedView[] = [], flowArea?: Rect): SheetDraft {
  const { widthMm, heightMm } = sheetSizeMm(spec);
  return { name, widthMm, heightMm, views, flow, primitives: [], flowArea: flowArea ?? drawingArea(spec) };
}

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
  const widest = Math.max(...inputs.map((d) => d.widthMm));
  const scales = usualScales(units);
  return scales.find((s) => longest / s <= area.w && widest / s + 8 <= area.h - KEY_MIN_MM) ?? scales[scales.length - 1]!;
}

/** Diagrams stacked down as many pages as they need, each page with a key to its numbered parts. */
function diagramSheets(inputs: readonly DiagramInput[], name: string, spec: SheetSpec, units: DrawingUnits): SheetDraft[] {
  if (!inputs.length) return [];
  const area = drawingArea(spec);
  const scale = diagramScale(inputs, area, units);
  const pages: DiagramInput[][] = [[]];
  let y = area.y;
  for (const d of inputs) {
    const h = 5 + d.widthMm / scale;
    if (y + h > area.y + area.h - KEY_MIN_MM && pages[pages.length - 1]!.length) {
      pages.push([]);
      y = area.y;
    }
    pages[pages.length - 1]!.push(d);
    y += h + DIAGRAM_GAP_MM;
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

const boardLengthText = (mm: number, units: DrawingUnits): string => {
  const feet = mm / 304.8;
  return units === 'in' && Math.abs(feet - Math.round(feet)) < 1e-6 ? `${Math.round(feet)} ft` : lengthText(mm, units);
};

/**
 * The materials summary page and the cutting-diagram pages of `result`. Lays out the default
 * stock when `materials.takeoff` is absent.
 */
export function materialsSheets(result: PieceResult, spec: SheetSpec, units: DrawingUnits, materials: PlanSetMaterials = {}): SheetDraft[] {
  const takeoff = materials.takeoff ?? materialsTakeoff(result);
  const summary = draft(spec, 'Materials', [...takeoffBlocks(takeoff, units), ...buyingBlocks(takeoff, materials), ...materialsBlocks(result)]);
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
      boardDiagram(plan, b.layout.kerfMm),
    )),
    `Cutting diagrams: ${b.speciesName} ${b.quarters}/4`, spec, units,
  ));
  return [summary, ...sheets, ...boards];
}
