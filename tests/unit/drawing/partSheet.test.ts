import { describe, expect, it } from 'vitest';
import { primitiveRect } from '../../../shared/drawing/dimensionLayout.ts';
import { lengthText } from '../../../shared/drawing/lengthText.ts';
import { partLetters } from '../../../shared/drawing/partLetters.ts';
import { cutRows, partSheet } from '../../../shared/drawing/partSheet.ts';
import { rectsOverlap, rectUnion } from '../../../shared/drawing/rects.ts';
import { DIM_TEXT_PT } from '../../../shared/drawing/textMetrics.ts';
import type { Primitive, Rect, Sheet } from '../../../shared/drawing/types.ts';
import type { Part } from '../../../shared/engine/types.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import { definingSizes, writes } from './support/definingSizes.ts';

const KINDS = ['chest', 'dresser', 'cabinet'] as const;

/** Every part sheet of the default piece of `kind`, inch drawings on Letter landscape. */
function sheetsOf(kind: (typeof KINDS)[number]): { partId: string; part: Part; sheet: Omit<Sheet, 'number'> }[] {
  const result = buildPiece(defaultSpec(kind));
  const letters = partLetters(result);
  return result.parts.map((p) => ({ partId: p.id, part: p, sheet: partSheet(p, letters.get(p.id)!, { size: 'letter', orientation: 'landscape' }, 'in') }));
}
const built = Object.fromEntries(KINDS.map((k) => [k, sheetsOf(k)])) as Record<(typeof KINDS)[number], ReturnType<typeof sheetsOf>>;

/** A detail mark as drawn: its pencil-red circle and, next in order, its number. */
function markBoxes(primitives: readonly Primitive[]): { text: string; box: Rect }[] {
  const out: { text: string; box: Rect }[] = [];
  primitives.forEach((p, i) => {
    const label = primitives[i + 1];
    if (p.type === 'circle' && p.kind === 'accent' && label?.type === 'label' && label.accent) {
      out.push({ text: label.text, box: rectUnion([primitiveRect(p), primitiveRect(label)]) });
    }
  });
  return out;
}

/** How far a line must run into a text's box to count as crossing it, mm: touching its edge is not. */
const CROSS_MM = 0.15;

describe('partSheet', () => {
  it.each(KINDS)('lets no extension line (or any thin line) run through a dimension text on the default %s', (kind) => {
    let texts = 0;
    for (const { partId, sheet } of built[kind]) {
      for (const view of sheet.views) {
        const lines = view.primitives.filter((p) => p.type === 'segment' && p.kind === 'thin').map(primitiveRect);
        for (const label of view.primitives) {
          if (label.type !== 'label' || label.font !== 'mono' || label.sizePt !== DIM_TEXT_PT) continue;
          texts++;
          const box = primitiveRect(label);
          const inner = { x: box.x + CROSS_MM, y: box.y + CROSS_MM, w: box.w - 2 * CROSS_MM, h: box.h - 2 * CROSS_MM };
          const crossing = lines.filter((l) => l.x < inner.x + inner.w && l.x + l.w > inner.x && l.y < inner.y + inner.h && l.y + l.h > inner.y);
          expect(crossing, `${partId} ${view.id}: "${label.text}" crossed`).toEqual([]);
        }
      }
    }
    expect(texts).toBeGreaterThan(0);
  });

  it.each(KINDS)('keeps every detail mark and its number clear of every other on the default %s', (kind) => {
    let marks = 0;
    for (const { partId, sheet } of built[kind]) {
      const boxes = sheet.views.flatMap((v) => markBoxes(v.primitives));
      marks += boxes.length;
      for (let i = 0; i < boxes.length; i++) {
        for (let j = i + 1; j < boxes.length; j++) {
          expect(rectsOverlap(boxes[i]!.box, boxes[j]!.box), `${partId}: marks ${boxes[i]!.text} and ${boxes[j]!.text} touch`).toBe(false);
        }
      }
    }
    expect(marks).toBeGreaterThan(0);
  });

  it.each(KINDS)('sets the size notes of holes and slots clear of every hole and slot on the default %s', (kind) => {
    let notes = 0;
    for (const { partId, sheet } of built[kind]) {
      for (const view of sheet.views) {
        const features = view.primitives.filter((p) => (p.type === 'circle' && p.kind !== 'accent' && p.radius > 0.5) || (p.type === 'polygon' && p.fill === null)).map(primitiveRect);
        const labels = view.primitives.filter((p) => p.type === 'label' && / dia\. × |^(\d+× )?slot /.test(p.text));
        notes += labels.length;
        for (const label of labels) {
          const box = primitiveRect(label);
          for (const f of features) expect(rectsOverlap(box, f), `${partId} ${view.id}: "${label.type === 'label' ? label.text : ''}" on a hole`).toBe(false);
        }
      }
    }
    if (kind !== 'dresser') expect(notes).toBeGreaterThan(0);
  });

  it.each(KINDS)('writes every defining size of every part on its views of the default %s', (kind) => {
    const missing: string[] = [];
    for (const { part, sheet } of built[kind]) {
      // The drawing alone: dimensions and notes on the views, not the cut table.
      const drawn = sheet.views.flatMap((v) => v.primitives.flatMap((p) => (p.type === 'label' ? [p.text] : []))).join('\n');
      for (const need of definingSizes(part, 'in')) {
        if (!need.texts.some((t) => writes(drawn, t))) missing.push(`${part.name}: ${need.what} (${need.texts.join(' or ')})`);
      }
    }
    expect(missing).toEqual([]);
  });

  it('draws a rabbet and the tongue it leaves as one detail with the sizes of both', () => {
    const panel = built.chest.find((s) => s.part.features.some((f) => f.type === 'rabbet') && s.part.features.some((f) => f.type === 'tongue'))!;
    const detail = panel.sheet.views.find((v) => /^Detail \d+: rabbet and tongue/.test(v.title));
    expect(detail, panel.sheet.views.map((v) => v.title).join(', ')).toBeDefined();
    const texts = detail!.primitives.flatMap((p) => (p.type === 'label' ? [p.text] : []));
    const rabbet = panel.part.features.find((f) => f.type === 'rabbet')!;
    const tongue = panel.part.features.find((f) => f.type === 'tongue')!;
    if (rabbet.type !== 'rabbet' || tongue.type !== 'tongue') throw new Error('feature kinds');
    expect(texts).toEqual(expect.arrayContaining([lengthText(rabbet.depthMm, 'in'), lengthText(tongue.thicknessMm, 'in')]));
  });
});

describe('cutRows', () => {
  it('writes a rabbet and the tongue it leaves as one row, and like cuts on both long edges as one row', () => {
    const panel = built.chest.find((b) => b.part.name === 'Front/back panel')!.part;
    const rabbets = panel.features.filter((f) => f.type === 'rabbet');
    const rows = cutRows(panel, 'in');
    expect(rabbets.length).toBe(4);
    expect(rows.every((r) => r[0] === 'Rabbet and tongue')).toBe(true);
    expect(rows.map((r) => r[1])).toEqual(['edges A and B', 'end A', 'end B']);
    for (const r of rabbets) {
      const tongue = panel.features.find((f) => f.type === 'tongue' && f.face === r.face);
      if (tongue?.type !== 'tongue' || r.type !== 'rabbet') throw new Error(`no tongue on ${r.face}`);
      const row = rows.find((x) => x[1]!.includes(r.face.split('-')[1]!.toUpperCase()) && x[1]!.startsWith(r.face.split('-')[0]!))!;
      expect(row[2]).toContain(`rabbet ${lengthText(r.widthMm, 'in')} wide × ${lengthText(r.depthMm, 'in')} deep`);
      expect(row[2]).toContain(`leaving a tongue ${lengthText(tongue.lengthMm, 'in')} long × ${lengthText(tongue.thicknessMm, 'in')} thick`);
    }
  });
});
