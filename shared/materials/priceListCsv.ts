/**
 * Reading a price list from CSV (papaparse), all or nothing: every row is checked, every
 * problem is reported with its line number, and no list comes back unless every row is good.
 *
 * Columns (a header row, any order, case-insensitive): `kind` (lumber, sheet, hardware,
 * finish), `item` (a species id, a sheet-good id, or your own id for hardware and finish),
 * `thickness` (lumber only: quarters such as `4/4` or `8/4`), `price` (per board foot, per
 * sheet, or per unit), `unit` (hardware and finish: `each`, `pair`, `quart` ...), `name`
 * (hardware and finish: the words on the shopping list).
 */
import Papa from 'papaparse';
import { centsFromText } from './money.ts';
import { priceItemSchema, priceKey, type PriceItem, type PriceList } from './priceList.ts';

/** One problem with one line of the file; `line` counts from 1, the header being line 1. */
export interface CsvLineError {
  line: number;
  column: string | null;
  message: string;
}

/** The outcome: a whole price list, or every problem found. */
export type PriceListCsvResult = { ok: true; priceList: PriceList } | { ok: false; errors: CsvLineError[] };

/** Columns every file must have. */
export const PRICE_LIST_COLUMNS = ['kind', 'item', 'thickness', 'price', 'unit', 'name'] as const;

const REQUIRED = ['kind', 'item', 'price'] as const;

/** Reads `text` as a price list in `currency`; see the module comment for the columns. */
export function parsePriceListCsv(text: string, currency = 'USD'): PriceListCsvResult {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
  const lines = lineNumbers(text, parsed.data.length);
  const errors: CsvLineError[] = parsed.errors.map((e) => ({ line: (e.row ?? 0) + 1, column: null, message: e.message }));
  const header = (parsed.data[0] ?? []).map((h) => h.trim().toLowerCase());
  const missing = REQUIRED.filter((c) => !header.includes(c));
  if (missing.length > 0) {
    return { ok: false, errors: [{ line: 1, column: null, message: `the header must name the columns ${PRICE_LIST_COLUMNS.join(', ')}; missing ${missing.join(', ')}` }] };
  }
  const items: PriceItem[] = [];
  const seen = new Map<string, number>();
  parsed.data.slice(1).forEach((cells, i) => {
    const line = lines[i + 1] ?? i + 2;
    if (cells.every((c) => c.trim() === '')) return;
    const cell = (name: string) => (cells[header.indexOf(name)] ?? '').trim();
    const row = readRow(cell, line, errors);
    if (row === null) return;
    const key = priceKey(row);
    const first = seen.get(key);
    if (first !== undefined) {
      errors.push({ line, column: 'item', message: `prices the same thing as line ${first}` });
      return;
    }
    seen.set(key, line);
    items.push(row);
  });
  if (errors.length > 0) return { ok: false, errors: errors.sort((a, b) => a.line - b.line) };
  return { ok: true, priceList: { currency, items } };
}

function readRow(cell: (name: string) => string, line: number, errors: CsvLineError[]): PriceItem | null {
  const fail = (column: string, message: string): null => {
    errors.push({ line, column, message });
    return null;
  };
  const kind = cell('kind').toLowerCase();
  const priceText = cell('price');
  const price = centsFromText(priceText);
  if (price === null) return fail('price', `"${priceText}" is not a price; write it like 8.75`);
  let candidate: unknown;
  if (kind === 'lumber') {
    const quarters = /^(\d{1,2})\/4$/.exec(cell('thickness'));
    if (!quarters) return fail('thickness', `"${cell('thickness')}" is not a stock thickness; write quarters such as 4/4 or 8/4`);
    candidate = { kind, speciesId: cell('item'), quarters: Number(quarters[1]), pricePerBoardFootCents: price };
  } else if (kind === 'sheet') {
    candidate = { kind, sheetId: cell('item'), pricePerSheetCents: price };
  } else if (kind === 'hardware' || kind === 'finish') {
    candidate = { kind, itemId: cell('item'), name: cell('name'), unit: cell('unit'), pricePerUnitCents: price };
  } else {
    return fail('kind', `"${cell('kind')}" is not a kind; use lumber, sheet, hardware or finish`);
  }
  const checked = priceItemSchema.safeParse(candidate);
  if (checked.success) return checked.data;
  for (const issue of checked.error.issues) {
    const field = String(issue.path[0] ?? 'item');
    const column = COLUMN_OF[field] ?? field;
    errors.push({ line, column, message: `${column}: ${issue.message}` });
  }
  return null;
}

const COLUMN_OF: Record<string, string> = {
  speciesId: 'item',
  sheetId: 'item',
  itemId: 'item',
  quarters: 'thickness',
  pricePerBoardFootCents: 'price',
  pricePerSheetCents: 'price',
  pricePerUnitCents: 'price',
  name: 'name',
  unit: 'unit',
};

// The line each parsed row starts on: quoted fields may hold line breaks, so rows and lines
// differ. Papaparse's cursor after a row is where the next row starts.
function lineNumbers(text: string, rows: number): number[] {
  const body = text.replace(/^\uFEFF/, '');
  const starts: number[] = [];
  let line = 1;
  let row = 0;
  Papa.parse<string[]>(body, {
    skipEmptyLines: false,
    step: (result) => {
      starts[row++] = line;
      line = body.slice(0, result.meta.cursor).split(/\r\n|\r|\n/).length;
    },
  });
  return starts.length === rows ? starts : Array.from({ length: rows }, (_, i) => i + 1);
}
