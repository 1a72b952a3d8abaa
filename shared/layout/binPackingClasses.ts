/**
 * Generated instances of the published two-dimensional bin-packing classes, used to measure
 * the sheet optimiser. Classes I–VI are Berkey & Wang (1987, Journal of the Operational
 * Research Society 38, "Two-dimensional finite bin-packing algorithms"); classes VII–X are
 * Martello & Vigo (1998, Management Science 44); the generation rules (integer sizes uniform in
 * each range, n = 20 … 100, ten instances per class and n) follow Lodi, Martello & Vigo (1999,
 * INFORMS Journal on Computing 11). The instances here are drawn with Casewright's own seeded
 * generator, so they follow the rules but are not the published files.
 */
import { randomInt, seededRandom } from './prng.ts';

/** The class numbers I–X as 1–10. */
export type BinPackingClass = 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9 | 10;

/** One generated instance: bin size and item sizes (w along the bin's W, h along its H). */
export interface BinPackingInstance {
  classNumber: BinPackingClass;
  n: number;
  seed: number;
  binW: number;
  binH: number;
  items: { w: number; h: number }[];
}

/** Bin size and item ranges of Berkey & Wang's classes I–VI. */
const UNIFORM_CLASSES: Readonly<Record<number, { bin: number; low: number; high: number }>> = {
  1: { bin: 10, low: 1, high: 10 },
  2: { bin: 30, low: 1, high: 10 },
  3: { bin: 40, low: 1, high: 35 },
  4: { bin: 100, low: 1, high: 35 },
  5: { bin: 100, low: 1, high: 100 },
  6: { bin: 300, low: 1, high: 100 },
};

/** Roman numerals for printing. */
export const CLASS_NAMES: readonly string[] = ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X'];

/** Generates instance `seed` of class `classNumber` with `n` items; the same arguments give the same items. */
export function binPackingInstance(classNumber: BinPackingClass, n: number, seed: number): BinPackingInstance {
  const random = seededRandom((classNumber * 1_000_003 + n * 7919 + seed) >>> 0);
  const uniform = UNIFORM_CLASSES[classNumber];
  if (uniform) {
    const items = Array.from({ length: n }, () => ({ w: randomInt(random, uniform.low, uniform.high), h: randomInt(random, uniform.low, uniform.high) }));
    return { classNumber, n, seed, binW: uniform.bin, binH: uniform.bin, items };
  }
  const W = 100;
  const H = 100;
  // Martello & Vigo: four item types; the class's own type with probability 0.7, the others 0.1.
  const favoured = classNumber - 6;
  const items = Array.from({ length: n }, () => {
    const u = random();
    const others = [1, 2, 3, 4].filter((t) => t !== favoured);
    const type = u < 0.7 ? favoured : (others[Math.min(2, Math.floor((u - 0.7) / 0.1))] as number);
    return itemOfType(type, W, H, random);
  });
  return { classNumber, n, seed, binW: W, binH: H, items };
}

function itemOfType(type: number, W: number, H: number, random: () => number): { w: number; h: number } {
  switch (type) {
    case 1:
      return { w: randomInt(random, Math.ceil((2 * W) / 3), W), h: randomInt(random, 1, Math.floor(H / 2)) };
    case 2:
      return { w: randomInt(random, 1, Math.floor(W / 2)), h: randomInt(random, Math.ceil((2 * H) / 3), H) };
    case 3:
      return { w: randomInt(random, Math.ceil(W / 2), W), h: randomInt(random, Math.ceil(H / 2), H) };
    default:
      return { w: randomInt(random, 1, Math.floor(W / 2)), h: randomInt(random, 1, Math.floor(H / 2)) };
  }
}
