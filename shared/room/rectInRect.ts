/**
 * Whether a rectangle fits inside another, turned if need be: the cross-section a carried piece
 * shows a doorway, which the carriers may hold at a slant in the door's plane.
 *
 * A p × q rectangle (p ≥ q) fits in an a × b rectangle (a ≥ b) exactly when
 *   (i)  p ≤ a and q ≤ b (square to the opening), or
 *   (ii) p > a, q ≤ b and ((a + b) / (p + q))² + ((a − b) / (p − q))² ≥ 2 (on a slant).
 * W. Carver, "Rectangles in rectangles", American Mathematical Monthly 63 (1956) — from memory;
 * the unit tests check it against a direct search over slant angles, so it does not rest on
 * the citation.
 */

/** True when a `p` × `q` rectangle fits inside an `a` × `b` rectangle, square or on a slant (mm). */
export function rectFitsInRect(p: number, q: number, a: number, b: number): boolean {
  const [long, short] = p >= q ? [p, q] : [q, p];
  const [outerLong, outerShort] = a >= b ? [a, b] : [b, a];
  if (long <= outerLong && short <= outerShort) return true;
  if (short > outerShort) return false;
  // Here long > outerLong ≥ outerShort ≥ short, so long − short > 0.
  const sum = (outerLong + outerShort) / (long + short);
  const diff = (outerLong - outerShort) / (long - short);
  return sum * sum + diff * diff >= 2;
}
