/**
 * The demo chest's room: an INVENTED coastal bedroom (the same room as
 * tests/fixtures/rooms/coastal-bedroom.json, with the chest's own placement), measured by the
 * demo's designer and saved as its own revision, so the demo shows room fit working on a
 * design's history. The chest stands under the sea window, 2 in off the wall, which is what
 * its open lid needs to clear the projecting sill.
 *
 * Idempotent: added once, as a new revision on top of the head, only when the chest has no
 * revision with this message and its head has no room of its own.
 */
import type { Sequelize } from 'sequelize';
import type { RoomSectionInput } from '../../shared/room/roomSchema.ts';
import { createDesignService } from '../features/designs/designs.service.ts';
import { modelsFor } from './models/index.ts';

/** The revision message the room arrives with. */
export const DEMO_ROOM_MESSAGE = 'Measured the bedroom: under the sea window, 2 in off the wall so the open lid clears the sill';

/** The invented bedroom, lengths in mm. */
export const DEMO_BEDROOM: RoomSectionInput = {
  schemaVersion: 1,
  name: 'Coastal bedroom',
  width: 3600,
  depth: 3300,
  ceiling: 2440,
  baseboard: { height: 90, thickness: 14 },
  doors: [{ id: 'hall', wall: 'front', position: 300, width: 737, height: 2032, swing: 'in', hinge: 'left' }],
  windows: [{ id: 'sea', wall: 'back', position: 1200, width: 1200, sillHeight: 760, headHeight: 2100, sillDepth: 40, sillThickness: 25 }],
  obstacles: [
    { id: 'bed', label: 'bed', x: 0, y: 322, width: 2030, depth: 1530, height: 600 },
    { id: 'bookcase', label: 'bookcase', x: 0, y: 3000, width: 800, depth: 300, height: 1800 },
    { id: 'dresser', label: 'dresser', x: 2800, y: 2800, width: 800, depth: 500, height: 860 },
  ],
  placement: { wall: 'back', near: 1800, align: 'centre', gap: 50.8 },
  clearances: {},
};

/** Gives the design `designId` the demo bedroom as a new revision by `authorId`; true when it did. */
export async function seedDemoRoom(sequelize: Sequelize, designId: string, authorId: string): Promise<boolean> {
  const models = modelsFor(sequelize);
  if (await models.Revision.findOne({ where: { designId, message: DEMO_ROOM_MESSAGE } })) return false;
  const head = await models.Revision.findOne({ where: { designId }, order: [['number', 'DESC']] });
  if (!head || head.spec.room !== undefined) return false;
  const designs = createDesignService(sequelize, models);
  await designs.save(designId, authorId, { baseRevision: head.number, spec: { ...head.spec, room: DEMO_BEDROOM }, message: DEMO_ROOM_MESSAGE });
  return true;
}
