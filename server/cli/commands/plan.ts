/**
 * `casewright plan chest --set width=40in --out chest.pdf`, or
 * `casewright plan path/to/spec.json --format svg --view front --out front.svg`: builds the
 * piece and writes its plan set (PDF), one view (SVG), the cut list (CSV) or the spec (JSON).
 * `--stock stock.json` lays the PDF's materials pages out on a workshop's stock (the file
 * `layout --stock` reads), `--prices prices.csv` costs them. Everything is built before anything is written, so bad input gives one error line, exit
 * code 2 and no file.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { basename } from 'node:path';
import { buildPlanSet } from '../../../shared/drawing/planSet.ts';
import type { PaperSize } from '../../../shared/drawing/types.ts';
import { buildPiece } from '../../../shared/engine/index.ts';
import { InputError } from '../../../shared/errors.ts';
import { parsePriceListCsv } from '../../../shared/materials/priceListCsv.ts';
import type { PriceList } from '../../../shared/materials/priceList.ts';
import { cutListCsv } from '../../../src/export/cutListCsv.ts';
import { monoFontsNode } from '../../../src/export/fontsNode.ts';
import { renderPlanSetPdf } from '../../../src/export/planSetPdf.ts';
import { specJson } from '../../../src/export/specJson.ts';
import { SVG_VIEWS, viewSvg } from '../../../src/export/viewSvg.ts';
import { choiceOption } from '../options.ts';
import { fromUserCwd } from '../paths.ts';
import { readStockFile, STOCK_FILE_FIELDS } from '../stockFile.ts';
import { specFromArguments } from './cutlist.ts';
import type { RegisterCommand } from './index.ts';

interface PlanOptions {
  set: string[];
  units?: string;
  format?: string;
  view?: string;
  sheet?: string;
  orientation?: string;
  title?: string;
  revision?: string;
  workshop?: string;
  date?: string;
  prices?: string;
  stock?: string;
  out?: string;
}

const FORMATS = ['pdf', 'svg', 'csv', 'json'] as const;

/** The price list in a CSV file (columns as for the workshop's upload); every bad line is named. */
function readPriceList(path: string): PriceList {
  let text: string;
  try {
    text = readFileSync(fromUserCwd(path), 'utf8');
  } catch {
    throw new InputError('--prices', `cannot read "${path}"`, 'a readable CSV file');
  }
  const parsed = parsePriceListCsv(text);
  if (!parsed.ok) {
    const lines = parsed.errors.map((e) => `line ${e.line}${e.column ? ` (${e.column})` : ''}: ${e.message}`).join('; ');
    throw new InputError('--prices', `"${path}" has errors — ${lines}`, 'a price list CSV');
  }
  return parsed.priceList;
}

const SHEETS: readonly PaperSize[] = ['letter', 'a4', 'a3'];
const ORIENTATIONS = ['landscape', 'portrait'] as const;

/** Builds the requested output, as bytes or text, without writing anything. */
export async function planOutput(target: string, opts: PlanOptions): Promise<{ data: string | Uint8Array; format: (typeof FORMATS)[number] }> {
  const units = choiceOption(opts.units, '--units', ['in', 'mm'] as const, 'in');
  const format = choiceOption(opts.format, '--format', FORMATS, 'pdf');
  const size = choiceOption(opts.sheet, '--sheet', SHEETS, units === 'in' ? 'letter' : 'a4');
  const orientation = choiceOption(opts.orientation, '--orientation', ORIENTATIONS, 'landscape');
  if (opts.date !== undefined && !/^\d{4}-\d{2}-\d{2}$/.test(opts.date)) throw new InputError('--date', `"${opts.date}" is not a date like 2025-03-14`, 'YYYY-MM-DD');
  const spec = specFromArguments(target, opts.set, units);
  const result = buildPiece(spec);
  const title = opts.title ?? `${result.kind[0]!.toUpperCase()}${result.kind.slice(1)}`;
  const info = { title, revision: opts.revision ?? '1', workshopName: opts.workshop ?? '', units, date: opts.date ?? new Date().toISOString().slice(0, 10) };
  const sheet = { size, orientation };
  switch (format) {
    case 'pdf': {
      const materials = {
        ...(opts.prices === undefined ? {} : { priceList: readPriceList(opts.prices) }),
        ...(opts.stock === undefined ? {} : { stock: readStockFile(opts.stock), stockSource: `the stock file ${basename(opts.stock)}` }),
      };
      const model = buildPlanSet(result, { ...info, sheet, materials });
      return { data: new Uint8Array(await renderPlanSetPdf(model, await monoFontsNode())), format };
    }
    case 'svg': {
      const view = choiceOption(opts.view, '--view', SVG_VIEWS, 'front');
      return { data: viewSvg(result, view, info, sheet), format };
    }
    case 'csv':
      return { data: cutListCsv(result, units), format };
    case 'json':
      return { data: specJson(result.spec), format };
  }
}

export const registerPlan: RegisterCommand = (program) => {
  program
    .command('plan')
    .description('Write the plan set (PDF), one view (SVG), the cut list (CSV) or the spec (JSON) of a piece kind or spec file.')
    .argument('<piece>', 'a piece kind (chest, dresser, cabinet) or a spec JSON file')
    .option('--set <key=value>', 'set a parameter, e.g. width=40in; repeatable', (value: string, previous: string[]) => [...previous, value], [] as string[])
    .option('--units <unit>', 'drawing units, and the unit of bare numbers in --set: in or mm', 'in')
    .option('--format <format>', 'pdf, svg, csv or json', 'pdf')
    .option('--view <view>', 'for svg: front, side, top or exploded', 'front')
    .option('--sheet <size>', 'letter, a4 or a3 (default letter for inches, a4 for mm)')
    .option('--orientation <o>', 'landscape or portrait', 'landscape')
    .option('--title <text>', 'design title for the title block')
    .option('--revision <text>', 'revision for the title block', '1')
    .option('--workshop <text>', 'workshop name for the title block')
    .option('--date <YYYY-MM-DD>', 'date for the title block (default today)')
    .option('--prices <file>', 'a price list CSV (kind,item,thickness,price,unit,name) to cost the job in the PDF')
    .option('--stock <file>', 'a workshop stock file (JSON, lengths in mm, as `layout --stock` reads it) to lay the PDF\'s materials pages out on: boards on hand first and around their defects; see below')
    .option('--out <file>', 'file to write; without it svg, csv and json go to stdout')
    .addHelpText('after', `${STOCK_FILE_FIELDS}
and nothing is drawn. Without --stock the materials pages use the default stock.`)
    .action(async (piece: string, opts: PlanOptions) => {
      const { data, format } = await planOutput(piece, opts);
      if (opts.out) {
        writeFileSync(fromUserCwd(opts.out), data);
        process.stderr.write(`casewright: wrote ${opts.out}\n`);
      } else if (format === 'pdf') {
        throw new InputError('--out', 'a PDF needs a file: give --out plan.pdf', 'a file path');
      } else {
        process.stdout.write(data);
      }
    });
};
