import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { emcPercent, humidityForEmc } from '../../../shared/wood/emc.ts';

// The issue allows 0.2 percentage points against the published table; the equation is
// reported to reproduce it to about 0.06 (WH2010 Chapter 4).
const TABLE_TOLERANCE_PP = 0.2;
const INVERSE_TOLERANCE_RH = 1e-6;

// WH2010 Table 4-2 (FPL-GTR-190), 70 °F row, % moisture content — secondary (a reprint of the table).
const TABLE_4_2_AT_70F: ReadonlyArray<readonly [rh: number, emc: number]> = [
  [20, 4.5],
  [30, 6.2],
  [40, 7.7],
  [50, 9.2],
  [60, 11.0],
  [70, 13.1],
  [80, 16.0],
  [90, 20.5],
];

// The rest of the same row, WH2010 Table 4-2 at 70 °F, recalled from memory (approximate, not
// checked against a printed copy); kept apart from the confirmed points above so a reader can
// tell them apart. 95 % RH is left out: the value remembered for it is too uncertain to test.
const TABLE_4_2_AT_70F_FROM_MEMORY: ReadonlyArray<readonly [rh: number, emc: number]> = [
  [5, 1.3],
  [10, 2.5],
  [15, 3.5],
  [25, 5.4],
  [35, 6.9],
  [45, 8.5],
  [55, 10.1],
  [65, 12.0],
  [75, 14.4],
  [85, 17.9],
];

const SEVENTY_F_IN_C = ((70 - 32) * 5) / 9;

describe('emcPercent', () => {
  it.each(TABLE_4_2_AT_70F)('matches WH2010 Table 4-2 at 70 °F and %i %% RH (%f %%), °F coefficients', (rh, published) => {
    const emc = emcPercent({ temperature: 70, temperatureUnit: 'F', relativeHumidityPercent: rh });
    expect(Math.abs(emc - published)).toBeLessThanOrEqual(TABLE_TOLERANCE_PP);
  });

  it.each(TABLE_4_2_AT_70F)('matches WH2010 Table 4-2 at 21.1 °C and %i %% RH (%f %%), °C coefficients', (rh, published) => {
    const emc = emcPercent({ temperature: SEVENTY_F_IN_C, temperatureUnit: 'C', relativeHumidityPercent: rh });
    expect(Math.abs(emc - published)).toBeLessThanOrEqual(TABLE_TOLERANCE_PP);
  });

  it.each(TABLE_4_2_AT_70F_FROM_MEMORY)(
    'matches WH2010 Table 4-2 at 70 °F and %i %% RH (%f %%, recalled from memory), both coefficient sets',
    (rh, remembered) => {
      const fahrenheit = emcPercent({ temperature: 70, temperatureUnit: 'F', relativeHumidityPercent: rh });
      const celsius = emcPercent({ temperature: SEVENTY_F_IN_C, temperatureUnit: 'C', relativeHumidityPercent: rh });
      expect(Math.abs(fahrenheit - remembered)).toBeLessThanOrEqual(TABLE_TOLERANCE_PP);
      expect(Math.abs(celsius - remembered)).toBeLessThanOrEqual(TABLE_TOLERANCE_PP);
    },
  );

  it('is zero in perfectly dry air', () => {
    expect(emcPercent({ temperature: 70, temperatureUnit: 'F', relativeHumidityPercent: 0 })).toBe(0);
  });

  it('increases with relative humidity at a fixed temperature (property)', () => {
    const cases = fc.tuple(
      fc.double({ min: 30, max: 210, noNaN: true }),
      fc.double({ min: 0, max: 100, noNaN: true }),
      fc.double({ min: 0, max: 100, noNaN: true }),
    );
    fc.assert(
      fc.property(cases, ([temperature, a, b]) => {
        fc.pre(Math.abs(a - b) > 1e-6);
        const [drier, wetter] = a < b ? [a, b] : [b, a];
        const at = (rh: number) => emcPercent({ temperature, temperatureUnit: 'F', relativeHumidityPercent: rh });
        return at(drier) < at(wetter);
      }),
    );
  });

  it('falls as the air warms at the same humidity, as Table 4-2 reads down a column', () => {
    const at = (temperature: number) => emcPercent({ temperature, temperatureUnit: 'F', relativeHumidityPercent: 50 });
    expect(at(40)).toBeGreaterThan(at(70));
    expect(at(70)).toBeGreaterThan(at(150));
  });

  it.each([
    [{ temperature: 70, temperatureUnit: 'F' as const, relativeHumidityPercent: 101 }, 'relativeHumidityPercent'],
    [{ temperature: 70, temperatureUnit: 'F' as const, relativeHumidityPercent: -1 }, 'relativeHumidityPercent'],
    [{ temperature: 70, temperatureUnit: 'F' as const, relativeHumidityPercent: Number.NaN }, 'relativeHumidityPercent'],
    [{ temperature: 300, temperatureUnit: 'F' as const, relativeHumidityPercent: 50 }, 'temperature'],
    [{ temperature: -20, temperatureUnit: 'C' as const, relativeHumidityPercent: 50 }, 'temperature'],
  ])('rejects %o with an InputError on %s', (air, field) => {
    let caught: unknown;
    try {
      emcPercent(air);
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught) && caught.field).toBe(field);
  });
});

describe('humidityForEmc', () => {
  it('inverts emcPercent (property)', () => {
    const cases = fc.tuple(fc.double({ min: 30, max: 210, noNaN: true }), fc.double({ min: 1, max: 99, noNaN: true }));
    fc.assert(
      fc.property(cases, ([temperature, rh]) => {
        const emc = emcPercent({ temperature, temperatureUnit: 'F', relativeHumidityPercent: rh });
        return Math.abs(humidityForEmc({ temperature, temperatureUnit: 'F', emcPercent: emc }) - rh) < INVERSE_TOLERANCE_RH;
      }),
    );
  });

  it('gives about 50 % RH for 9.2 % moisture content at 70 °F (WH2010 Table 4-2 read backwards)', () => {
    const rh = humidityForEmc({ temperature: 70, temperatureUnit: 'F', emcPercent: 9.2 });
    // 0.2 pp of moisture content near 9 % is about 1.5 points of RH on this part of the curve.
    expect(Math.abs(rh - 50)).toBeLessThan(1.5);
  });

  it('rejects a moisture content that air at that temperature cannot give', () => {
    expect(() => humidityForEmc({ temperature: 70, temperatureUnit: 'F', emcPercent: 35 })).toThrow(/range air at that temperature/);
  });
});
