/**
 * Collects part instances drawn in world coordinates and turns them into the engine's result:
 * identical instances (same size, material and cuts in their own frame) become one `Part` with a
 * quantity and one `Placement` each, and joints between instances become joints between parts.
 */
import { assert } from '../assert.ts';
import type { Box3, Feature, Grain, GlueUpPlan, GrainMatch, Joint, JointType, Material, Part, PartFace, PartRole, Placement, RoughSize, Vec3 } from './types.ts';
import { describeFeature, type FeatureDraft } from './geometry/featureDescribe.ts';
import { localFaceOf, oppositeAxis, placeInto, worldBoxToLocalInto, type AxisMap } from './geometry/placement.ts';

/** Id and maker's name for a set of identical instances, given their member names. */
export type PartNamer = (members: readonly string[]) => { id: string; name: string };

/** One instance of a part, drawn in the world. */
export interface PartDraft {
  /** Instances may merge only within a group, e.g. `front-back/top-rail`. */
  group: string;
  /** This instance's member name in its group, e.g. `front` or `back-left`. */
  member: string;
  /** Readable instance name, e.g. `front top rail`. */
  label: string;
  role: PartRole;
  material: Material;
  grain: Grain;
  /** Finished length, width, thickness (mm). */
  size: Vec3;
  axes: AxisMap;
  /** The world box the part fills (mm). */
  world: Box3;
  explodeMm: Vec3;
  features: readonly FeatureDraft[];
  notes: readonly string[];
  glueUp?: GlueUpPlan;
  /** This instance's place in a run cut from one board; not part of its shape, so runs never split a part. */
  grainMatch?: GrainMatch;
  name: PartNamer;
}

/** A joint between two drafted instances. */
export interface JointDraft {
  type: JointType;
  a: { draft: PartDraft; featureIds: readonly string[] };
  b: { draft: PartDraft; featureIds: readonly string[] };
  clearanceMm: number;
  glued: boolean;
  floating: boolean;
  note: string;
}

/** Rough size for a finished part. */
export type RoughSizer = (part: Omit<Part, 'rough' | 'quantity'>) => RoughSize;

/** The merged parts, their placements and joints. */
export interface Assembled {
  parts: Part[];
  placements: Placement[];
  joints: Joint[];
  /** Part id of each draft. */
  partIdOf: Map<PartDraft, string>;
  /** Placement instance of each draft among its part's instances. */
  instanceOf: Map<PartDraft, number>;
}

const round6 = (n: number): number => Math.round(n * 1e6) / 1e6;

// A part's shape as a flat list of strings and whole numbers, compared element by element:
// numbers snapped to 0.1 µm so binary noise never splits identical parts. The grid is offset
// by 0.3 of a step: inch fractions and 0.1 mm values land on multiples of 1/8 step and never
// near a snapping boundary. Every measured number of a feature follows from its boxes, so the
// boxes, type, face and id are the whole shape. A list rather than one joined string: building
// and hashing a long string per instance was the largest single cost of matching parts.
type ShapeKey = (string | number)[];

const snap = (n: number): number => Math.round(n * 1e4 + 0.3);

/**
 * One instance's shape in its frame for one turn, worked out from its feature drafts without
 * making features: only the first instance of each part needs them, and describing every cut
 * of every instance in full was most of the time spent matching.
 */
interface Shape {
  key: ShapeKey;
  /** The id each feature draft takes in the part, by its index in `draft.features`. */
  ids: string[];
  /** Indices of `draft.features` in id order, the order of the part's features. */
  order: number[];
  /** Feature id in the draft → id in the part; null when no id is templated (all as drafted). */
  idMap: Map<string, string> | null;
}

// Templated ids repeat from build to build (`tongue-end-a`, `screw-hole-3`): made once and
// shared, so they cost no string building and compare by reference when sorted and matched.
const templatedIds = new Map<string, Map<string, string[]>>();

function templatedId(template: string, face: string, n: number): string {
  let byFace = templatedIds.get(template);
  if (!byFace) {
    byFace = new Map();
    templatedIds.set(template, byFace);
  }
  let byN = byFace.get(face);
  if (!byN) {
    byN = [];
    byFace.set(face, byN);
  }
  let id = byN[n];
  if (id === undefined) {
    id = template.replace('{face}', face).replace('{n}', String(n));
    byN[n] = id;
  }
  return id;
}

// Scratch for one local box: min x, y, z, max x, y, z. Written and read within one call.
const local = new Float64Array(6);

function pushLocalBox(out: ShapeKey, box: Box3, draft: PartDraft, axes: AxisMap): void {
  worldBoxToLocalInto(box, draft.size, axes, draft.world.min, local, 0);
  out.push(snap(local[0]!), snap(local[1]!), snap(local[2]!), snap(local[3]!), snap(local[4]!), snap(local[5]!));
}

/**
 * 0 … n-1 in the stable order of `compare`. A part has a handful of features, where insertion
 * sort beats the built-in sort's set-up; a side full of shelf-pin holes takes the built-in one.
 */
function indicesSorted(n: number, compare: (i: number, j: number) => number): number[] {
  const order: number[] = [];
  for (let i = 0; i < n; i++) order.push(i);
  if (n > 16) return order.sort(compare);
  for (let k = 1; k < n; k++) {
    const i = order[k]!;
    let at = k;
    while (at > 0 && compare(order[at - 1]!, i) > 0) {
      order[at] = order[at - 1]!;
      at--;
    }
    order[at] = i;
  }
  return order;
}

/** The shape of `draft` in its frame for `axes`: templated ids filled in, features in id order. */
function shapeOf(draft: PartDraft, axes: AxisMap): Shape {
  const drafts = draft.features;
  const n = drafts.length;
  const faces: PartFace[] = [];
  const ids: string[] = [];
  let templated = false;
  for (let i = 0; i < n; i++) {
    const fd = drafts[i]!;
    faces.push(localFaceOf(axes, fd.faceDir));
    ids.push(fd.id);
    if (fd.idTemplate) templated = true;
  }
  let idMap: Map<string, string> | null = null;
  if (templated) {
    // Templated ids number features in order along the part: by the low corner of each one's
    // first box (a tongue's own solid when it removes nothing).
    // A plain array: allocating a typed array costs more than the few numbers in it.
    const low: number[] = [];
    for (let i = 0; i < n; i++) {
      const fd = drafts[i]!;
      const first = fd.removed[0] ?? (fd.type === 'tongue' ? fd.tongue : undefined);
      if (first) {
        worldBoxToLocalInto(first, draft.size, axes, draft.world.min, local, 0);
        low.push(local[0]!, local[1]!, local[2]!);
      } else {
        low.push(0, 0, 0);
      }
    }
    const along = indicesSorted(n, (i, j) => low[3 * i]! - low[3 * j]! || low[3 * i + 1]! - low[3 * j + 1]! || low[3 * i + 2]! - low[3 * j + 2]!);
    const counters = new Map<string, number>();
    idMap = new Map();
    for (const i of along) {
      const fd = drafts[i]!;
      if (fd.idTemplate) {
        const count = (counters.get(fd.idTemplate) ?? 0) + 1;
        counters.set(fd.idTemplate, count);
        ids[i] = templatedId(fd.idTemplate, faces[i]!, count);
      }
      idMap.set(fd.id, ids[i]!);
    }
  }
  const order = indicesSorted(n, (i, j) => (ids[i]! < ids[j]! ? -1 : ids[i]! > ids[j]! ? 1 : 0));

  const material = draft.material.kind === 'solid' ? draft.material.speciesId : draft.material.sheetId;
  const key: ShapeKey = [draft.role, material, draft.grain, snap(draft.size[0]), snap(draft.size[1]), snap(draft.size[2]), draft.glueUp?.boards ?? 0];
  for (const i of order) {
    const fd = drafts[i]!;
    key.push('|', ids[i]!, fd.type, faces[i]!);
    for (const box of fd.removed) pushLocalBox(key, box, draft, axes);
    // A tongue without its solid, a hole without its diameter: never matched here, and the
    // first instance's features assert on them.
    if (fd.type === 'tongue' && fd.tongue) pushLocalBox(key, fd.tongue, draft, axes);
    if (fd.type === 'hole' || fd.type === 'slot') key.push(snap(fd.diameterMm ?? Number.NaN));
    if (fd.type === 'slot') key.push(snap(fd.slot?.lengthMm ?? Number.NaN));
  }
  return { key, ids, order, idMap };
}

/** The features of `draft` in its frame for `axes`, as `shape` names and orders them. */
function featuresOf(draft: PartDraft, axes: AxisMap, shape: Shape): Feature[] {
  const features: Feature[] = [];
  for (const i of shape.order) {
    const feature = describeFeature(draft.features[i]!, draft.size, axes, draft.world.min);
    // Made just above for this part alone, so it is named in place rather than copied.
    feature.id = shape.ids[i]!;
    features.push(feature);
  }
  return features;
}

function sameShape(a: ShapeKey, b: ShapeKey): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function sameIds(a: readonly string[], b: readonly string[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** The same part turned end for end about its thickness axis: still a rotation. */
function turned(axes: AxisMap): AxisMap {
  return { length: oppositeAxis(axes.length), width: oppositeAxis(axes.width), thickness: axes.thickness };
}

/** Identical instances of one part, in the order first met. */
interface PartClass {
  key: ShapeKey;
  drafts: PartDraft[];
  features: Feature[];
}

/** How a drafted instance was taken into its part: its turn and its features' ids. */
interface Chosen {
  axes: AxisMap;
  idMap: Map<string, string> | null;
}

/** Joints between the same features of the same parts with the same clearance, counted. */
interface JointTally {
  type: JointType;
  a: string;
  b: string;
  aFeatures: string[];
  bFeatures: string[];
  clearance: number;
  first: JointDraft;
  count: number;
  /** How many joints before this one join the same two parts with the same type. */
  ordinal: number;
}

// Every instance of a part in a run, or none: a part half in runs has no sensible board order.
function grainMatchOf(same: readonly PartDraft[]): readonly GrainMatch[] | null {
  if (!same.some((d) => d.grainMatch)) return null;
  const runs = same.flatMap((d) => (d.grainMatch ? [d.grainMatch] : []));
  assert(runs.length === same.length, `part ${same[0]!.label}: every instance or none takes a grain-match run`);
  return runs;
}

/** A part before its rough size and quantity, while `assemble` fills it in. */
type PartBody = { -readonly [K in keyof Omit<Part, 'rough' | 'quantity'>]: Part[K] };

/** Merges identical instances into parts and resolves joints to part ids. */
export function assemble(drafts: readonly PartDraft[], joints: readonly JointDraft[], roughFor: RoughSizer): Assembled {
  // An instance keeps its own orientation unless, turned end for end about its thickness axis,
  // it matches a part already seen: so a panel and its turned twin come out as one part, while
  // a leg still reads from its foot.
  // Instances merge only within their group, and a group holds a few shapes at most, so each
  // instance is compared with its group's shapes one by one.
  const classes: PartClass[] = [];
  const byGroup = new Map<string, PartClass[]>();
  const chosen = new Map<PartDraft, Chosen>();
  for (const draft of drafts) {
    const shapeA = shapeOf(draft, draft.axes);
    const inGroup = byGroup.get(draft.group);
    let axes = draft.axes;
    let shape = shapeA;
    let match = inGroup?.find((c) => sameShape(c.key, shapeA.key));
    // Only a group already holding a part can hold this one's turned twin.
    if (!match && inGroup) {
      const other = turned(draft.axes);
      const shapeB = shapeOf(draft, other);
      const twin = inGroup.find((c) => sameShape(c.key, shapeB.key));
      if (twin) {
        match = twin;
        axes = other;
        shape = shapeB;
      }
    }
    chosen.set(draft, { axes, idMap: shape.idMap });
    if (match) {
      match.drafts.push(draft);
      continue;
    }
    const created: PartClass = { key: shape.key, drafts: [draft], features: featuresOf(draft, axes, shape) };
    classes.push(created);
    if (inGroup) inGroup.push(created);
    else byGroup.set(draft.group, [created]);
  }

  const parts: Part[] = [];
  const placements: Placement[] = [];
  const partIdOf = new Map<PartDraft, string>();
  const instanceOf = new Map<PartDraft, number>();
  const used = new Map<string, number>();
  for (const { drafts: same, features } of classes) {
    const first = same[0]!;
    const named = first.name(same.map((d) => d.member));
    // Two different parts may earn the same name (end panels and centre panels): number them.
    const n = (used.get(named.id) ?? 0) + 1;
    used.set(named.id, n);
    const id = n === 1 ? named.id : `${named.id}-${n}`;
    const name = n === 1 ? named.name : `${named.name} ${n}`;
    // Built up in place rather than by spreads, which V8 runs slowly: the optional fields
    // before the rough size, which is worked out from the finished part.
    const part: PartBody = {
      id, name, role: first.role, material: first.material, grain: first.grain,
      lengthMm: first.size[0], widthMm: first.size[1], thicknessMm: first.size[2],
      features, notes: first.notes,
    };
    if (first.glueUp) part.glueUp = first.glueUp;
    const runs = grainMatchOf(same);
    if (runs) part.grainMatch = runs;
    const whole = part as PartBody & { rough?: Part['rough']; quantity?: number };
    whole.rough = roughFor(part);
    whole.quantity = same.length;
    parts.push(whole as Part);
    same.forEach((draft, instance) => {
      partIdOf.set(draft, id);
      instanceOf.set(draft, instance);
      placements.push(placeInto(id, instance, draft.label, draft.size, chosen.get(draft)!.axes, draft.world, draft.explodeMm));
    });
  }

  // Joints between the same features of the same two parts with the same clearance are one
  // joint with a count, compared field by field among the joints of the same first part.
  const tallies: JointTally[] = [];
  const byFirstPart = new Map<string, JointTally[]>();
  const partIds = (member: JointDraft['a']): string[] => {
    const idMap = chosen.get(member.draft)!.idMap;
    return idMap ? member.featureIds.map((id) => idMap.get(id) ?? id) : member.featureIds.slice();
  };
  for (const j of joints) {
    const a = partIdOf.get(j.a.draft)!;
    const b = partIdOf.get(j.b.draft)!;
    const aFeatures = partIds(j.a);
    const bFeatures = partIds(j.b);
    const clearance = round6(j.clearanceMm);
    const sameA = byFirstPart.get(a);
    const existing = sameA?.find((t) => t.type === j.type && t.b === b && t.clearance === clearance && sameIds(t.aFeatures, aFeatures) && sameIds(t.bFeatures, bFeatures));
    if (existing) {
      existing.count++;
      continue;
    }
    // Joints of one type between the same two parts but other features are numbered.
    let ordinal = 0;
    if (sameA) for (const t of sameA) if (t.b === b && t.type === j.type) ordinal++;
    const tally: JointTally = { type: j.type, a, b, aFeatures, bFeatures, clearance, first: j, count: 1, ordinal };
    tallies.push(tally);
    if (sameA) sameA.push(tally);
    else byFirstPart.set(a, [tally]);
  }
  const jointList: Joint[] = tallies.map(({ type, a, b, aFeatures, bFeatures, first, count, ordinal: n }) => {
    const base = `${a}:${b}:${type}`;
    return {
      id: n === 0 ? base : `${base}:${n + 1}`,
      type,
      members: [{ partId: a, featureIds: aFeatures }, { partId: b, featureIds: bFeatures }],
      count, clearanceMm: first.clearanceMm, glued: first.glued, floating: first.floating, note: first.note,
    };
  });
  return { parts, placements, joints: jointList, partIdOf, instanceOf };
}
