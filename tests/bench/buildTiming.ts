/**
 * Timing of `buildPiece` for the engine benchmarks: every case is warmed up first, all of them
 * together, so the measured runs see code the JIT has already compiled for every shape it will
 * meet; then each case is timed over many runs, each from a fresh spec object so the engine's
 * last-build cache never answers. Median and 95th percentile of every measured run, none dropped.
 */
import { buildPiece } from '../../shared/engine/index.ts';
import type { PieceSpec } from '../../shared/engine/types.ts';

/** One printed row of an engine benchmark: times in ms. */
export interface BuildTiming {
  name: string;
  medianMs: number;
  p95Ms: number;
  /**
   * Median processor time of the process per build (user + system, all its threads), ms: on a
   * machine shared with other work it leaves out the time spent waiting for a processor, which
   * the wall-clock median and p95 include.
   */
  cpuMedianMs: number;
  runs: number;
}

/** A named build: `make` returns a fresh spec each call. */
export interface BuildCase {
  name: string;
  make: () => PieceSpec;
}

/** Warm-up builds of every case before any is timed. */
export const WARM_UP_RUNS = 500;
/** Timed builds per case: enough that a garbage collection now and then moves the p95 little. */
export const MEASURED_RUNS = 3000;

function percentile(sorted: readonly number[], p: number): number {
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[i]!;
}

/** Warms every case up, then times each; median and p95 of all measured runs, ms. */
export function timeBuilds(cases: readonly BuildCase[], warmUp = WARM_UP_RUNS, runs = MEASURED_RUNS): BuildTiming[] {
  for (let i = 0; i < warmUp; i++) for (const c of cases) buildPiece(c.make());
  return cases.map((c) => {
    const times = new Float64Array(runs);
    const cpu = new Float64Array(runs);
    for (let i = 0; i < runs; i++) {
      const spec = c.make();
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      buildPiece(spec);
      times[i] = performance.now() - t0;
      const used = process.cpuUsage(c0);
      cpu[i] = (used.user + used.system) / 1000;
    }
    const sorted = [...times].sort((a, b) => a - b);
    const cpuSorted = [...cpu].sort((a, b) => a - b);
    return { name: c.name, medianMs: percentile(sorted, 50), p95Ms: percentile(sorted, 95), cpuMedianMs: percentile(cpuSorted, 50), runs };
  });
}
