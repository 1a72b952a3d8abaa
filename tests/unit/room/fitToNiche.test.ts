import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { PieceSpec } from '../../../shared/engine/types.ts';
import { fitRoom } from '../../../shared/room/fitRoom.ts';
import { fitToNiche } from '../../../shared/room/fitToNiche.ts';
import { envelopeFromResult } from '../../../shared/room/pieceEnvelope.ts';
import { buildBoxChest } from './support/boxChest.ts';
import { coastalBedroom, plainRoom } from './support/rooms.ts';

const chestSpec = (width: number, depth: number, height: number): PieceSpec => ({ schemaVersion: 1, kind: 'chest', params: { width, depth, height } });
const passesIn = (spec: PieceSpec, room: ReturnType<typeof plainRoom>) => fitRoom(room, envelopeFromResult(buildBoxChest(spec))).passed;

describe('fitToNiche', () => {
  it('shrinks the demo chest in proportion until its open lid stays under the sill', () => {
    // Open to 90° the lid stands 34 − 19 = 15 mm off the wall, inside the 40 mm sill, so its
    // front edge must stay below the sill's underside at 760 − 25 = 735. That edge is at
    // (height − 19) + (depth + 25); scaled by s from 584 and 483: 1067 s + 6 ≤ 735 → s ≤ 0.6832,
    // i.e. width ≤ 694.1, depth ≤ 330.0, height ≤ 399.0.
    const nf = fitToNiche(chestSpec(1016, 483, 584), coastalBedroom(), buildBoxChest);
    expect(nf.found).toBe(true);
    const p = nf.params as Record<string, number>;
    expect(p['height']! - 19 + p['depth']! + 25).toBeLessThanOrEqual(735);
    expect(p['height']! - 19 + p['depth']! + 25).toBeGreaterThanOrEqual(732);
    expect(p['width']).toBeLessThanOrEqual(694.1);
    expect(p['width']).toBeGreaterThanOrEqual(690);
    expect(nf.fit.checks.find((c) => c.id === 'lid-open')?.passed).toBe(true);
    expect(nf.changes.map((c) => c.key)).toEqual(['width', 'depth', 'height']);
  });

  it('says there is no answer when the pinned height keeps the lid in the sill', () => {
    // Height pinned at 584: the front edge needs depth + 25 ≤ 735 − 565 = 170, depth ≤ 145,
    // under the chest's 250 mm least depth.
    const nf = fitToNiche(chestSpec(1016, 483, 584), coastalBedroom(), buildBoxChest, { pinned: ['height'] });
    expect(nf.found).toBe(false);
    expect(nf.message).toContain('height pinned');
    expect(nf.params).toEqual({ width: 1016, depth: 483, height: 584 });
  });

  it('keeps pinned sizes and grows the free one to fill a niche', () => {
    // A 1500 mm niche between two cabinets, no baseboard: the lid (25 each side) may be 1500
    // wide, so the case over the legs 1450, with depth and height pinned.
    const room = plainRoom({
      obstacles: [
        { id: 'a', label: 'cabinet', x: 0, y: 3500, width: 1000, depth: 500, height: 900 },
        { id: 'b', label: 'cabinet', x: 2500, y: 3500, width: 1000, depth: 500, height: 900 },
      ],
      placement: { wall: 'back', near: 1750, gap: 20 },
    });
    const nf = fitToNiche(chestSpec(900, 450, 500), room, buildBoxChest, { pinned: ['depth', 'height'] });
    expect(nf.found).toBe(true);
    expect(nf.params).toMatchObject({ depth: 450, height: 500, width: 1450 });
  });

  it('returns sizes that pass every check, wherever the sill is', () => {
    fc.assert(
      fc.property(fc.integer({ min: 650, max: 1000 }), fc.integer({ min: 0, max: 60 }), fc.integer({ min: 700, max: 1400 }), (sill, sillDepth, width) => {
        const room = plainRoom({
          placement: { wall: 'back', gap: 20 },
          doors: [{ id: 'd', wall: 'front', position: 300, width: 800, height: 2030 }],
          windows: [{ id: 'w', wall: 'back', position: 1000, width: 2000, sillHeight: sill, headHeight: 2100, sillDepth }],
          baseboard: { height: 90, thickness: 14 },
        });
        const nf = fitToNiche(chestSpec(width, 480, 600), room, buildBoxChest);
        fc.pre(nf.found);
        expect(passesIn({ schemaVersion: 1, kind: 'chest', params: nf.params }, room)).toBe(true);
        expect(nf.fit.checks.every((c) => c.passed)).toBe(true);
      }),
      { numRuns: 8 },
    );
  });

  it('a chest that passes also passes in a bigger room with a bigger door', () => {
    fc.assert(
      fc.property(fc.integer({ min: 400, max: 1600 }), fc.integer({ min: 300, max: 700 }), fc.integer({ min: 300, max: 900 }), fc.integer({ min: 0, max: 800 }), (w, d, h, more) => {
        const roomOf = (extra: number) => plainRoom({
          width: 3000 + extra, depth: 2500 + extra, ceiling: 2400 + extra,
          doors: [{ id: 'd', wall: 'front', position: 300, width: 700 + extra / 4, height: 2000 + extra / 4 }],
          placement: { wall: 'back', gap: 20 },
        });
        const spec = chestSpec(w, d, h);
        fc.pre(passesIn(spec, roomOf(0)));
        expect(passesIn(spec, roomOf(more))).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});
