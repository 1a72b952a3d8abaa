import { describe, expect, it } from 'vitest';
import { axisDeterminant, localBoxToWorld, localFaceOf, worldBoxToLocal, worldBoxToLocalInto } from '../../../../shared/engine/geometry/placement.ts';
import { buildPiece, defaultSpec } from '../../../../shared/engine/index.ts';
import type { Box3 } from '../../../../shared/engine/types.ts';

const MM_TOLERANCE = 1e-9;

describe('localBoxToWorld', () => {
  it('maps a local box through signed axes and back again', () => {
    const axes = { length: '-Y', width: '+Z', thickness: '-X' } as const;
    const size = [500, 80, 20] as const;
    const local: Box3 = { min: [10, 5, 0], max: [30, 15, 6] };
    const world = localBoxToWorld(local, size, axes, [100, 200, 300]);
    // length −Y: local x 10..30 → y = 200 + (500 − 30)..(500 − 10); thickness −X: z 0..6 → x = 100 + 14..20.
    expect(world.min).toEqual([114, 670, 305]);
    expect(world.max).toEqual([120, 690, 315]);
    const back = worldBoxToLocal(world, size, axes, [100, 200, 300]);
    back.min.forEach((v, i) => expect(Math.abs(v - local.min[i]!)).toBeLessThan(MM_TOLERANCE));
  });

  it('names the face that looks toward a world direction', () => {
    const axes = { length: '+Z', width: '+Y', thickness: '-X' } as const;
    expect(localFaceOf(axes, '-X')).toBe('face-b');
    expect(localFaceOf(axes, '+X')).toBe('face-a');
    expect(localFaceOf(axes, '-Z')).toBe('end-a');
  });
});

describe('worldBoxToLocalInto', () => {
  it('writes the same local box as worldBoxToLocal, min then max, from the given index', () => {
    const axes = { length: '-Y', width: '+Z', thickness: '-X' } as const;
    const size = [500, 80, 20] as const;
    const world: Box3 = { min: [114, 670, 305], max: [120, 690, 315] };
    const out = [-1, -1, -1, -1, -1, -1, -1, -1];
    worldBoxToLocalInto(world, size, axes, [100, 200, 300], out, 2);
    const box = worldBoxToLocal(world, size, axes, [100, 200, 300]);
    expect(out.slice(0, 2)).toEqual([-1, -1]);
    expect(out.slice(2)).toEqual([...box.min, ...box.max]);
    expect(out.slice(2)).toEqual([10, 5, 0, 30, 15, 6]);
  });
});

describe('buildPiece placements', () => {
  it('turns every part by a rotation, never a mirror', () => {
    for (const p of buildPiece(defaultSpec('chest')).placements) expect(axisDeterminant(p.axes), p.label).toBe(1);
  });

  it('gives every part as many placements as its quantity, and an exploded offset', () => {
    const r = buildPiece(defaultSpec('chest'));
    for (const part of r.parts) {
      const mine = r.placements.filter((p) => p.partId === part.id);
      expect(mine.map((p) => p.instance)).toEqual([...Array(part.quantity).keys()]);
    }
    const lid = r.placements.find((p) => p.partId === 'lid')!;
    expect(lid.explodeMm[2]).toBeGreaterThan(0);
  });
});
