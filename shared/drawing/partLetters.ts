/** Letters that name each distinct part across the plan set: A, B, … Z, AA, AB … */
import type { PieceResult } from '../engine/types.ts';

/** The letter for the `index`-th part (0-based). */
export function letterFor(index: number): string {
  let n = index;
  let out = '';
  do {
    out = String.fromCharCode(65 + (n % 26)) + out;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return out;
}

/** Part id → letter, in the engine's part order. */
export function partLetters(result: PieceResult): Map<string, string> {
  return new Map(result.parts.map((p, i) => [p.id, letterFor(i)]));
}
