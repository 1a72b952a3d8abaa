/**
 * A workshop's stock on the wire: the whole stock as an owner or designer saves it (every size
 * within its limit, every defect inside its board), and the stock as members read it. The same
 * schema checks the form before it is sent and the takeoff's options before a layout runs.
 */
import { z } from 'zod';
import type { StockSettings } from '../materials/stockSettings.ts';
import { SHEET_GOOD_IDS } from '../wood/sheetGoods.ts';
import { SPECIES_IDS } from '../wood/species.ts';
import { MAX_KERF_MM, MAX_SIZE_MM, MAX_TRIM_MM } from '../layout/sheetInput.ts';
import { timestampSchema } from './common.ts';

/** Longest stock length accepted, mm: the layout's own limit (20 m). */
export const MAX_STOCK_LENGTH_MM = MAX_SIZE_MM;
/** Widest board accepted, mm (2 m). */
export const MAX_BOARD_WIDTH_MM = 2_000;
/** Widest kerf and edge trim accepted, mm: the layout's own limits, so the form and the layout agree. */
export { MAX_KERF_MM, MAX_TRIM_MM };
/** Longest label on a board, characters. */
export const MAX_LABEL_CHARS = 60;
/** Most offcuts, boards on hand, defects per board and sizes for sale a workshop may list. */
export const MAX_OFFCUTS = 200;
export const MAX_BOARDS_IN_STOCK = 500;
export const MAX_DEFECTS_PER_BOARD = 50;
export const MAX_SIZES_FOR_SALE = 20;
/** Most of one offcut. */
export const MAX_OFFCUT_COUNT = 100;

// Sums of lengths typed in fractions of an inch carry float noise far below a saw's accuracy.
const FIT_TOLERANCE_MM = 1e-6;

/** What a required field left out reports, naming no type: the form has simply not sent it. */
const MISSING_MESSAGE = 'is missing';

/** A type error that says `is missing` when the field was left out, and `message` when it holds the wrong kind of value. */
const orMissing = (message: string) => ({ error: (issue: { input?: unknown }) => (issue.input === undefined ? MISSING_MESSAGE : message) });

const number = orMissing('must be a number (millimetres)');

const size = (max: number) =>
  z.number(number).gt(0, { message: 'must be more than 0 mm' }).max(max, { message: `must be at most ${max} mm` });
const offset = (max: number) =>
  z.number(number).min(0, { message: 'must be 0 mm or more' }).max(max, { message: `must be at most ${max} mm` });

const defectSchema = z.strictObject({
  kind: z.enum(['knot', 'check', 'other'], orMissing('must be knot, check or other')),
  fromEndMm: offset(MAX_STOCK_LENGTH_MM),
  fromEdgeMm: offset(MAX_BOARD_WIDTH_MM),
  lengthMm: size(MAX_STOCK_LENGTH_MM),
  widthMm: size(MAX_BOARD_WIDTH_MM),
});

const boardInStockSchema = z.strictObject({
  label: z
    .string()
    .trim()
    .max(MAX_LABEL_CHARS, { message: `must be at most ${MAX_LABEL_CHARS} characters` })
    .refine((text) => !text.includes('\u0000'), { message: 'must not contain NUL characters' })
    .optional(),
  speciesId: z.enum(SPECIES_IDS as [string, ...string[]], orMissing('must be a species of the wood library')),
  quarters: z.number(number).int({ message: 'must be a whole number of quarters (4 for 4/4)' }).min(1, { message: 'must be at least 1/4' }).max(64, { message: 'must be at most 64/4' }),
  lengthMm: size(MAX_STOCK_LENGTH_MM),
  widthMm: size(MAX_BOARD_WIDTH_MM),
  defects: z.array(defectSchema, orMissing('must be a list of defects')).max(MAX_DEFECTS_PER_BOARD, { message: `must list at most ${MAX_DEFECTS_PER_BOARD} defects` }),
});

const offcutSchema = z.strictObject({
  sheetId: z.enum(SHEET_GOOD_IDS as [string, ...string[]], orMissing('must be a sheet good of the wood library')),
  lengthMm: size(MAX_STOCK_LENGTH_MM),
  widthMm: size(MAX_STOCK_LENGTH_MM),
  count: z.number(number).int({ message: 'must be a whole number' }).min(1, { message: 'must be at least 1' }).max(MAX_OFFCUT_COUNT, { message: `must be at most ${MAX_OFFCUT_COUNT}` }),
});

const sizesForSale = (max: number) =>
  z.array(size(max), orMissing('must be a list of sizes')).min(1, { message: 'needs at least one size for sale' }).max(MAX_SIZES_FOR_SALE, { message: `must list at most ${MAX_SIZES_FOR_SALE} sizes` });

/** Millimetres as a message shows them: to a tenth. */
const mm = (value: number) => `${Number(value.toFixed(1))} mm`;

/** Where a limit that spans fields is broken, for the custom issues below. */
type Fit = { path: (string | number)[]; message: string; limit: string };

/** Defects that leave their board and trims that leave nothing of a sheet, in the order a form shows them. */
function fitProblems(stock: StockSettings): Fit[] {
  const found: Fit[] = [];
  const trimLeaves = (path: (string | number)[], lengthMm: number, widthMm: number, what: string) => {
    if (2 * stock.trimMm >= Math.min(lengthMm, widthMm)) {
      found.push({ path, message: `is too small for the edge trim: ${mm(stock.trimMm)} off each edge leaves nothing of the ${what}`, limit: `more than twice the edge trim (${mm(2 * stock.trimMm)})` });
    }
  };
  trimLeaves(['sheetWidthMm'], stock.sheetLengthMm, stock.sheetWidthMm, 'sheet');
  stock.offcuts.forEach((o, i) => trimLeaves(['offcuts', i, 'widthMm'], o.lengthMm, o.widthMm, `offcut ${i + 1}`));
  stock.boardsInStock.forEach((board, i) => {
    board.defects.forEach((d, j) => {
      const at = ['boardsInStock', i, 'defects', j];
      const name = `${d.kind === 'other' ? 'defect' : d.kind} ${j + 1}`;
      if (d.fromEndMm >= board.lengthMm) {
        found.push({ path: [...at, 'fromEndMm'], message: `puts ${name} beyond the far end of the ${mm(board.lengthMm)} board`, limit: `less than the board's length (${mm(board.lengthMm)})` });
      } else if (d.fromEndMm + d.lengthMm > board.lengthMm + FIT_TOLERANCE_MM) {
        found.push({ path: [...at, 'lengthMm'], message: `runs ${name} past the far end of the board: ${mm(d.fromEndMm)} + ${mm(d.lengthMm)} is more than its ${mm(board.lengthMm)} length`, limit: `at most ${mm(board.lengthMm - d.fromEndMm)} from there` });
      }
      if (d.fromEdgeMm >= board.widthMm) {
        found.push({ path: [...at, 'fromEdgeMm'], message: `puts ${name} beyond the far edge of the ${mm(board.widthMm)} wide board`, limit: `less than the board's width (${mm(board.widthMm)})` });
      } else if (d.fromEdgeMm + d.widthMm > board.widthMm + FIT_TOLERANCE_MM) {
        found.push({ path: [...at, 'widthMm'], message: `runs ${name} past the far edge of the board: ${mm(d.fromEdgeMm)} + ${mm(d.widthMm)} is more than its ${mm(board.widthMm)} width`, limit: `at most ${mm(board.widthMm - d.fromEdgeMm)} from there` });
      }
    });
  });
  return found;
}

/** A workshop's whole stock, each field within its limit and every defect inside its board. */
export const stockSettingsSchema = z
  .strictObject({
    sheetLengthMm: size(MAX_STOCK_LENGTH_MM),
    sheetWidthMm: size(MAX_STOCK_LENGTH_MM),
    offcuts: z.array(offcutSchema, orMissing('must be a list of offcuts')).max(MAX_OFFCUTS, { message: `must list at most ${MAX_OFFCUTS} offcuts` }),
    boardLengthsMm: sizesForSale(MAX_STOCK_LENGTH_MM),
    boardWidthsMm: sizesForSale(MAX_BOARD_WIDTH_MM),
    boardsInStock: z.array(boardInStockSchema, orMissing('must be a list of boards')).max(MAX_BOARDS_IN_STOCK, { message: `must list at most ${MAX_BOARDS_IN_STOCK} boards` }),
    kerfMm: offset(MAX_KERF_MM),
    trimMm: offset(MAX_TRIM_MM),
  })
  .superRefine((stock, ctx) => {
    for (const fit of fitProblems(stock)) ctx.addIssue({ code: 'custom', path: fit.path, message: fit.message, params: { limit: fit.limit } });
  }) satisfies z.ZodType<StockSettings>;

/**
 * The version of a workshop's stock a client read: the stored row's last-saved time to the
 * microsecond, which every save moves forward. Clients treat it as an opaque token and send it
 * back unchanged; null when the workshop has saved no stock yet (it reads the defaults).
 */
export const stockVersionSchema = z
  .string({ error: 'must be the version the stock was read at (as GET returned it), or null for a workshop that has saved none' })
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{6}Z$/, { message: 'must be the version the stock was read at, unchanged (as GET returned it)' })
  .nullable();

/**
 * The body of `PUT /workshops/:workshopId/stock`: the whole stock and the version it was edited
 * from. When the stored version has moved on, nothing is saved and the answer is a 409.
 */
export const stockBody = z.strictObject({
  version: stockVersionSchema,
  stock: stockSettingsSchema,
});

/** A workshop's stock as members read it; `updatedAt` and `version` are null when none has been saved (the defaults). */
export const stockResponse = z.object({
  stock: stockSettingsSchema,
  updatedAt: timestampSchema.nullable(),
  updatedBy: z.string().nullable(),
  version: stockVersionSchema,
});
export type StockResponse = z.infer<typeof stockResponse>;

/** 409 details when someone saved the stock since the version a save started from: the stock as it is now. */
export const staleStockDetails = z.object({ current: stockResponse });

/** The first thing wrong with a stock, as an InputError would name it: field path, message and limit. */
export interface StockProblem {
  /** e.g. `boardsInStock[2].defects[0].lengthMm`. */
  field: string;
  /** The same place as a path of keys and indexes, for a form to find its row. */
  path: (string | number)[];
  message: string;
  limit: string;
}

const fieldOf = (path: readonly PropertyKey[]) =>
  path.reduce<string>((text, key) => (typeof key === 'number' ? `${text}[${key}]` : text === '' ? String(key) : `${text}.${String(key)}`), '');

function limitOf(issue: z.core.$ZodIssue): string {
  if (issue.message === MISSING_MESSAGE) return 'required';
  if (issue.code === 'too_big') return `at most ${String(issue.maximum)}`;
  if (issue.code === 'too_small') return issue.inclusive === false ? `more than ${String(issue.minimum)}` : `at least ${String(issue.minimum)}`;
  if (issue.code === 'custom' && typeof issue.params?.limit === 'string') return issue.params.limit;
  return issue.message;
}

/** Every problem of `value` as a stock, in the order of the form; empty when it is good. */
export function stockProblems(value: unknown): StockProblem[] {
  const parsed = stockSettingsSchema.safeParse(value);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => {
    const path = issue.path.filter((k): k is string | number => typeof k !== 'symbol');
    return { field: fieldOf(path) || 'stock', path, message: issue.message, limit: limitOf(issue) };
  });
}

/** The first problem of `value` as a stock, or null when it is good. */
export function stockProblem(value: unknown): StockProblem | null {
  return stockProblems(value)[0] ?? null;
}
