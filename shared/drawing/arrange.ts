/**
 * Arranging views on a sheet: third-angle groups (top above front, side to the right of front,
 * edge below face) with a gap between frames, scaled to the largest usual scale that fits the
 * sheet's drawing area, then centred in it.
 */
import { layoutView, shiftView } from './dimensionLayout.ts';
import { rectUnion } from './rects.ts';
import { chooseScale, scaleText } from './scale.ts';
import type { ModelView, PlacedView, Rect } from './types.ts';

/** Clear space between the frames of neighbouring views, mm. */
export const VIEW_GAP_MM = 8;

/** Where a view goes relative to the first (anchor) view of a group. */
export interface Arrangement {
  view: ModelView;
  /** `right`: beside the anchor, bottoms of the pieces level; `below`/`above`: under or over it, left ends aligned. */
  place: 'anchor' | 'right' | 'below' | 'above';
  /** Model mm by which this view's own origin sits right of (or above) the anchor's, for alignment. */
  offsetMm?: number;
  /** Its own scale (1:n) when it differs from the group's, e.g. an end view drawn larger; tops then level. */
  scale?: number;
}

/** Lays out `arrangement` at 1:`scale`, anchor at the origin; returns views and their union frame. */
export function arrangeAt(arrangement: readonly Arrangement[], scale: number): { views: PlacedView[]; frame: Rect } {
  const views: PlacedView[] = [];
  let anchor: PlacedView | null = null;
  for (const item of arrangement) {
    const own = item.scale ?? scale;
    let v = layoutView(item.view, own, scaleText(own));
    if (item.place === 'anchor' || anchor === null) {
      anchor = v;
      views.push(v);
      continue;
    }
    const offset = (item.offsetMm ?? 0) / scale;
    const placed = rectUnion(views.map((p) => p.frame));
    if (item.place === 'right') {
      const anchorFrameRight = Math.max(...views.filter((p) => p.geometry.y < anchor!.geometry.y + anchor!.geometry.h).map((p) => p.frame.x + p.frame.w));
      const dy = own === scale ? anchor.geometry.y + anchor.geometry.h - (v.geometry.y + v.geometry.h) - offset : anchor.geometry.y - v.geometry.y;
      v = shiftView(v, anchorFrameRight + VIEW_GAP_MM - v.frame.x, dy);
    } else if (item.place === 'below') {
      v = shiftView(v, anchor.geometry.x + offset - v.geometry.x, placed.y + placed.h + VIEW_GAP_MM - v.frame.y);
    } else {
      v = shiftView(v, anchor.geometry.x + offset - v.geometry.x, placed.y - VIEW_GAP_MM - (v.frame.y + v.frame.h));
    }
    views.push(v);
  }
  return { views, frame: rectUnion(views.map((p) => p.frame)) };
}

/** Moves views so their union frame is centred in `area` (top-aligned when `top`). */
export function centreIn(views: readonly PlacedView[], frame: Rect, area: Rect, top = false): PlacedView[] {
  const dx = area.x + (area.w - frame.w) / 2 - frame.x;
  const dy = top ? area.y - frame.y : area.y + (area.h - frame.h) / 2 - frame.y;
  return views.map((v) => shiftView(v, dx, dy));
}

/**
 * The largest usual scale at which `arrangement` fits `area`, laid out and centred. Falls back
 * to the smallest usual scale.
 */
export function fitArrangement(arrangement: readonly Arrangement[], area: Rect, units: 'in' | 'mm', top = false): PlacedView[] {
  const fits = (s: number): boolean => {
    const { frame } = arrangeAt(arrangement, s);
    return frame.w <= area.w && frame.h <= area.h;
  };
  const scale = chooseScale(units, fits);
  const { views, frame } = arrangeAt(arrangement, scale);
  return centreIn(views, frame, area, top);
}
