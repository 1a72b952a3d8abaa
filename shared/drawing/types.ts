/**
 * The drawing model: what a plan set's pages hold, in paper millimetres, before any renderer
 * (SVG or PDF) draws it. Views are first built in model space (mm of the piece, y up), then
 * scaled and placed on a sheet, where y runs down as on paper.
 */

/** A 2D point, mm. In model space y points up; on a sheet y points down. */
export type Pt = readonly [number, number];

/** A 3D point, mm. */
export type Vec3Like = readonly [number, number, number];

/**
 * Line kinds of a technical drawing: `visible` edges heavy, `hidden` edges dashed, `centre`
 * lines chain-dotted, `thin` for dimension and extension lines and leaders, `accent` for the
 * pencil-red marks (section and cut indications).
 */
export type LineKind = 'visible' | 'hidden' | 'centre' | 'thin' | 'accent';

/** A straight line. */
export interface Segment {
  type: 'segment';
  a: Pt;
  b: Pt;
  kind: LineKind;
}

/** A closed polygon; `fill` is a tone name, `null` for no fill. */
export interface Polygon {
  type: 'polygon';
  points: readonly Pt[];
  fill: Fill | null;
  kind: LineKind;
}

/** Fills a renderer knows: paper and three wood tones for the 3D-style views' faces. */
export type Fill = 'paper' | 'light' | 'mid' | 'dark';

/** A circle, e.g. a hole. */
export interface Circle {
  type: 'circle';
  centre: Pt;
  radius: number;
  kind: LineKind;
}

/** A filled arrowhead at `tip`, pointing from `from` toward `tip`. */
export interface Arrow {
  type: 'arrow';
  tip: Pt;
  from: Pt;
}

/** Which typeface: `mono` (JetBrains Mono) for every number, `sans` for words. */
export type Typeface = 'mono' | 'sans';

/** A line of text; `at` is the baseline point the anchor refers to. */
export interface Label {
  type: 'label';
  at: Pt;
  text: string;
  /** Cap height in paper mm is about 0.7 of this size; size is the font size in points. */
  sizePt: number;
  anchor: 'start' | 'middle' | 'end';
  font: Typeface;
  bold?: boolean;
  /** Degrees counter-clockwise; 90 reads from bottom to top. */
  rotate?: 0 | 90;
  accent?: boolean;
}

/** Anything a renderer draws. */
export type Primitive = Segment | Polygon | Circle | Arrow | Label;

/** An axis-aligned rectangle, mm: low corner and size. */
export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

/**
 * A dimension requested in model space: the distance between `a` and `b` measured along
 * `axis` (`h` horizontal, `v` vertical), drawn on `side` of the view. `tier` orders
 * dimensions outward: feature sizes sit nearest the part, overall sizes outermost.
 */
export interface DimensionRequest {
  a: Pt;
  b: Pt;
  axis: 'h' | 'v';
  side: 'below' | 'above' | 'left' | 'right';
  /** The text written on the dimension line, already formatted in the drawing's units. */
  text: string;
  valueMm: number;
  tier: number;
  /** A short word in front of the value, e.g. `groove`, when the number alone is unclear. */
  note?: string;
  /** A stable name for the dimensions tests and exports look up, e.g. `overall-width`. */
  key?: string;
}

/**
 * A note naming a feature, e.g. `12× 1/4" dia. × 3/8" deep` for a line of holes: the layout sets
 * it beside `target` (the first feature it names, model mm) on paper, clear of the view's holes
 * and texts, with a leader when it has to stand off.
 */
export interface ViewNote {
  text: string;
  target: Rect;
}

/** A view in model space: primitives in mm of the piece (y up) and the dimensions it wants. */
export interface ModelView {
  id: string;
  title: string;
  primitives: readonly Primitive[];
  dimensions: readonly DimensionRequest[];
  /** Part labels for the exploded view: the point a leader starts at and the text. */
  callouts: readonly { at: Pt; text: string }[];
  /** Notes naming a feature (a hole's size), set on paper clear of every feature. */
  notes?: readonly ViewNote[];
  /** Extent of the drawn geometry in model mm. */
  bounds: Rect;
}

/** A view scaled and placed on a sheet: primitives in paper mm (y down). */
export interface PlacedView {
  id: string;
  title: string;
  /** The scale denominator: 1:n. */
  scale: number;
  /** The scale as written, e.g. `1:8`. */
  scaleText: string;
  primitives: readonly Primitive[];
  /** Everything the view occupies on paper, including its dimensions and title. */
  frame: Rect;
  /** The drawn piece or part alone, without dimensions, paper mm. */
  geometry: Rect;
  /** Dimension texts drawn, in order, with the key of those that have one. */
  dimensionTexts: readonly { text: string; key?: string }[];
}

/** A table for a page: a header row and body rows of text, with numeric columns named. */
export interface TableBlock {
  type: 'table';
  title: string;
  head: readonly string[];
  rows: readonly (readonly string[])[];
  /** Indexes of columns holding numbers or lengths: set in mono and right-aligned, never wrapped. */
  numericColumns: readonly number[];
  /** Indexes of further columns never wrapped, e.g. part names a test or a maker reads whole. */
  unbrokenColumns?: readonly number[];
  /** Optional line under the table, e.g. a source or an approximation note. */
  footnote?: string;
}

/** A heading with paragraphs or bullet points. */
export interface TextBlock {
  type: 'text';
  title: string;
  paragraphs: readonly string[];
  bullets?: boolean;
}

/** Page content that flows top to bottom: tables and text. */
export type FlowBlock = TableBlock | TextBlock;

/** Paper sizes a plan set prints on. */
export type PaperSize = 'letter' | 'a4' | 'a3';

/** Sheet size and orientation. */
export interface SheetSpec {
  size: PaperSize;
  orientation: 'portrait' | 'landscape';
}

/** The title block's fields. */
export interface TitleBlockInfo {
  title: string;
  revision: string;
  /** ISO date, YYYY-MM-DD. */
  date: string;
  units: 'in' | 'mm';
  workshopName: string;
}

/** One page of the plan set. */
export interface Sheet {
  number: number;
  /** What the page shows, e.g. `Part drawing: Leg`; goes into the title block. */
  name: string;
  widthMm: number;
  heightMm: number;
  /** Drawn views; their scales are stated under each view and in the title block. */
  views: readonly PlacedView[];
  /** Tables and text flowing down the page's free area (rendered by the PDF renderer). */
  flow: readonly FlowBlock[];
  /** Loose primitives in paper mm: border, title block, key-number panels. */
  primitives: readonly Primitive[];
  /** The free area for flowing blocks, paper mm. */
  flowArea: Rect;
  /**
   * Columns the flow is set in, side by side across `flowArea`: each filled down before the
   * next, a block moving whole to the next column when it would not fit. Absent: one.
   */
  flowColumns?: number;
  /** Tables set with tighter rows (less padding in each cell), for a page of many short tables. */
  tightTables?: boolean;
}

/** The whole plan set, ready to render. */
export interface PlanSetModel {
  info: TitleBlockInfo;
  sheet: SheetSpec;
  sheets: readonly Sheet[];
}
