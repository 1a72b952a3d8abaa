/**
 * From the engine's parts and placements to three.js: the world transform of a placed part and
 * the part's solid. Pure (no React, no DOM), so it runs in node tests.
 *
 * Everything here is in the engine's world: millimetres, Z up (see shared/engine/types.ts).
 * PieceView turns that world into three's metres and Y up once, on a parent group.
 */
import { Matrix4, type BufferGeometry } from 'three';
import type { Part, Placement, Vec3, WorldAxis } from '../../shared/engine/types.ts';
import { partSolidKey, partSolidSteps, plainPartSolid, plainSolidKey } from './partSolid.ts';

const AXIS_INDEX = { X: 0, Y: 1, Z: 2 } as const;

function parseAxis(axis: WorldAxis): { index: 0 | 1 | 2; sign: 1 | -1 } {
  return { index: AXIS_INDEX[axis[1] as 'X' | 'Y' | 'Z'], sign: axis[0] === '-' ? -1 : 1 };
}

/** A part's finished length, width and thickness (mm), its local box's high corner. */
export function partSize(part: Part): Vec3 {
  return [part.lengthMm, part.widthMm, part.thicknessMm];
}

/**
 * The 4×4 matrix (column-major, as three's `Matrix4.elements`) that carries a point in the part's
 * local frame to the world, mm. `Placement.positionMm` is the world low corner *after* turning,
 * so a local axis that points along a negative world axis puts local 0 at the high side: its
 * translation gains that axis's size. `offsetMm` is added afterwards (the exploded-view shift).
 */
export function placementMatrixElements(part: Part, placement: Placement, offsetMm: Vec3 = [0, 0, 0]): number[] {
  const size = partSize(part);
  const e = new Array<number>(16).fill(0);
  const translation: [number, number, number] = [
    placement.positionMm[0] + offsetMm[0],
    placement.positionMm[1] + offsetMm[1],
    placement.positionMm[2] + offsetMm[2],
  ];
  [placement.axes.length, placement.axes.width, placement.axes.thickness].forEach((axis, column) => {
    const { index, sign } = parseAxis(axis);
    e[column * 4 + index] = sign;
    if (sign < 0) translation[index] += size[column]!;
  });
  e[12] = translation[0];
  e[13] = translation[1];
  e[14] = translation[2];
  e[15] = 1;
  return e;
}

/** {@link placementMatrixElements} as a three.js matrix. */
export function placementMatrix(part: Part, placement: Placement, offsetMm: Vec3 = [0, 0, 0]): Matrix4 {
  return new Matrix4().fromArray(placementMatrixElements(part, placement, offsetMm));
}

/** A part's solid and its outline, shared by every instance of the part. */
export interface PartSolid {
  /** The solid in the part's local frame (mm), with joinery cut and tongues kept; UVs follow the grain. */
  geometry: BufferGeometry;
  /** Creases of the solid (box edges, groove walls) as line segments, for the graphite outline. */
  edges: BufferGeometry;
}

/**
 * Builds each distinct solid once. Two layers: a WeakMap on the immutable `Part` (every instance
 * of a part in one result gets the same objects without hashing), and a map on the part's shape
 * (size and cuts), so a new engine result whose rails did not change reuses the rails' solids
 * while the maker types. `retainOnly` frees the GPU-side buffers of solids no part uses any more.
 *
 * The cut solids (boolean operations) are the slow part of drawing a piece, so the view draws a
 * part's plain box (`box`, cheap) until its cut solid is ready (`peek`), and builds the cut solids
 * in idle time with `buildPending`, one boolean operation at a time.
 */
export interface PartSolidCache {
  /** The cut solid, built now if it is not yet (finishing a build `buildPending` began). */
  get(part: Part): PartSolid;
  /** The cut solid if it is built, else null. */
  peek(part: Part): PartSolid | null;
  /** The part's plain box (no cuts), shared by every part of the same size and grain. */
  box(part: Part): PartSolid;
  /**
   * Advances the builds of `parts`' missing cut solids, one boolean operation per step, while
   * `hasTime()` says so (always at least one step); returns how many parts still wait.
   */
  buildPending(parts: readonly Part[], hasTime: () => boolean): number;
  /** How many of `parts` have no cut solid yet. */
  pendingCount(parts: readonly Part[]): number;
  /** Disposes every solid whose shape is not among `parts`; returns how many were freed. */
  retainOnly(parts: readonly Part[]): number;
  /** Disposes everything (on unmount). */
  dispose(): void;
  /** Distinct cut solids held. */
  readonly size: number;
}

/** A new, empty {@link PartSolidCache}. */
export function createPartSolidCache(): PartSolidCache {
  let byPart = new WeakMap<Part, PartSolid>();
  const byShape = new Map<string, PartSolid>();
  const boxes = new Map<string, PartSolid>();
  const building = new Map<string, Generator<void, PartSolid, void>>();
  const keyOf = new WeakMap<Part, string>();
  const shapeKey = (part: Part): string => {
    let key = keyOf.get(part);
    if (key === undefined) {
      key = partSolidKey(part);
      keyOf.set(part, key);
    }
    return key;
  };
  const free = (solid: PartSolid): void => {
    solid.geometry.dispose();
    solid.edges.dispose();
  };
  const peek = (part: Part): PartSolid | null => {
    const known = byPart.get(part);
    if (known) return known;
    const solid = byShape.get(shapeKey(part));
    if (solid) byPart.set(part, solid);
    return solid ?? null;
  };
  /** One step of `part`'s build; true when its solid is done. */
  const step = (part: Part): boolean => {
    const key = shapeKey(part);
    let steps = building.get(key);
    if (!steps) {
      steps = partSolidSteps(part);
      building.set(key, steps);
    }
    const next = steps.next();
    if (!next.done) return false;
    building.delete(key);
    byShape.set(key, next.value);
    return true;
  };
  return {
    get(part) {
      const known = peek(part);
      if (known) return known;
      while (!step(part)) { /* finish it now */ }
      return peek(part)!;
    },
    peek,
    box(part) {
      const key = plainSolidKey(part);
      let solid = boxes.get(key);
      if (!solid) {
        solid = plainPartSolid(part);
        boxes.set(key, solid);
      }
      return solid;
    },
    buildPending(parts, hasTime) {
      const waiting = parts.filter((part) => !peek(part));
      let done = 0;
      let first = true;
      for (const part of waiting) {
        while (first || hasTime()) {
          first = false;
          if (step(part)) {
            done++;
            break;
          }
        }
        if (!hasTime()) break;
      }
      return waiting.length - done;
    },
    pendingCount(parts) {
      return parts.filter((part) => !peek(part)).length;
    },
    retainOnly(parts) {
      const keep = new Set(parts.map(shapeKey));
      let freed = 0;
      for (const [key, solid] of byShape) {
        if (keep.has(key)) continue;
        free(solid);
        byShape.delete(key);
        freed++;
      }
      for (const key of building.keys()) if (!keep.has(key)) building.delete(key);
      const keepBoxes = new Set(parts.map(plainSolidKey));
      for (const [key, solid] of boxes) {
        if (keepBoxes.has(key)) continue;
        free(solid);
        boxes.delete(key);
      }
      // Parts of older results may still point at freed solids: forget them all.
      if (freed > 0) byPart = new WeakMap();
      return freed;
    },
    dispose() {
      for (const solid of [...byShape.values(), ...boxes.values()]) free(solid);
      byShape.clear();
      boxes.clear();
      building.clear();
      byPart = new WeakMap();
    },
    get size() {
      return byShape.size;
    },
  };
}
