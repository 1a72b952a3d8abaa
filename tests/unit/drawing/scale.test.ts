import { describe, expect, it } from 'vitest';
import { chooseScale, scaleText, usualScales } from '../../../shared/drawing/scale.ts';

describe('chooseScale', () => {
  it('takes the largest usual scale at which the drawing fits', () => {
    // A 1000 mm long view on 250 mm of paper fits at 1:4 (250 mm) but not at 1:2.
    expect(chooseScale('in', (n) => 1000 / n <= 250)).toBe(4);
    // Metric drawings use ISO 5455 scales: 1:5 is the first that fits.
    expect(chooseScale('mm', (n) => 1000 / n <= 250)).toBe(5);
  });

  it('falls back to the smallest usual scale when nothing fits', () => {
    const scales = usualScales('mm');
    expect(chooseScale('mm', () => false)).toBe(scales[scales.length - 1]);
  });

  it('writes the scale as 1:n', () => {
    expect(scaleText(8)).toBe('1:8');
  });
});
