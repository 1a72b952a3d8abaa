import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { materialsSheets } from '../../../shared/drawing/materialsPages.ts';
import { buildPlanSet } from '../../../shared/drawing/planSet.ts';
import type { Label, PlacedView, Segment, TableBlock, TextBlock } from '../../../shared/drawing/types.ts';
import { buildPiece, defaultSpec, type PieceResult } from '../../../shared/engine/index.ts';
import { costOf } from '../../../shared/materials/cost.ts';
import { centsText } from '../../../shared/materials/money.ts';
import { parsePriceListCsv } from '../../../shared/materials/priceListCsv.ts';
import { DEFAULT_STOCK_SETTINGS, takeoffOptionsFor, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import { materialsTakeoff, type MaterialsTakeoff } from '../../../shared/materials/takeoff.ts';
import { matchRunsOf } from '../../../shared/layout/diagram.ts';
import { DEMO_PRICE_LIST } from '../../../server/db/demoPriceList.ts';
import { monoFontsNode } from '../../../src/export/fontsNode.ts';
import { renderPlanSetPdf } from '../../../src/export/planSetPdf.ts';

/** Paper mm: a diagram drawn to scale matches its stock to a hundredth of a millimetre. */
const PAPER_TOLERANCE_MM = 0.01;
const SHEET = { size: 'letter', orientation: 'landscape' } as const;
// Invented prices for the test, not market prices.
const PRICES = 'kind,item,thickness,price\nlumber,white-oak,4/4,9.50\nlumber,white-oak,8/4,11.25\nsheet,hardwood-plywood-1/2,,78.00\n';

let result: PieceResult;
let takeoff: MaterialsTakeoff;

beforeAll(() => {
  result = buildPiece(defaultSpec('chest'));
  takeoff = materialsTakeoff(result);
});

const tables = (sheets: ReturnType<typeof materialsSheets>): TableBlock[] => sheets.flatMap((s) => s.flow).filter((b): b is TableBlock => b.type === 'table');

describe('materialsSheets', () => {
  it('draws every sheet and board of the takeoff at its stated scale', () => {
    const sheets = materialsSheets(result, SHEET, 'in', { takeoff });
    const views = sheets.flatMap((s) => s.views);
    const plans = [...takeoff.sheets.flatMap((s) => s.layout.sheets), ...takeoff.boards.flatMap((b) => b.layout.boards)];
    expect(views).toHaveLength(plans.length);
    views.forEach((v, i) => {
      expect(Math.abs(v.geometry.w * v.scale - plans[i]!.lengthMm)).toBeLessThan(PAPER_TOLERANCE_MM * v.scale);
      expect(Math.abs(v.geometry.h * v.scale - plans[i]!.widthMm)).toBeLessThan(PAPER_TOLERANCE_MM * v.scale);
      expect(v.scaleText).toBe(`1:${v.scale}`);
    });
  });

  it('names every placed part on its diagram, or numbers it and names it in the page key', () => {
    const sheets = materialsSheets(result, SHEET, 'in', { takeoff });
    for (const sheet of sheets.filter((s) => s.views.length)) {
      const keyRows = tables([sheet]).flatMap((t) => t.rows);
      for (const view of sheet.views) {
        const diagram = view.title.split(':')[0]!;
        const plan = [...takeoff.sheets.flatMap((s) => s.layout.sheets.map((p, i) => ({ p, id: `sheet-${s.sheetId}-${i + 1}` }))),
          ...takeoff.boards.flatMap((b) => b.layout.boards.map((p, i) => ({ p, id: `board-${b.speciesId}-${b.quarters}-${i + 1}` })))].find((x) => x.id === view.id)!.p;
        const labels = view.primitives.filter((p): p is Label => p.type === 'label').map((l) => l.text);
        plan.parts.forEach((part, i) => {
          const named = labels.includes(part.name);
          const keyed = keyRows.some((r) => r[0] === diagram && r[1] === String(i + 1) && r[2] === part.name);
          expect(named || keyed, `${part.name} on ${view.title}`).toBe(true);
        });
      }
    }
  });

  it('states sheets used against the lower bound, and board feet bought against finished', () => {
    const sheets = materialsSheets(result, SHEET, 'in', { takeoff });
    const all = tables(sheets);
    const sheetTable = all.find((t) => t.title === 'Sheets — laid out')!;
    takeoff.sheets.forEach((s, i) => {
      expect(sheetTable.rows[i]).toEqual([s.sheetName, String(s.layout.sheets.length), String(s.layout.sheetsBought), String(s.layout.lowerBound), `${(s.layout.yield * 100).toFixed(0)} %`]);
    });
    const boards = all.find((t) => t.title === 'Boards — laid out')!;
    const total = boards.rows[boards.rows.length - 1]!;
    expect(total[3]).toBe(takeoff.boardFeetBought.toFixed(1));
    expect(total[6]).toBe(takeoff.boardFeetFinished.toFixed(1));
  });

  it('costs the job and prices the shopping list when a price list is given', () => {
    const parsed = parsePriceListCsv(PRICES);
    if (!parsed.ok) throw new Error('price list did not parse');
    const all = tables(materialsSheets(result, SHEET, 'in', { takeoff, priceList: parsed.priceList }));
    const cost = all.find((t) => t.title === 'Cost (USD)')!;
    expect(cost.rows[cost.rows.length - 1]![4]).toBe(centsText(costOf(takeoff, parsed.priceList).totals.total));
    const list = all.find((t) => t.title === 'Shopping list (USD)')!;
    expect(list.head).toContain('Cost');
    expect(list.rows.some((r) => r[0] === 'Hardwood plywood, 1/2 (15/32 in actual)' && r[6] === '78.00')).toBe(true);
  });

  it('lists what to buy without prices, and says why, when there is no price list', () => {
    const all = tables(materialsSheets(result, SHEET, 'in', { takeoff }));
    expect(all.some((t) => t.title.startsWith('Cost'))).toBe(false);
    const list = all.find((t) => t.title === 'Shopping list')!;
    expect(list.head).not.toContain('Cost');
    expect(list.footnote).toMatch(/No price list/);
    expect(list.rows.length).toBeGreaterThan(0);
  });
});

const IN = 25.4;
/** Paper mm: brackets are drawn at the run's ends to this. */
const BRACKET_TOLERANCE_MM = 0.01;

/** A workshop that buys 10 ft × 12 in boards only: long enough for a whole column of drawer fronts. */
function tenFootStock(extra: Partial<StockSettings> = {}): StockSettings {
  return { ...DEFAULT_STOCK_SETTINGS, boardLengthsMm: [120 * IN], boardWidthsMm: [12 * IN], ...extra };
}

const segments = (view: PlacedView): Segment[] => view.primitives.filter((p): p is Segment => p.type === 'segment');
const labels = (view: PlacedView): Label[] => view.primitives.filter((p): p is Label => p.type === 'label');

describe('materialsSheets on a workshop\'s stock', () => {
  let dresser: PieceResult;
  beforeAll(() => {
    dresser = buildPiece(defaultSpec('dresser'));
  });

  it('brackets each column of grain-matched drawer fronts under its board on 10 ft × 12 in boards, with its note', () => {
    const stock = tenFootStock();
    const sheets = materialsSheets(dresser, SHEET, 'in', { stock });
    const done = materialsTakeoff(dresser, takeoffOptionsFor(stock));
    const runs = done.boards.flatMap((b) => b.layout.boards.flatMap((plan, i) => matchRunsOf(plan, b.layout.splitGroups).map((run) => ({ run, id: `board-${b.speciesId}-${b.quarters}-${i + 1}` }))));
    const columns = new Set(done.boards.flatMap((b) => b.layout.boards.flatMap((p) => p.parts.flatMap((q) => (q.matchGroup === null || q.matchOrder === null ? [] : [q.matchGroup])))));
    // Runs are the ordered groups (drawer-front columns); every column's fronts come from one board on 10 ft boards: one bracket per column, none split.
    expect(columns.size).toBeGreaterThan(1);
    expect(runs.map((r) => r.run.group).sort()).toEqual([...columns].sort());
    expect(runs.every((r) => !r.run.partial)).toBe(true);
    const views = sheets.flatMap((s) => s.views);
    for (const { run, id } of runs) {
      const view = views.find((v) => v.id === id)!;
      const note = labels(view).find((l) => l.text === run.text);
      expect(note, `${run.text} on ${view.title}`).toBeDefined();
      expect(run.text).toMatch(/^grain-matched: .*column \d+ \(1–\d+\)$/);
      // The bracket's line runs under the board from the run's first part to its last.
      const [from, to] = [view.geometry.x + run.fromMm / view.scale, view.geometry.x + run.toMm / view.scale];
      const under = view.geometry.y + view.geometry.h;
      const line = segments(view).find((s) => s.a[1] === s.b[1] && s.a[1] > under
        && Math.abs(Math.min(s.a[0], s.b[0]) - from) < BRACKET_TOLERANCE_MM && Math.abs(Math.max(s.a[0], s.b[0]) - to) < BRACKET_TOLERANCE_MM);
      expect(line, `bracket of ${run.text}`).toBeDefined();
      // The note sits inside the diagram's frame, so the next diagram does not cover it.
      expect(note!.at[1]).toBeLessThanOrEqual(view.frame.y + view.frame.h);
    }
  });

  it('marks a run split over boards in red and lists why it was split', () => {
    // 4 ft boards are too short for a column of fronts end to end.
    const sheets = materialsSheets(dresser, SHEET, 'in', { stock: tenFootStock({ boardLengthsMm: [48 * IN] }) });
    const split = tables(sheets).find((t) => t.title === 'Grain-matched runs split over boards');
    expect(split, 'no table of split runs').toBeDefined();
    expect(split!.rows.length).toBeGreaterThan(0);
    const notes = sheets.flatMap((s) => s.views).flatMap(labels).filter((l) => l.text.endsWith('split over boards'));
    expect(notes.length).toBeGreaterThan(0);
    expect(notes.every((l) => l.accent === true)).toBe(true);
  });

  it('cuts the boards on hand first and draws their knots, and says which stock it laid out', () => {
    const oak = result.parts.find((p) => p.material.kind === 'solid')!;
    const quarters = oak.rough.quarters;
    const speciesId = oak.material.kind === 'solid' ? oak.material.speciesId : '';
    const stock = tenFootStock({
      boardsInStock: [{ label: 'Rack A', speciesId, quarters, lengthMm: 96 * IN, widthMm: 10 * IN, defects: [{ kind: 'knot', fromEndMm: 600, fromEdgeMm: 40, lengthMm: 40, widthMm: 30 }] }],
    });
    const sheets = materialsSheets(result, SHEET, 'in', { stock, stockSource: 'the stock of Test workshop' });
    const first = sheets.flatMap((s) => s.views).find((v) => v.id === `board-${speciesId}-${quarters}-1`)!;
    expect(first.title).toContain('(in stock)');
    expect(labels(first).some((l) => l.text === 'knot' && l.accent)).toBe(true);
    const text = sheets[0]!.flow.filter((b): b is TextBlock => b.type === 'text').flatMap((b) => b.paragraphs).join(' ');
    expect(text).toContain('Laid out on the stock of Test workshop');
    expect(text).toContain('1 board on hand, cut before any is bought and around the 1 knot marked on them (in red on the diagrams)');
    expect(text).toContain('10 ft long, 12" wide');
  });

  it('says it used the default stock when given none', () => {
    const text = materialsSheets(result, SHEET, 'in', { takeoff })[0]!.flow.filter((b): b is TextBlock => b.type === 'text').flatMap((b) => b.paragraphs).join(' ');
    expect(text).toContain('Laid out on the default stock');
    expect(text).toContain('6 ft and 8 ft long');
  });

  it('leaves room under the diagrams of each page for its whole key of numbered parts', () => {
    // A 7.5 pt table row is about 5 mm; title and head about 11 mm (planSetPdf's table styles).
    const rowMm = 5.0;
    const headMm = 11;
    const sheets = materialsSheets(dresser, SHEET, 'in', { stock: tenFootStock() }).filter((s) => s.views.length);
    const keyed = sheets.filter((s) => tables([s]).length);
    expect(keyed.length).toBeGreaterThan(0);
    for (const sheet of keyed) {
      const rows = tables([sheet])[0]!.rows.length;
      expect(sheet.flowArea.h, sheet.name).toBeGreaterThanOrEqual(headMm + rows * rowMm);
    }
  });

  it('names the bad field of a stock it cannot lay out', () => {
    expect(() => materialsSheets(result, SHEET, 'in', { stock: tenFootStock({ kerfMm: -1 }) })).toThrow(expect.objectContaining({ name: 'InputError', field: 'kerfMm' }));
  });
});

describe('materialsSheets summary page', () => {
  it('sets the summary in two columns of tight tables on a landscape page, and in one on a portrait letter page', () => {
    const [landscape] = materialsSheets(result, SHEET, 'in', { takeoff });
    expect(landscape!.name).toBe('Materials');
    expect(landscape!.flowColumns).toBe(2);
    expect(landscape!.tightTables).toBe(true);
    const [portrait] = materialsSheets(result, { size: 'letter', orientation: 'portrait' }, 'in', { takeoff });
    expect(portrait!.flowColumns).toBe(1);
  });

  it('fits the default chest, dresser and cabinet summary with the demo price list on one page, with no continued page', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'casewright-materials-'));
    try {
      const fonts = await monoFontsNode();
      for (const kind of ['chest', 'dresser', 'cabinet'] as const) {
        const model = buildPlanSet(buildPiece(defaultSpec(kind)), {
          title: kind, revision: '1', date: '2025-03-14', workshopName: 'Test workshop', sheet: SHEET, units: 'in', materials: { priceList: DEMO_PRICE_LIST },
        });
        const summary = model.sheets.filter((s) => s.name === 'Materials');
        expect(summary, kind).toHaveLength(1);
        const path = join(dir, `${kind}.pdf`);
        writeFileSync(path, new Uint8Array(await renderPlanSetPdf({ ...model, sheets: summary }, fonts)));
        const pages = execFileSync('pdftotext', ['-layout', path, '-'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).split('\f').filter((p) => p.trim());
        // The price list is on the page: the cost table and the priced shopping list are both there.
        expect(pages.join('\n'), kind).toContain('Cost (USD)');
        expect(pages.join('\n'), kind).toContain('Shopping list (USD)');
        expect(pages.join('\n'), kind).not.toContain('Materials (continued)');
        expect(pages, kind).toHaveLength(1);
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 60_000);
});
