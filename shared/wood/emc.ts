/**
 * Equilibrium moisture content: the moisture content wood settles at in air of a given
 * temperature and relative humidity. Hailwood–Horrobin sorption equation, WH2010 Chapter 4,
 * Eq. 4-5, with the °F and °C coefficient sets printed there; it reproduces WH2010 Table 4-2 to
 * about 0.06 percentage points and holds for any species (species differ by less than the
 * table's own precision).
 */
import { InputError } from '../errors.ts';

/** Dry-bulb temperature unit. */
export type TemperatureUnit = 'F' | 'C';

/** Air conditions: dry-bulb temperature and relative humidity. */
export interface AirConditions {
  temperature: number;
  temperatureUnit: TemperatureUnit;
  /** Relative humidity, 0–100 %. */
  relativeHumidityPercent: number;
}

/**
 * Temperatures the equation is used for, in °F (the °C limits are the same temperatures): the
 * span of WH2010 Table 4-2 as recalled (from memory, approximate). Beyond it the fitted
 * coefficients would be extrapolated, so the input is refused instead.
 */
export const EMC_TEMPERATURE_LIMITS_F = { min: 30, max: 210 } as const;

interface Coefficients {
  W: number;
  K: number;
  K1: number;
  K2: number;
}

// WH2010 Eq. 4-5 coefficients, as functions of T in °F or °C.
function coefficients(temperature: number, unit: TemperatureUnit): Coefficients {
  const T = temperature;
  if (unit === 'F') {
    return {
      W: 330 + 0.452 * T + 0.00415 * T * T,
      K: 0.791 + 4.63e-4 * T - 8.44e-7 * T * T,
      K1: 6.34 + 7.75e-4 * T - 9.35e-5 * T * T,
      K2: 1.09 + 2.84e-2 * T - 9.04e-5 * T * T,
    };
  }
  return {
    W: 349 + 1.29 * T + 0.0135 * T * T,
    K: 0.805 + 7.36e-4 * T - 2.73e-6 * T * T,
    K1: 6.27 - 9.38e-3 * T - 3.03e-4 * T * T,
    K2: 1.91 + 4.07e-2 * T - 2.93e-4 * T * T,
  };
}

function hailwoodHorrobin({ W, K, K1, K2 }: Coefficients, h: number): number {
  const Kh = K * h;
  const single = Kh / (1 - Kh);
  const multi = (K1 * Kh + 2 * K1 * K2 * Kh * Kh) / (1 + K1 * Kh + K1 * K2 * Kh * Kh);
  return (1800 / W) * (single + multi);
}

/** Converts a temperature to °F. */
export function toFahrenheit(temperature: number, unit: TemperatureUnit): number {
  return unit === 'F' ? temperature : (temperature * 9) / 5 + 32;
}

function checkTemperature(temperature: number, unit: TemperatureUnit, field: string): void {
  if (unit !== 'F' && unit !== 'C') throw new InputError(`${field}Unit`, `must be F or C (got "${String(unit)}")`, 'F or C');
  const { min, max } = EMC_TEMPERATURE_LIMITS_F;
  const limit = `between ${min} °F and ${max} °F (${fToC(min)} °C and ${fToC(max)} °C)`;
  const fahrenheit = toFahrenheit(temperature, unit);
  if (!Number.isFinite(fahrenheit) || fahrenheit < min || fahrenheit > max) {
    throw new InputError(field, `must be ${limit} for the sorption equation (got ${temperature} °${unit})`, limit);
  }
}

function fToC(fahrenheit: number): number {
  return Math.round(((fahrenheit - 32) * 5) / 9);
}

function checkHumidity(relativeHumidityPercent: number, field: string): void {
  if (!Number.isFinite(relativeHumidityPercent) || relativeHumidityPercent < 0 || relativeHumidityPercent > 100) {
    throw new InputError(field, `must be between 0 % and 100 % (got ${relativeHumidityPercent})`, 'between 0 % and 100 %');
  }
}

/**
 * Equilibrium moisture content (% of oven-dry weight) in air at `temperature` (°F or °C) and
 * `relativeHumidityPercent` (0–100 %). WH2010 Eq. 4-5.
 */
export function emcPercent(air: AirConditions): number {
  checkTemperature(air.temperature, air.temperatureUnit, 'temperature');
  checkHumidity(air.relativeHumidityPercent, 'relativeHumidityPercent');
  return hailwoodHorrobin(coefficients(air.temperature, air.temperatureUnit), air.relativeHumidityPercent / 100);
}

/** Inputs for {@link humidityForEmc}. */
export interface HumidityForEmcInput {
  temperature: number;
  temperatureUnit: TemperatureUnit;
  /** The moisture content wanted, in %. */
  emcPercent: number;
}

/**
 * The relative humidity (%) at which wood at `temperature` settles at `emcPercent` (%): the
 * inverse of {@link emcPercent}. The equation rises steadily with humidity, so bisection finds
 * the one answer; a moisture content above what saturated air gives is an InputError.
 */
export function humidityForEmc(input: HumidityForEmcInput): number {
  checkTemperature(input.temperature, input.temperatureUnit, 'temperature');
  const c = coefficients(input.temperature, input.temperatureUnit);
  const highest = hailwoodHorrobin(c, 1);
  if (!Number.isFinite(input.emcPercent) || input.emcPercent < 0 || input.emcPercent > highest) {
    const limit = `between 0 % and ${highest.toFixed(1)} % at ${input.temperature} °${input.temperatureUnit}`;
    throw new InputError('emcPercent', `must be ${limit}, the range air at that temperature can give (got ${input.emcPercent})`, limit);
  }
  let low = 0;
  let high = 1;
  // 50 halvings take the bracket below 1e-15 of humidity, far under any reading.
  for (let step = 0; step < 50; step += 1) {
    const mid = (low + high) / 2;
    if (hailwoodHorrobin(c, mid) < input.emcPercent) low = mid;
    else high = mid;
  }
  return ((low + high) / 2) * 100;
}
