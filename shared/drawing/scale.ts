/**
 * Drawing scales. A plan set uses the scales a maker expects to read with a rule: halving
 * scales for inch drawings (1:2, 1:4, 1:8 — an eighth-scale rule), and the ISO 5455
 * recommended scales for metric drawings (1:2, 1:5, 1:10, 1:20 ...).
 */

/** Reduction scales (1:n) for inch drawings, largest drawing first. 1:12 is 1" = 1'. */
export const INCH_SCALES: readonly number[] = [1, 2, 4, 8, 12, 16, 24, 48];
/** Reduction scales (1:n) recommended by ISO 5455 for metric drawings, largest first. */
export const METRIC_SCALES: readonly number[] = [1, 2, 5, 10, 20, 50, 100];

/** The usual scales for `units`, largest drawing first, as denominators (1:n). */
export function usualScales(units: 'in' | 'mm'): readonly number[] {
  return units === 'in' ? INCH_SCALES : METRIC_SCALES;
}

/** Writes a scale for the title block, e.g. `1:8`. */
export function scaleText(denominator: number): string {
  return `1:${denominator}`;
}

/**
 * The largest usual scale at which `fits(denominator)` holds, or the smallest scale when none
 * fits (the caller then shows the drawing at that scale and says so).
 */
export function chooseScale(units: 'in' | 'mm', fits: (denominator: number) => boolean): number {
  const scales = usualScales(units);
  for (const s of scales) if (fits(s)) return s;
  return scales[scales.length - 1]!;
}
