/**
 * Seasonal movement of solid wood across its grain. WH2010 Chapter 13, Eq. 13-2:
 * ΔD = D_I · C · (M_F − M_I), with C the tangential coefficient for a flat-sawn width or the
 * radial one for a quarter-sawn width (WH2010 Table 13-5). WH2010 gives it for moisture contents
 * between 6 % and 14 % and notes it tends to overestimate shrinkage in width.
 *
 * Outside 6–14 % (up to fibre saturation, 30 %) Casewright uses the total-shrinkage form,
 * ΔD = D_I (M_F − M_I) / (30·100/S − 30 + M_I), with S the green-to-oven-dry shrinkage (%,
 * WH2010 Table 4-3). It follows from shrinkage being linear in moisture content below fibre
 * saturation at 30 %; it is WH2010 Eq. 13-3 as recalled (from memory, approximate), and the
 * result says so with `withinPublishedRange: false` and a note.
 */
import { InputError } from '../errors.ts';
import { dual, type DualLength } from '../units/dual.ts';
import { MM_PER_INCH } from '../units/length.ts';
import { checkClimate, checkMc, type Climate } from './climate.ts';
import { resolveSpecies, type SpeciesInput } from './resolve.ts';
import { isApproximate } from './source.ts';
import type { Species } from './species.ts';

/** How the board was sawn: flat (width tangential), quarter (width radial) or unknown. */
export type Sawn = 'flat' | 'quarter' | 'unknown';

/** The sawing options, in display order. */
export const SAWN_VALUES: readonly Sawn[] = ['flat', 'quarter', 'unknown'];

/** Moisture contents (%) between which WH2010 Eq. 13-2 is published as valid. */
export const LINEAR_RANGE = { min: 6, max: 14 } as const;

/** Fibre saturation point assumed by the total-shrinkage form, % moisture content. */
export const FIBRE_SATURATION_PERCENT = 30;

/** Moves are small: show them to 1/32 in and 0.1 mm. */
const MOVE_DISPLAY = { inchPrecision: 32, mmPrecision: 0.1 } as const;

/** Inputs for {@link widthChange}. */
export interface WidthChangeInput {
  /** Width across the grain at `fromMcPercent`, mm. */
  widthMm: number;
  species: SpeciesInput;
  sawn: Sawn;
  /** Starting moisture content, %. */
  fromMcPercent: number;
  /** Final moisture content, %. */
  toMcPercent: number;
}

/** A change in width, signed: positive is swelling. */
export interface WidthChange {
  changeMm: number;
  changeIn: number;
  /** The change ready to show, signed (`+1/8"`, `+3.2 mm`). */
  change: DualLength;
  /** Which direction of the grain the width lies in. */
  direction: 'tangential' | 'radial';
  /** Width change per 1 % moisture content used (for the total-shrinkage form, its effective value). */
  coefficient: number;
  /** True when both moisture contents lie within 6–14 %, where WH2010 Eq. 13-2 is published. */
  withinPublishedRange: boolean;
  method: 'linear' | 'total-shrinkage';
  /** True when the coefficients or the form used are unconfirmed: show the result as approximate. */
  approximate: boolean;
  note?: string;
}

/**
 * The numbers of a {@link WidthChange} without its display text: what the engine reads on
 * every rebuild, where formatting text nobody shows was a measurable share of its time.
 */
export type WidthChangeMm = Omit<WidthChange, 'changeIn' | 'change'>;

/** Inputs for {@link seasonalSwing}. */
export interface SeasonalSwingInput {
  /** Width across the grain at the build moisture content, mm. */
  widthMm: number;
  species: SpeciesInput;
  sawn: Sawn;
  climate: Climate;
}

/** How a part moves from its build condition to the driest and most humid seasons. */
export interface SeasonalSwing {
  /** How much narrower than built it gets at its driest, mm (0 if built drier than that). */
  shrinkMm: number;
  shrinkIn: number;
  /** How much wider than built it gets at its most humid, mm (0 if built wetter than that). */
  swellMm: number;
  swellIn: number;
  /** Width at the most humid less width at the driest, mm. */
  totalMm: number;
  totalIn: number;
  widthAtDriestMm: number;
  widthAtMostHumidMm: number;
  /** The same values ready to show. */
  text: { shrink: DualLength; swell: DualLength; total: DualLength };
  toDriest: WidthChange;
  toMostHumid: WidthChange;
  withinPublishedRange: boolean;
  approximate: boolean;
  notes: string[];
}

/**
 * The numbers of a {@link SeasonalSwing} without display text or the two changes' detail:
 * what the engine reads on every rebuild.
 */
export type SeasonalSwingMm = Pick<
  SeasonalSwing,
  'shrinkMm' | 'swellMm' | 'totalMm' | 'widthAtDriestMm' | 'widthAtMostHumidMm' | 'withinPublishedRange' | 'approximate' | 'notes'
>;

/** The coefficient per 1 % MC for `sawn`: unknown sawing takes the larger, tangential. */
export function coefficientFor(species: Species, sawn: Sawn): { coefficient: number; direction: 'tangential' | 'radial' } {
  checkSawn(sawn);
  if (sawn === 'quarter') return { coefficient: species.coefficientRadial, direction: 'radial' };
  return species.coefficientTangential >= species.coefficientRadial
    ? { coefficient: species.coefficientTangential, direction: 'tangential' }
    : { coefficient: species.coefficientRadial, direction: 'radial' };
}

/**
 * Change in width (mm, signed) of a solid-wood part `widthMm` wide going from `fromMcPercent`
 * to `toMcPercent` (%). WH2010 Eq. 13-2 within 6–14 %; the total-shrinkage form outside it.
 */
export function widthChange(input: WidthChangeInput): WidthChange {
  return withText(widthChangeMm(input));
}

/** {@link widthChange} without display text (mm, signed). */
export function widthChangeMm(input: WidthChangeInput): WidthChangeMm {
  checkWidth(input.widthMm, 'widthMm');
  checkMc(input.fromMcPercent, 'fromMcPercent');
  checkMc(input.toMcPercent, 'toMcPercent');
  const species = resolveSpecies(input.species);
  const { coefficient, direction } = coefficientFor(species, input.sawn);
  return changeOf(input.widthMm, species, coefficient, direction, input.fromMcPercent, input.toMcPercent);
}

/** The change once every input is checked; the seasonal swing calls it twice with one look-up. */
function changeOf(
  widthMm: number,
  species: Species,
  coefficient: number,
  direction: WidthChange['direction'],
  from: number,
  to: number,
): WidthChangeMm {
  const approximate = isApproximate(species.source.coefficients);
  const within = from >= LINEAR_RANGE.min && from <= LINEAR_RANGE.max && to >= LINEAR_RANGE.min && to <= LINEAR_RANGE.max;
  if (within) {
    const changeMm = widthMm * coefficient * (to - from);
    return numbers(changeMm, direction, coefficient, true, 'linear', approximate);
  }

  const shrinkagePercent = direction === 'radial' ? species.totalShrinkage.radialPercent : species.totalShrinkage.tangentialPercent;
  const effective = 1 / ((FIBRE_SATURATION_PERCENT * 100) / shrinkagePercent - FIBRE_SATURATION_PERCENT + from);
  const changeMm = widthMm * effective * (to - from);
  const note =
    `Outside ${LINEAR_RANGE.min}–${LINEAR_RANGE.max} % moisture content, where WH2010 Eq. 13-2 is published; ` +
    `used the total-shrinkage form with ${direction} shrinkage ${shrinkagePercent} % (WH2010 Table 4-3), approximate.`;
  // The form itself is recalled, not read in the source, so its result is always approximate.
  return numbers(changeMm, direction, effective, false, 'total-shrinkage', true, note);
}

function withText(c: WidthChangeMm): WidthChange {
  const out: WidthChange = {
    changeMm: c.changeMm, changeIn: c.changeMm / MM_PER_INCH, change: signed(c.changeMm), direction: c.direction,
    coefficient: c.coefficient, withinPublishedRange: c.withinPublishedRange, method: c.method, approximate: c.approximate,
  };
  if (c.note !== undefined) out.note = c.note;
  return out;
}

function numbers(
  changeMm: number,
  direction: WidthChange['direction'],
  coefficient: number,
  withinPublishedRange: boolean,
  method: WidthChange['method'],
  approximate: boolean,
  note?: string,
): WidthChangeMm {
  const out: WidthChangeMm = { changeMm: changeMm === 0 ? 0 : changeMm, direction, coefficient, withinPublishedRange, method, approximate };
  if (note !== undefined) out.note = note;
  return out;
}

/**
 * How a part `widthMm` wide at its build moisture content moves through the seasons of
 * `climate`: shrinkage to the driest, swelling to the most humid, and the total between them.
 */
export function seasonalSwing(input: SeasonalSwingInput): SeasonalSwing {
  const [climate, toDriestMm, toMostHumidMm] = seasonalChanges(input);
  const toDriest = withText(toDriestMm);
  const toMostHumid = withText(toMostHumidMm);
  const s = swingOf(input.widthMm, climate, toDriest, toMostHumid);
  return {
    shrinkMm: s.shrinkMm, shrinkIn: s.shrinkMm / MM_PER_INCH,
    swellMm: s.swellMm, swellIn: s.swellMm / MM_PER_INCH,
    totalMm: s.totalMm, totalIn: s.totalMm / MM_PER_INCH,
    widthAtDriestMm: s.widthAtDriestMm,
    widthAtMostHumidMm: s.widthAtMostHumidMm,
    text: { shrink: dual(s.shrinkMm, MOVE_DISPLAY), swell: dual(s.swellMm, MOVE_DISPLAY), total: dual(s.totalMm, MOVE_DISPLAY) },
    toDriest,
    toMostHumid,
    withinPublishedRange: s.withinPublishedRange,
    approximate: s.approximate,
    notes: s.notes,
  };
}

/** {@link seasonalSwing} without display text (mm). */
export function seasonalSwingMm(input: SeasonalSwingInput): SeasonalSwingMm {
  const [climate, toDriest, toMostHumid] = seasonalChanges(input);
  return swingOf(input.widthMm, climate, toDriest, toMostHumid);
}

// The checks run in the order the two width changes ran them (climate, width, species, sawing),
// so a refused input names the same field; the species is looked up once for both seasons.
function seasonalChanges(input: SeasonalSwingInput): [Climate, WidthChangeMm, WidthChangeMm] {
  const climate = checkClimate(input.climate);
  checkWidth(input.widthMm, 'widthMm');
  const species = resolveSpecies(input.species);
  const { coefficient, direction } = coefficientFor(species, input.sawn);
  const from = climate.buildMcPercent;
  return [
    climate,
    changeOf(input.widthMm, species, coefficient, direction, from, climate.lowMcPercent),
    changeOf(input.widthMm, species, coefficient, direction, from, climate.highMcPercent),
  ];
}

function swingOf(widthMm: number, climate: Climate, toDriest: WidthChangeMm, toMostHumid: WidthChangeMm): SeasonalSwingMm {
  const notes: string[] = [];
  if (toDriest.note) notes.push(toDriest.note);
  if (toMostHumid.note && toMostHumid.note !== toDriest.note) notes.push(toMostHumid.note);
  if (climate.buildMcPercent < climate.lowMcPercent) notes.push('Built drier than its driest season: the part only swells in service.');
  if (climate.buildMcPercent > climate.highMcPercent) notes.push('Built wetter than its most humid season: the part only shrinks in service.');
  return {
    shrinkMm: Math.max(0, -toDriest.changeMm),
    swellMm: Math.max(0, toMostHumid.changeMm),
    totalMm: toMostHumid.changeMm - toDriest.changeMm,
    widthAtDriestMm: widthMm + toDriest.changeMm,
    widthAtMostHumidMm: widthMm + toMostHumid.changeMm,
    withinPublishedRange: toDriest.withinPublishedRange && toMostHumid.withinPublishedRange,
    approximate: toDriest.approximate || toMostHumid.approximate,
    notes,
  };
}

/** A signed change ready to show: swelling gets a leading `+`. */
function signed(changeMm: number): DualLength {
  const shown = dual(changeMm, MOVE_DISPLAY);
  if (changeMm <= 0 || shown.text.in.startsWith('0"')) return shown;
  return { ...shown, text: { mm: `+${shown.text.mm}`, in: `+${shown.text.in}` } };
}

/** Throws an {@link InputError} on `field` unless `widthMm` is a positive, finite length. */
export function checkWidth(widthMm: number, field: string): void {
  if (typeof widthMm !== 'number' || !Number.isFinite(widthMm) || widthMm <= 0) {
    throw new InputError(field, `must be a length greater than 0 mm (got ${String(widthMm)})`, 'greater than 0');
  }
}

function checkSawn(sawn: Sawn): void {
  if (!SAWN_VALUES.includes(sawn)) {
    throw new InputError('sawn', `must be one of ${SAWN_VALUES.join(', ')} (got "${String(sawn)}")`, SAWN_VALUES.join(', '));
  }
}
