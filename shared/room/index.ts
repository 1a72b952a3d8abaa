/** Room fit: the room model, where the piece stands, every clearance check, passage and fit to niche. */
export * from './roomSchema.ts';
export * from './parseRoom.ts';
export * from './roomFrame.ts';
export * from './roomSolids.ts';
export * from './pieceEnvelope.ts';
export * from './niche.ts';
export * from './placement.ts';
export * from './rectInRect.ts';
export * from './passage.ts';
export * from './swing.ts';
export * from './roomCheck.ts';
export * from './collision.ts';
export * from './fitContext.ts';
export * from './roomScene.ts';
export * from './fitRoom.ts';
export * from './fitToNiche.ts';
export { DEFAULT_WALKWAY_MM, WALKWAY_HEADROOM_MM, openFrontY } from './checks/walkway.ts';
export { DOOR_CHECK_ANGLE_DEG } from './checks/doorsOpen.ts';
