import { describe, expect, it } from 'vitest';
import { BoxGeometry, type BufferGeometry } from 'three';
import { outlineEdges } from '../../../src/scene/outlineEdges.ts';
import { buildPartGeometry } from '../../../src/scene/partSolid.ts';
import type { Part } from '../../../shared/engine/types.ts';
import { frameSideResult } from './fixtures/frameSide.ts';

/** Float32 vertices on parts under a metre. */
const FLOAT32_MM = 1e-3;

function segments(edges: BufferGeometry): number[][] {
  const p = edges.getAttribute('position');
  const out: number[][] = [];
  for (let i = 0; i < p.count; i += 2) out.push([p.getX(i), p.getY(i), p.getZ(i), p.getX(i + 1), p.getY(i + 1), p.getZ(i + 1)]);
  return out;
}
const lengthOf = (s: number[]): number => Math.hypot(s[3]! - s[0]!, s[4]! - s[1]!, s[5]! - s[2]!);

describe('outlineEdges', () => {
  it('outlines a plain box with its twelve edges and nothing across its faces', () => {
    const edges = segments(outlineEdges(new BoxGeometry(300, 80, 20)));
    expect(edges).toHaveLength(12);
    const total = edges.reduce((sum, s) => sum + lengthOf(s), 0);
    expect(Math.abs(total - 4 * (300 + 80 + 20))).toBeLessThan(FLOAT32_MM);
  });

  it('draws only lines along the part\'s axes, never a triangulation diagonal, on a cut part', () => {
    const result = frameSideResult();
    for (const part of result.parts) {
      for (const s of segments(outlineEdges(buildPartGeometry(part)))) {
        const moving = [0, 1, 2].filter((k) => Math.abs(s[k + 3]! - s[k]!) > FLOAT32_MM);
        expect(moving).toHaveLength(1);
      }
    }
  });

  it('outlines a full-length groove: the box edges plus the groove\'s four long edges', () => {
    const L = 400, W = 76, T = 19;
    const part: Part = {
      ...frameSideResult().parts[1]!,
      lengthMm: L, widthMm: W, thicknessMm: T,
      features: [{ id: 'g', type: 'groove', face: 'edge-b', label: 'g', removed: [{ min: [0, W - 10, 6], max: [L, W, 12] }], widthMm: 6, depthMm: 10, offsetMm: 6, lengthMm: L }],
    };
    const edges = segments(outlineEdges(buildPartGeometry(part)));
    const total = edges.reduce((sum, s) => sum + lengthOf(s), 0);
    // Box: 4(L + W + T). The groove adds two mouth edges and two bottom edges along L, and on
    // each end its outline (2 × 10 deep + 6 across the bottom), while the 6 mm of end edge it opens
    // is no longer a crease.
    const expected = 4 * (L + W + T) + 4 * L + 2 * (2 * 10 + 6) - 2 * 6;
    expect(Math.abs(total - expected)).toBeLessThan(FLOAT32_MM * edges.length);
  });
});
