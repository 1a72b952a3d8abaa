import { describe, expect, it } from 'vitest';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { thumbnailOf } from '../../../src/editor/thumbnail.ts';

const chest = buildPiece(defaultSpec('chest'));

function pointsOf(list: string): [number, number][] {
  return list.split(' ').map((pair) => pair.split(',').map(Number) as [number, number]);
}

describe('thumbnailOf', () => {
  it('draws one box for every placed part instance', () => {
    expect(thumbnailOf(chest).shapes).toHaveLength(chest.placements.length);
  });

  it('frames every corner inside its viewBox', () => {
    const drawing = thumbnailOf(chest, 10);
    const [x, y, w, h] = drawing.viewBox.split(' ').map(Number) as [number, number, number, number];
    for (const shape of drawing.shapes) {
      for (const [u, v] of [...pointsOf(shape.front), ...pointsOf(shape.top), ...pointsOf(shape.side)]) {
        expect(u).toBeGreaterThanOrEqual(x);
        expect(u).toBeLessThanOrEqual(x + w);
        expect(v).toBeGreaterThanOrEqual(y);
        expect(v).toBeLessThanOrEqual(y + h);
      }
    }
  });

  it('is as wide as the piece plus its receding depth and margins', () => {
    // Cabinet oblique: depth drawn at half scale along 30°, so width = W + D·cos30°/2 + 2·margin.
    const margin = 10;
    const [, , w] = thumbnailOf(chest, margin).viewBox.split(' ').map(Number) as [number, number, number];
    const expected = chest.bboxMm[0] + chest.bboxMm[1] * Math.cos(Math.PI / 6) * 0.5 + 2 * margin;
    expect(Math.abs(w - expected)).toBeLessThan(0.2);
  });

  it('draws the lid last, over the case below it', () => {
    const drawing = thumbnailOf(chest);
    const lidIndex = drawing.shapes.findIndex((s) => s.role === 'lid');
    expect(lidIndex).toBeGreaterThanOrEqual(0);
    const legs = drawing.shapes.map((s, i) => (s.role === 'leg' ? i : -1)).filter((i) => i >= 0);
    for (const leg of legs) expect(leg).toBeLessThan(lidIndex);
  });

  it('gives an empty drawing a default frame', () => {
    expect(thumbnailOf({ ...chest, placements: [] }).viewBox).toBe('0 0 100 100');
  });
});
