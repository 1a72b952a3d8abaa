import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { fitRoom } from '../../../shared/room/fitRoom.ts';
import { parseRoomSection } from '../../../shared/room/parseRoom.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { pieceBoxToRoom } from '../../../shared/room/roomFrame.ts';
import { placeInRoom, ROOM_FOCUS_MARGIN_MM, roomFocusBox } from '../../../src/scene/roomSceneModel.ts';
import { sceneModel } from '../../../src/scene/sceneModel.ts';

/** Room placements are sums of mm values and 90° turns; a micrometre is far past rounding. */
const TOLERANCE_MM = 1e-6;

const result = buildPiece(defaultSpec('chest'));
const room = parseRoomSection(JSON.parse(readFileSync(resolve(dirname(fileURLToPath(import.meta.url)), '../../fixtures/rooms/coastal-bedroom.json'), 'utf8')));
const fit = fitRoom(room, envelopeFromResult(result));
const model = sceneModel(result, { explode: 0 });
const placed = placeInRoom(model, fit.scene);

describe('placeInRoom', () => {
  it('puts every part that does not open where the room placement puts the piece', () => {
    const moving = new Set([...(fit.scene.lid?.partIds ?? []), ...fit.scene.pieceDoors.flatMap((d) => d.partIds), ...fit.scene.drawers.flatMap((d) => d.partIds)]);
    let checked = 0;
    placed.meshes.forEach((mesh, i) => {
      if (moving.has(mesh.partId)) return;
      const expected = pieceBoxToRoom(room, fit.placed.pose, model.meshes[i]!.worldBox);
      for (let k = 0; k < 3; k++) {
        expect(Math.abs(mesh.worldBox.min[k]! - expected.min[k]!)).toBeLessThan(TOLERANCE_MM);
        expect(Math.abs(mesh.worldBox.max[k]! - expected.max[k]!)).toBeLessThan(TOLERANCE_MM);
      }
      checked++;
    });
    expect(checked).toBeGreaterThan(10);
  });

  it('stands the lid up on its hinge line when it is open at 90°', () => {
    expect(fit.scene.lid?.angleDeg).toBe(90);
    const lidPart = result.parts.find((p) => p.role === 'lid')!;
    const lid = placed.meshes.find((m) => m.partId === lidPart.id)!;
    const size = (k: number) => lid.worldBox.max[k]! - lid.worldBox.min[k]!;
    // Closed it lies flat (thin in Z); open it stands up, thin along the room's depth.
    expect(size(1)).toBeCloseTo(lidPart.thicknessMm, 6);
    expect(size(2)).toBeCloseTo(lidPart.widthMm, 6);
    // It rises above the closed piece's height.
    expect(lid.worldBox.max[2]!).toBeGreaterThan(result.bboxMm[2] + lidPart.widthMm / 2);
  });

  it('marks the lid and the window sill it runs into as colliding', () => {
    const lidPart = result.parts.find((p) => p.role === 'lid')!;
    expect(placed.collidingPartIds.has(lidPart.id)).toBe(true);
    expect([...placed.collidingSolidIds].some((id) => id.startsWith('sill'))).toBe(true);
  });
});

describe('roomFocusBox', () => {
  const focus = roomFocusBox(placed, fit.scene);
  const roomBox = fit.scene.roomBox;

  it('frames less than the whole room: the opened piece and what is around it', () => {
    const extent = (b: typeof roomBox, k: number) => b.max[k]! - b.min[k]!;
    expect(extent(focus, 0)).toBeLessThan(extent(roomBox, 0));
    expect(extent(focus, 1)).toBeLessThan(extent(roomBox, 1));
  });

  it('holds every placed part, the open lid included, with the margin around them inside the room', () => {
    for (const mesh of placed.meshes) {
      for (let k = 0; k < 3; k++) {
        expect(mesh.worldBox.min[k]!).toBeGreaterThanOrEqual(focus.min[k]! - TOLERANCE_MM);
        expect(mesh.worldBox.max[k]!).toBeLessThanOrEqual(focus.max[k]! + TOLERANCE_MM);
      }
    }
    for (let k = 0; k < 3; k++) {
      expect(focus.min[k]!).toBeGreaterThanOrEqual(roomBox.min[k]! - TOLERANCE_MM);
      expect(focus.max[k]!).toBeLessThanOrEqual(roomBox.max[k]! + TOLERANCE_MM);
    }
    // Stands on the floor, so the view keeps the floor under the piece.
    expect(focus.min[2]).toBe(roomBox.min[2]);
    const pieceTop = Math.max(...placed.meshes.map((m) => m.worldBox.max[2]!));
    expect(focus.max[2]).toBeCloseTo(Math.min(roomBox.max[2]!, pieceTop + ROOM_FOCUS_MARGIN_MM), 6);
  });

  it('takes in the place the lid meets the sill', () => {
    const overlaps = fit.scene.collisions.flatMap((c) => (c.overlapMm ? [c.overlapMm] : []));
    for (const box of overlaps) for (let k = 0; k < 3; k++) expect(box.max[k]!).toBeLessThanOrEqual(focus.max[k]! + TOLERANCE_MM);
  });
});
