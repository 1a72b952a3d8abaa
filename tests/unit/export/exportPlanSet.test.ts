import { describe, expect, it } from 'vitest';
import { buildPlanSet } from '../../../shared/drawing/planSet.ts';
import type { TableBlock } from '../../../shared/drawing/types.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import type { PriceList } from '../../../shared/materials/priceList.ts';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import { planSetOptions, type ExportPlanSetOptions } from '../../../src/export/exportPlanSet.ts';

// Invented prices for Casewright's fictional workshop, not market data.
const PRICES: PriceList = {
  currency: 'USD',
  items: [
    { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 900 },
    { kind: 'lumber', speciesId: 'white-oak', quarters: 8, pricePerBoardFootCents: 1200 },
    { kind: 'sheet', sheetId: 'hardwood-plywood-1/2', pricePerSheetCents: 7000 },
    { kind: 'finish', itemId: 'oil-varnish', name: 'Oil-varnish blend', unit: 'quart', pricePerUnitCents: 2800 },
    { kind: 'hardware', itemId: 'lid-stay', name: 'Lid stay', unit: 'each', pricePerUnitCents: 2500 },
  ],
};

const result = buildPiece(defaultSpec('chest'));
const base: ExportPlanSetOptions = { title: 'Chest', revision: '3', workshopName: 'Test workshop', sheet: { size: 'letter', orientation: 'landscape' }, units: 'in' };

function materialsTables(opts: ExportPlanSetOptions): TableBlock[] {
  const model = buildPlanSet(result, { ...planSetOptions(result, opts), date: '2025-06-01' });
  const page = model.sheets.find((s) => s.name === 'Materials');
  if (!page) throw new Error('no materials page');
  return page.flow.filter((b): b is TableBlock => b.type === 'table');
}

describe('planSetOptions', () => {
  it('passes the workshop\'s price list through, so the materials page carries the cost', () => {
    const opts = planSetOptions(result, { ...base, priceList: PRICES });
    expect(opts.materials?.priceList).toBe(PRICES);
    const cost = materialsTables({ ...base, priceList: PRICES }).find((t) => t.title === 'Cost (USD)');
    expect(cost, 'no cost table').toBeDefined();
    const total = cost!.rows.find((r) => r[0] === 'Total');
    expect(total?.[4]).toMatch(/^\$?[\d,]+\.\d\d$/);
    expect(total?.[4]).not.toBe('0.00');
  });

  it('costs the finish the schedule calls for, as the Materials page starts with, and leaves hardware for the maker', () => {
    const extras = planSetOptions(result, { ...base, priceList: PRICES }).materials?.extras ?? [];
    const finish = extras.find((e) => e.itemId === 'oil-varnish');
    expect(finish?.quantity).toBeGreaterThan(0);
    expect(extras.some((e) => e.itemId === 'lid-stay')).toBe(false);
  });

  it('leaves the materials page unpriced without a price list or with an empty one', () => {
    for (const priceList of [undefined, null, { currency: 'USD', items: [] }]) {
      const opts = planSetOptions(result, { ...base, priceList });
      expect(opts.materials).toBeUndefined();
      const tables = materialsTables({ ...base, priceList });
      expect(tables.some((t) => t.title.startsWith('Cost'))).toBe(false);
      expect(tables.some((t) => t.title === 'Shopping list')).toBe(true);
    }
  });

  it('keeps the title block fields as given', () => {
    expect(planSetOptions(result, base)).toEqual({ title: 'Chest', revision: '3', workshopName: 'Test workshop', sheet: { size: 'letter', orientation: 'landscape' }, units: 'in' });
  });

  it('lays the materials out on the workshop\'s stock, as the Materials page does, and says whose it is', () => {
    const oak = result.parts.find((p) => p.material.kind === 'solid')!;
    if (oak.material.kind !== 'solid') throw new Error('no solid part');
    // Invented stock: one board on hand with a knot, 10 ft × 12 in boards for sale, a 1/16 in kerf.
    const stock: StockSettings = {
      ...DEFAULT_STOCK_SETTINGS, boardLengthsMm: [3048], boardWidthsMm: [304.8], kerfMm: 1.5875,
      boardsInStock: [{ speciesId: oak.material.speciesId, quarters: oak.rough.quarters, lengthMm: 2438.4, widthMm: 254, defects: [{ kind: 'knot', fromEndMm: 500, fromEdgeMm: 30, lengthMm: 40, widthMm: 30 }] }],
    };
    const opts = planSetOptions(result, { ...base, stock });
    expect(opts.materials?.stock).toBe(stock);
    expect(opts.materials?.priceList).toBeUndefined();
    const model = buildPlanSet(result, { ...opts, date: '2025-06-01' });
    const page = model.sheets.find((s) => s.name === 'Materials')!;
    const words = page.flow.flatMap((b) => (b.type === 'text' ? b.paragraphs : [])).join(' ');
    expect(words).toContain('Laid out on the stock of Test workshop');
    expect(words).toContain('saw kerf 1/16"');
    const boards = model.sheets.flatMap((s) => s.views).filter((v) => v.id.startsWith(`board-${oak.material.kind === 'solid' ? oak.material.speciesId : ''}-${oak.rough.quarters}-`));
    expect(boards[0]?.title).toContain('(in stock)');
    expect(boards[0]?.primitives.some((p) => p.type === 'label' && p.text === 'knot')).toBe(true);
    expect(boards.slice(1).every((v) => v.title.includes('10 ft × 12"'))).toBe(true);
  });

  it('keeps the stock and the price list together when both are given', () => {
    const opts = planSetOptions(result, { ...base, priceList: PRICES, stock: DEFAULT_STOCK_SETTINGS });
    expect(opts.materials?.stock).toBe(DEFAULT_STOCK_SETTINGS);
    expect(opts.materials?.priceList).toBe(PRICES);
  });
});
