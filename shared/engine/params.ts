/**
 * Parameters of every piece kind: their metadata (for forms), defaults, and the one place a
 * spec is checked before the engine computes anything. `validateSpec` merges the defaults over
 * the given parameters, checks every value against its range, then every combination the piece
 * cannot be built with, and throws an `InputError` naming the parameter and the limit.
 */
import { InputError } from '../errors.ts';
import { checkClimate, DEFAULT_CLIMATE, type Climate } from '../wood/climate.ts';
import { isSheetGoodId, SHEET_GOOD_IDS } from '../wood/sheetGoods.ts';
import { isSpeciesId, SPECIES_IDS } from '../wood/species.ts';
import type { ParamDef } from './paramDef.ts';
import { CHEST_PARAMS } from './pieces/chestParams.ts';
import { validateChestCombinations } from './pieces/chestValidate.ts';
import type { ChestLayout } from './pieces/chestLayout.ts';
import { CABINET_PARAMS } from './pieces/cabinetParams.ts';
import { validateCabinetCombinations } from './pieces/cabinet.ts';
import type { CaseLayout } from './pieces/caseLayout.ts';
import { DRESSER_PARAMS } from './pieces/dresserParams.ts';
import { validateDresserCombinations, type DresserLayout } from './pieces/dresser.ts';
import type { ParamValue, PieceKind, PieceSpec } from './types.ts';
import { parseRoomSection } from '../room/parseRoom.ts';

export type { ParamDef, ParamKind } from './paramDef.ts';

/** Every piece kind the engine knows the name of, built or not. */
export const PIECE_KINDS: readonly PieceKind[] = ['chest', 'dresser', 'cabinet'];

/** What a kind's combination checks worked out on the way, named for the kind. */
type Worked = Omit<CheckedSpec, 'spec'>;

interface KindParams {
  defs: readonly ParamDef[];
  /**
   * Throws an InputError for a combination of values that cannot be built; returns the layout
   * it worked out on the way so the builder need not work it out again.
   */
  combinations: (params: Readonly<Record<string, ParamValue>>, climate: Climate) => Worked;
}

const KINDS: Partial<Record<PieceKind, KindParams>> = {
  chest: { defs: CHEST_PARAMS, combinations: (params, climate) => ({ chestLayout: validateChestCombinations(params, climate) }) },
  dresser: { defs: DRESSER_PARAMS, combinations: (params, climate) => ({ dresserLayout: validateDresserCombinations(params, climate) }) },
  cabinet: { defs: CABINET_PARAMS, combinations: (params, climate) => ({ cabinetLayout: validateCabinetCombinations(params, climate) }) },
};

function kindParams(kind: unknown): KindParams {
  if (typeof kind !== 'string' || !(PIECE_KINDS as readonly string[]).includes(kind)) {
    throw new InputError('kind', `unknown piece kind "${String(kind)}"; choose one of: ${PIECE_KINDS.join(', ')}`, PIECE_KINDS.join(', '));
  }
  const entry = KINDS[kind as PieceKind];
  if (!entry) {
    const built = Object.keys(KINDS).join(', ');
    throw new InputError('kind', `the ${kind} is not built by this version of the engine yet; available: ${built}`, built);
  }
  return entry;
}

/** The parameters of a piece kind, in form order; an unknown or unbuilt kind is an InputError. */
export function paramDefs(kind: PieceKind): readonly ParamDef[] {
  return kindParams(kind).defs;
}

/** A spec of `kind` with every parameter at its default and the default climate. */
export function defaultSpec(kind: PieceKind): PieceSpec {
  const params: Record<string, ParamValue> = {};
  for (const def of kindParams(kind).defs) params[def.key] = def.default;
  return { schemaVersion: 1, kind, params, climate: { ...climateOf(DEFAULT_CLIMATE) } };
}

function climateOf(c: { buildMcPercent: number; lowMcPercent: number; highMcPercent: number }) {
  return { buildMcPercent: c.buildMcPercent, lowMcPercent: c.lowMcPercent, highMcPercent: c.highMcPercent };
}

const mmText = (n: number): string => `${Math.round(n * 100) / 100} mm`;

function rangeText(def: ParamDef): string {
  const unit = def.kind === 'length' ? ' mm' : def.unit ? ` ${def.unit}` : '';
  const round = (n: number) => Math.round(n * 100) / 100;
  return `between ${round(def.min ?? -Infinity)}${unit} and ${round(def.max ?? Infinity)}${unit}${def.integer ? ', a whole number' : ''}`;
}

function checkValue(def: ParamDef, value: unknown): ParamValue {
  switch (def.kind) {
    case 'length':
    case 'number':
    case 'percent': {
      // The limit's text is written only for an error: every build checks every parameter.
      if (typeof value !== 'number' || !Number.isFinite(value)) {
        throw new InputError(def.key, `${def.label} must be a number${def.kind === 'length' ? ' of millimetres' : ''} (got ${JSON.stringify(value) ?? String(value)})`, rangeText(def));
      }
      if ((def.min !== undefined && value < def.min) || (def.max !== undefined && value > def.max) || (def.integer && !Number.isInteger(value))) {
        const shown = def.kind === 'length' ? mmText(value) : String(value);
        const limit = rangeText(def);
        throw new InputError(def.key, `${def.label} must be ${limit} (got ${shown})`, limit);
      }
      return value;
    }
    case 'boolean':
      if (typeof value !== 'boolean') throw new InputError(def.key, `${def.label} must be true or false (got ${JSON.stringify(value) ?? String(value)})`, 'true or false');
      return value;
    case 'enum': {
      if (typeof value !== 'string' || !def.options?.some((o) => o.value === value)) {
        const options = (def.options ?? []).map((o) => o.value);
        throw new InputError(def.key, `${def.label} must be one of ${options.join(', ')} (got ${JSON.stringify(value) ?? String(value)})`, options.join(', '));
      }
      return value;
    }
    case 'species':
      if (typeof value !== 'string' || !isSpeciesId(value)) {
        throw new InputError(def.key, `${def.label} must be one of ${SPECIES_IDS.join(', ')} (got ${JSON.stringify(value) ?? String(value)})`, SPECIES_IDS.join(', '));
      }
      return value;
    case 'sheet':
      if (typeof value !== 'string' || !isSheetGoodId(value)) {
        throw new InputError(def.key, `${def.label} must be one of ${SHEET_GOOD_IDS.join(', ')} (got ${JSON.stringify(value) ?? String(value)})`, SHEET_GOOD_IDS.join(', '));
      }
      return value;
  }
}

const keySets = new WeakMap<readonly ParamDef[], ReadonlySet<string>>();

/** The parameter keys of a kind's definitions, worked out once per definition list. */
function keysOf(defs: readonly ParamDef[]): ReadonlySet<string> {
  let keys = keySets.get(defs);
  if (!keys) {
    keys = new Set(defs.map((d) => d.key));
    keySets.set(defs, keys);
  }
  return keys;
}

/**
 * Checks a spec from anywhere (a form, the API, a file) and returns it complete: defaults
 * merged over the given parameters, every value in range, every combination buildable, the
 * climate valid. Throws an `InputError` naming the field and the limit at the first problem.
 */
export function validateSpec(spec: unknown): PieceSpec {
  return checkSpecForBuild(spec).spec;
}

/** A spec checked by `validateSpec`, with the layout its checks worked out for its kind (mm). */
export interface CheckedSpec {
  spec: PieceSpec;
  /** Set for a chest: the layout the combination checks read, which the builder reuses. */
  chestLayout?: ChestLayout;
  /** Set for a dresser: the layout the combination checks read, which the builder reuses. */
  dresserLayout?: DresserLayout;
  /** Set for a cabinet: the carcass layout the combination checks read, which the builder reuses. */
  cabinetLayout?: CaseLayout;
}

/** `validateSpec`, keeping what the checks worked out for `buildPiece`. */
export function checkSpecForBuild(spec: unknown): CheckedSpec {
  if (typeof spec !== 'object' || spec === null || Array.isArray(spec)) {
    throw new InputError('spec', 'a piece spec must be an object with schemaVersion, kind and params', 'an object');
  }
  const s = spec as Record<string, unknown>;
  if (s.schemaVersion !== 1) {
    throw new InputError('schemaVersion', `this engine reads spec schema version 1 (got ${JSON.stringify(s.schemaVersion) ?? 'nothing'})`, '1');
  }
  const { defs, combinations } = kindParams(s.kind);
  const given = s.params ?? {};
  if (typeof given !== 'object' || given === null || Array.isArray(given)) {
    throw new InputError('params', 'params must be an object of parameter values', 'an object');
  }
  const known = keysOf(defs);
  for (const key of Object.keys(given)) {
    if (!known.has(key)) {
      const keys = defs.map((d) => d.key).join(', ');
      throw new InputError(key, `is not a ${String(s.kind)} parameter; known parameters: ${keys}`, keys);
    }
  }
  const params: Record<string, ParamValue> = {};
  for (const def of defs) {
    const value = (given as Record<string, unknown>)[def.key];
    params[def.key] = value === undefined ? def.default : checkValue(def, value);
  }
  const climate = s.climate === undefined ? climateOf(DEFAULT_CLIMATE) : checkClimate(readClimate(s.climate));
  const worked = combinations(params, climate);
  const out: PieceSpec = { schemaVersion: 1, kind: s.kind as PieceKind, params, climate };
  if (s.room !== undefined) {
    // Checked here so a bad room is refused wherever a spec enters (API, file, editor), named
    // by its path under `room`; kept as given so a maker's `12'` stays as typed.
    parseRoomSection(s.room, 'room');
    out.room = s.room;
  }
  return { spec: out, ...worked };
}

function readClimate(value: unknown): { buildMcPercent: number; lowMcPercent: number; highMcPercent: number } {
  if (typeof value !== 'object' || value === null) {
    throw new InputError('climate', 'climate must be an object with buildMcPercent, lowMcPercent and highMcPercent', 'an object');
  }
  const c = value as Record<string, unknown>;
  return climateOf({ buildMcPercent: c.buildMcPercent as number, lowMcPercent: c.lowMcPercent as number, highMcPercent: c.highMcPercent as number });
}
