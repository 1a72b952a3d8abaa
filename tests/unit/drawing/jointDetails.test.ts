import { describe, expect, it } from 'vitest';
import { jointDetails, markExtent, mergeMarks, type DetailMark } from '../../../shared/drawing/jointDetails.ts';
import { rectsOverlap } from '../../../shared/drawing/rects.ts';
import { lengthText } from '../../../shared/drawing/lengthText.ts';
import { partViews } from '../../../shared/drawing/partViews.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { sampleResult } from './support/sampleResult.ts';

const rail = () => sampleResult().parts.find((p) => p.id === 'front-top-rail')!;

describe('jointDetails', () => {
  it('details a groove and the stub tenons of a rail drawn at 1:4, at 1:1 with their sizes', () => {
    // Groove 6.35 wide × 9.5 deep and tongues 11 long × 6.35 thick: 1.6 mm on paper at 1:4.
    const details = jointDetails(rail(), 'in', { face: 4, edge: 4, end: 4 });
    expect(details.map((d) => d.view.title.replace(/^Detail \d: /, '')).sort()).toEqual(['groove', 'tongue, 2 alike']);
    for (const d of details) expect(d.scale).toBe(1);
    const texts = details.flatMap((d) => d.view.dimensions.map((x) => x.text));
    for (const mm of [6.35, 9.5, 11]) expect(texts).toContain(lengthText(mm, 'in'));
  });

  it('leaves out cuts already 5 mm or more on paper', () => {
    expect(jointDetails(rail(), 'in', { face: 1, edge: 1, end: 1 })).toEqual([]);
  });

  it('marks each detail on the part view it is taken from', () => {
    const details = jointDetails(rail(), 'in', { face: 4, edge: 4, end: 4 });
    const views = partViews(rail(), 'in', undefined, details.map((d) => d.mark));
    for (const d of details) {
      const marked = views[d.mark.view].primitives.some((p) => p.type === 'label' && p.accent && p.text === d.mark.text);
      expect(marked, `mark ${d.mark.text} on the ${d.mark.view} view`).toBe(true);
    }
  });
});

describe('partViews hole lines', () => {
  it('dimensions a shelf-pin line by its first centre and spacing instead of hole by hole', () => {
    const side = buildPiece(defaultSpec('cabinet')).parts.find((p) => p.role === 'case-side')!;
    const holes = side.features.filter((f) => f.type === 'hole');
    expect(holes.length).toBeGreaterThan(10);
    const views = partViews(side, 'in');
    const dims = [views.face, views.edge, views.end].flatMap((v) => v.dimensions);
    expect(dims.some((d) => /^\d+ spaces @ /.test(d.text))).toBe(true);
    expect(dims.length).toBeLessThan(holes.length);
  });
});

describe('mergeMarks', () => {
  const scales = { face: 4, edge: 4, end: 4 };
  const mark = (text: string, x: number, view: DetailMark['view'] = 'end'): DetailMark => ({ view, at: [x, 0], radius: 12, text });

  it('draws marks that would touch at the drawn scale as one circle round both, numbered with both', () => {
    const merged = mergeMarks([mark('1', 0), mark('3', 4), mark('2', 300)], scales);
    expect(merged.map((m) => m.text).sort()).toEqual(['1, 3', '2']);
    const both = merged.find((m) => m.text === '1, 3')!;
    // The circle holds both circles: centre between them, radius reaching past each.
    expect(both.radius).toBeGreaterThanOrEqual(12 + 2);
  });

  it('leaves marks clear of each other, or on different views, alone', () => {
    const marks = [mark('1', 0), mark('2', 0, 'face'), mark('3', 400)];
    expect(mergeMarks(marks, scales)).toEqual(marks);
  });

  it('keeps merging until no two marks on a view touch, labels included', () => {
    // A chain of marks each touching the next.
    const merged = mergeMarks([0, 20, 40, 60].map((x, i) => mark(String(i + 1), x)), scales);
    for (let i = 0; i < merged.length; i++) {
      for (let j = i + 1; j < merged.length; j++) expect(rectsOverlap(markExtent(merged[i]!, 4), markExtent(merged[j]!, 4))).toBe(false);
    }
    expect(merged.flatMap((m) => m.text.split(', ')).sort()).toEqual(['1', '2', '3', '4']);
  });
});
