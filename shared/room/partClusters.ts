/** Groups placed parts into the pieces they make up: parts whose boxes touch belong together. */
import type { Box3 } from '../engine/types.ts';

/** Boxes closer than this (mm) on every axis count as touching: glued or screwed together. */
export const TOUCH_GAP_MM = 1;

/** The groups of `items` whose boxes touch, directly or through others, in first-seen order. */
export function touchingGroups<T extends { box: Box3 }>(items: readonly T[]): T[][] {
  const parent = items.map((_, i) => i);
  const root = (i: number): number => {
    while (parent[i] !== i) i = parent[i] = parent[parent[i]!]!;
    return i;
  };
  for (let i = 0; i < items.length; i++) {
    for (let j = i + 1; j < items.length; j++) {
      if (touch(items[i]!.box, items[j]!.box)) parent[root(j)] = root(i);
    }
  }
  const groups = new Map<number, T[]>();
  items.forEach((item, i) => {
    const r = root(i);
    groups.set(r, [...(groups.get(r) ?? []), item]);
  });
  return [...groups.values()];
}

function touch(a: Box3, b: Box3): boolean {
  for (let i = 0; i < 3; i++) {
    if (a.min[i]! > b.max[i]! + TOUCH_GAP_MM || b.min[i]! > a.max[i]! + TOUCH_GAP_MM) return false;
  }
  return true;
}
