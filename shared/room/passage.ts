/**
 * Carrying a box through a doorway, straight through, the geometry written down.
 *
 * A box W × D × H (mm) carried straight through a w × h opening in a wall must show the opening
 * a cross-section that fits it; carried along one of its own edges, that cross-section is the
 * face across the direction of travel, whatever the wall's thickness.
 *
 * Upright (height kept vertical, as the piece stands): front first the face is W × H, sideways
 * it is D × H. It passes when H ≤ h and min(W, D) ≤ w.
 *
 * Tipped (on its back, side or end): any face may lead, held square or on a slant in the door's
 * plane. The smallest face a × b (the two smallest sizes) is the best one to lead with: every
 * other face is at least as large on both sides. It passes when a × b fits in w × h, square or
 * slanted (see `rectInRect.ts`).
 *
 * Tipping only part way never helps a box through a thin opening: tilted back by t, a vertical
 * cut through its H × D side is at most min(H / cos t, D / sin t) long, which is never below
 * min(H, D) — what standing upright or lying flat already gives.
 *
 * Once through, a tipped piece must be stood up. Pivoting on a bottom edge from lying on its
 * back (or side), the far top edge rises to the diagonal √(H² + D²) (or √(H² + W²)) when that
 * diagonal stands vertical; the room's ceiling must clear the shallower of the two.
 */
import type { Vec3 } from '../engine/types.ts';
import { rectFitsInRect } from './rectInRect.ts';

/** A door's clear opening, mm. */
export interface DoorOpeningSize {
  widthMm: number;
  heightMm: number;
}

/** How a box goes through, or that it does not. */
export type PassageWay = 'upright' | 'tipped' | 'none';

/** The outcome for one box; every number in mm. */
export interface BoxPassage {
  way: PassageWay;
  /** Upright: the narrower of width and depth, and the height. */
  uprightFaceMm: readonly [number, number];
  /** The smallest face, the two smallest sizes. */
  smallestFaceMm: readonly [number, number];
  /** √(H² + min(W, D)²): the height needed to stand it up after carrying it tipped. */
  standUpDiagonalMm: number;
  /** True when it would go through tipped but the ceiling is too low to stand it up. */
  blockedByCeiling: boolean;
}

/** How a box of `sizeMm` = [W, D, H] goes through `door` into a room with a `ceilingMm` ceiling. */
export function boxThroughDoor(sizeMm: Vec3, door: DoorOpeningSize, ceilingMm: number): BoxPassage {
  const [w, d, h] = sizeMm;
  const sorted = [...sizeMm].sort((x, y) => x - y);
  const uprightFaceMm = [Math.min(w, d), h] as const;
  const smallestFaceMm = [sorted[0]!, sorted[1]!] as const;
  const standUpDiagonalMm = Math.hypot(h, Math.min(w, d));

  const upright = uprightFaceMm[0] <= door.widthMm && h <= door.heightMm;
  const tippedThrough = rectFitsInRect(smallestFaceMm[0], smallestFaceMm[1], door.widthMm, door.heightMm);
  const standsUp = standUpDiagonalMm <= ceilingMm;

  const way: PassageWay = upright ? 'upright' : tippedThrough && standsUp ? 'tipped' : 'none';
  return { way, uprightFaceMm, smallestFaceMm, standUpDiagonalMm, blockedByCeiling: !upright && tippedThrough && !standsUp };
}
