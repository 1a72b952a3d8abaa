/**
 * Turning a part's local frame into the world: a signed axis for each local axis (a proper
 * rotation by 90° steps) and the world position of the part's low corner. See `Placement`.
 */
import { assert } from '../../assert.ts';
import type { Box3, PartFace, Placement, Vec3, WorldAxis } from '../types.ts';

/** Local axes → signed world axes, as stored on a {@link Placement}. */
export type AxisMap = Placement['axes'];

interface ParsedAxis {
  readonly index: 0 | 1 | 2;
  readonly sign: 1 | -1;
}

// One shared answer per axis, read from the characters: parsing runs for every box of every cut
// on each rebuild, where a fresh object per call, or a keyed lookup on a string built at run
// time, was a measurable share of the engine's time.
const PARSED: readonly (readonly [ParsedAxis, ParsedAxis])[] = [
  [{ index: 0, sign: -1 }, { index: 0, sign: 1 }],
  [{ index: 1, sign: -1 }, { index: 1, sign: 1 }],
  [{ index: 2, sign: -1 }, { index: 2, sign: 1 }],
];
const CODE_X = 'X'.charCodeAt(0);
const CODE_MINUS = '-'.charCodeAt(0);

function parseAxis(axis: WorldAxis): ParsedAxis {
  return PARSED[axis.charCodeAt(1) - CODE_X]![axis.charCodeAt(0) === CODE_MINUS ? 0 : 1];
}

// Hot paths below use plain loops: the engine places every part and cut of a piece on each
// keystroke, and per-call closures and arrays cost more than the arithmetic.
function localAxis(axes: AxisMap, local: number): WorldAxis {
  return local === 0 ? axes.length : local === 1 ? axes.width : axes.thickness;
}

/** The 3×3 rotation matrix of `axes`, columns = where local x, y, z point. */
export function axisMatrix(axes: AxisMap): number[][] {
  const m = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let column = 0; column < 3; column++) {
    const { index, sign } = parseAxis(localAxis(axes, column));
    m[index]![column] = sign;
  }
  return m;
}

/** Determinant of the axis mapping: +1 for a rotation, -1 for a mirror, 0 when axes repeat. */
export function axisDeterminant(axes: AxisMap): number {
  // A signed permutation matrix: its determinant is the product of the signs times the
  // permutation's parity, and 0 when two local axes share a world axis.
  const a = parseAxis(axes.length);
  const b = parseAxis(axes.width);
  const c = parseAxis(axes.thickness);
  if (a.index === b.index || b.index === c.index || a.index === c.index) return 0;
  // (0 1 2), (1 2 0) and (2 0 1) are the even permutations.
  const even = (b.index - a.index + 3) % 3 === 1;
  return a.sign * b.sign * c.sign * (even ? 1 : -1);
}

/** The part's size along world X, Y and Z once turned by `axes`, mm. */
export function worldSize(axes: AxisMap, size: Vec3): Vec3 {
  const out: [number, number, number] = [0, 0, 0];
  for (let i = 0; i < 3; i++) out[parseAxis(localAxis(axes, i)).index] = size[i]!;
  return out;
}

/**
 * Maps a box in a part's local frame to the world, for a part of local `size` placed with its
 * low world corner at `positionMm`.
 */
export function localBoxToWorld(box: Box3, size: Vec3, axes: AxisMap, positionMm: Vec3): Box3 {
  const min: [number, number, number] = [0, 0, 0];
  const max: [number, number, number] = [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    const { index, sign } = parseAxis(localAxis(axes, i));
    const lo = sign > 0 ? box.min[i]! : size[i]! - box.max[i]!;
    const hi = sign > 0 ? box.max[i]! : size[i]! - box.min[i]!;
    min[index] = positionMm[index]! + lo;
    max[index] = positionMm[index]! + hi;
  }
  return { min, max };
}

/**
 * The placement that puts a part of local `size`, turned by `axes`, so that it fills the world
 * box `world`. Asserts the sizes agree and the mapping is a rotation, not a mirror.
 */
export function placeInto(
  partId: string,
  instance: number,
  label: string,
  size: Vec3,
  axes: AxisMap,
  world: Box3,
  explodeMm: Vec3,
): Placement {
  if (axisDeterminant(axes) !== 1) assert(false, `placement of ${partId} must be a rotation, not a mirror`);
  const turned = worldSize(axes, size);
  for (let i = 0; i < 3; i++) {
    const span = world.max[i]! - world.min[i]!;
    if (Math.abs(span - turned[i]!) >= 1e-6) assert(false, `${partId} does not fill its place on axis ${i}: ${span} vs ${turned[i]}`);
  }
  return { partId, instance, label, positionMm: world.min, axes, explodeMm };
}

/** Maps a world box back into the local frame of a part placed at `positionMm` with `axes`. */
export function worldBoxToLocal(box: Box3, size: Vec3, axes: AxisMap, positionMm: Vec3): Box3 {
  const min: [number, number, number] = [0, 0, 0];
  const max: [number, number, number] = [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    const { index, sign } = parseAxis(localAxis(axes, i));
    const lo = box.min[index]! - positionMm[index]!;
    const hi = box.max[index]! - positionMm[index]!;
    min[i] = sign > 0 ? lo : size[i]! - hi;
    max[i] = sign > 0 ? hi : size[i]! - lo;
  }
  return { min, max };
}

/**
 * `worldBoxToLocal` written into `out` from index `at`: the local box's min x, y, z then max
 * x, y, z (mm), the same numbers without a box object, for loops that only compare them.
 */
export function worldBoxToLocalInto(box: Box3, size: Vec3, axes: AxisMap, positionMm: Vec3, out: Float64Array | number[], at: number): void {
  for (let i = 0; i < 3; i++) {
    const { index, sign } = parseAxis(localAxis(axes, i));
    const lo = box.min[index]! - positionMm[index]!;
    const hi = box.max[index]! - positionMm[index]!;
    out[at + i] = sign > 0 ? lo : size[i]! - hi;
    out[at + 3 + i] = sign > 0 ? hi : size[i]! - lo;
  }
}

const FACE_BY_LOCAL: readonly (readonly [PartFace, PartFace])[] = [
  ['end-a', 'end-b'],
  ['edge-a', 'edge-b'],
  ['face-a', 'face-b'],
];

/** The face of a placed part that looks toward the world direction `direction`. */
export function localFaceOf(axes: AxisMap, direction: WorldAxis): PartFace {
  const wanted = parseAxis(direction);
  for (let local = 0; local < 3; local++) {
    const axis = parseAxis(localAxis(axes, local));
    if (axis.index === wanted.index) return FACE_BY_LOCAL[local]![axis.sign * wanted.sign > 0 ? 1 : 0]!;
  }
  throw new Error(`Assertion failed: no local axis maps to ${direction}`);
}

const OPPOSITE: Readonly<Record<WorldAxis, WorldAxis>> = { '+X': '-X', '-X': '+X', '+Y': '-Y', '-Y': '+Y', '+Z': '-Z', '-Z': '+Z' };

/** The world direction opposite `axis`. */
export function oppositeAxis(axis: WorldAxis): WorldAxis {
  return OPPOSITE[axis];
}

const UNIT: Readonly<Record<WorldAxis, Vec3>> = {
  '+X': [1, 0, 0], '-X': [-1, 0, 0], '+Y': [0, 1, 0], '-Y': [0, -1, 0], '+Z': [0, 0, 1], '-Z': [0, 0, -1],
};

/** The unit vector of a signed world axis (shared and read-only). */
export function axisVector(axis: WorldAxis): Vec3 {
  return UNIT[axis];
}
