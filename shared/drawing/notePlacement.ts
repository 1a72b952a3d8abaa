/**
 * Setting feature notes (a hole's size, a slot's width) on paper. A note written over the holes
 * it names hides them, so it goes beside its target, trying nearer places first, and is kept
 * clear of every hole, slot and text: clear of every line too, inside the part when there is
 * room there, else outside it; only failing both does it cross a line. A note that has to stand
 * off gets a leader to its target.
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
  /** Centre, break and other thin lines: avoided before part lines are given up on. */
  thinLines: readonly Rect[];
}

/** Size of a feature note, pt. */
export const NOTE_TEXT_PT = 6.5;
/** Distances from the target tried, nearest first, paper mm. */
const STANDOFFS_MM = [1, 2, 3.5, 5, 7, 9, 12, 15, 19, 24, 30, 38, 48];
/** Clear space kept round a note, paper mm. */
const CLEAR_MM = 0.6;
/** Length of a leader's arrowhead, paper mm. */
const LEADER_ARROW_MM = 1.8;
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

const withinAcross = (r: Rect, area: Rect): boolean => r.x >= area.x && r.x + r.w <= area.x + area.w;

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
  const { features, lines, thinLines } = occupied;
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
      (r) => within(r, geometry) && free(r, [...features, ...texts, ...lines, ...thinLines]),
      // Outside, above or below the part first: a note beside a long part would widen the view.
      (r) => withinAcross(r, geometry) && free(r, [...features, ...texts, ...lines, ...thinLines]),
      (r) => free(r, [...features, ...texts, ...lines, ...thinLines]),
      (r) => within(r, geometry) && free(r, [...features, ...texts, ...thinLines]),
      (r) => free(r, [...features, ...texts, ...thinLines]),
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
      const t = note.target;
      const round = Math.abs(t.w - t.h) < 0.01;
      const [cx, cy] = centre(t);
      const [tx, ty] = centre(rect);
      const d = Math.hypot(tx - cx, ty - cy) || 1;
      // A leader ends on a hole's circle, else on the feature's outline.
      const from: Pt = round ? [cx + ((tx - cx) / d) * (t.w / 2), cy + ((ty - cy) / d) * (t.w / 2)] : nearestIn(t, [tx, ty]);
      const to = nearestIn(inflate(rect, 1), from);
      const len = Math.hypot(to[0] - from[0], to[1] - from[1]) || 1;
      const back: Pt = [from[0] + ((to[0] - from[0]) / len) * LEADER_ARROW_MM, from[1] + ((to[1] - from[1]) / len) * LEADER_ARROW_MM];
      out.push({ type: 'segment', a: from, b: to, kind: 'thin' }, { type: 'arrow', tip: from, from: back });
    }
  }
  return out;
}
