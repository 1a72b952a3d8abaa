import { describe, expect, it } from 'vitest';
import { projectEdges } from '../../../shared/drawing/hiddenLines.ts';
import { subtract, unionOf } from '../../../shared/drawing/intervals.ts';
import type { Segment } from '../../../shared/drawing/types.ts';

const TOL = 1e-9;

function total(segments: readonly Segment[], kind: Segment['kind']): number {
  return segments.filter((s) => s.kind === kind).reduce((n, s) => n + Math.hypot(s.b[0] - s.a[0], s.b[1] - s.a[1]), 0);
}

describe('unionOf and subtract', () => {
  it('joins overlapping intervals and cuts holes out of them', () => {
    expect(unionOf([[0, 2], [1, 3], [5, 6]])).toEqual([[0, 3], [5, 6]]);
    expect(subtract([[0, 10]], [[2, 3], [5, 7]])).toEqual([[0, 2], [3, 5], [7, 10]]);
  });
});

describe('projectEdges', () => {
  it('dashes the part of a far box that a near box covers', () => {
    // A 100 × 10 rail behind a 20 × 50 leg that overlaps its left end by 10.
    const leg = { rect: { x: 0, y: 0, w: 20, h: 50 }, near: 0 };
    const rail = { rect: { x: 10, y: 20, w: 100, h: 10 }, near: 5 };
    const segments = projectEdges([leg, rail], { hidden: true });
    // Hidden: the rail's end inside the leg (10) and 10 of each long edge inside the leg.
    expect(total(segments, 'hidden')).toBeCloseTo(30, 9);
    // Visible: the leg's outline (140) plus the rail outside it: 90 + 90 + 10.
    expect(total(segments, 'visible')).toBeCloseTo(140 + 190, 9);
  });

  it('draws a shared edge once, visible, even where one box would hide it', () => {
    const a = { rect: { x: 0, y: 0, w: 10, h: 10 }, near: 0 };
    const b = { rect: { x: 10, y: 0, w: 10, h: 10 }, near: 3 };
    const segments = projectEdges([a, b], { hidden: true });
    expect(total(segments, 'hidden')).toBeLessThan(TOL);
    const shared = segments.filter((s) => s.a[0] === 10 && s.b[0] === 10);
    expect(shared).toHaveLength(1);
  });

  it('leaves hidden stretches out when asked to', () => {
    const front = { rect: { x: 0, y: 0, w: 50, h: 50 }, near: 0 };
    const back = { rect: { x: 10, y: 10, w: 10, h: 10 }, near: 20 };
    expect(total(projectEdges([front, back], { hidden: false }), 'hidden')).toBe(0);
    expect(total(projectEdges([front, back], { hidden: true }), 'hidden')).toBeCloseTo(40, 9);
  });
});
