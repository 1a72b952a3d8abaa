/**
 * A workshop's stock read from a JSON file for the commands that lay materials out (`layout
 * --stock`, `plan --stock`): the shape the stock API returns or accepts, lengths in mm, checked
 * whole by `stockSettingsSchema` so a bad value is named by its place in the file.
 */
import { readFileSync } from 'node:fs';
import { InputError } from '../../shared/errors.ts';
import type { StockSettings } from '../../shared/materials/stockSettings.ts';
import { stockProblem } from '../../shared/schemas/stock.ts';
import { fromUserCwd } from './paths.ts';

/** The stock file's fields for a command's help; the command adds what it does with them. */
export const STOCK_FILE_FIELDS = `
Stock file (--stock): one JSON object, lengths in millimetres. Either the stock alone or, as
GET /api/workshops/:workshopId/stock returns it, wrapped as { "stock": { ... }, ... }.
  sheetLengthMm, sheetWidthMm   the sheet size for sale (length along the face grain)
  offcuts        [{ sheetId, lengthMm, widthMm, count }]   used before a sheet is bought
  boardLengthsMm, boardWidthsMm the board sizes for sale: every length in every width
  boardsInStock  [{ label?, speciesId, quarters, lengthMm, widthMm, defects }]   boards on hand,
                 cut before any is bought; quarters is the stock thickness (4 for 4/4)
    defects      [{ kind: knot | check | other, fromEndMm, fromEdgeMm, lengthMm, widthMm }]
                 from the board's end and edge to the defect's near side, and its size
  kerfMm, trimMm the saw's kerf and the trim off each sheet edge
Every field but label is required and checked; a bad one is named (e.g. boardsInStock[0].defects[1].lengthMm)`;

/**
 * Reads a workshop's stock from the JSON text of a stock file: the stock alone, or wrapped in
 * `stock` as the stock API returns it (`{ stock, updatedAt, updatedBy, version }`) or accepts it
 * (`{ version, stock }`); the wrapper's other fields are not read. Checked whole by
 * `stockSettingsSchema`: a bad value throws an InputError naming its place in the file.
 */
export function stockFromJson(text: string, file: string): StockSettings {
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    throw new InputError('--stock', `"${file}" is not JSON (${error instanceof Error ? error.message : String(error)})`, 'a JSON object');
  }
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new InputError('--stock', `"${file}" must hold one JSON object: the stock, or { "stock": { ... } } as the stock API returns it`, 'a JSON object');
  }
  const wrapped = Object.hasOwn(value, 'stock');
  const stock: unknown = wrapped ? (value as { stock: unknown }).stock : value;
  const problem = stockProblem(stock);
  if (problem) {
    const field = problem.field === 'stock' ? (wrapped ? 'stock' : '') : `${wrapped ? 'stock.' : ''}${problem.field}`;
    throw new InputError(`--stock ${field}`.trim(), problem.message, problem.limit);
  }
  return stock as StockSettings;
}

/** The stock file at `path` (relative to where the user ran the command), read and checked. */
export function readStockFile(path: string): StockSettings {
  let text: string;
  try {
    text = readFileSync(fromUserCwd(path), 'utf8');
  } catch {
    throw new InputError('--stock', `cannot read "${path}"`, 'a readable JSON file');
  }
  return stockFromJson(text, path);
}
