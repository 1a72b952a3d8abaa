import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildPiece, type PieceSpec } from '../../../shared/engine/index.ts';
import { costOf } from '../../../shared/materials/cost.ts';
import { centsFromText, costCents } from '../../../shared/materials/money.ts';
import type { PriceList } from '../../../shared/materials/priceList.ts';
import { shoppingList, shoppingListCsv } from '../../../shared/materials/shoppingList.ts';
import { materialsTakeoff } from '../../../shared/materials/takeoff.ts';

// Invented demo prices: Casewright's fictional workshop, not market data.
const PRICES: PriceList = {
  currency: 'USD',
  items: [
    { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 875 },
    { kind: 'lumber', speciesId: 'white-oak', quarters: 8, pricePerBoardFootCents: 1150 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-1/2', pricePerSheetCents: 6200 },
    { kind: 'hardware', itemId: 'lid-stay', name: 'Lid stay', unit: 'each', pricePerUnitCents: 2450 },
  ],
};

const spec = JSON.parse(readFileSync(new URL('../../fixtures/specs/chest-blanket-coastal.json', import.meta.url), 'utf8')) as PieceSpec;
const takeoff = materialsTakeoff(buildPiece(spec), { sheetAttempts: 20 });

describe('costOf', () => {
  it('prices lumber by the board feet bought and sheets by the sheet', () => {
    const report = costOf(takeoff, PRICES, [{ kind: 'hardware', itemId: 'lid-stay', quantity: 2 }]);
    const oak4 = report.lines.find((l) => l.key === 'lumber:white-oak:4')!;
    const oak4Layout = takeoff.boards.find((b) => b.quarters === 4)!.layout;
    expect(oak4.quantity).toBe(oak4Layout.boardFeetBought);
    expect(oak4.costCents).toBe(costCents(oak4Layout.boardFeetBought, 875));
    expect(report.lines.find((l) => l.key === 'sheet:hardwood-plywood-1/2')).toMatchObject({ quantity: 1, costCents: 6200 });
    expect(report.totals.hardware).toBe(4900);
    expect(report.totals.total).toBe(report.totals.lumber + report.totals.sheet + report.totals.hardware + report.totals.finish);
    expect(report.missingPrices).toEqual([]);
  });

  it('shows the waste factor as bought over finished, less one', () => {
    const report = costOf(takeoff, PRICES);
    const oak4 = report.lines.find((l) => l.key === 'lumber:white-oak:4')!;
    const layout = takeoff.boards.find((b) => b.quarters === 4)!.layout;
    expect(oak4.wasteFactor).toBeCloseTo(layout.boardFeetBought / layout.boardFeetFinished - 1, 12);
    expect(oak4.wasteFactor).toBeGreaterThan(0);
  });

  it('keeps a line with no price, marks it, and leaves it out of the total', () => {
    const report = costOf(takeoff, { currency: 'USD', items: PRICES.items.filter((i) => i.kind !== 'sheet') });
    expect(report.missingPrices).toEqual(['sheet:hardwood-plywood-1/2']);
    expect(report.lines.find((l) => l.category === 'sheet')?.costCents).toBeNull();
    expect(report.totals.sheet).toBe(0);
  });

  it('names the field for a bad extra quantity', () => {
    expect(() => costOf(takeoff, PRICES, [{ kind: 'hardware', itemId: 'lid-stay', quantity: Number.NaN }])).toThrow(/must be a number above 0/);
  });
});

describe('shoppingList', () => {
  it('lists boards by size with their board feet, and sums to the priced rows', () => {
    const list = shoppingList(takeoff, costOf(takeoff, PRICES));
    const lumber = list.rows.filter((r) => r.category === 'lumber');
    const boards = takeoff.boards.reduce((n, b) => n + b.layout.boards.length, 0);
    expect(lumber.reduce((n, r) => n + r.quantity, 0)).toBe(boards);
    expect(list.totalCents).toBe(list.rows.reduce((s, r) => s + (r.costCents ?? 0), 0));
    expect(lumber[0]?.size).toMatch(/^\d+ ft × \d+ in, \d\/4$/);
  });

  it('exports CSV with a header, one row per line and a total', () => {
    const list = shoppingList(takeoff, costOf(takeoff, PRICES));
    const lines = shoppingListCsv(list).split('\n');
    expect(lines[0]).toBe('category,item,size,quantity,unit,board_feet,unit_price_USD,cost_USD');
    expect(lines).toHaveLength(list.rows.length + 2);
    expect(lines.at(-1)).toMatch(/^total,.*,\d+\.\d\d$/);
  });
});

describe('money', () => {
  it('reads prices to the cent and refuses what is not a price', () => {
    expect(centsFromText('8.75')).toBe(875);
    expect(centsFromText('$1,250.5')).toBe(125050);
    expect(centsFromText('8.755')).toBeNull();
    expect(centsFromText('-3')).toBeNull();
    expect(costCents(2.675, 100)).toBe(268);
  });
});
