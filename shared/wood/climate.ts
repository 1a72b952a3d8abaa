/**
 * The moisture a piece sees: built at one moisture content, then living between a seasonal low
 * (the driest month) and high (the most humid). Any of the three may be given as a moisture
 * content or as the air that produces it (temperature and relative humidity → WH2010 Eq. 4-5).
 */
import { InputError } from '../errors.ts';
import { emcPercent, type AirConditions } from './emc.ts';
import type { SourceNote } from './source.ts';

/** Build, driest and most humid moisture content of a piece, in %. */
export interface Climate {
  /** Moisture content when the part is cut and fitted, %. */
  buildMcPercent: number;
  /** Lowest moisture content in service (driest season), %. */
  lowMcPercent: number;
  /** Highest moisture content in service (most humid season), %. */
  highMcPercent: number;
  label?: string;
}

/** Moisture contents outside these are outside what the movement equations handle. */
export const MC_LIMITS = { min: 0, max: 30 } as const;

/** Ids of the regional presets. */
export type ClimatePresetId = 'most-of-us' | 'dry-southwest' | 'damp-coastal';

/** A regional preset: a {@link Climate} with its source. */
export interface ClimatePreset extends Climate {
  id: ClimatePresetId;
  label: string;
  /** Source of the average (used as the build moisture content). */
  source: SourceNote;
  /** Source of the seasonal low and high. */
  rangeSource: SourceNote;
}

const REGIONAL_TABLE = 'WH2010 Chapter 13, recommended moisture content for interior woodwork (FPL-GTR-190)';
const AVERAGE: SourceNote = { ref: REGIONAL_TABLE, confidence: 'secondary' };
const RANGE: SourceNote = {
  ref: REGIONAL_TABLE,
  confidence: 'unconfirmed',
  note: 'individual pieces range about 2–3 points either side of the average; from memory, approximate',
};

/**
 * Regional presets for interior furniture in the United States. The build moisture content is
 * the region's recommended average (secondary), so parts move both ways; the low and high are
 * the range individual pieces reach (unconfirmed, shown as approximate).
 */
export const CLIMATE_PRESETS: Readonly<Record<ClimatePresetId, ClimatePreset>> = Object.freeze({
  'most-of-us': {
    id: 'most-of-us', label: 'Most of the United States (average 8 %)',
    buildMcPercent: 8, lowMcPercent: 6, highMcPercent: 10, source: AVERAGE, rangeSource: RANGE,
  },
  'dry-southwest': {
    id: 'dry-southwest', label: 'Dry Southwest (average 6 %)',
    buildMcPercent: 6, lowMcPercent: 4, highMcPercent: 9, source: AVERAGE, rangeSource: RANGE,
  },
  'damp-coastal': {
    id: 'damp-coastal', label: 'Damp, warm coastal areas (average 11 %)',
    buildMcPercent: 11, lowMcPercent: 8, highMcPercent: 13, source: AVERAGE, rangeSource: RANGE,
  },
});

/** The preset ids, in display order. */
export const CLIMATE_PRESET_IDS: readonly ClimatePresetId[] = ['most-of-us', 'dry-southwest', 'damp-coastal'];

/** The climate used when a design names none: most of the United States. */
export const DEFAULT_CLIMATE: ClimatePreset = CLIMATE_PRESETS['most-of-us'];

/** Looks up a preset; an unknown id is an {@link InputError} that lists the valid ids. */
export function getClimatePreset(id: string, field = 'climate'): ClimatePreset {
  if (!(CLIMATE_PRESET_IDS as readonly string[]).includes(id)) {
    throw new InputError(field, `unknown climate preset "${id}"; choose one of: ${CLIMATE_PRESET_IDS.join(', ')}`, CLIMATE_PRESET_IDS.join(', '));
  }
  return CLIMATE_PRESETS[id as ClimatePresetId];
}

/** A moisture content in % or the air (temperature and relative humidity) that gives it. */
export type MoistureInput = number | AirConditions;

/** Inputs for {@link climateFrom}: build, driest and most humid, each as MC or air. */
export interface ClimateInput {
  build: MoistureInput;
  low: MoistureInput;
  high: MoistureInput;
  label?: string;
}

/**
 * Builds a checked {@link Climate} from moisture contents (%) or air conditions. Rejects a
 * moisture content outside 0–30 % or a low above the high, naming the field.
 */
export function climateFrom(input: ClimateInput): Climate {
  const climate: Climate = {
    buildMcPercent: toMc(input.build, 'build'),
    lowMcPercent: toMc(input.low, 'low'),
    highMcPercent: toMc(input.high, 'high'),
  };
  if (input.label !== undefined) climate.label = input.label;
  return checkClimate(climate);
}

/**
 * Checks a {@link Climate}: every moisture content within 0–30 % (fibre saturation, where
 * swelling stops) and the low no higher than the high. Returns it unchanged.
 */
export function checkClimate(climate: Climate, field = 'climate'): Climate {
  // Runs on every rebuild: the fields' names are only spelled out when one is refused.
  if (!isMc(climate.buildMcPercent)) checkMc(climate.buildMcPercent, `${field}.buildMcPercent`);
  if (!isMc(climate.lowMcPercent)) checkMc(climate.lowMcPercent, `${field}.lowMcPercent`);
  if (!isMc(climate.highMcPercent)) checkMc(climate.highMcPercent, `${field}.highMcPercent`);
  if (climate.lowMcPercent > climate.highMcPercent) {
    throw new InputError(
      `${field}.lowMcPercent`,
      `the driest moisture content (${climate.lowMcPercent} %) is above the most humid (${climate.highMcPercent} %)`,
      `at most ${climate.highMcPercent} %`,
    );
  }
  return climate;
}

/** Throws an {@link InputError} on `field` unless `mcPercent` is a number within 0–30 %. */
export function checkMc(mcPercent: number, field: string): void {
  if (isMc(mcPercent)) return;
  const limit = `between ${MC_LIMITS.min} % and ${MC_LIMITS.max} %`;
  throw new InputError(field, `moisture content must be ${limit} (got ${String(mcPercent)})`, limit);
}

function isMc(mcPercent: number): boolean {
  return typeof mcPercent === 'number' && Number.isFinite(mcPercent) && mcPercent >= MC_LIMITS.min && mcPercent <= MC_LIMITS.max;
}

function toMc(value: MoistureInput, field: string): number {
  if (typeof value === 'number') return value;
  try {
    return emcPercent(value);
  } catch (error) {
    if (error instanceof InputError) throw new InputError(`${field}.${error.field}`, error.message, error.limit);
    throw error;
  }
}
