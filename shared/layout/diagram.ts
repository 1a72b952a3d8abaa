/**
 * Cutting diagrams as plain shapes, mm on the stock (x along its length, y across it), for any
 * renderer (the Materials page's SVG, the plan set's PDF): parts with their label size and
 * direction fitted to the part, saw cuts numbered in the order the saw makes them with their
 * kerf drawn as a band, the trimmed edge, knots and checks to cut around, and brackets over
 * grain-matched runs. Sizes stay numbers; the renderer writes them in the maker's units.
 */
import type { BoardPlan, PlacedBoardPart } from './boardTypes.ts';
import type { SheetPlan } from './sheetTypes.ts';

/** An axis-aligned box on the stock, mm. */
export interface DiagramBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** One part on the diagram with its label. */
export interface DiagramPart extends DiagramBox {
  partId: string;
  name: string;
  instance: number;
  /** The part's own length and width (finished on sheets, rough on boards), mm. */
  lengthMm: number;
  widthMm: number;
  /** 1-based number on this diagram, shown instead of the name when the name does not fit. */
  tag: number;
  /** Text height that fits two label lines (name, size) inside the box, mm; 0 when only the tag fits. */
  labelMm: number;
  /** True when the label reads along y (tall, narrow parts). */
  vertical: boolean;
  /** 2: name above size; 1: `name · size` on one line. */
  lines: 1 | 2;
  matchGroup: string | null;
  /** 1-based place in its grain-matched run, drawn beside the tag; null when not in a run. */
  matchOrder: number | null;
}

/** One saw cut: its line, its kerf band and its place in the cutting order (from 1). */
export interface DiagramCut {
  order: number;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  kerf: DiagramBox;
}

/** A sheet's diagram. */
export interface SheetDiagram {
  lengthMm: number;
  widthMm: number;
  /** The sheet inside its trimmed edges. */
  usable: DiagramBox;
  parts: DiagramPart[];
  cuts: DiagramCut[];
}

/**
 * A grain-matched run on one board, drawn as a bracket along the board's far edge from the run's
 * first part to its last, with its note beside it.
 */
export interface DiagramMatchRun {
  group: string;
  /** E.g. `grain-matched: drawer fronts, column 1 (1–4)`. */
  text: string;
  /** The bracket's ends along the board, mm. */
  fromMm: number;
  toMm: number;
  /** Text height that fits the note along the bracket (at most {@link MAX_LABEL_MM}); 0 when the bracket is too short. */
  labelMm: number;
  /** True when the run could not come whole from one board and this board holds only some of it. */
  partial: boolean;
}

/** A board's diagram: crosscuts into lengths first, then rips (not numbered: one per part edge). */
export interface BoardDiagram {
  lengthMm: number;
  widthMm: number;
  parts: DiagramPart[];
  crosscuts: DiagramCut[];
  defects: (DiagramBox & { note: string })[];
  /** Grain-matched runs on the board, in the order of their first part along it. */
  matchRuns: DiagramMatchRun[];
}

// Mono glyphs are about 0.6 of their height wide; a size line such as `30 15/16" × 12 1/2"`
// has up to about 22 characters; two lines with their spacing take 2.6 text heights, one line 1.4.
const GLYPH_WIDTH = 0.62;
const SIZE_CHARS = 22;
/** Largest label, mm, so a big panel's label does not shout. */
export const MAX_LABEL_MM = 60;
/**
 * Smallest label, as a fraction of the stock's length: all stock of a layout is drawn at one
 * scale, so below this the text is too small to read and the part shows its tag instead.
 */
export const MIN_LABEL_OF_LENGTH = 1 / 110;

/** How a part's label fits its box: text height (0 when only the tag fits), direction and line count. */
export interface LabelFit {
  labelMm: number;
  vertical: boolean;
  /** 2: name above size; 1: `name · size` on one line, for long narrow parts. */
  lines: 1 | 2;
}

/** The largest label of `name` and a size line that fits `box`, no smaller than `minMm`. */
export function fitLabel(box: DiagramBox, name: string, minMm: number): LabelFit {
  const options: LabelFit[] = [];
  for (const vertical of [false, true]) {
    const along = vertical ? box.h : box.w;
    const thick = vertical ? box.w : box.h;
    options.push({ labelMm: Math.min(thick / 2.6, along / (Math.max(name.length, SIZE_CHARS) * GLYPH_WIDTH), MAX_LABEL_MM), vertical, lines: 2 });
    options.push({ labelMm: Math.min(thick / 1.4, along / ((name.length + 3 + SIZE_CHARS) * GLYPH_WIDTH), MAX_LABEL_MM), vertical, lines: 1 });
  }
  // Upright text only when it is clearly larger; two lines unless one line is clearly larger.
  const score = (f: LabelFit) => f.labelMm * (f.vertical ? 0.8 : 1) * (f.lines === 1 ? 0.8 : 1);
  const best = options.reduce((a, b) => (score(b) > score(a) ? b : a));
  return best.labelMm >= minMm ? best : { ...best, labelMm: 0 };
}

/** The diagram of one sheet of a layout cut with `kerfMm`. */
export function sheetDiagram(plan: SheetPlan, kerfMm: number): SheetDiagram {
  const t = plan.trimMm;
  const parts = plan.parts.map((p, i): DiagramPart => {
    const box = { x: p.x, y: p.y, w: p.length, h: p.width };
    return {
      ...box, partId: p.partId, name: p.name, instance: p.instance, tag: i + 1, matchGroup: null, matchOrder: null,
      lengthMm: p.rotated ? p.width : p.length, widthMm: p.rotated ? p.length : p.width,
      ...fitLabel(box, p.name, plan.lengthMm * MIN_LABEL_OF_LENGTH),
    };
  });
  const cuts = plan.cuts.map((c, i): DiagramCut =>
    c.axis === 'x'
      ? { order: i + 1, x1: c.atMm, y1: c.fromMm, x2: c.atMm, y2: c.toMm, kerf: { x: c.atMm, y: c.fromMm, w: kerfMm, h: c.toMm - c.fromMm } }
      : { order: i + 1, x1: c.fromMm, y1: c.atMm, x2: c.toMm, y2: c.atMm, kerf: { x: c.fromMm, y: c.atMm, w: c.toMm - c.fromMm, h: kerfMm } },
  );
  return { lengthMm: plan.lengthMm, widthMm: plan.widthMm, usable: { x: t, y: t, w: plan.lengthMm - 2 * t, h: plan.widthMm - 2 * t }, parts, cuts };
}

/**
 * The diagram of one board of a layout cut with `kerfMm`; `splitGroups` (the layout's) marks
 * runs this board holds only part of.
 */
export function boardDiagram(plan: BoardPlan, kerfMm: number, splitGroups: readonly string[] = []): BoardDiagram {
  const parts = plan.parts.map((p, i): DiagramPart => {
    const box = { x: p.x, y: p.y, w: p.length, h: p.width };
    return {
      ...box, partId: p.partId, name: p.name, instance: p.instance, tag: i + 1, matchGroup: p.matchGroup, matchOrder: p.matchOrder,
      lengthMm: p.length, widthMm: p.width, ...fitLabel(box, p.name, plan.lengthMm * MIN_LABEL_OF_LENGTH),
    };
  });
  const crosscuts = plan.crosscutsMm.map((at, i): DiagramCut => ({ order: i + 1, x1: at, y1: 0, x2: at, y2: plan.widthMm, kerf: { x: at, y: 0, w: kerfMm, h: plan.widthMm } }));
  const defects = plan.defects.map((d) => {
    const from = d.fromEdgeMm ?? 0;
    const to = d.toEdgeMm ?? plan.widthMm;
    return { x: d.startMm, y: from, w: d.endMm - d.startMm, h: to - from, note: d.note ?? 'defect' };
  });
  return { lengthMm: plan.lengthMm, widthMm: plan.widthMm, parts, crosscuts, defects, matchRuns: matchRunsOf(plan, splitGroups) };
}

/** The runs of `plan` as bracket notes; `splitGroups` are the layout's groups spread over several boards. */
export function matchRunsOf(plan: BoardPlan, splitGroups: readonly string[] = []): DiagramMatchRun[] {
  const runs = new Map<string, PlacedBoardPart[]>();
  for (const p of plan.parts) {
    if (p.matchGroup === null || p.matchOrder === null) continue;
    runs.set(p.matchGroup, [...(runs.get(p.matchGroup) ?? []), p]);
  }
  return [...runs.entries()]
    .map(([group, parts]): DiagramMatchRun => {
      const orders = [...new Set(parts.map((p) => p.matchOrder!))].sort((a, b) => a - b);
      const fromMm = Math.min(...parts.map((p) => p.x));
      const toMm = Math.max(...parts.map((p) => p.x + p.length));
      const partial = splitGroups.includes(group);
      const span = orders.length === 1 ? `${orders[0]}` : `${orders[0]}–${orders[orders.length - 1]}`;
      const text = `grain-matched: ${parts[0]!.matchLabel ?? group} (${span})${partial ? ', split over boards' : ''}`;
      const labelMm = Math.min(MAX_LABEL_MM, (toMm - fromMm) / (text.length * GLYPH_WIDTH));
      return { group, text, fromMm, toMm, labelMm: labelMm >= plan.lengthMm * MIN_LABEL_OF_LENGTH ? labelMm : 0, partial };
    })
    .sort((a, b) => a.fromMm - b.fromMm);
}
