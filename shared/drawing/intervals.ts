/** Closed 1D intervals [lo, hi]: union and difference, for splitting edges into visible and hidden runs. */

/** An interval on a line, lo < hi. */
export type Interval = readonly [number, number];

/** Intervals shorter than this (mm) are dropped as noise. */
export const INTERVAL_EPS = 1e-6;

/** Sorted, merged union of `list`; touching intervals join. */
export function unionOf(list: readonly Interval[]): Interval[] {
  const sorted = list.filter(([lo, hi]) => hi - lo > INTERVAL_EPS).sort((a, b) => a[0] - b[0]);
  const out: [number, number][] = [];
  for (const [lo, hi] of sorted) {
    const last = out[out.length - 1];
    if (last && lo <= last[1] + INTERVAL_EPS) last[1] = Math.max(last[1], hi);
    else out.push([lo, hi]);
  }
  return out;
}

/** The parts of `from` not covered by any of `cut`. */
export function subtract(from: readonly Interval[], cut: readonly Interval[]): Interval[] {
  const cuts = unionOf(cut);
  const out: Interval[] = [];
  for (const [lo, hi] of unionOf(from)) {
    let start = lo;
    for (const [clo, chi] of cuts) {
      if (chi <= start || clo >= hi) continue;
      if (clo > start) out.push([start, clo]);
      start = Math.max(start, chi);
    }
    if (hi - start > INTERVAL_EPS) out.push([start, hi]);
  }
  return out;
}

/** The parts of `a` that lie inside `b`. */
export function intersect(a: readonly Interval[], b: readonly Interval[]): Interval[] {
  return subtract(a, subtract(a, b));
}
