/** Axis-aligned boxes in mm, the engine's only solid: parts, cuts and tongues are all boxes. */
import type { Box3, Vec3 } from '../types.ts';

/** A box from its low corner and its size, mm. */
export function boxAt(min: Vec3, size: Vec3): Box3 {
  return { min, max: [min[0] + size[0], min[1] + size[1], min[2] + size[2]] };
}

/** A box from two opposite corners in any order, mm. */
export function boxBetween(a: Vec3, b: Vec3): Box3 {
  return {
    min: [Math.min(a[0], b[0]), Math.min(a[1], b[1]), Math.min(a[2], b[2])],
    max: [Math.max(a[0], b[0]), Math.max(a[1], b[1]), Math.max(a[2], b[2])],
  };
}

/** Size of a box along x, y and z, mm. */
export function boxSize(box: Box3): Vec3 {
  return [box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]];
}

/** Volume in mm³; 0 for an empty or inverted box. */
export function boxVolume(box: Box3): number {
  const [x, y, z] = boxSize(box);
  return x > 0 && y > 0 && z > 0 ? x * y * z : 0;
}

/** The common part of two boxes, or null when they do not overlap with positive volume. */
export function boxIntersection(a: Box3, b: Box3): Box3 | null {
  const min: Vec3 = [Math.max(a.min[0], b.min[0]), Math.max(a.min[1], b.min[1]), Math.max(a.min[2], b.min[2])];
  const max: Vec3 = [Math.min(a.max[0], b.max[0]), Math.min(a.max[1], b.max[1]), Math.min(a.max[2], b.max[2])];
  return max[0] > min[0] && max[1] > min[1] && max[2] > min[2] ? { min, max } : null;
}

/** True when `inner` lies inside `outer`, allowing `toleranceMm` on every side. */
export function boxContains(outer: Box3, inner: Box3, toleranceMm = 0): boolean {
  for (let i = 0; i < 3; i++) {
    if (inner.min[i]! < outer.min[i]! - toleranceMm) return false;
    if (inner.max[i]! > outer.max[i]! + toleranceMm) return false;
  }
  return true;
}

/** The smallest box holding all `boxes`; asserts there is at least one. */
export function boxUnion(boxes: readonly Box3[]): Box3 {
  const first = boxes[0];
  if (!first) throw new Error('Assertion failed: boxUnion needs at least one box');
  const min = [...first.min] as [number, number, number];
  const max = [...first.max] as [number, number, number];
  for (const b of boxes) {
    for (let i = 0; i < 3; i++) {
      min[i] = Math.min(min[i]!, b.min[i]!);
      max[i] = Math.max(max[i]!, b.max[i]!);
    }
  }
  return { min, max };
}
