import { beforeAll, describe, expect, it } from 'vitest';
import { materialsSheets } from '../../../shared/drawing/materialsPages.ts';
import type { Label, TableBlock } from '../../../shared/drawing/types.ts';
import { buildPiece, defaultSpec, type PieceResult } from '../../../shared/engine/index.ts';
import { costOf } from '../../../shared/materials/cost.ts';
import { centsText } from '../../../shared/materials/money.ts';
import { parsePriceListCsv } from '../../../shared/materials/priceListCsv.ts';
import { materialsTakeoff, type MaterialsTakeoff } from '../../../shared/materials/takeoff.ts';

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
