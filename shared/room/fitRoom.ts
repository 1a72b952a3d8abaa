/**
 * Room fit: the piece placed in its room and every check run — footprint, window sill with the
 * piece closed, lid, doors and drawers open, the walkway in front, and passage through each
 * door — with the scene a 3D view draws.
 */
import { doorOpenChecks } from './checks/doorsOpen.ts';
import { drawerOpenChecks } from './checks/drawersOpen.ts';
import { footprintCheck } from './checks/footprint.ts';
import { lidOpenCheck } from './checks/lidOpen.ts';
import { passageChecks } from './checks/passage.ts';
import { walkwayCheck } from './checks/walkway.ts';
import { windowClosedChecks } from './checks/windowClosed.ts';
import type { CheckOutcome } from './collision.ts';
import { fitContext } from './fitContext.ts';
import type { PieceEnvelope } from './pieceEnvelope.ts';
import type { PlacedPiece } from './placement.ts';
import type { RoomCheck } from './roomCheck.ts';
import type { RoomSection } from './roomSchema.ts';
import { roomScene, type RoomScene } from './roomScene.ts';

/** The outcome of fitting a piece to a room. */
export interface RoomFit {
  /** True when every check passed (warnings included). */
  passed: boolean;
  checks: readonly RoomCheck[];
  placed: PlacedPiece;
  scene: RoomScene;
  /** What the envelope assumed about the piece, in words. */
  assumptions: readonly string[];
}

/** Places `piece` in `room` (already parsed) and runs every room-fit check. */
export function fitRoom(room: RoomSection, piece: PieceEnvelope): RoomFit {
  const ctx = fitContext(room, piece);
  const lid = lidOpenCheck(ctx);
  const outcomes: CheckOutcome[] = [
    footprintCheck(ctx),
    ...windowClosedChecks(ctx),
    ...(lid ? [lid] : []),
    ...doorOpenChecks(ctx),
    ...drawerOpenChecks(ctx),
    walkwayCheck(ctx),
    ...passageChecks(ctx),
  ];
  const checks = outcomes.map((o) => o.check);
  return {
    passed: checks.every((c) => c.passed),
    checks,
    placed: ctx.placed,
    scene: roomScene(ctx, outcomes.flatMap((o) => o.collisions)),
    assumptions: piece.assumptions,
  };
}
