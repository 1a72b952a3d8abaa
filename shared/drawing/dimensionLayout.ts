/**
 * Places a model view on paper at a scale and lays out its dimensions so none collide. Rules:
 * dimensions stand outside the drawing in rows on the side they ask for; a row holds
 * dimensions whose lines and texts do not overlap (with a gap); lower tiers (feature sizes) take
 * the rows nearest the drawing and every higher tier starts beyond them, so overall sizes are
 * outermost; a text that does not fit between its extension lines goes beside the line, right
 * or above first, else left or below, and slides further out along its row (the dimension line
 * drawn on to it) rather than sit across another dimension's extension line.
 */
import { placeNotes } from './notePlacement.ts';
import { inflate, rectsOverlap, rectUnion } from './rects.ts';
import { capHeightMm, DIM_TEXT_PT, textWidthMm, VIEW_TITLE_PT } from './textMetrics.ts';
import type { DimensionRequest, Label, ModelView, PlacedView, Primitive, Pt, Rect } from './types.ts';

/** Gap between the drawing and the first row of dimensions, mm. */
export const FIRST_ROW_MM = 7;
/** Distance between rows of dimensions, mm. */
export const ROW_PITCH_MM = 6.5;
/** Arrowhead length, mm. */
export const ARROW_MM = 2.2;
/** Gap between a part and the start of an extension line, mm. */
const EXT_GAP_MM = 1;
/** How far an extension line runs past its dimension line, mm. */
const EXT_OVERRUN_MM = 1.5;
/** Clear space kept between neighbours in a row, mm. */
const ROW_GAP_MM = 2;
/** Gap between a dimension line and its text, mm. */
const TEXT_GAP_MM = 0.9;
/** Space below the lowest dimension for the view's title, mm. */
const TITLE_GAP_MM = 6;
/** Dimensions smaller than this (mm of the piece) are not drawn. */
const MIN_DIM_MM = 0.05;

type Side = DimensionRequest['side'];

interface PlacedDim {
  primitives: Primitive[];
  /** Occupied interval along the row. */
  lo: number;
  hi: number;
}

/** Rounds paper coordinates to 0.01 mm so output is stable and compact. */
const r2 = (n: number): number => Math.round(n * 100) / 100;
const pt = (x: number, y: number): Pt => [r2(x), r2(y)];

function seg(a: Pt, b: Pt): Primitive {
  return { type: 'segment', a, b, kind: 'thin' };
}

/**
 * Draws one dimension on a row at `rowAt` (paper y for horizontal, x for vertical). `p0`, `p1`
 * are the measured points on paper with p0 ≤ p1 along the axis. `textPlace` picks where the
 * text goes; a text beside the line moves `slide` mm further out, the line drawn on to it.
 * Returns the primitives and the interval they take along the row.
 */
function drawDimension(req: DimensionRequest, p0: Pt, p1: Pt, side: Side, rowAt: number, textPlace: 'inside' | 'after' | 'before', insideCentre?: number, slide = 0): PlacedDim {
  const horizontal = req.axis === 'h';
  const lo = horizontal ? p0[0] : p0[1];
  const hi = horizontal ? p1[0] : p1[1];
  const span = hi - lo;
  const textW = textWidthMm(req.text, DIM_TEXT_PT);
  const out: Primitive[] = [];
  // Which way is "away from the drawing" for this side, on the axis across the row.
  const away = side === 'below' || side === 'right' ? 1 : -1;

  // Extension lines from each measured point out past the dimension line.
  for (const p of [p0, p1]) {
    const from = horizontal ? p[1] : p[0];
    const start = from + away * EXT_GAP_MM;
    const end = rowAt + away * EXT_OVERRUN_MM;
    if ((end - start) * away > 0) out.push(horizontal ? seg(pt(p[0], start), pt(p[0], end)) : seg(pt(start, p[1]), pt(end, p[1])));
  }
  const at = (along: number): Pt => (horizontal ? pt(along, rowAt) : pt(rowAt, along));

  const arrowsInside = span >= 2 * ARROW_MM + 0.6;
  if (arrowsInside) {
    out.push(seg(at(lo), at(hi)));
    out.push({ type: 'arrow', tip: at(lo), from: at(lo + ARROW_MM) }, { type: 'arrow', tip: at(hi), from: at(hi - ARROW_MM) });
  } else {
    out.push(seg(at(lo - ARROW_MM - 2), at(hi + ARROW_MM + 2)));
    out.push({ type: 'arrow', tip: at(lo), from: at(lo - ARROW_MM) }, { type: 'arrow', tip: at(hi), from: at(hi + ARROW_MM) });
  }

  let textLo: number;
  const centreInside = insideCentre ?? (lo + hi) / 2;
  if (textPlace === 'inside') textLo = centreInside - textW / 2;
  else if (textPlace === 'after') textLo = hi + (arrowsInside ? 1.2 : ARROW_MM + 2.8) + slide;
  else textLo = lo - (arrowsInside ? 1.2 : ARROW_MM + 2.8) - textW - slide;
  const vCentre = textPlace === 'inside' ? centreInside : verticalTextCentre(lo, hi, textW, textPlace, arrowsInside) + (textPlace === 'after' ? -slide : slide);
  if (slide > 0 && textPlace !== 'inside') {
    // The line runs on to the slid text, so it still reads as this dimension's.
    const lineEnd = { lo: arrowsInside ? lo : lo - ARROW_MM - 2, hi: arrowsInside ? hi : hi + ARROW_MM + 2 };
    const [textA, textB] = horizontal ? [textLo, textLo + textW] : [vCentre - textW / 2, vCentre + textW / 2];
    const towardHigh = horizontal ? textPlace === 'after' : textPlace === 'before';
    out.push(towardHigh ? seg(at(lineEnd.hi), at(textA - 0.5)) : seg(at(textB + 0.5), at(lineEnd.lo)));
  }

  // Text sits on the far side of the line from the drawing for horizontal rows below, and on the
  // near side otherwise, so it reads upright and never crosses the line.
  const label: Label = horizontal
    ? { type: 'label', at: pt(textLo + textW / 2, rowAt - TEXT_GAP_MM), text: req.text, sizePt: DIM_TEXT_PT, anchor: 'middle', font: 'mono' }
    : // Vertical: text turned to read from the bottom, centred along the row; y runs down, so "after" is toward smaller y.
      { type: 'label', at: pt(rowAt - TEXT_GAP_MM, vCentre), text: req.text, sizePt: DIM_TEXT_PT, anchor: 'middle', font: 'mono', rotate: 90 };
  out.push(label);

  const lineLo = arrowsInside ? lo : lo - ARROW_MM - 2;
  const lineHi = arrowsInside ? hi : hi + ARROW_MM + 2;
  if (horizontal) return { primitives: out, lo: Math.min(lineLo, textLo), hi: Math.max(lineHi, textLo + textW) };
  return { primitives: out, lo: Math.min(lineLo, vCentre - textW / 2), hi: Math.max(lineHi, vCentre + textW / 2) };
}

function verticalTextCentre(lo: number, hi: number, textW: number, place: 'inside' | 'after' | 'before', arrowsInside: boolean): number {
  const pad = arrowsInside ? 1.2 : ARROW_MM + 2.8;
  if (place === 'inside') return (lo + hi) / 2;
  // On paper y grows downward: "after" puts the text above the upper end (smaller y).
  if (place === 'after') return lo - pad - textW / 2;
  return hi + pad + textW / 2;
}

/** Stations closer than this to a dimension's own ends are its own extension lines, mm. */
const STATION_SAME_MM = 0.05;
/** Clear space kept between a dimension text and another dimension's extension line, mm. */
const STATION_CLEAR_MM = 0.8;

/**
 * Where along [`lo`, `hi`] to centre a text `textW` wide so no station (another dimension's
 * extension line) runs through it: the middle if it is clear, else the nearest clear centre
 * that keeps the text between the arrowheads; the middle when none is.
 */
function clearCentre(lo: number, hi: number, textW: number, stations: readonly number[]): number {
  const mid = (lo + hi) / 2;
  const clear = (c: number): boolean => stations.every((x) => x < c - textW / 2 - STATION_CLEAR_MM || x > c + textW / 2 + STATION_CLEAR_MM);
  if (clear(mid)) return mid;
  const min = lo + ARROW_MM + 0.5 + textW / 2;
  const max = hi - ARROW_MM - 0.5 - textW / 2;
  for (let step = 0.5; mid - step >= min || mid + step <= max; step += 0.5) {
    if (mid + step <= max && clear(mid + step)) return mid + step;
    if (mid - step >= min && clear(mid - step)) return mid - step;
  }
  return mid;
}

/** Rows tried for a text clear of other dimensions' extension lines before one across them is accepted. */
const STATION_ROWS_TRIED = 3;

/** True when the candidate's text runs across none of `stations` (paper mm along its row). */
function textClearOf(c: PlacedDim, stations: readonly number[]): boolean {
  const label = c.primitives.find((p) => p.type === 'label');
  if (!label) return true;
  const r = primitiveRect(label);
  const [a, b] = label.type === 'label' && label.rotate === 90 ? [r.y, r.y + r.h] : [r.x, r.x + r.w];
  return stations.every((x) => x <= a - STATION_CLEAR_MM || x >= b + STATION_CLEAR_MM);
}

/** Furthest a text beside its line slides out along its row to clear extension lines, mm. */
const SLIDE_MAX_MM = 30;

/**
 * How far the text of `c` (set beside its line at `place`) must slide outward along its row to
 * cross none of `stations`: 0 when it crosses none, null when no slide up to {@link SLIDE_MAX_MM} will do.
 */
function slideClear(c: PlacedDim, horizontal: boolean, place: 'after' | 'before', stations: readonly number[]): number | null {
  const label = c.primitives.find((p) => p.type === 'label');
  if (!label) return 0;
  const r = primitiveRect(label);
  const [a, b] = horizontal ? [r.x, r.x + r.w] : [r.y, r.y + r.h];
  // Outward: along +x after the line (horizontal), along −y after it (vertical: "after" is above).
  const dir = horizontal === (place === 'after') ? 1 : -1;
  for (let slide = 0; slide <= SLIDE_MAX_MM; slide += 0.25) {
    const [lo, hi] = [a + dir * slide, b + dir * slide];
    if (stations.every((x) => x <= lo - STATION_CLEAR_MM || x >= hi + STATION_CLEAR_MM)) return slide;
  }
  return null;
}

interface Row {
  intervals: [number, number][];
}

function fits(row: Row | undefined, lo: number, hi: number): boolean {
  return !row || row.intervals.every(([a, b]) => hi + ROW_GAP_MM <= a || lo >= b + ROW_GAP_MM);
}

/**
 * Lays out `model` at scale 1:`scale`, with the drawing's top-left corner at paper (0, 0).
 * Returns the placed view; move it with {@link translateView}.
 */
export function layoutView(model: ModelView, scale: number, scaleLabel: string): PlacedView {
  const b = model.bounds;
  const toPaper = (p: Pt): Pt => pt((p[0] - b.x) / scale, (b.y + b.h - p[1]) / scale);
  const geometry: Rect = { x: 0, y: 0, w: b.w / scale, h: b.h / scale };
  const primitives: Primitive[] = model.primitives.map((p) => mapPrimitive(p, toPaper, scale));

  const rows: Record<Side, Row[]> = { below: [], above: [], left: [], right: [] };
  const tierStart: Record<Side, number> = { below: 0, above: 0, left: 0, right: 0 };
  const texts: { text: string; key?: string }[] = [];
  // Every text placed so far, so a text beside one row never lands on a text of another side.
  const textRects: Rect[] = primitives.filter((p) => p.type === 'label').map(primitiveRect);
  const textFree = (c: PlacedDim): boolean => {
    const label = c.primitives.find((p) => p.type === 'label');
    if (!label) return true;
    const r = inflate(primitiveRect(label), 0.7);
    return textRects.every((t) => !rectsOverlap(r, t));
  };
  // Where every dimension on a side has its extension lines: a text set across one of them, the
  // line of a dimension further out would strike through it, so inside texts slide clear.
  const stationsOn: Record<Side, number[]> = { below: [], above: [], left: [], right: [] };
  for (const d of model.dimensions) {
    for (const q of [toPaper(d.a), toPaper(d.b)]) stationsOn[d.side].push(d.axis === 'h' ? q[0] : q[1]);
  }
  const byTier = [...model.dimensions].filter((d) => Math.abs(d.valueMm) >= MIN_DIM_MM).sort((x, y) => x.tier - y.tier || x.valueMm - y.valueMm);

  let currentTier = byTier[0]?.tier ?? 0;
  for (const req of byTier) {
    if (req.tier !== currentTier) {
      for (const side of Object.keys(rows) as Side[]) tierStart[side] = rows[side].length;
      currentTier = req.tier;
    }
    const side = req.side;
    const pa = toPaper(req.a);
    const pb = toPaper(req.b);
    const horizontal = req.axis === 'h';
    const [p0, p1] = (horizontal ? pa[0] <= pb[0] : pa[1] <= pb[1]) ? [pa, pb] : [pb, pa];
    const span = horizontal ? p1[0] - p0[0] : p1[1] - p0[1];
    const textW = textWidthMm(req.text, DIM_TEXT_PT);
    const places: ('inside' | 'after' | 'before')[] = span >= textW + 2 * ARROW_MM + 1.5 ? ['inside'] : ['after', 'before'];
    const lo = horizontal ? p0[0] : p0[1];
    const hi = horizontal ? p1[0] : p1[1];
    const foreign = stationsOn[side].filter((x) => Math.abs(x - lo) > STATION_SAME_MM && Math.abs(x - hi) > STATION_SAME_MM);
    const insideCentre = clearCentre(lo, hi, textW, foreign);

    let placed: PlacedDim | null = null;
    for (let r = tierStart[side]; placed === null; r++) {
      const rowAt = rowPosition(geometry, side, r);
      // Beside the line where it is clear of other extension lines; else slid out along the row
      // past them (after, then before).
      const candidates = places.map((place) => drawDimension(req, p0, p1, side, rowAt, place, place === 'inside' ? insideCentre : undefined));
      for (const place of places) {
        if (place === 'inside') continue;
        const slide = slideClear(drawDimension(req, p0, p1, side, rowAt, place), horizontal, place, foreign);
        if (slide) candidates.push(drawDimension(req, p0, p1, side, rowAt, place, undefined, slide));
      }
      const inside = places[0] === 'inside';
      for (const candidate of candidates) {
        // A text set beside its line must not sit across another's extension line either; after a
        // few rows that cannot be helped, the first free place is taken.
        const across = inside || r - tierStart[side] >= STATION_ROWS_TRIED || textClearOf(candidate, foreign);
        if (fits(rows[side][r], candidate.lo, candidate.hi) && textFree(candidate) && across) {
          placed = candidate;
          const label = candidate.primitives.find((p) => p.type === 'label');
          if (label) textRects.push(primitiveRect(label));
          rows[side][r] ??= { intervals: [] };
          rows[side][r]!.intervals.push([candidate.lo, candidate.hi]);
          break;
        }
      }
    }
    primitives.push(...placed.primitives);
    texts.push(req.key ? { text: req.text, key: req.key } : { text: req.text });
  }

  // Notes last, so they keep clear of the dimensions' lines and texts as well as the features.
  if (model.notes?.length) {
    const corners = (r: Rect): Rect => {
      const [x0, y1] = toPaper([r.x, r.y]);
      const [x1, y0] = toPaper([r.x + r.w, r.y + r.h]);
      return { x: x0, y: y0, w: x1 - x0, h: y1 - y0 };
    };
    const rectsOf = (keep: (p: Primitive) => boolean) => primitives.filter(keep).map(primitiveRect);
    primitives.push(...placeNotes(
      model.notes.map((n) => ({ text: n.text, target: corners(n.target) })),
      {
        features: rectsOf((p) => p.type === 'circle' || p.type === 'polygon'),
        texts: rectsOf((p) => p.type === 'label'),
        lines: rectsOf((p) => p.type === 'segment' && (p.kind === 'visible' || p.kind === 'hidden')),
        thinLines: rectsOf((p) => p.type === 'arrow' || (p.type === 'segment' && p.kind !== 'visible' && p.kind !== 'hidden')),
      },
      geometry,
    ));
  }
  const extent = rectUnion([geometry, ...primitives.map(primitiveRect)]);
  const titleY = extent.y + extent.h + TITLE_GAP_MM;
  const title = `${model.title.toUpperCase()}   ${scaleLabel}`;
  primitives.push({ type: 'label', at: pt(geometry.w / 2, titleY), text: title, sizePt: VIEW_TITLE_PT, anchor: 'middle', font: 'sans', bold: true });
  for (const c of model.callouts) primitives.push(...calloutPrimitives(toPaper(c.at), c.text, geometry));
  const frame = inflate(rectUnion([extent, ...primitives.map(primitiveRect)]), 1);
  return { id: model.id, title: model.title, scale, scaleText: scaleLabel, primitives, frame, geometry, dimensionTexts: texts };
}

function rowPosition(g: Rect, side: Side, row: number): number {
  const d = FIRST_ROW_MM + row * ROW_PITCH_MM;
  switch (side) {
    case 'below': return g.y + g.h + d;
    case 'above': return g.y - d;
    case 'left': return g.x - d;
    case 'right': return g.x + g.w + d;
  }
}

/** A part label for the exploded view: a short leader from the part to its letter in a circle. */
function calloutPrimitives(at: Pt, text: string, g: Rect): Primitive[] {
  const cx = g.x + g.w / 2;
  const cy = g.y + g.h / 2;
  const dx = at[0] - cx;
  const dy = at[1] - cy;
  const len = Math.hypot(dx, dy) || 1;
  const end = pt(at[0] + (dx / len) * 9, at[1] + (dy / len) * 9);
  const radius = Math.max(2.6, textWidthMm(text, 8) / 2 + 0.9);
  const centre = pt(end[0] + (dx / len) * radius, end[1] + (dy / len) * radius);
  return [
    { type: 'circle', centre: at, radius: 0.5, kind: 'accent' },
    { type: 'segment', a: at, b: end, kind: 'thin' },
    { type: 'circle', centre, radius, kind: 'thin' },
    { type: 'label', at: pt(centre[0], centre[1] + capHeightMm(8) / 2), text, sizePt: 8, anchor: 'middle', font: 'mono', bold: true },
  ];
}

function mapPrimitive(p: Primitive, toPaper: (p: Pt) => Pt, scale: number): Primitive {
  switch (p.type) {
    case 'segment': return { ...p, a: toPaper(p.a), b: toPaper(p.b) };
    case 'polygon': return { ...p, points: p.points.map(toPaper) };
    case 'circle': return { ...p, centre: toPaper(p.centre), radius: p.radius / scale };
    case 'arrow': return { ...p, tip: toPaper(p.tip), from: toPaper(p.from) };
    case 'label': return { ...p, at: toPaper(p.at) };
  }
}

/** The paper rectangle a primitive covers (texts estimated from their monospaced width). */
export function primitiveRect(p: Primitive): Rect {
  switch (p.type) {
    case 'segment': return rectUnion([{ x: p.a[0], y: p.a[1], w: 0, h: 0 }, { x: p.b[0], y: p.b[1], w: 0, h: 0 }]);
    case 'polygon': return rectUnion(p.points.map(([x, y]) => ({ x, y, w: 0, h: 0 })));
    case 'circle': return { x: p.centre[0] - p.radius, y: p.centre[1] - p.radius, w: 2 * p.radius, h: 2 * p.radius };
    case 'arrow': return rectUnion([{ x: p.tip[0], y: p.tip[1], w: 0, h: 0 }, { x: p.from[0], y: p.from[1], w: 0, h: 0 }]);
    case 'label': {
      const w = textWidthMm(p.text, p.sizePt);
      const h = capHeightMm(p.sizePt);
      const shift = p.anchor === 'middle' ? w / 2 : p.anchor === 'end' ? w : 0;
      return p.rotate === 90 ? { x: p.at[0] - h, y: p.at[1] - w + shift, w: h, h: w } : { x: p.at[0] - shift, y: p.at[1] - h, w, h };
    }
  }
}

function movePrimitive(p: Primitive, dx: number, dy: number): Primitive {
  const m = (q: Pt): Pt => pt(q[0] + dx, q[1] + dy);
  switch (p.type) {
    case 'segment': return { ...p, a: m(p.a), b: m(p.b) };
    case 'polygon': return { ...p, points: p.points.map(m) };
    case 'circle': return { ...p, centre: m(p.centre) };
    case 'arrow': return { ...p, tip: m(p.tip), from: m(p.from) };
    case 'label': return { ...p, at: m(p.at) };
  }
}

/** Moves a placed view by (`dx`, `dy`) paper mm. */
export function shiftView(view: PlacedView, dx: number, dy: number): PlacedView {
  return {
    ...view,
    primitives: view.primitives.map((p) => movePrimitive(p, dx, dy)),
    frame: { ...view.frame, x: view.frame.x + dx, y: view.frame.y + dy },
    geometry: { ...view.geometry, x: view.geometry.x + dx, y: view.geometry.y + dy },
  };
}

/** Moves a placed view so its frame's top-left corner lands at paper (`x`, `y`). */
export function translateView(view: PlacedView, x: number, y: number): PlacedView {
  return shiftView(view, x - view.frame.x, y - view.frame.y);
}
