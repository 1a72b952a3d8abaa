import { describe, expect, it } from 'vitest';
import { isInputError } from '../../../shared/errors.ts';
import { CLIMATE_PRESETS, climateFrom, DEFAULT_CLIMATE, getClimatePreset } from '../../../shared/wood/climate.ts';
import { emcPercent } from '../../../shared/wood/emc.ts';

describe('CLIMATE_PRESETS', () => {
  // WH2010 Chapter 13, recommended moisture content for interior woodwork (secondary):
  // about 8 % for most of the country, 6 % in the dry Southwest, 11 % on damp, warm coasts.
  it.each([
    ['most-of-us', 8],
    ['dry-southwest', 6],
    ['damp-coastal', 11],
  ])('builds %s at the recommended regional average, %i %%', (id, average) => {
    const preset = getClimatePreset(id);
    expect(preset.buildMcPercent).toBe(average);
    expect(preset.source.confidence).toBe('secondary');
  });

  it('keeps each build moisture content between its low and high, and marks the range approximate', () => {
    for (const preset of Object.values(CLIMATE_PRESETS)) {
      expect(preset.lowMcPercent).toBeLessThanOrEqual(preset.buildMcPercent);
      expect(preset.highMcPercent).toBeGreaterThanOrEqual(preset.buildMcPercent);
      expect(preset.rangeSource.confidence).toBe('unconfirmed');
    }
  });

  it('defaults to most of the United States', () => {
    expect(DEFAULT_CLIMATE.id).toBe('most-of-us');
  });

  it('rejects an unknown preset, listing the valid ones', () => {
    expect(() => getClimatePreset('arctic')).toThrow(/damp-coastal/);
  });
});

describe('climateFrom', () => {
  it('takes moisture contents directly', () => {
    expect(climateFrom({ build: 7, low: 5, high: 11, label: 'shop' })).toEqual({ buildMcPercent: 7, lowMcPercent: 5, highMcPercent: 11, label: 'shop' });
  });

  it('turns air conditions into moisture contents with the sorption equation', () => {
    const winter = { temperature: 70, temperatureUnit: 'F' as const, relativeHumidityPercent: 30 };
    const summer = { temperature: 24, temperatureUnit: 'C' as const, relativeHumidityPercent: 70 };
    const climate = climateFrom({ build: 8, low: winter, high: summer });
    expect(climate.lowMcPercent).toBe(emcPercent(winter));
    expect(climate.highMcPercent).toBe(emcPercent(summer));
  });

  it.each([
    [{ build: 31, low: 5, high: 11 }, 'climate.buildMcPercent'],
    [{ build: 7, low: -1, high: 11 }, 'climate.lowMcPercent'],
    [{ build: 7, low: 12, high: 11 }, 'climate.lowMcPercent'],
    [{ build: 7, low: 5, high: { temperature: 70, temperatureUnit: 'F' as const, relativeHumidityPercent: 120 } }, 'high.relativeHumidityPercent'],
  ])('rejects %o, naming %s', (input, field) => {
    let caught: unknown;
    try {
      climateFrom(input);
    } catch (error) {
      caught = error;
    }
    expect(isInputError(caught) && caught.field).toBe(field);
  });
});
