/**
 * Collects part instances drawn in world coordinates and turns them into the engine's result:
 * identical instances (same size, material and cuts in their own frame) become one `Part` with a
 * quantity and one `Placement` each, and joints between instances become joints between parts.
 */
import { assert } from '../assert.ts';
import type { Box3, Feature, Grain, GlueUpPlan, GrainMatch, Joint, JointType, Material, Part, PartRole, Placement, RoughSize, Vec3 } from './types.ts';
import { describeFeature, type FeatureDraft } from './geometry/featureDescribe.ts';
import { oppositeAxis, placeInto, type AxisMap } from './geometry/placement.ts';

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

function pushBox(out: ShapeKey, box: Box3): void {
  out.push(snap(box.min[0]), snap(box.min[1]), snap(box.min[2]), snap(box.max[0]), snap(box.max[1]), snap(box.max[2]));
}

function shapeKey(draft: PartDraft, features: readonly Feature[]): ShapeKey {
  const material = draft.material.kind === 'solid' ? draft.material.speciesId : draft.material.sheetId;
  const out: ShapeKey = [draft.role, material, draft.grain, snap(draft.size[0]), snap(draft.size[1]), snap(draft.size[2]), draft.glueUp?.boards ?? 0];
  for (const f of features) {
    out.push('|', f.id, f.type, f.face);
    for (const box of f.removed) pushBox(out, box);
    if (f.type === 'tongue') pushBox(out, f.tongue);
    if (f.type === 'hole' || f.type === 'slot') out.push(snap(f.diameterMm));
    if (f.type === 'slot') out.push(snap(f.slotLengthMm));
  }
  return out;
}

function sameShape(a: ShapeKey, b: ShapeKey): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** The same part turned end for end about its thickness axis: still a rotation. */
function turned(axes: AxisMap): AxisMap {
  return { length: oppositeAxis(axes.length), width: oppositeAxis(axes.width), thickness: axes.thickness };
}

/** Features of `draft` in its frame for `axes`, with templated ids filled in. */
function describeAll(draft: PartDraft, axes: AxisMap): { features: Feature[]; ids: Map<string, string> } {
  const drafts = draft.features;
  const described: Feature[] = [];
  let templated = false;
  for (const fd of drafts) {
    described.push(describeFeature(fd, draft.size, axes, draft.world.min));
    if (fd.idTemplate) templated = true;
  }
  const ids = new Map<string, string>();
  if (templated) {
    // Templated ids number features in order along the part: by the low corner of each one's
    // first box (a tongue's own solid when it removes nothing).
    const low = (f: Feature): Vec3 | undefined => (f.removed[0] ?? (f.type === 'tongue' ? f.tongue : undefined))?.min;
    const order = described.map((_, i) => i).sort((i, j) => {
      const ra = low(described[i]!);
      const rb = low(described[j]!);
      return (ra?.[0] ?? 0) - (rb?.[0] ?? 0) || (ra?.[1] ?? 0) - (rb?.[1] ?? 0) || (ra?.[2] ?? 0) - (rb?.[2] ?? 0);
    });
    const counters = new Map<string, number>();
    for (const i of order) {
      const fd = drafts[i]!;
      const feature = described[i]!;
      let id = fd.id;
      if (fd.idTemplate) {
        const n = (counters.get(fd.idTemplate) ?? 0) + 1;
        counters.set(fd.idTemplate, n);
        id = fd.idTemplate.replace('{face}', feature.face).replace('{n}', String(n));
      }
      ids.set(fd.id, id);
      // Made just above for this part alone, so it is named in place rather than copied.
      feature.id = id;
    }
  }
  const features = described.sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  return { features, ids };
}

/** Identical instances of one part, in the order first met. */
interface PartClass {
  key: ShapeKey;
  drafts: PartDraft[];
  features: Feature[];
}

// Every instance of a part in a run, or none: a part half in runs has no sensible board order.
function grainMatchOf(same: readonly PartDraft[]): { grainMatch?: readonly GrainMatch[] } {
  const runs = same.flatMap((d) => (d.grainMatch ? [d.grainMatch] : []));
  if (runs.length === 0) return {};
  assert(runs.length === same.length, `part ${same[0]!.label}: every instance or none takes a grain-match run`);
  return { grainMatch: runs };
}

/** Merges identical instances into parts and resolves joints to part ids. */
export function assemble(drafts: readonly PartDraft[], joints: readonly JointDraft[], roughFor: RoughSizer): Assembled {
  // An instance keeps its own orientation unless, turned end for end about its thickness axis,
  // it matches a part already seen: so a panel and its turned twin come out as one part, while
  // a leg still reads from its foot.
  // Instances merge only within their group, and a group holds a few shapes at most, so each
  // instance is compared with its group's shapes one by one.
  const classes: PartClass[] = [];
  const byGroup = new Map<string, PartClass[]>();
  const chosen = new Map<PartDraft, { axes: AxisMap; ids: Map<string, string> }>();
  for (const draft of drafts) {
    const a = describeAll(draft, draft.axes);
    const keyA = shapeKey(draft, a.features);
    const inGroup = byGroup.get(draft.group);
    let axes = draft.axes;
    let described = a;
    let key = keyA;
    let match = inGroup?.find((c) => sameShape(c.key, keyA));
    // Only a group already holding a part can hold this one's turned twin.
    if (!match && inGroup) {
      const other = turned(draft.axes);
      const b = describeAll(draft, other);
      const keyB = shapeKey(draft, b.features);
      const twin = inGroup.find((c) => sameShape(c.key, keyB));
      if (twin) {
        match = twin;
        axes = other;
        described = b;
        key = keyB;
      }
    }
    chosen.set(draft, { axes, ids: described.ids });
    if (match) {
      match.drafts.push(draft);
      continue;
    }
    const created: PartClass = { key, drafts: [draft], features: described.features };
    classes.push(created);
    if (inGroup) inGroup.push(created);
    else byGroup.set(draft.group, [created]);
  }

  const parts: Part[] = [];
  const placements: Placement[] = [];
  const partIdOf = new Map<PartDraft, string>();
  const used = new Map<string, number>();
  for (const { drafts: same, features } of classes) {
    const first = same[0]!;
    const named = first.name(same.map((d) => d.member));
    // Two different parts may earn the same name (end panels and centre panels): number them.
    const n = (used.get(named.id) ?? 0) + 1;
    used.set(named.id, n);
    const id = n === 1 ? named.id : `${named.id}-${n}`;
    const name = n === 1 ? named.name : `${named.name} ${n}`;
    const body = {
      id, name, role: first.role, material: first.material, grain: first.grain,
      lengthMm: first.size[0], widthMm: first.size[1], thicknessMm: first.size[2],
      features, notes: first.notes,
      ...(first.glueUp ? { glueUp: first.glueUp } : {}),
      ...grainMatchOf(same),
    };
    parts.push(Object.assign({}, body, { rough: roughFor(body), quantity: same.length }));
    same.forEach((draft, instance) => {
      partIdOf.set(draft, id);
      placements.push(placeInto(id, instance, draft.label, draft.size, chosen.get(draft)!.axes, draft.world, draft.explodeMm));
    });
  }

  const byKey = new Map<string, Joint>();
  for (const j of joints) {
    const a = partIdOf.get(j.a.draft)!;
    const b = partIdOf.get(j.b.draft)!;
    const aFeatures = j.a.featureIds.map((id) => chosen.get(j.a.draft)!.ids.get(id) ?? id);
    const bFeatures = j.b.featureIds.map((id) => chosen.get(j.b.draft)!.ids.get(id) ?? id);
    const key = `${j.type}|${a}|${aFeatures.join(',')}|${b}|${bFeatures.join(',')}|${round6(j.clearanceMm)}`;
    const existing = byKey.get(key);
    if (existing) {
      byKey.set(key, { ...existing, count: existing.count + 1 });
      continue;
    }
    byKey.set(key, {
      id: `${a}:${b}:${j.type}`,
      type: j.type,
      members: [{ partId: a, featureIds: aFeatures }, { partId: b, featureIds: bFeatures }],
      count: 1, clearanceMm: j.clearanceMm, glued: j.glued, floating: j.floating, note: j.note,
    });
  }
  const seen = new Map<string, number>();
  const jointList = [...byKey.values()].map((joint) => {
    const n = seen.get(joint.id) ?? 0;
    seen.set(joint.id, n + 1);
    return n === 0 ? joint : { ...joint, id: `${joint.id}:${n + 1}` };
  });
  return { parts, placements, joints: jointList, partIdOf };
}
