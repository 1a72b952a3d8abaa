/**
 * Checks and defaults for the board layout's input, and the part instances it packs.
 */
import { InputError } from '../errors.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { BoardLayoutOptions, BoardPartInput, BoardStock, GrainRun, MillingAllowance } from './boardTypes.ts';
import { DEFAULT_KERF_MM, MAX_KERF_MM, MAX_QUANTITY, checkAllowance, checkCount, checkSize } from './sheetInput.ts';

/**
 * Board sizes bought by default: 6 and 8 ft long, 4, 6 and 8 in wide, as a hardwood dealer's
 * random widths and lengths are commonly sorted (common practice, no published source).
 */
export const DEFAULT_BOARD_SIZES: readonly BoardStock[] = [6, 8].flatMap((feet) =>
  [4, 6, 8].map((inches) => ({
    id: `board-${feet}ft-${inches}in`,
    name: `Board ${feet} ft × ${inches} in`,
    lengthMm: feet * 12 * MM_PER_INCH,
    widthMm: inches * MM_PER_INCH,
    count: null,
    inStock: false,
    defects: [],
  })),
);

/** Default milling allowance: 1 in on length, 1/4 in on width (common practice, no published source). */
export const DEFAULT_ALLOWANCE: MillingAllowance = Object.freeze({ lengthMm: 1 * MM_PER_INCH, widthMm: 0.25 * MM_PER_INCH });

/** Options with defaults filled in. */
export interface BoardSettings {
  stock: readonly BoardStock[];
  quarters: number;
  kerfMm: number;
  allowance: MillingAllowance;
  attempts: number;
}

/** One part instance to cut, at its rough size, mm. */
export interface BoardItem {
  index: number;
  partId: string;
  name: string;
  instance: number;
  lengthMm: number;
  widthMm: number;
  finished: readonly [number, number, number];
  /** The match group with the instance folded in where the part asks for one group per instance. */
  group: string | null;
  /** Place in a grain-matched run (cut end to end in this order); null for an unordered group or none. */
  order: number | null;
  /** The run in the maker's words; null when not in a run. */
  label: string | null;
}

/** Merges `options` over the defaults and checks them. */
export function boardSettings(options: BoardLayoutOptions): BoardSettings {
  const stock = options.stock ?? DEFAULT_BOARD_SIZES;
  if (stock.length === 0) throw new InputError('stock', 'needs at least one board size', 'one or more boards');
  stock.forEach((s, i) => {
    checkSize(s.lengthMm, `stock[${i}].lengthMm`);
    checkSize(s.widthMm, `stock[${i}].widthMm`);
    if (s.count !== null) checkCount(s.count, `stock[${i}].count`, 0, MAX_QUANTITY);
    s.defects.forEach((d, j) => {
      const at = `stock[${i}].defects[${j}]`;
      checkAllowance(d.startMm, `${at}.startMm`, s.lengthMm);
      checkAllowance(d.endMm, `${at}.endMm`, s.lengthMm);
      if (d.endMm <= d.startMm) throw new InputError(`${at}.endMm`, 'must be beyond startMm', 'endMm > startMm');
      const from = checkAllowance(d.fromEdgeMm ?? 0, `${at}.fromEdgeMm`, s.widthMm);
      const to = checkAllowance(d.toEdgeMm ?? s.widthMm, `${at}.toEdgeMm`, s.widthMm);
      if (to <= from) throw new InputError(`${at}.toEdgeMm`, 'must be beyond fromEdgeMm', 'toEdgeMm > fromEdgeMm');
    });
  });
  return {
    stock,
    quarters: checkCount(options.quarters ?? 4, 'quarters', 1, 64),
    kerfMm: checkAllowance(options.kerfMm ?? DEFAULT_KERF_MM, 'kerfMm', MAX_KERF_MM),
    allowance: {
      lengthMm: checkAllowance(options.allowance?.lengthMm ?? DEFAULT_ALLOWANCE.lengthMm, 'allowance.lengthMm', 300),
      widthMm: checkAllowance(options.allowance?.widthMm ?? DEFAULT_ALLOWANCE.widthMm, 'allowance.widthMm', 100),
    },
    attempts: checkCount(options.attempts ?? 6, 'attempts', 1, 1000),
  };
}

/** Checks `parts` and returns one item per instance at its rough size. */
export function expandBoardParts(parts: readonly BoardPartInput[], allowance: MillingAllowance): BoardItem[] {
  const items: BoardItem[] = [];
  parts.forEach((part, i) => {
    const at = `parts[${i}]`;
    if (typeof part.id !== 'string' || part.id === '') throw new InputError(`${at}.id`, 'must be a non-empty id', 'non-empty');
    const finished = [checkSize(part.lengthMm, `${at}.lengthMm`), checkSize(part.widthMm, `${at}.widthMm`), checkSize(part.thicknessMm, `${at}.thicknessMm`)] as const;
    const quantity = checkCount(part.quantity, `${at}.quantity`, 0, MAX_QUANTITY);
    const lengthMm = part.roughLengthMm === undefined ? finished[0] + allowance.lengthMm : checkSize(part.roughLengthMm, `${at}.roughLengthMm`);
    const widthMm = part.roughWidthMm === undefined ? finished[1] + allowance.widthMm : checkSize(part.roughWidthMm, `${at}.roughWidthMm`);
    const first = part.firstInstance === undefined ? 0 : checkCount(part.firstInstance, `${at}.firstInstance`, 0, MAX_QUANTITY);
    const run = checkRun(part, at);
    const group = run ? run.group : part.matchGroup === undefined || part.matchGroup === '' ? null : part.matchGroup;
    for (let instance = 0; instance < quantity; instance++) {
      items.push({ index: items.length, partId: part.id, name: part.name, instance: first + instance, lengthMm, widthMm, finished, group, order: run ? run.order : null, label: run ? (run.note ?? run.group) : null });
    }
  });
  checkGroupKinds(items);
  return items;
}

function checkRun(part: BoardPartInput, at: string): GrainRun | null {
  const run = part.grainMatch;
  if (run === undefined) return null;
  if (part.matchGroup !== undefined && part.matchGroup !== '') throw new InputError(`${at}.grainMatch`, 'a part takes matchGroup or grainMatch, not both', 'one of the two');
  if (typeof run.group !== 'string' || run.group === '') throw new InputError(`${at}.grainMatch.group`, 'must be a non-empty id', 'non-empty');
  if (!Number.isFinite(run.order)) throw new InputError(`${at}.grainMatch.order`, 'must be a finite number', 'finite');
  return run;
}

// A group is either a run (every part ordered) or a set kept on one board (none ordered).
function checkGroupKinds(items: readonly BoardItem[]): void {
  const ordered = new Map<string, boolean>();
  for (const item of items) {
    if (item.group === null) continue;
    const isRun = item.order !== null;
    const seen = ordered.get(item.group);
    if (seen !== undefined && seen !== isRun) throw new InputError(`parts (${item.partId})`, `group ${item.group} mixes grainMatch runs and matchGroup parts`, 'one kind per group');
    ordered.set(item.group, isRun);
  }
}
