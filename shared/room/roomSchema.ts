/**
 * The room a piece goes in, as stored in a design's spec (`spec.room`) and in room files. Every
 * length is in millimetres (or a maker's text such as `12' 6"`, read on parse).
 *
 * The room is a rectangle seen from above: X runs along its width, Y along its depth, Z up from
 * the floor, origin at one floor corner. Its four walls are named as they lie on a plan drawn
 * with the `front` wall at the bottom: `front` (Y = 0), `back` (Y = depth), `left` (X = 0) and
 * `right` (X = width). A position along a wall is measured from the wall's left corner as you
 * stand in the room facing that wall — where a maker hooks the tape.
 */
import { z } from 'zod';
import { lengthField } from './lengthField.ts';

/** Version of the room section; bump it and migrate stored rooms when fields change. */
export const ROOM_SCHEMA_VERSION = 1;

/** The four walls of a rectangular room. */
export const WALLS = ['front', 'back', 'left', 'right'] as const;
export type Wall = (typeof WALLS)[number];

/**
 * Sill-board (stool) thickness when none is given, mm: about 1 in, common practice, no
 * published source.
 */
export const DEFAULT_SILL_THICKNESS_MM = 25;

const id = z.string().trim().min(1).max(60);
const wall = z.enum(WALLS);

const doorSchema = z.object({
  id,
  wall,
  /** From the wall's left corner to the near side of the clear opening, mm. */
  position: lengthField({ allowZero: true }),
  /** Clear opening width between the stops with the door open, mm. */
  width: lengthField({ min: 300, max: 5000 }),
  /** Clear opening height, floor to the underside of the head, mm. */
  height: lengthField({ min: 600, max: 6000 }),
  /** `in`: the leaf swings into this room; `out`: away from it; `none`: an open or sliding doorway. */
  swing: z.enum(['in', 'out', 'none']).default('in'),
  /** Hinge side as you stand in the room facing the door. */
  hinge: z.enum(['left', 'right']).default('left'),
});

const windowSchema = z.object({
  id,
  wall,
  /** From the wall's left corner to the near side of the opening, mm. */
  position: lengthField({ allowZero: true }),
  width: lengthField({ min: 100, max: 20_000 }),
  /** Floor to the top of the sill, mm. */
  sillHeight: lengthField({ allowZero: true }),
  /** Floor to the underside of the head, mm. */
  headHeight: lengthField({}),
  /** How far the sill board projects into the room from the wall face, mm (0: flush). */
  sillDepth: lengthField({ allowZero: true, max: 600 }).default(0),
  /** Thickness of the projecting sill board, mm. */
  sillThickness: lengthField({ max: 200 }).default(DEFAULT_SILL_THICKNESS_MM),
});

const obstacleSchema = z.object({
  id,
  /** What it is, in a maker's words: `bed`, `radiator`, `shelf`. */
  label: z.string().trim().min(1).max(80),
  /** Low corner in room coordinates, mm. */
  x: lengthField({ allowZero: true }),
  y: lengthField({ allowZero: true }),
  z: lengthField({ allowZero: true }).default(0),
  /** Size along X, Y and Z, mm. */
  width: lengthField({}),
  depth: lengthField({}),
  height: lengthField({}),
});

const baseboardSchema = z.object({
  height: lengthField({ allowZero: true, max: 600 }),
  thickness: lengthField({ allowZero: true, max: 100 }),
});

const placementSchema = z.object({
  /** The wall the piece's back stands against. */
  wall,
  /** From the wall's left corner to the piece's left side, mm; absent: placed in its niche. */
  position: lengthField({ allowZero: true }).optional(),
  /** A point along the wall inside the niche, mm; default the middle of the wall. */
  near: lengthField({ allowZero: true }).optional(),
  /** Where the piece sits in its niche when no position is given. */
  align: z.enum(['left', 'centre', 'right']).default('centre'),
  /** True when the piece's back is scribed around the baseboard, so it stands against the wall. */
  scribed: z.boolean().default(false),
  /** Extra space left between the piece and the wall (or baseboard), mm. */
  gap: lengthField({ allowZero: true, max: 2000 }).default(0),
});

const clearancesSchema = z.object({
  /** Clear floor wanted in front of the piece with everything open, mm. */
  walkway: lengthField({ allowZero: true, max: 5000 }).optional(),
});

/** The zod schema of a room section (version 1), with defaults. */
export const roomSectionSchema = z.object({
  schemaVersion: z.literal(ROOM_SCHEMA_VERSION),
  name: z.string().trim().max(120).optional(),
  width: lengthField({ min: 300 }),
  depth: lengthField({ min: 300 }),
  ceiling: lengthField({ min: 600, max: 20_000 }),
  baseboard: baseboardSchema.default({ height: 0, thickness: 0 }),
  doors: z.array(doorSchema).max(20).default([]),
  windows: z.array(windowSchema).max(40).default([]),
  obstacles: z.array(obstacleSchema).max(100).default([]),
  placement: placementSchema,
  clearances: clearancesSchema.default({}),
});

/** A parsed room section: every length a number of mm, defaults filled in. */
export type RoomSection = z.output<typeof roomSectionSchema>;
/** A room section as written in a file or a request, before defaults and unit parsing. */
export type RoomSectionInput = z.input<typeof roomSectionSchema>;
export type RoomDoor = RoomSection['doors'][number];
export type RoomWindow = RoomSection['windows'][number];
export type RoomObstacle = RoomSection['obstacles'][number];
export type RoomPlacement = RoomSection['placement'];
