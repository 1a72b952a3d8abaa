/**
 * Drawer heights graduated down a bank: equal, growing by a fixed step (arithmetic), growing by
 * a fixed ratio (geometric), or listed by the maker. The top row is the shallowest; the rows
 * always add up to the height available.
 */
import { assert } from '../../assert.ts';

/** How opening heights change from the top row down. */
export type Graduation = 'equal' | 'arithmetic' | 'geometric' | 'listed';

/** Options for {@link graduatedHeights}; lengths in mm. */
export interface GraduatedHeightsOptions {
  totalMm: number;
  rows: number;
  graduation: Graduation;
  /** Arithmetic: each row is this much taller than the one above it. */
  stepMm: number;
  /** Geometric: each row is this many times the one above it. */
  ratio: number;
  /** Listed: heights from the top; the bottom row takes what is left, whatever is listed for it. */
  listedMm: readonly number[];
}

/** Opening heights from the top row to the bottom (mm); they sum to `totalMm`. May hold a non-positive height the caller must refuse. */
export function graduatedHeights(o: GraduatedHeightsOptions): number[] {
  const n = o.rows;
  assert(Number.isInteger(n) && n >= 1, `rows must be a whole number of at least 1 (got ${n})`);
  switch (o.graduation) {
    case 'equal':
      return Array.from({ length: n }, () => o.totalMm / n);
    case 'arithmetic': {
      // Σ (h0 + i·step) = n·h0 + step·n(n−1)/2 = total
      const h0 = (o.totalMm - (o.stepMm * n * (n - 1)) / 2) / n;
      return Array.from({ length: n }, (_, i) => h0 + i * o.stepMm);
    }
    case 'geometric': {
      // Σ h0·rⁱ = h0 (rⁿ − 1)/(r − 1) = total; r = 1 is the equal case.
      const r = o.ratio;
      const h0 = Math.abs(r - 1) < 1e-12 ? o.totalMm / n : (o.totalMm * (r - 1)) / (r ** n - 1);
      return Array.from({ length: n }, (_, i) => h0 * r ** i);
    }
    case 'listed': {
      const given = Array.from({ length: n - 1 }, (_, i) => o.listedMm[i] ?? 0);
      return [...given, o.totalMm - given.reduce((s, h) => s + h, 0)];
    }
  }
}
