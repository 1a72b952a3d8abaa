/**
 * `casewright cutlist chest --set width=40in --set depth=19in [--set key=value ...]
 * [--units in|mm] [--json]`, or `casewright cutlist path/to/spec.json`: builds the piece and
 * prints its cut list, board feet, sheet area and checks; `--json` prints the whole result with
 * lengths in millimetres. Everything is built before anything is printed, so a bad value gives
 * one error line, exit code 2, and no partial output.
 */
import { readFileSync } from 'node:fs';
import { buildPiece, defaultSpec, paramDefs, PIECE_KINDS, type PieceKind, type PieceResult, type PieceSpec } from '../../../shared/engine/index.ts';
import { materialLabel } from '../../../shared/engine/derived/cutList.ts';
import { InputError } from '../../../shared/errors.ts';
import { formatLength } from '../../../shared/units/format.ts';
import type { LengthUnit } from '../../../shared/units/length.ts';
import { parseLength } from '../../../shared/units/parse.ts';
import { choiceOption, printJson, printLines } from '../options.ts';
import { fromUserCwd } from '../paths.ts';
import type { RegisterCommand } from './index.ts';

interface CutlistOptions {
  set: string[];
  units?: string;
  json?: boolean;
}

const CLIMATE_KEYS = ['buildMcPercent', 'lowMcPercent', 'highMcPercent'] as const;

/** Reads a spec file; a missing file or bad JSON is an InputError on `spec`. */
function readSpecFile(path: string): PieceSpec {
  let text: string;
  try {
    text = readFileSync(fromUserCwd(path), 'utf8');
  } catch {
    throw new InputError('spec', `cannot read "${path}": give a piece kind (${PIECE_KINDS.join(', ')}) or a spec file`, 'a readable JSON file');
  }
  try {
    return JSON.parse(text) as PieceSpec;
  } catch (error) {
    throw new InputError('spec', `"${path}" is not valid JSON (${error instanceof Error ? error.message : String(error)})`, 'JSON');
  }
}

/** Applies one `key=value` to `spec`, reading lengths in the maker's notation. */
function applySet(spec: PieceSpec, assignment: string, units: LengthUnit): PieceSpec {
  const eq = assignment.indexOf('=');
  if (eq <= 0) throw new InputError('--set', `"${assignment}" is not key=value, e.g. width=40in`, 'key=value');
  const key = assignment.slice(0, eq).trim();
  const text = assignment.slice(eq + 1).trim();
  if (key.startsWith('climate.')) {
    const field = key.slice('climate.'.length);
    if (!(CLIMATE_KEYS as readonly string[]).includes(field)) throw new InputError(key, `unknown climate field; use ${CLIMATE_KEYS.map((k) => `climate.${k}`).join(', ')}`, CLIMATE_KEYS.join(', '));
    const value = Number(text.replace(/%$/, ''));
    if (text === '' || !Number.isFinite(value)) throw new InputError(key, `"${text}" is not a moisture content in %`, 'a number of %');
    const climate = { ...(spec.climate ?? defaultSpec(spec.kind).climate!), [field]: value };
    return { ...spec, climate };
  }
  const def = paramDefs(spec.kind).find((d) => d.key === key);
  if (!def) throw new InputError(key, `is not a ${spec.kind} parameter; known: ${paramDefs(spec.kind).map((d) => d.key).join(', ')}`, 'a known parameter');
  let value: unknown;
  switch (def.kind) {
    case 'length':
      value = parseLength(text, { field: key, defaultUnit: units, allowZero: true, allowNegative: (def.min ?? 0) < 0 });
      break;
    case 'number':
    case 'percent': {
      const n = Number(text.replace(/%$/, ''));
      if (text === '' || !Number.isFinite(n)) throw new InputError(key, `"${text}" is not a number`, 'a number');
      value = n;
      break;
    }
    case 'boolean':
      if (!['true', 'false', 'yes', 'no'].includes(text.toLowerCase())) throw new InputError(key, `"${text}" is not true or false`, 'true or false');
      value = ['true', 'yes'].includes(text.toLowerCase());
      break;
    default:
      value = text;
  }
  return { ...spec, params: { ...spec.params, [key]: value } };
}

/** The spec the command line describes: a kind's defaults or a file, with every `--set` applied. */
export function specFromArguments(target: string, sets: readonly string[], units: LengthUnit): PieceSpec {
  const base = (PIECE_KINDS as readonly string[]).includes(target) ? defaultSpec(target as PieceKind) : readSpecFile(target);
  if (typeof base !== 'object' || base === null || typeof base.kind !== 'string') {
    throw new InputError('spec', 'a spec file must hold an object with schemaVersion, kind and params', 'a piece spec');
  }
  return sets.reduce((spec, s) => applySet({ ...spec, params: { ...(spec.params ?? {}) } }, s, units), base);
}

/** The `--json` shape: the whole result, lengths in mm. */
export function resultJson(result: PieceResult) {
  return {
    piece: { kind: result.kind, engineVersion: result.engineVersion, spec: result.spec },
    parts: result.parts.map((p) => ({
      id: p.id, name: p.name, role: p.role, material: materialLabel(p), materialDetail: p.material, grain: p.grain,
      quantity: p.quantity, lengthMm: p.lengthMm, widthMm: p.widthMm, thicknessMm: p.thicknessMm, rough: p.rough,
      ...(p.glueUp ? { glueUp: p.glueUp } : {}), notes: p.notes, features: p.features,
    })),
    joints: result.joints,
    placements: result.placements,
    checks: result.checks,
    bboxMm: result.bboxMm,
    bboxMinMm: result.bboxMinMm,
    boardFeet: result.derived.boardFeet,
    sheetArea: result.derived.sheetArea,
    cutList: result.derived.cutList,
    joinery: result.derived.joinery,
    glueUp: result.derived.glueUp,
  };
}

function pad(rows: string[][]): string[] {
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((r) => (r[i] ?? '').length)));
  return rows.map((r) => r.map((c, i) => c.padEnd(widths[i]!)).join('  ').trimEnd());
}

/** The human-readable report. */
export function resultLines(result: PieceResult, units: LengthUnit): string[] {
  const len = (mm: number) => formatLength(mm, { unit: units, precision: units === 'in' ? 32 : 0.1 });
  const size = (s: readonly number[]) => s.map(len).join(' × ');
  const lines = [
    `${result.kind.charAt(0).toUpperCase()}${result.kind.slice(1)}: ${size(result.bboxMm)} overall (width × depth × height)`,
    '',
    'CUT LIST',
  ];
  for (const group of result.derived.cutList) {
    lines.push('', `${group.material}`);
    const rows = [['qty', 'part', 'finished L × W × T', 'rough L × W × T', 'grain', 'notes']];
    for (const r of group.rows) rows.push([String(r.quantity), r.name, size(r.finished), size(r.rough), r.grain, r.notes.join(' ')]);
    lines.push(...pad(rows).map((l) => `  ${l}`));
  }
  lines.push('', 'BOARD FEET (rough sizes, thickness to the next quarter)');
  for (const s of result.derived.boardFeet.bySpecies) {
    const by = Object.entries(s.byThickness).map(([t, bf]) => `${t}: ${bf.toFixed(1)}`).join(', ');
    lines.push(`  ${s.speciesName}: ${s.total.toFixed(1)} bd ft (${by})`);
  }
  if (result.derived.sheetArea.length > 0) {
    lines.push('', 'SHEET GOODS');
    for (const s of result.derived.sheetArea) lines.push(`  ${s.sheetName}: ${s.areaFt2.toFixed(1)} ft² (${s.areaM2.toFixed(2)} m²), at least ${s.sheetsByArea} sheet${s.sheetsByArea === 1 ? '' : 's'} of 48 × 96 in`);
  }
  lines.push('', 'JOINERY');
  for (const j of result.derived.joinery) {
    if (j.features.length === 0) continue;
    lines.push(`  ${j.type} ×${j.count}: ${j.parts[0]} → ${j.parts[1]}${j.floating ? ' (floating, no glue)' : j.glued ? ' (glued)' : ''}`);
    for (const f of j.features) lines.push(`    ${f.partId}: ${f.summary}`);
  }
  lines.push('', 'CHECKS');
  for (const c of result.checks) {
    lines.push(`  [${c.severity}] ${c.title}: ${c.message}`);
    if (c.fix) lines.push(`    fix: ${c.fix}`);
  }
  return lines;
}

export const registerCutlist: RegisterCommand = (program) => {
  program
    .command('cutlist')
    .description('Build a piece and print its cut list, board feet, joinery and checks.')
    .argument('<piece>', `a piece kind (${PIECE_KINDS.join(', ')}) or a spec file (JSON)`)
    .option('--set <key=value>', 'set a parameter, e.g. width=40in or legSize="1 3/4\\""; repeatable', (value: string, previous: string[]) => [...previous, value], [] as string[])
    .option('--units <unit>', 'units for the table and for bare numbers in --set: in or mm', 'in')
    .option('--json', 'print the whole result as JSON, lengths in mm')
    .action((piece: string, opts: CutlistOptions) => {
      const units = choiceOption(opts.units, '--units', ['in', 'mm'] as const);
      const result = buildPiece(specFromArguments(piece, opts.set, units));
      if (opts.json) printJson(resultJson(result));
      else printLines(resultLines(result, units));
    });
};
