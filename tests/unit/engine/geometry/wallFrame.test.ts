import { describe, expect, it } from 'vitest';
import { boxBetween } from '../../../../shared/engine/geometry/box.ts';
import { wallBoxBetweenToWorld, wallBoxToWorld, type WallFrame } from '../../../../shared/engine/geometry/wallFrame.ts';

// Walls of a 1000 × 500 case seen from outside, as the chest draws them.
const FRAMES: WallFrame[] = [
  { origin: [50, 0, 0], u: '+X', w: '-Y' },
  { origin: [950, 500, 0], u: '-X', w: '+Y' },
  { origin: [0, 450, 0], u: '-Y', w: '-X' },
  { origin: [1000, 50, 0], u: '+Y', w: '+X' },
];

describe('wallBoxBetweenToWorld', () => {
  it('gives the very numbers of wallBoxToWorld on the box between the same corners, in any order', () => {
    const corners: [number, number, number, number, number, number][] = [
      [0, 900, 100, 160, -30, -10.5],
      [900, 0, 160, 100, -10.5, -30],
      [-12.7, 0, 0.1 + 0.2, 600, 6.35, -6.35],
    ];
    for (const frame of FRAMES) {
      for (const [u0, u1, v0, v1, w0, w1] of corners) {
        const direct = wallBoxBetweenToWorld(frame, u0, u1, v0, v1, w0, w1);
        const viaBox = wallBoxToWorld(frame, boxBetween([u0, v0, w0], [u1, v1, w1]));
        expect(direct).toEqual(viaBox);
      }
    }
  });

  it('puts a front wall box at its world place: u along +X, v up, w toward the viewer (−Y)', () => {
    const box = wallBoxBetweenToWorld(FRAMES[0]!, 0, 900, 100, 160, -30, -10);
    expect(box.min).toEqual([50, 10, 100]);
    expect(box.max).toEqual([950, 30, 160]);
  });
});
