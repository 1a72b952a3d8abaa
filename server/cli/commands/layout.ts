/**
 * `casewright layout path/to/spec.json [--stock stock.json] [--sheet 48x96in] [--kerf 1/8in]
 * [--trim 1/4in] [--units in|mm] [--json]`, or `casewright layout --parts parts.csv ...`: lays
 * the parts out on boards and sheets and prints the sheets and boards, every placement and the
 * yield.
 *
 * A parts file has a header row with the columns `name, quantity, length, width, thickness,
 * material` (a species id or a sheet-good id) and optionally `grain` (length, width or none:
 * which way a sheet part's face grain runs; default none). Lengths are in a maker's notation,
 * bare numbers in `--units`.
 *
 * A stock file is a workshop's stock as JSON, in the shape the stock API returns or accepts
 * (the stock alone, or wrapped as `{ "stock": { ... } }`), lengths in mm; boards on hand are cut
 * first and around their defects. `--sheet`, `--kerf` and `--trim` override its values.
 */
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { buildPiece } from '../../../shared/engine/index.ts';
import { InputError } from '../../../shared/errors.ts';
import { layoutBoards } from '../../../shared/layout/boardOptimiser.ts';
import type { BoardPartInput } from '../../../shared/layout/boardTypes.ts';
import { layoutSheets } from '../../../shared/layout/sheetOptimiser.ts';
import type { FaceGrain, SheetPartInput, SheetStock } from '../../../shared/layout/sheetTypes.ts';
import { DEFECT_NAMES, takeoffOptionsFor, type StockSettings } from '../../../shared/materials/stockSettings.ts';
import { materialsTakeoff, type MaterialsTakeoff, type TakeoffOptions } from '../../../shared/materials/takeoff.ts';
import { stockProblem } from '../../../shared/schemas/stock.ts';
import { formatLength } from '../../../shared/units/format.ts';
import { MM_PER_INCH, type LengthUnit } from '../../../shared/units/length.ts';
import { parseLength } from '../../../shared/units/parse.ts';
import { getSheetGood, isSheetGoodId } from '../../../shared/wood/sheetGoods.ts';
import { getSpecies, isSpeciesId } from '../../../shared/wood/species.ts';
import { choiceOption, lengthOption, printJson, printLines } from '../options.ts';
import { fromUserCwd } from '../paths.ts';
import { readStockFile, STOCK_FILE_FIELDS } from '../stockFile.ts';
import { specFromArguments } from './cutlist.ts';
import type { RegisterCommand } from './index.ts';

interface LayoutOptions {
  parts?: string;
  stock?: string;
  sheet?: string;
  kerf?: string;
  trim?: string;
  units?: string;
  json?: boolean;
}

/** Reads `48x96in` or `1220 x 2440 mm`: the longer side is the sheet's length (its face grain). */
export function sheetSizeOption(text: string): SheetStock {
  const parts = text.split(/\s*[x×]\s*/i);
  if (parts.length !== 2) throw new InputError('--sheet', `"${text}" is not a sheet size; write it like 48x96in or 1220x2440mm`, 'width x length');
  const unit = /mm|cm|m\s*$/i.test(text) ? 'mm' : 'in';
  const [a, b] = parts.map((p) => parseLength(/[a-z"']\s*$/i.test(p) ? p : `${p} ${unit}`, { field: '--sheet', max: 20_000 }));
  const lengthMm = Math.max(a!, b!);
  const widthMm = Math.min(a!, b!);
  return { id: 'sheet', name: `Sheet ${formatLength(widthMm, { unit })} × ${formatLength(lengthMm, { unit })}`, lengthMm, widthMm, count: null, offcut: false };
}

/**
 * The takeoff options from a stock file with `--sheet`, `--kerf` and `--trim` laid over it; a
 * value that no longer fits with an override (an offcut the trim leaves nothing of) is named.
 */
function takeoffOptionsFromStock(stock: StockSettings, sheet: SheetStock | undefined, kerf: { kerfMm?: number; trimMm?: number }): TakeoffOptions {
  const settings: StockSettings = { ...stock, ...(sheet ? { sheetLengthMm: sheet.lengthMm, sheetWidthMm: sheet.widthMm } : {}), ...kerf };
  const problem = stockProblem(settings);
  if (problem) throw new InputError(`--stock ${problem.field} (with --sheet, --kerf and --trim applied)`, problem.message, problem.limit);
  return takeoffOptionsFor(settings);
}

/** Reads a parts CSV into the takeoff's shape, laying each material out on its own with `options`' stock, kerf and trim. */
export function takeoffFromPartsCsv(text: string, units: LengthUnit, options: TakeoffOptions = {}): MaterialsTakeoff {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim().toLowerCase() });
  for (const column of ['name', 'quantity', 'length', 'width', 'thickness', 'material']) {
    if (!parsed.meta.fields?.includes(column)) throw new InputError('--parts', `the header must name the columns name, quantity, length, width, thickness, material (missing ${column})`, 'a header row');
  }
  const solid = new Map<string, { speciesId: string; quarters: number; parts: BoardPartInput[] }>();
  const sheets = new Map<string, SheetPartInput[]>();
  parsed.data.forEach((row, i) => {
    const at = `--parts row ${i + 1}`;
    const cell = (name: string) => (row[name] ?? '').trim();
    const length = (name: string) => parseLength(cell(name), { field: `${at} ${name}`, defaultUnit: units, max: 20_000 });
    const quantity = Number(cell('quantity'));
    if (!Number.isInteger(quantity) || quantity < 1 || quantity > 10_000) throw new InputError(`${at} quantity`, `"${cell('quantity')}" is not a whole number from 1 to 10000`, '1–10000');
    const name = cell('name') || `Part ${i + 1}`;
    const id = `${name.toLowerCase().replace(/[^a-z0-9]+/g, '-')}-${i + 1}`;
    const material = cell('material');
    const [lengthMm, widthMm, thicknessMm] = [length('length'), length('width'), length('thickness')];
    if (isSheetGoodId(material)) {
      const grain = (cell('grain') || 'none') as FaceGrain;
      if (!['length', 'width', 'none'].includes(grain)) throw new InputError(`${at} grain`, `"${grain}" is not length, width or none`, 'length, width or none');
      sheets.set(material, [...(sheets.get(material) ?? []), { id, name, lengthMm, widthMm, quantity, grain }]);
    } else if (isSpeciesId(material)) {
      // Rough thickness: finished plus 1/8 in for planing, up to the next quarter (common practice).
      const quarters = Math.ceil((thicknessMm / MM_PER_INCH + 0.125) * 4 - 1e-9);
      const key = `${material}:${quarters}`;
      const group = solid.get(key) ?? { speciesId: material, quarters, parts: [] };
      group.parts.push({ id, name, quantity, lengthMm, widthMm, thicknessMm });
      solid.set(key, group);
    } else {
      throw new InputError(`${at} material`, `"${material}" is neither a species id nor a sheet-good id`, 'a species or sheet-good id');
    }
  });
  const kerf = options.kerfMm === undefined ? {} : { kerfMm: options.kerfMm };
  const boards = [...solid.values()].map((g) => {
    const layout = layoutBoards(g.parts, {
      quarters: g.quarters,
      ...kerf,
      ...(options.boardStock ? { stock: options.boardStock(g.speciesId, g.quarters) } : {}),
      ...(options.boardAttempts === undefined ? {} : { attempts: options.boardAttempts }),
    });
    return { speciesId: g.speciesId, speciesName: getSpecies(g.speciesId).name, quarters: g.quarters, layout };
  });
  const sheetTakeoffs = [...sheets.entries()].map(([sheetId, parts]) => {
    const layout = layoutSheets(parts, {
      ...kerf,
      ...(options.trimMm === undefined ? {} : { trimMm: options.trimMm }),
      ...(options.sheetStock ? { stock: options.sheetStock(sheetId) } : {}),
      ...(options.sheetAttempts === undefined ? {} : { attempts: options.sheetAttempts }),
    });
    return { sheetId, sheetName: getSheetGood(sheetId).name, layout };
  });
  return {
    boards,
    sheets: sheetTakeoffs,
    boardFeetBought: boards.reduce((s, b) => s + b.layout.boardFeetBought, 0),
    boardFeetFinished: boards.reduce((s, b) => s + b.layout.boardFeetFinished, 0),
    sheetsBought: sheetTakeoffs.reduce((s, t) => s + t.layout.sheetsBought, 0),
    cancelled: false,
  };
}

/** The human-readable report: sheets and boards, each placement, yields and what would not fit. */
export function takeoffLines(takeoff: MaterialsTakeoff, units: LengthUnit): string[] {
  const len = (mm: number) => formatLength(mm, { unit: units, precision: units === 'in' ? 16 : 0.5 });
  const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
  const lines: string[] = [];
  for (const s of takeoff.sheets) {
    const l = s.layout;
    lines.push(`${s.sheetName}: ${l.sheetsBought} sheet${l.sheetsBought === 1 ? '' : 's'} to buy${l.offcutsUsed ? ` and ${l.offcutsUsed} offcuts` : ''}, area lower bound ${l.lowerBound}, yield ${pct(l.yield)} (kerf ${len(l.kerfMm)}, trim ${len(l.trimMm)})`);
    l.sheets.forEach((plan, i) => {
      lines.push(`  sheet ${i + 1} (${plan.stockName}), yield ${pct(plan.yield)}`);
      for (const p of plan.parts) lines.push(`    ${p.name} #${p.instance + 1}: ${len(p.length)} × ${len(p.width)} at (${len(p.x)}, ${len(p.y)})${p.rotated ? ', turned' : ''}`);
    });
    for (const u of l.unplaced) lines.push(`  NOT PLACED: ${u.message}`);
  }
  for (const b of takeoff.boards) {
    const l = b.layout;
    lines.push(`${b.speciesName} ${b.quarters}/4: ${l.boards.length} board${l.boards.length === 1 ? '' : 's'}, ${l.boardFeetBought.toFixed(2)} bd ft bought, ${l.boardFeetRough.toFixed(2)} in rough parts, ${l.boardFeetFinished.toFixed(2)} in finished parts`);
    l.boards.forEach((plan, i) => {
      lines.push(`  board ${i + 1} (${plan.stockName}${plan.inStock ? ', in stock' : ''}), ${plan.boardFeet.toFixed(2)} bd ft, yield ${pct(plan.yield)}`);
      for (const d of plan.defects) lines.push(`    cut around ${d.note ?? DEFECT_NAMES.other}: ${len(d.startMm)} to ${len(d.endMm)} from the end${d.fromEdgeMm === undefined ? '' : `, ${len(d.fromEdgeMm)} to ${len(d.toEdgeMm ?? plan.widthMm)} from the edge`}`);
      for (const p of plan.parts) lines.push(`    ${p.name} #${p.instance + 1}: ${len(p.length)} × ${len(p.width)} rough at (${len(p.x)}, ${len(p.y)})${p.matchGroup ? `, ${p.matchOrder !== null ? `grain-matched run ${p.matchLabel ?? p.matchGroup}, place ${p.matchOrder}` : `match group ${p.matchGroup}`}` : ''}`);
    });
    for (const w of l.splitWarnings) lines.push(`  GRAIN MATCH SPLIT: ${w.message}`);
    for (const u of l.unplaced) lines.push(`  NOT PLACED: ${u.message}`);
  }
  lines.push(`Total: ${takeoff.sheetsBought} sheets, ${takeoff.boardFeetBought.toFixed(2)} bd ft of boards (${takeoff.boardFeetFinished.toFixed(2)} bd ft in finished parts)`);
  return lines;
}

const STOCK_FILE_HELP = `${STOCK_FILE_FIELDS}
and nothing is laid out. --sheet, --kerf and --trim override the file's values.`;

export const registerLayout: RegisterCommand = (program) => {
  program
    .command('layout')
    .description('Lay a piece (or a list of parts) out on boards and sheets: sheets, placements and yield.')
    .argument('[spec]', 'a spec file (JSON) or a piece kind')
    .option('--parts <file>', 'a CSV list of parts instead of a spec: name, quantity, length, width, thickness, material[, grain]')
    .option('--stock <file>', 'a workshop stock file (JSON, lengths in mm, as the stock API returns or accepts it): boards on hand are cut first and around their defects; see below')
    .option('--sheet <size>', 'sheet size for sale, e.g. 48x96in or 1220x2440mm (default 48x96in, or the stock file\'s)')
    .option('--kerf <length>', 'saw kerf, e.g. 1/8in (default 1/8in, or the stock file\'s)')
    .option('--trim <length>', 'trim off each sheet edge, e.g. 1/4in (default 1/4in, or the stock file\'s)')
    .option('--units <unit>', 'units for the report and for bare numbers in the parts file: in or mm', 'in')
    .option('--json', 'print the takeoff as JSON, lengths in mm')
    .addHelpText('after', STOCK_FILE_HELP)
    .action((specPath: string | undefined, opts: LayoutOptions) => {
      const units = choiceOption(opts.units, '--units', ['in', 'mm'] as const);
      const sheet = opts.sheet === undefined ? undefined : sheetSizeOption(opts.sheet);
      const kerf = {
        ...(opts.kerf === undefined ? {} : { kerfMm: lengthOption(opts.kerf, '--kerf', { allowZero: true, max: 20 }) }),
        ...(opts.trim === undefined ? {} : { trimMm: lengthOption(opts.trim, '--trim', { allowZero: true, max: 100 }) }),
      };
      // Everything is read and checked before anything is laid out or printed.
      const options: TakeoffOptions = opts.stock === undefined
        ? { ...kerf, ...(sheet ? { sheetStock: () => [sheet] } : {}) }
        : takeoffOptionsFromStock(readStockFile(opts.stock), sheet, kerf);
      let takeoff: MaterialsTakeoff;
      if (opts.parts !== undefined) {
        if (specPath !== undefined) throw new InputError('--parts', 'give either a spec or --parts, not both', 'one source of parts');
        let text: string;
        try {
          text = readFileSync(fromUserCwd(opts.parts), 'utf8');
        } catch {
          throw new InputError('--parts', `cannot read "${opts.parts}"`, 'a readable CSV file');
        }
        takeoff = takeoffFromPartsCsv(text, units, options);
      } else {
        if (specPath === undefined) throw new InputError('spec', 'give a spec file or --parts parts.csv', 'a spec or a parts list');
        const result = buildPiece(specFromArguments(specPath, [], units));
        takeoff = materialsTakeoff(result, options);
      }
      if (opts.json) printJson(takeoff);
      else printLines(takeoffLines(takeoff, units));
    });
};
