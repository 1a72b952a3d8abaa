/**
 * Setting feature notes (a hole's size, a slot's width) on paper. A note written over the holes
 * it names hides them, so it goes beside its target, trying nearer places first, and is kept
 * clear of every hole, slot and text; inside the part and clear of its lines when there is room,
 * else outside. A note that has to stand off gets a leader to its target.
 */
import { inflate, rectsOverlap } from './rects.ts';
import { capHeightMm, textWidthMm } from './textMetrics.ts';
import type { Primitive, Pt, Rect } from './types.ts';

/** What is already drawn on the view, as paper rectangles. */
export interface Occupied {
  /** Holes, slots and other outlined features: never covered. */
  features: readonly Rect[];
  texts: readonly Rect[];
  /** Part lines: avoided when there is room. */
  lines: readonly Rect[];
}

/** Size of a feature note, pt. */
export const NOTE_TEXT_PT = 6.5;
/** Distances from the target tried, nearest first, paper mm. */
const STANDOFFS_MM = [1, 2, 3.5, 5, 7, 9, 12, 15, 19, 24, 30];
/** Clear space kept round a note, paper mm. */
const CLEAR_MM = 0.6;
/** A note further than this from its target gets a leader, paper mm. */
const LEADER_FROM_MM = 2.5;

/** A note to set: its text and the paper rectangle of the feature it names. */
export interface PaperNote {
  text: string;
  target: Rect;
}

type Place = (t: Rect, d: number, w: number, h: number) => Rect;

// Right, above, below, left, then the corners: a note reads best level with its feature.
const PLACES: readonly Place[] = [
  (t, d, w, h) => ({ x: t.x + t.w + d, y: t.y + t.h / 2 - h / 2, w, h }),
  (t, d, w, h) => ({ x: t.x, y: t.y - d - h, w, h }),
  (t, d, w, h) => ({ x: t.x, y: t.y + t.h + d, w, h }),
  (t, d, w, h) => ({ x: t.x - d - w, y: t.y + t.h / 2 - h / 2, w, h }),
  (t, d, w, h) => ({ x: t.x + t.w + d, y: t.y - d - h, w, h }),
  (t, d, w, h) => ({ x: t.x + t.w + d, y: t.y + t.h + d, w, h }),
  (t, d, w, h) => ({ x: t.x - d - w, y: t.y - d - h, w, h }),
  (t, d, w, h) => ({ x: t.x - d - w, y: t.y + t.h + d, w, h }),
];

const within = (r: Rect, area: Rect): boolean => r.x >= area.x && r.y >= area.y && r.x + r.w <= area.x + area.w && r.y + r.h <= area.y + area.h;

/** The point of `r` nearest `p`. */
function nearestIn(r: Rect, p: Pt): Pt {
  return [Math.min(Math.max(p[0], r.x), r.x + r.w), Math.min(Math.max(p[1], r.y), r.y + r.h)];
}

/**
 * Labels (and leaders) for `notes` on a view of the part drawn in `geometry`, with what is
 * already `occupied` (paper mm). Holes, slots and texts are never covered; part lines are
 * avoided when a place inside the part allows it.
 */
export function placeNotes(notes: readonly PaperNote[], occupied: Occupied, geometry: Rect): Primitive[] {
  const { features, lines } = occupied;
  const texts = [...occupied.texts];
  const out: Primitive[] = [];
  const h = capHeightMm(NOTE_TEXT_PT);
  for (const note of notes) {
    const w = textWidthMm(note.text, NOTE_TEXT_PT);
    const free = (r: Rect, avoid: readonly Rect[]): boolean => {
      const grown = inflate(r, CLEAR_MM);
      return avoid.every((a) => !rectsOverlap(grown, a));
    };
    const tries: ((r: Rect) => boolean)[] = [
      (r) => within(r, geometry) && free(r, [...features, ...texts, ...lines]),
      (r) => within(r, geometry) && free(r, [...features, ...texts]),
      (r) => free(r, [...features, ...texts]),
    ];
    let spot: { rect: Rect; d: number } | null = null;
    for (const ok of tries) {
      for (const d of STANDOFFS_MM) {
        const rect = PLACES.map((place) => place(note.target, d, w, h)).find(ok);
        if (rect) {
          spot = { rect, d };
          break;
        }
      }
      if (spot) break;
    }
    // Beyond every standoff: under the part, where nothing else is written yet.
    spot ??= { rect: { x: geometry.x, y: geometry.y + geometry.h + STANDOFFS_MM[0]!, w, h }, d: Infinity };
    const { rect } = spot;
    out.push({ type: 'label', at: [rect.x, rect.y + h], text: note.text, sizePt: NOTE_TEXT_PT, anchor: 'start', font: 'mono' });
    texts.push(rect);
    if (spot.d > LEADER_FROM_MM) {
      const centre = (r: Rect): Pt => [r.x + r.w / 2, r.y + r.h / 2];
      const from = nearestIn(note.target, centre(rect));
      const to = nearestIn(inflate(rect, 0.4), centre(note.target));
      out.push({ type: 'segment', a: from, b: to, kind: 'thin' }, { type: 'arrow', tip: from, from: to });
    }
  }
  return out;
}
