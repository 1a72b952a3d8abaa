/**
 * A part's solid: its finished box with every feature's removed material subtracted
 * (three-bvh-csg), tongues kept, and texture coordinates laid along the grain. Built in the
 * part's local frame (mm): x along the length, y across the width, z through the thickness.
 */
import { BoxGeometry, BufferAttribute, type BufferGeometry } from 'three';
import { Brush, Evaluator, ADDITION, SUBTRACTION } from 'three-bvh-csg';
import type { Box3, Part } from '../../shared/engine/types.ts';
import { outlineEdges } from './outlineEdges.ts';
import type { PartSolid } from './partGeometry.ts';

/**
 * A cut that reaches a part's surface is pushed this far beyond it, so the cutter's face is never
 * coplanar with the part's (coplanar faces leave slivers in boolean operations).
 */
const CUT_OVERRUN_MM = 1;
/** A cut face within this distance of the part's surface counts as reaching it. */
const SURFACE_TOLERANCE_MM = 1e-6;
/** One tile of the grain texture covers this much wood along and across the grain. */
export const GRAIN_TILE_ALONG_MM = 600;
export const GRAIN_TILE_ACROSS_MM = 150;

const round = (n: number): number => Math.round(n * 1e4) / 1e4;

const size3 = (part: Part): [number, number, number] => [part.lengthMm, part.widthMm, part.thicknessMm];

function boxBrush(box: Box3): Brush {
  const sx = box.max[0] - box.min[0];
  const sy = box.max[1] - box.min[1];
  const sz = box.max[2] - box.min[2];
  const geometry = new BoxGeometry(sx, sy, sz).translate(box.min[0] + sx / 2, box.min[1] + sy / 2, box.min[2] + sz / 2);
  geometry.deleteAttribute('uv');
  const brush = new Brush(geometry);
  brush.updateMatrixWorld();
  return brush;
}

/** The removed box clipped to the part and pushed out past every face it reaches; null when it misses. */
function cutterBox(box: Box3, size: readonly number[]): Box3 | null {
  const min: [number, number, number] = [0, 0, 0];
  const max: [number, number, number] = [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    const lo = box.min[i]!;
    const hi = box.max[i]!;
    if (hi <= SURFACE_TOLERANCE_MM || lo >= size[i]! - SURFACE_TOLERANCE_MM || hi <= lo) return null;
    min[i] = lo <= SURFACE_TOLERANCE_MM ? -CUT_OVERRUN_MM : lo;
    max[i] = hi >= size[i]! - SURFACE_TOLERANCE_MM ? size[i]! + CUT_OVERRUN_MM : hi;
  }
  return { min, max };
}

function overlaps(a: Box3, b: Box3): boolean {
  for (let i = 0; i < 3; i++) {
    if (Math.min(a.max[i]!, b.max[i]!) - Math.max(a.min[i]!, b.min[i]!) <= SURFACE_TOLERANCE_MM) return false;
  }
  return true;
}

/**
 * Texture coordinates in tiles of the grain texture, whose streaks run along u. On faces the
 * grain runs along, u follows the grain; on end grain the growth rings run across the width,
 * stacked through the thickness, so u follows the remaining in-plane axis and v the thickness.
 * Sheet goods (grain `none`) get plain planar coordinates.
 */
export function writeGrainUvs(geometry: BufferGeometry, grain: Part['grain']): void {
  const position = geometry.getAttribute('position');
  const normal = geometry.getAttribute('normal');
  const uv = new Float32Array(position.count * 2);
  const along = grain === 'width' ? 1 : 0;
  for (let v = 0; v < position.count; v++) {
    const p = [position.getX(v), position.getY(v), position.getZ(v)];
    const n = [Math.abs(normal.getX(v)), Math.abs(normal.getY(v)), Math.abs(normal.getZ(v))];
    const facing = n[0]! >= n[1]! && n[0]! >= n[2]! ? 0 : n[1]! >= n[2]! ? 1 : 2;
    const inPlane = [0, 1, 2].filter((a) => a !== facing);
    let uAxis: number;
    let vAxis: number;
    if (grain === 'none') [uAxis, vAxis] = [inPlane[0]!, inPlane[1]!];
    else if (facing !== along) [uAxis, vAxis] = [along, inPlane.find((a) => a !== along)!];
    else [uAxis, vAxis] = [inPlane.find((a) => a !== 2)!, 2];
    uv[v * 2] = p[uAxis]! / GRAIN_TILE_ALONG_MM;
    uv[v * 2 + 1] = p[vAxis]! / GRAIN_TILE_ACROSS_MM;
  }
  geometry.setAttribute('uv', new BufferAttribute(uv, 2));
}

/**
 * three-bvh-csg 0.0.18 still passes `maxLeafSize` to three-mesh-bvh 0.9, which warns on every
 * boolean operation (dozens per piece) although the option still works; keep that one notice out
 * of the console while the operations run, and let every other warning through.
 */
function withoutLeafSizeNotice<T>(run: () => T): T {
  const warn = console.warn;
  console.warn = (...args: unknown[]) => {
    if (typeof args[0] === 'string' && args[0].startsWith('BVH: "maxLeafSize"')) return;
    warn(...args);
  };
  try {
    return run();
  } finally {
    console.warn = warn;
  }
}

/**
 * The part's solid geometry in its local frame (mm), built one boolean operation per step: the
 * generator yields after each cut so a caller can spread a part's cuts over idle time and never
 * hold the page for a whole part (a cabinet side with rows of shelf-pin holes takes dozens of
 * cuts). Not cached: see `createPartSolidCache`.
 */
export function* partGeometrySteps(part: Part): Generator<void, BufferGeometry, void> {
  const size = size3(part);
  const body = { min: [0, 0, 0], max: size } as const satisfies Box3;
  const cutters = part.features.flatMap((f) => f.removed).map((b) => cutterBox(b, size)).filter((b): b is Box3 => b !== null);
  // A tongue is what the cheek and shoulder cuts leave; add it back only if a cut drawn over it took it away.
  const tongues = part.features.flatMap((f) => (f.type === 'tongue' ? [f.tongue] : [])).filter((t) => cutters.some((c) => overlaps(c, t)));

  let solid = boxBrush(body);
  if (cutters.length > 0 || tongues.length > 0) {
    const evaluator = new Evaluator();
    evaluator.attributes = ['position', 'normal'];
    evaluator.useGroups = false;
    const operations = [...cutters.map((box) => ({ box, op: SUBTRACTION })), ...tongues.map((box) => ({ box, op: ADDITION }))];
    for (const { box, op } of operations) {
      const before = solid;
      solid = withoutLeafSizeNotice(() => evaluator.evaluate(before, boxBrush(box), op));
      yield;
    }
  }
  const geometry = solid.geometry;
  geometry.clearGroups();
  writeGrainUvs(geometry, part.grain);
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return geometry;
}

/** Runs a stepwise build to its end at once. */
function finish<T>(steps: Generator<void, T, void>): T {
  let step = steps.next();
  while (!step.done) step = steps.next();
  return step.value;
}

/** The part's solid geometry in its local frame (mm), all cuts at once. */
export function buildPartGeometry(part: Part): BufferGeometry {
  return finish(partGeometrySteps(part));
}

/** The solid and its outline, one step per cut and one for the outline (see {@link partGeometrySteps}). */
export function* partSolidSteps(part: Part): Generator<void, PartSolid, void> {
  const geometry = yield* partGeometrySteps(part);
  yield;
  return { geometry, edges: outlineEdges(geometry) };
}

/** The solid and its outline, for the cache. */
export function buildPartSolid(part: Part): PartSolid {
  return finish(partSolidSteps(part));
}

/**
 * The part's finished box with no cuts, grain laid as on the real solid: what the view draws at
 * once while the cut solid waits for idle time. A box's outline is its twelve edges.
 */
export function plainPartSolid(part: Part): PartSolid {
  const [sx, sy, sz] = size3(part);
  const geometry = new BoxGeometry(sx, sy, sz).translate(sx / 2, sy / 2, sz / 2);
  writeGrainUvs(geometry, part.grain);
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return { geometry, edges: outlineEdges(geometry) };
}

/** What a part's plain box depends on: its size and grain. */
export function plainSolidKey(part: Part): string {
  return JSON.stringify([size3(part).map(round), part.grain]);
}

/** What the solid depends on — size, grain and cuts — as a string; equal keys give equal solids. */
export function partSolidKey(part: Part): string {
  const boxes = (list: readonly Box3[]): number[][] => list.map((b) => [...b.min, ...b.max].map(round));
  return JSON.stringify([
    size3(part).map(round),
    part.grain,
    part.features.map((f) => [boxes(f.removed), f.type === 'tongue' ? boxes([f.tongue]) : []]),
  ]);
}
