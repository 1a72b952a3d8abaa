/**
 * The piece engine's plain data: what goes in (a {@link PieceSpec}) and what comes out (a
 * {@link PieceResult}). Every length is in millimetres.
 *
 * World axes of an assembled piece:
 *  - X is the width, from the piece's left to its right as you face its front;
 *  - Y is the depth, from the front to the back;
 *  - Z is the height, from the floor up.
 * The origin is the front-left corner of the case measured over its legs (or carcass), on the
 * floor; parts that overhang the case (a lid, a top) reach into negative X and Y.
 *
 * A part's own (local) frame: x runs along its length (the grain of solid wood), y across its
 * width and z through its thickness, each from 0 to the part's finished size. Features are boxes
 * and positions in that frame.
 */
import type { Climate } from '../wood/climate.ts';

/** The kinds of piece the engine knows. */
export type PieceKind = 'chest' | 'dresser' | 'cabinet';

/** A parameter value: lengths as numbers in mm, choices as strings, switches as booleans. */
export type ParamValue = number | string | boolean;

/**
 * A piece as the maker describes it. `schemaVersion` lets stored designs be migrated when the
 * parameters change; `params` holds only what differs from the defaults, or everything.
 */
export interface PieceSpec {
  schemaVersion: 1;
  kind: PieceKind;
  params: Record<string, unknown>;
  /** Build and seasonal moisture content; the wood library's default when absent. */
  climate?: Climate;
  /** The room the piece goes in, read by room-fit checks. */
  room?: unknown;
}

/** A point or size in mm, [x, y, z]. */
export type Vec3 = readonly [number, number, number];

/** An axis-aligned box in mm: `min` and `max` corners, in a part's local frame or the world. */
export interface Box3 {
  readonly min: Vec3;
  readonly max: Vec3;
}

/** A signed world axis a part's local axis points along. */
export type WorldAxis = '+X' | '-X' | '+Y' | '-Y' | '+Z' | '-Z';

/**
 * Which face of a part a feature is cut into, named in the part's local frame:
 * `face-a`/`face-b` are the broad faces (z = 0 / z = thickness), `edge-a`/`edge-b` the long
 * edges (y = 0 / y = width), `end-a`/`end-b` the ends (x = 0 / x = length).
 */
export type PartFace = 'face-a' | 'face-b' | 'edge-a' | 'edge-b' | 'end-a' | 'end-b';

/** What a part is for; drives grouping, explode directions and glue-up. */
export type PartRole =
  | 'leg'
  | 'rail'
  | 'stile'
  | 'panel'
  | 'bottom'
  | 'cleat'
  | 'lid'
  | 'batten'
  // Case pieces (dressers, cabinets): a carcass of sheet goods and what hangs on it.
  | 'case-side'
  | 'case-top'
  | 'case-bottom'
  | 'stretcher'
  | 'back'
  | 'divider'
  | 'shelf'
  | 'edge-strip'
  | 'face-frame'
  | 'runner'
  | 'top'
  | 'base'
  | 'door'
  | 'door-frame'
  | 'door-panel'
  | 'drawer-front'
  | 'drawer-side'
  | 'drawer-end'
  | 'drawer-bottom';

/** Grain direction of a part, in its local frame; sheet goods have none that limits movement. */
export type Grain = 'length' | 'width' | 'none';

/** What a part is cut from. */
export type Material =
  | { kind: 'solid'; speciesId: string; speciesName: string }
  | { kind: 'sheet'; sheetId: string; sheetName: string };

/** Common fields of every machining feature. */
interface FeatureBase {
  /** Unique within its part, e.g. `groove-panel` or `tongue-a`. */
  id: string;
  /** The face or edge the cut goes into. */
  face: PartFace;
  /** Words a maker reads on a drawing, e.g. `groove for the side panel`. */
  label: string;
  /** Material removed, as boxes in the part's local frame (mm); what a 3D view subtracts. */
  removed: readonly Box3[];
}

/** A groove running the full length of the face it is on. */
export interface GrooveFeature extends FeatureBase {
  type: 'groove';
  widthMm: number;
  depthMm: number;
  /** Distance from the reference edge or face (the lower local coordinate) to the near wall. */
  offsetMm: number;
  lengthMm: number;
}

/** A groove that stops short of one or both ends so it does not show. */
export interface StoppedGrooveFeature extends FeatureBase {
  type: 'stopped-groove';
  widthMm: number;
  depthMm: number;
  offsetMm: number;
  /** Where the groove starts and stops, measured from end-a along the part's length. */
  startMm: number;
  stopMm: number;
}

/** A tongue or stub tenon left on an end or edge by cutting its cheeks and shoulders. */
export interface TongueFeature extends FeatureBase {
  type: 'tongue';
  /** Thickness of the tongue (across the part's thickness). */
  thicknessMm: number;
  /** How far the tongue stands out from its shoulder. */
  lengthMm: number;
  /** Width of the tongue along the shoulder line. */
  widthMm: number;
  /** The tongue's own solid, in the part's local frame (mm). */
  tongue: Box3;
}

/** A rabbet: an open step along an edge or end. */
export interface RabbetFeature extends FeatureBase {
  type: 'rabbet';
  /** Width of the step, measured in from the edge. */
  widthMm: number;
  /** Depth of the step, measured in from the face. */
  depthMm: number;
  lengthMm: number;
}

/** A rectangular notch through the part's thickness, e.g. at a corner around a leg. */
export interface NotchFeature extends FeatureBase {
  type: 'notch';
  /** Size along the part's length and across its width. */
  lengthMm: number;
  widthMm: number;
  depthMm: number;
  /** Where the notch sits: its low corner in local (x, y). */
  atMm: readonly [number, number];
}

/** A shallow pocket, e.g. for a hinge leaf, or a mortise. */
export interface PocketFeature extends FeatureBase {
  type: 'recess' | 'mortise';
  lengthMm: number;
  widthMm: number;
  depthMm: number;
  atMm: readonly [number, number];
}

/** A dado: a groove across the grain. */
export interface DadoFeature extends FeatureBase {
  type: 'dado';
  widthMm: number;
  depthMm: number;
  /** Distance from end-a to the near wall. */
  offsetMm: number;
}

/** A round hole, e.g. a screw clearance hole. */
export interface HoleFeature extends FeatureBase {
  type: 'hole';
  diameterMm: number;
  depthMm: number;
  /** Centre of the hole on its face, local (x, y) for faces. */
  atMm: readonly [number, number];
}

/** An elongated hole that lets a screw slide as the wood it holds moves. */
export interface SlotFeature extends FeatureBase {
  type: 'slot';
  diameterMm: number;
  /** Overall length of the slot along its long direction. */
  slotLengthMm: number;
  depthMm: number;
  /** Centre of the slot on its face, local (x, y). */
  atMm: readonly [number, number];
  /** The local axis the slot runs along. */
  along: 'length' | 'width';
}

/** A machining feature on a part, discriminated by `type`. */
export type Feature =
  | GrooveFeature
  | StoppedGrooveFeature
  | TongueFeature
  | RabbetFeature
  | NotchFeature
  | PocketFeature
  | DadoFeature
  | HoleFeature
  | SlotFeature;

/** The kinds of feature. */
export type FeatureType = Feature['type'];

/** A finished length × width × thickness in mm. */
export type PartSize = readonly [number, number, number];

/** Extra stock bought for milling a part to its finished size, and the rough size it gives. */
export interface RoughSize {
  lengthMm: number;
  widthMm: number;
  /** Rough thickness: the next quarter-inch stock (4/4, 5/4, 8/4 ...) for solid wood. */
  thicknessMm: number;
  /** The stock thickness in quarters of an inch, e.g. 4 for 4/4; 0 for sheet goods. */
  quarters: number;
}

/** A solid part glued up from narrower boards (a lid, a wide panel). */
export interface GlueUpPlan {
  boards: number;
  /** Finished width of each board before the glue-up is trimmed (mm). */
  boardWidthMm: number;
}

/**
 * One part instance's place in a run of parts cut one after another from one board, so their
 * grain and colour run on from part to part (a column of drawer fronts, top to bottom).
 */
export interface GrainMatch {
  /** Shared by every instance cut from the same board, e.g. `drawer-fronts-column-1`. */
  group: string;
  /** Position along the board from its end, 1 first; instances of one group follow in this order. */
  order: number;
  /** What the group is, in the maker's words, e.g. `drawer fronts, column 1`. */
  note?: string;
}

/** One distinct part; identical parts share one `Part` with a quantity and several placements. */
export interface Part {
  /** Stable, readable id, e.g. `leg`, `front-top-rail`, `side-panel`. */
  id: string;
  /** The name a maker writes on the board, e.g. `Front top rail`. */
  name: string;
  role: PartRole;
  material: Material;
  grain: Grain;
  /** Finished length (x), width (y) and thickness (z), mm. Tongues are included. */
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  rough: RoughSize;
  quantity: number;
  features: readonly Feature[];
  /** Present when the part is glued up from several boards. */
  glueUp?: GlueUpPlan;
  /**
   * Present when instances must be cut in sequence from one board: one entry per instance, in
   * instance order (the `instance` of its placement). Identical parts from different runs share
   * one `Part`, so the run is an instance's, not the part's.
   */
  grainMatch?: readonly GrainMatch[];
  /** Notes a maker needs on the cut list, e.g. `float: do not glue`. */
  notes: readonly string[];
}

/** The kinds of joint the engine makes. */
export type JointType =
  | 'stub-tenon'
  | 'panel-in-groove'
  | 'notch-around-leg'
  | 'cleat-screwed'
  | 'bottom-on-cleats'
  | 'batten-screwed'
  | 'hinge'
  | 'edge-glued'
  // Case pieces.
  | 'dado'
  | 'rabbet'
  | 'back-in-rabbet'
  | 'back-in-groove'
  | 'butt-screwed'
  | 'pocket-screw'
  | 'face-frame-glued'
  | 'tongue-and-dado'
  | 'bottom-in-groove'
  | 'shelf-pin'
  | 'top-fastened'
  | 'drawer-slide'
  | 'front-screwed';

/** One side of a joint: a part and the features of it that take part. */
export interface JointMember {
  partId: string;
  featureIds: readonly string[];
}

/** A joint between two parts (or two boards of one part). */
export interface Joint {
  /** Unique in the result, e.g. `front-top-rail:leg`. */
  id: string;
  type: JointType;
  /** The part carrying the tongue, screw or panel first; the receiving part second. */
  members: readonly [JointMember, JointMember];
  /** How many times this joint occurs in the piece. */
  count: number;
  /** Gap left at the bottom of the groove or around the part (mm), 0 for a tight fit. */
  clearanceMm: number;
  glued: boolean;
  /** True when a part must be free to move: never glue it. */
  floating: boolean;
  /** Why this fit, in a maker's words. */
  note: string;
}

/**
 * Where one instance of a part sits in the assembly.
 *
 * `positionMm` is the world position of the part's minimum corner after it is turned into
 * place, i.e. the low corner of its world bounding box. `axes` says which signed world axis
 * each local axis points along; a `-` axis means local 0 lies at the box's high side on that
 * world axis. Every mapping is a proper rotation, never a mirror.
 */
export interface Placement {
  partId: string;
  /** 0-based index among the part's `quantity` instances. */
  instance: number;
  /** A readable name for this instance, e.g. `front-left leg`. */
  label: string;
  positionMm: Vec3;
  axes: { length: WorldAxis; width: WorldAxis; thickness: WorldAxis };
  /** Exploded-view offset: direction × distance, mm. */
  explodeMm: Vec3;
}

/** One placed instance of a part: its id and the `instance` of its placement. */
export interface PartInstanceRef {
  partId: string;
  instance: number;
}

/** A line in the piece's world frame: a point on it (mm) and a unit direction. */
export interface Axis3 {
  origin: Vec3;
  direction: Vec3;
}

/** A lid that swings up and back about its hinge line. */
export interface LidOpening {
  kind: 'lid';
  /** The lid and what is fixed to it (battens). */
  parts: readonly PartInstanceRef[];
  /** The hinge pin line, along X; opening turns the lid about it, front rising. */
  hingeAxis: Axis3;
  /** How far the lid opens to its stop, degrees from closed. */
  openAngleDeg: number;
}

/** A door that swings out about a vertical hinge line at its front face. */
export interface DoorOpening {
  kind: 'door';
  /** `door-1`, `door-2` ... from the left. */
  id: string;
  /** Every part of the leaf (stiles, rails, panel, or the slab). */
  parts: readonly PartInstanceRef[];
  /** Hinge side as you face the piece. */
  side: 'left' | 'right';
  /** The hinge line: the leaf's outer edge at its front face, along +Z. */
  hingeAxis: Axis3;
  /** How far the door swings open, degrees from closed. */
  swingDeg: number;
}

/** A drawer that slides straight out of the front. */
export interface DrawerOpening {
  kind: 'drawer';
  /** `drawer-<row>-<column>`, rows counted from the top. */
  id: string;
  /** The drawer front and every part of its box. */
  parts: readonly PartInstanceRef[];
  /** How far it comes out at full extension (or off its runners), mm: the box depth. */
  travelMm: number;
  /** Unit direction it pulls out: toward the viewer, −Y. */
  direction: Vec3;
}

/** What opens on a piece and how; lengths mm, angles degrees, in the piece's world frame. */
export type Opening = LidOpening | DoorOpening | DrawerOpening;

/** How serious a check is. */
export type Severity = 'error' | 'warning' | 'caution' | 'info';

/** Something a maker must know about the design: a problem, a caution or a useful number. */
export interface Check {
  /** Stable id, e.g. `panel-float:side-panel`. */
  id: string;
  severity: Severity;
  title: string;
  message: string;
  partIds: readonly string[];
  /** The numbers behind the message, named with their unit, e.g. `shortfallMm`. */
  numbers: Readonly<Record<string, number>>;
  /** What to change, when something can be changed. */
  fix?: string;
}

/** One row of the cut list. */
export interface CutListRow {
  partId: string;
  name: string;
  quantity: number;
  finished: PartSize;
  rough: PartSize;
  grain: Grain;
  notes: readonly string[];
}

/** Cut-list rows for one material (a species at one stock thickness, or a sheet good). */
export interface CutListGroup {
  /** e.g. `White oak 4/4` or `Baltic birch plywood 12 mm`. */
  material: string;
  materialKind: 'solid' | 'sheet';
  rows: readonly CutListRow[];
}

/** A router-table or saw set-up for one feature. */
export interface SetUp {
  tool: 'router table' | 'table saw' | 'drill press' | 'router' | 'handsaw' | 'chisel';
  /** What to set and to what, e.g. `bit height` → 9.5 mm. */
  settings: readonly { name: string; valueMm: number }[];
  note: string;
}

/** One line of the joinery schedule. */
export interface JoineryRow {
  jointId: string;
  type: JointType;
  parts: readonly [string, string];
  count: number;
  features: readonly { partId: string; featureId: string; summary: string }[];
  setUps: readonly SetUp[];
  clearanceMm: number;
  glued: boolean;
  floating: boolean;
}

/** Board feet for one species, from rough sizes with the thickness rounded up to the quarter. */
export interface BoardFeetRow {
  speciesId: string;
  speciesName: string;
  /** Board feet by stock thickness, keyed `4/4`, `8/4` ... */
  byThickness: Readonly<Record<string, number>>;
  total: number;
}

/** Area of one sheet good used by the parts. */
export interface SheetAreaRow {
  sheetId: string;
  sheetName: string;
  areaM2: number;
  areaFt2: number;
  /** Sheets needed by area alone, a lower bound before cutting diagrams. */
  sheetsByArea: number;
}

/** One stage of the glue-up sequence. */
export interface GlueUpStage {
  stage: number;
  title: string;
  /** Subassemblies that can be glued at the same time in this stage. */
  steps: readonly { title: string; partIds: readonly string[]; notes: readonly string[] }[];
  /** Parts that go in during this stage and must not be glued. */
  floatingPartIds: readonly string[];
}

/** Everything the outputs derive from parts and joints. */
export interface DerivedOutputs {
  cutList: readonly CutListGroup[];
  joinery: readonly JoineryRow[];
  boardFeet: { bySpecies: readonly BoardFeetRow[]; total: number };
  sheetArea: readonly SheetAreaRow[];
  glueUp: readonly GlueUpStage[];
}

/** The engine's answer for one spec. Immutable: never change it, derive a new one. */
export interface PieceResult {
  /** The spec after defaults were merged and values checked. */
  spec: PieceSpec;
  kind: PieceKind;
  engineVersion: string;
  parts: readonly Part[];
  joints: readonly Joint[];
  placements: readonly Placement[];
  checks: readonly Check[];
  /** Overall size of the assembled piece, [width, depth, height] mm, lid closed. */
  bboxMm: Vec3;
  /** World position of the bounding box's low corner (negative where a lid overhangs). */
  bboxMinMm: Vec3;
  /** The lid, doors and drawers: how each opens, closed positions as placed. */
  openings: readonly Opening[];
  derived: DerivedOutputs;
}
