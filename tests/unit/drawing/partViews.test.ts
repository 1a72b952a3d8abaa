import { describe, expect, it } from 'vitest';
import { layoutView, primitiveRect } from '../../../shared/drawing/dimensionLayout.ts';
import { lengthText } from '../../../shared/drawing/lengthText.ts';
import { partViews } from '../../../shared/drawing/partViews.ts';
import { rectsOverlap } from '../../../shared/drawing/rects.ts';
import type { ModelView } from '../../../shared/drawing/types.ts';
import type { Part } from '../../../shared/engine/types.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { sampleResult } from './support/sampleResult.ts';

function part(id: string): Part {
  const p = sampleResult().parts.find((x) => x.id === id);
  if (!p) throw new Error(`no part ${id}`);
  return p;
}

function allDimensionTexts(p: Part): string[] {
  const views = partViews(p, 'in');
  return [views.face, views.edge, views.end].flatMap((v) => v.dimensions.map((d) => d.text));
}

describe('partViews', () => {
  it('dimensions a groove\'s width, depth and offset and a tongue\'s length and thickness', () => {
    const texts = allDimensionTexts(part('front-top-rail'));
    // Rail: tongues 11 mm long × 6.35 thick; groove 6.35 wide × 9.5 deep, 6.35 from face A.
    for (const mm of [11, 6.35, 9.5]) expect(texts).toContain(lengthText(mm, 'in'));
  });

  it('dimensions where a stopped groove starts and stops', () => {
    const texts = allDimensionTexts(part('leg'));
    // Leg grooves run from 87 to 568 mm of 580: 87 before, 481 long, 12 after.
    for (const mm of [87, 481, 12]) expect(texts).toContain(lengthText(mm, 'in'));
  });

  it('dimensions rabbets, notches, hinge recesses and slot lengths', () => {
    expect(allDimensionTexts(part('front-panel'))).toEqual(expect.arrayContaining([lengthText(10, 'in'), lengthText(5.65, 'in')]));
    expect(allDimensionTexts(part('bottom'))).toContain(lengthText(23, 'in'));
    expect(allDimensionTexts(part('lid'))).toEqual(expect.arrayContaining([lengthText(63.5, 'in'), lengthText(16, 'in'), lengthText(2, 'in')]));
    expect(allDimensionTexts(part('batten'))).toContain(lengthText(10, 'in'));
  });

  it('gives every part its finished length, width and thickness as keyed dimensions', () => {
    for (const p of sampleResult().parts) {
      const views = partViews(p, 'mm');
      const keyed = new Map([views.face, views.edge, views.end].flatMap((v) => v.dimensions.filter((d) => d.key).map((d) => [d.key!, d.valueMm] as const)));
      expect(keyed.get('length')).toBeCloseTo(p.lengthMm, 6);
      expect(keyed.get('width')).toBeCloseTo(p.widthMm, 6);
      expect(keyed.get('thickness')).toBeCloseTo(p.thicknessMm, 6);
    }
  });
});

describe('layoutView', () => {
  it('sets no dimension text on another for any part of the engine\'s chest', () => {
    const result = buildPiece(defaultSpec('chest'));
    for (const p of result.parts) {
      const views = partViews(p, 'in');
      for (const v of [views.face, views.edge, views.end]) {
        const placed = layoutView(v, 4, '1:4');
        const labels = placed.primitives.filter((q) => q.type === 'label' && q.font === 'mono').map(primitiveRect);
        for (let i = 0; i < labels.length; i++) {
          for (let j = i + 1; j < labels.length; j++) {
            expect(rectsOverlap(labels[i]!, labels[j]!), `${p.id} ${v.id}: texts ${i} and ${j} overlap`).toBe(false);
          }
        }
      }
    }
  });

  it('slides a dimension text along its line off another dimension\'s extension line', () => {
    // 0–200 overall above a 0–100 cut: the cut's extension line at 100 runs up through the middle
    // of the overall dimension, where its text would sit.
    const view: ModelView = {
      id: 'test', title: 'Test', callouts: [], bounds: { x: 0, y: 0, w: 200, h: 50 },
      primitives: [{ type: 'polygon', points: [[0, 0], [200, 0], [200, 50], [0, 50]], fill: null, kind: 'visible' }],
      dimensions: [
        { a: [0, 50], b: [100, 50], axis: 'h', side: 'above', text: '100', valueMm: 100, tier: 0 },
        { a: [0, 50], b: [200, 50], axis: 'h', side: 'above', text: '200', valueMm: 200, tier: 1 },
      ],
    };
    const placed = layoutView(view, 1, '1:1');
    const text = placed.primitives.find((p) => p.type === 'label' && p.text === '200');
    if (!text) throw new Error('no text');
    const r = primitiveRect(text);
    const station = 100; // paper x of the cut's extension line at 1:1
    expect(r.x > station || r.x + r.w < station, `text from ${r.x} to ${r.x + r.w}`).toBe(true);
  });

  it('puts overall sizes outside the sizes of cuts on the same side', () => {
    const views = partViews(part('front-top-rail'), 'in');
    const placed = layoutView(views.edge, 2, '1:2');
    const bottomOf = (text: string): number => {
      const label = placed.primitives.find((q) => q.type === 'label' && q.text === text);
      if (!label || label.type !== 'label') throw new Error(`no ${text}`);
      return label.at[0];
    };
    // Thickness (overall, right side) lies further right than the tongue sizes on the right side.
    const thickness = bottomOf(lengthText(19, 'in'));
    expect(thickness).toBeGreaterThan(placed.geometry.x + placed.geometry.w);
  });
});
