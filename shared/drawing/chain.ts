/** Chains of dimensions between sorted stations, the usual way to dimension a row of parts. */
import { lengthText, type DrawingUnits } from './lengthText.ts';
import type { DimensionRequest } from './types.ts';

/** Stations closer than this (mm) are one station. */
const STATION_EPS = 0.01;

/** Sorted, de-duplicated stations (mm). */
export function stations(values: readonly number[]): number[] {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted.filter((v, i) => i === 0 || v - sorted[i - 1]! > STATION_EPS);
}

/**
 * One dimension per gap between consecutive `stationsMm`, measured along `axis` and drawn on
 * `side`; `atMm` is the other coordinate the extension lines start from.
 */
export function chainDimensions(
  stationsMm: readonly number[],
  atMm: number,
  axis: 'h' | 'v',
  side: DimensionRequest['side'],
  tier: number,
  units: DrawingUnits,
): DimensionRequest[] {
  const s = stations(stationsMm);
  const out: DimensionRequest[] = [];
  for (let i = 0; i + 1 < s.length; i++) {
    const lo = s[i]!;
    const hi = s[i + 1]!;
    out.push({
      a: axis === 'h' ? [lo, atMm] : [atMm, lo],
      b: axis === 'h' ? [hi, atMm] : [atMm, hi],
      axis, side, tier, valueMm: hi - lo, text: lengthText(hi - lo, units),
    });
  }
  return out;
}

/** A single dimension from `lo` to `hi` (mm) along `axis`. */
export function dimension(
  lo: number,
  hi: number,
  atMm: number,
  axis: 'h' | 'v',
  side: DimensionRequest['side'],
  tier: number,
  units: DrawingUnits,
  extra: { key?: string; note?: string } = {},
): DimensionRequest {
  const text = lengthText(hi - lo, units);
  return {
    a: axis === 'h' ? [lo, atMm] : [atMm, lo],
    b: axis === 'h' ? [hi, atMm] : [atMm, hi],
    axis, side, tier, valueMm: hi - lo, text: extra.note ? `${extra.note} ${text}` : text,
    ...(extra.key ? { key: extra.key } : {}),
    ...(extra.note ? { note: extra.note } : {}),
  };
}
