/**
 * A small seeded pseudo-random generator, so optimiser restarts and generated benchmark
 * instances repeat exactly from run to run. Mulberry32 (Tommy Ettinger's public-domain
 * 32-bit generator): fast, statistically adequate for shuffling and instance generation.
 */

/** Returns a generator of floats in [0, 1) seeded by the 32-bit integer `seed`. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A whole number uniform in [`low`, `high`] drawn from `random`. */
export function randomInt(random: () => number, low: number, high: number): number {
  return low + Math.floor(random() * (high - low + 1));
}

/** A shuffled copy of `items` (Fisher–Yates) drawn from `random`. */
export function shuffled<T>(items: readonly T[], random: () => number): T[] {
  const out = items.slice();
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const held = out[i] as T;
    out[i] = out[j] as T;
    out[j] = held;
  }
  return out;
}
