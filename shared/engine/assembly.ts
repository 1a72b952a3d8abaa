/**
 * Collects part instances drawn in world coordinates and turns them into the engine's result:
 * identical instances (same size, material and cuts in their own frame) become one `Part` with a
 * quantity and one `Placement` each, and joints between instances become joints between parts.
 */
import type { Box3, Feature, Grain, GlueUpPlan, Joint, JointType, Material, Part, PartRole, Placement, RoughSize, Vec3 } from './types.ts';
import { describeFeature, type FeatureDraft } from './geometry/featureDescribe.ts';
import { placeInto, type AxisMap } from './geometry/placement.ts';

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

function signature(draft: PartDraft, features: readonly Feature[]): string {
  const material = draft.material.kind === 'solid' ? draft.material.speciesId : draft.material.sheetId;
  return JSON.stringify([draft.role, material, draft.grain, draft.size.map(round6), draft.glueUp?.boards ?? 0, features], (_key, value: unknown) =>
    typeof value === 'number' ? round6(value) : value,
  );
}

/** Merges identical instances into parts and resolves joints to part ids. */
export function assemble(drafts: readonly PartDraft[], joints: readonly JointDraft[], roughFor: RoughSizer): Assembled {
  const classes = new Map<string, { drafts: PartDraft[]; features: Feature[] }>();
  for (const draft of drafts) {
    const features = draft.features.map((f) => describeFeature(f, draft.size, draft.axes, draft.world.min));
    const key = `${draft.group}|${signature(draft, features)}`;
    const existing = classes.get(key);
    if (existing) existing.drafts.push(draft);
    else classes.set(key, { drafts: [draft], features });
  }

  const parts: Part[] = [];
  const placements: Placement[] = [];
  const partIdOf = new Map<PartDraft, string>();
  for (const { drafts: same, features } of classes.values()) {
    const first = same[0]!;
    const { id, name } = first.name(same.map((d) => d.member));
    const body = {
      id, name, role: first.role, material: first.material, grain: first.grain,
      lengthMm: first.size[0], widthMm: first.size[1], thicknessMm: first.size[2],
      features, notes: first.notes,
      ...(first.glueUp ? { glueUp: first.glueUp } : {}),
    };
    parts.push({ ...body, rough: roughFor(body), quantity: same.length });
    same.forEach((draft, instance) => {
      partIdOf.set(draft, id);
      placements.push(placeInto(id, instance, draft.label, draft.size, draft.axes, draft.world, draft.explodeMm));
    });
  }

  const byKey = new Map<string, Joint>();
  for (const j of joints) {
    const a = partIdOf.get(j.a.draft)!;
    const b = partIdOf.get(j.b.draft)!;
    const key = JSON.stringify([j.type, a, j.a.featureIds, b, j.b.featureIds, round6(j.clearanceMm)]);
    const existing = byKey.get(key);
    if (existing) {
      byKey.set(key, { ...existing, count: existing.count + 1 });
      continue;
    }
    byKey.set(key, {
      id: `${a}:${b}:${j.type}`,
      type: j.type,
      members: [{ partId: a, featureIds: j.a.featureIds }, { partId: b, featureIds: j.b.featureIds }],
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
