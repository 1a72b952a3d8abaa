/** A part of the piece meeting something in the room: what a 3D view highlights. */
import type { Box3 } from '../engine/types.ts';
import type { RoomCheck } from './roomCheck.ts';

/** One meeting, in the piece's parts and the room's solid ids. */
export interface Collision {
  /** The id of the check that found it. */
  checkId: string;
  solidId: string;
  partIds: readonly string[];
  /** For a swing: the first angle at which they meet, degrees from closed. */
  atDeg?: number;
  /** For a box against a box: the shared volume in room coordinates, mm. */
  overlapMm?: Box3;
}

/** What each check returns: its verdict and the meetings behind it. */
export interface CheckOutcome {
  check: RoomCheck;
  collisions: readonly Collision[];
}
