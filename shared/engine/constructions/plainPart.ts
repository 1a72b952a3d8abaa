/** A part drawn as a plain world box with its axes: the size follows from the box. */
import type { PartDraft, PartNamer } from '../assembly.ts';
import type { FeatureDraft } from '../geometry/featureDescribe.ts';
import type { AxisMap } from '../geometry/placement.ts';
import type { Box3, GlueUpPlan, Grain, GrainMatch, Material, PartRole, Vec3 } from '../types.ts';

/** Options for {@link plainPart}: everything of a {@link PartDraft} but its size. */
export interface PlainPartOptions {
  group: string;
  member: string;
  label: string;
  role: PartRole;
  material: Material;
  grain: Grain;
  world: Box3;
  axes: AxisMap;
  explodeMm: Vec3;
  features?: readonly FeatureDraft[];
  notes?: readonly string[];
  glueUp?: GlueUpPlan;
  grainMatch?: GrainMatch;
  name: PartNamer;
}

const INDEX = { X: 0, Y: 1, Z: 2 } as const;

/** A part filling `world`, turned by `axes`; its local size is the box's extent along each mapped axis (mm). */
export function plainPart(o: PlainPartOptions): PartDraft {
  const extent = (axis: AxisMap['length']): number => {
    const i = INDEX[axis[1] as 'X' | 'Y' | 'Z'];
    return o.world.max[i]! - o.world.min[i]!;
  };
  // Optional fields assigned after the literal rather than spread into it: spreads run slowly
  // in V8, and dressers and cabinets draw dozens of plain parts per build.
  const draft: PartDraft = {
    group: o.group, member: o.member, label: o.label, role: o.role, material: o.material, grain: o.grain,
    size: [extent(o.axes.length), extent(o.axes.width), extent(o.axes.thickness)],
    axes: o.axes, world: o.world, explodeMm: o.explodeMm,
    features: o.features ?? [], notes: o.notes ?? [], name: o.name,
  };
  if (o.glueUp) draft.glueUp = o.glueUp;
  if (o.grainMatch) draft.grainMatch = o.grainMatch;
  return draft;
}

/** A namer that gives every instance the same id and name. */
export function fixedName(id: string, name: string): PartNamer {
  return () => ({ id, name });
}
