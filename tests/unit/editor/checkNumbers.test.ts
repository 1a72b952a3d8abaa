import { describe, expect, it } from 'vitest';
import { checkNumber } from '../../../src/editor/checkNumbers.ts';
import { formatLength } from '../../../shared/units/index.ts';

const mm = (n: number) => `${n} mm`;

describe('checkNumber', () => {
  it('writes a length through the display-unit formatter and drops the unit from the label', () => {
    expect(checkNumber('floatShortfallMm', 1.5, mm)).toEqual({ label: 'float shortfall', text: '1.5 mm' });
  });

  it('writes percentages and torques with their units', () => {
    expect(checkNumber('buildMcPercent', 8, mm)).toEqual({ label: 'build mc', text: '8 %' });
    expect(checkNumber('requiredTorqueNm', 4.567, mm)).toEqual({ label: 'required torque', text: '4.57 N·m' });
  });

  it('keeps a unitless number as it is, rounded', () => {
    expect(checkNumber('boards', 5, mm)).toEqual({ label: 'boards', text: '5' });
    expect(checkNumber('ratio', 0.123456, mm).text).toBe('0.123');
  });

  it('does not treat a key that is only a suffix as having a unit', () => {
    expect(checkNumber('N', 3, mm)).toEqual({ label: 'n', text: '3' });
  });

  it('gives a length too small for the maker\'s precision in tenths of a millimetre, never as zero', () => {
    const sixteenths = (n: number) => formatLength(n, { unit: 'in', precision: 16 });
    expect(checkNumber('shortfallMm', 0.4, sixteenths)).toEqual({ label: 'shortfall', text: '0.4 mm' });
    expect(checkNumber('shortfallMm', 0, sixteenths).text).toBe(sixteenths(0));
    expect(checkNumber('shortfallMm', 3.175, sixteenths).text).toBe('1/8"');
  });
});
