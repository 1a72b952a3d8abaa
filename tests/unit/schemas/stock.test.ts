import { describe, expect, it } from 'vitest';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import { MAX_KERF_MM, stockBody, stockProblem, stockProblems, stockSettingsSchema } from '../../../shared/schemas/stock.ts';

const IN = 25.4;

/** The defaults with two white-oak boards on hand, the second with a knot and a check. */
const withBoards = (defect: Partial<StockSettings['boardsInStock'][number]['defects'][number]> = {}): StockSettings => ({
  ...DEFAULT_STOCK_SETTINGS,
  boardsInStock: [
    { speciesId: 'white-oak', quarters: 4, lengthMm: 72 * IN, widthMm: 7 * IN, defects: [] },
    {
      label: 'A2',
      speciesId: 'white-oak',
      quarters: 4,
      lengthMm: 72 * IN,
      widthMm: 7 * IN,
      defects: [
        { kind: 'check', fromEndMm: 0, fromEdgeMm: 3 * IN, lengthMm: 5 * IN, widthMm: 0.25 * IN },
        { kind: 'knot', fromEndMm: 30 * IN, fromEdgeMm: 2 * IN, lengthMm: 1.5 * IN, widthMm: 1.5 * IN, ...defect },
      ],
    },
  ],
});

describe('stockSettingsSchema', () => {
  it('accepts the usual stock and boards whose defects lie inside them', () => {
    expect(stockProblems(DEFAULT_STOCK_SETTINGS)).toEqual([]);
    expect(stockProblems(withBoards())).toEqual([]);
  });

  it('accepts a defect that reaches exactly to the far end and edge, typed in inches', () => {
    // 70 1/2 + 1 1/2 in = 72 in and 5 + 2 in = 7 in, summed in mm with float noise.
    expect(stockProblems(withBoards({ fromEndMm: 70.5 * IN, lengthMm: 1.5 * IN, fromEdgeMm: 5 * IN, widthMm: 2 * IN }))).toEqual([]);
  });

  it('names the row and field of a knot that runs past the end of its board, with the limit', () => {
    const problem = stockProblem(withBoards({ fromEndMm: 71 * IN, lengthMm: 2 * IN }));
    expect(problem?.field).toBe('boardsInStock[1].defects[1].lengthMm');
    expect(problem?.path).toEqual(['boardsInStock', 1, 'defects', 1, 'lengthMm']);
    expect(problem?.message).toMatch(/knot 2 past the far end/);
    expect(problem?.limit).toBe('at most 25.4 mm from there');
  });

  it('names the start of a defect that lies beyond the board altogether', () => {
    expect(stockProblem(withBoards({ fromEndMm: 80 * IN }))?.field).toBe('boardsInStock[1].defects[1].fromEndMm');
    expect(stockProblem(withBoards({ fromEdgeMm: 7 * IN }))?.field).toBe('boardsInStock[1].defects[1].fromEdgeMm');
    expect(stockProblem(withBoards({ fromEdgeMm: 6 * IN }))?.field).toBe('boardsInStock[1].defects[1].widthMm');
  });

  it('refuses sizes out of range, naming the field and the limit', () => {
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, kerfMm: 25 })).toMatchObject({ field: 'kerfMm', limit: `at most ${MAX_KERF_MM}` });
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, sheetLengthMm: 0 })).toMatchObject({ field: 'sheetLengthMm', limit: 'more than 0' });
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, boardWidthsMm: [] })).toMatchObject({ field: 'boardWidthsMm', message: 'needs at least one size for sale' });
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, boardLengthsMm: [1800, -1] })?.field).toBe('boardLengthsMm[1]');
  });

  it('refuses an unknown species, a fractional thickness and a field it does not know', () => {
    const board = withBoards().boardsInStock[0]!;
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, boardsInStock: [{ ...board, speciesId: 'unobtainium' }] })?.field).toBe('boardsInStock[0].speciesId');
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, boardsInStock: [{ ...board, quarters: 4.5 }] })?.field).toBe('boardsInStock[0].quarters');
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, colour: 'red' })?.message).toMatch(/colour/);
  });

  it('refuses an edge trim that leaves nothing of the sheet', () => {
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, sheetWidthMm: 150, trimMm: 80 })).toMatchObject({ field: 'sheetWidthMm', limit: 'more than twice the edge trim (160 mm)' });
  });

  it('trims the label and keeps every size as sent', () => {
    const parsed = stockSettingsSchema.parse({ ...withBoards(), boardsInStock: [{ ...withBoards().boardsInStock[1]!, label: '  A2 ' }] });
    expect(parsed.boardsInStock[0]?.label).toBe('A2');
    expect(parsed.boardsInStock[0]?.lengthMm).toBe(72 * IN);
  });
});

describe('stockProblems of a missing field', () => {
  it('says a left-out length is missing, naming the field, and keeps the type message for a wrong kind of value', () => {
    const { kerfMm: _kerf, ...noKerf } = DEFAULT_STOCK_SETTINGS;
    expect(stockProblem(noKerf)).toEqual({ field: 'kerfMm', path: ['kerfMm'], message: 'is missing', limit: 'required' });
    expect(stockProblem({ ...DEFAULT_STOCK_SETTINGS, kerfMm: '3' })?.message).toBe('must be a number (millimetres)');
  });

  it('says a left-out list, species or size inside a board on hand is missing, naming its row', () => {
    const { offcuts: _offcuts, ...noOffcuts } = DEFAULT_STOCK_SETTINGS;
    expect(stockProblem(noOffcuts)).toMatchObject({ field: 'offcuts', message: 'is missing' });
    const board = { quarters: 4, lengthMm: 72 * IN, defects: [{ kind: 'knot', fromEndMm: 0, fromEdgeMm: 0, widthMm: IN }] };
    const problems = stockProblems({ ...DEFAULT_STOCK_SETTINGS, boardsInStock: [board] }).map((p) => [p.field, p.message]);
    expect(problems).toEqual([
      ['boardsInStock[0].speciesId', 'is missing'],
      ['boardsInStock[0].widthMm', 'is missing'],
      ['boardsInStock[0].defects[0].lengthMm', 'is missing'],
    ]);
  });
});

describe('stockBody', () => {
  it('takes the stock with the version it was read at, or null for a workshop that has saved none', () => {
    expect(stockBody.safeParse({ version: '2026-11-30T16:20:00.123456Z', stock: DEFAULT_STOCK_SETTINGS }).success).toBe(true);
    expect(stockBody.safeParse({ version: null, stock: DEFAULT_STOCK_SETTINGS }).success).toBe(true);
  });

  it('names version when it is missing, a number, or not as the API wrote it (milliseconds only)', () => {
    for (const version of [undefined, 3, 'latest', '2026-11-30T16:20:00.123Z']) {
      const parsed = stockBody.safeParse({ version, stock: DEFAULT_STOCK_SETTINGS });
      expect(parsed.success, String(version)).toBe(false);
      expect(parsed.error?.issues[0]?.path, String(version)).toEqual(['version']);
      expect(parsed.error?.issues[0]?.message, String(version)).toMatch(/^must be the version the stock was read at/);
    }
  });

  it('names a bad stock field under stock', () => {
    const parsed = stockBody.safeParse({ version: null, stock: { ...DEFAULT_STOCK_SETTINGS, kerfMm: MAX_KERF_MM + 1 } });
    expect(parsed.error?.issues[0]?.path).toEqual(['stock', 'kerfMm']);
  });
});
