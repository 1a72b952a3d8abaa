import { describe, expect, it } from 'vitest';
import { parsePriceListCsv } from '../../../shared/materials/priceListCsv.ts';
import { priceListSchema } from '../../../shared/materials/priceList.ts';

const HEADER = 'kind,item,thickness,price,unit,name';

describe('parsePriceListCsv', () => {
  it('reads lumber, sheet, hardware and finish rows into whole cents', () => {
    const csv = [HEADER, 'lumber,white-oak,4/4,8.75,,', 'sheet,hardwood-plywood-1/2,,$62,,', 'hardware,lid-stay,,24.50,each,"Lid stay, torque-rated"', 'finish,oil,,19,quart,Oil finish'].join('\n');
    const result = parsePriceListCsv(csv);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.priceList.items).toEqual([
      { kind: 'lumber', speciesId: 'white-oak', quarters: 4, pricePerBoardFootCents: 875 },
      { kind: 'sheet', sheetId: 'hardwood-plywood-1/2', pricePerSheetCents: 6200 },
      { kind: 'hardware', itemId: 'lid-stay', name: 'Lid stay, torque-rated', unit: 'each', pricePerUnitCents: 2450 },
      { kind: 'finish', itemId: 'oil', name: 'Oil finish', unit: 'quart', pricePerUnitCents: 1900 },
    ]);
    expect(priceListSchema.safeParse(result.priceList).success).toBe(true);
  });

  it('lists every bad row by its line and returns no list', () => {
    const csv = [HEADER, 'lumber,white-oak,4/4,8.75,,', 'lumber,oak,4/4,9,,', '', 'sheet,plywood,,62,,', 'lumber,white-oak,4/4,x,,', 'hardware,hinge,,4,,Hinge', 'lumber,white-oak,four,9,,', 'lumber,white-oak,4/4,9.10,,', 'nails,x,,1,,'].join('\n');
    const result = parsePriceListCsv(csv);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.map((e) => [e.line, e.column])).toEqual([
      [3, 'item'],
      [5, 'item'],
      [6, 'price'],
      [7, 'unit'],
      [8, 'thickness'],
      [9, 'item'],
      [10, 'kind'],
    ]);
    expect(result.errors.find((e) => e.line === 9)?.message).toMatch(/same thing as line 2/);
  });

  it('counts lines inside quoted fields that hold line breaks', () => {
    const csv = `${HEADER}\nhardware,stay,,5,each,"Lid stay\nleft hand"\nlumber,white-oak,4/4,-1,,`;
    const result = parsePriceListCsv(csv);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((e) => e.line)).toEqual([4]);
  });

  it('refuses a file without the required columns', () => {
    const result = parsePriceListCsv('species,price\nwhite-oak,8');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0]).toMatchObject({ line: 1, column: null });
  });
});
