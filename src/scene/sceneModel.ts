/**
 * The 3D view's plan of what to draw, from an engine result: one mesh per placed part instance
 * with its world transform, world box, wood tone and grain direction. Pure data (no three.js
 * objects), so tests can compare it with the engine's parts and placements in node.
 */
import { assert } from '../../shared/assert.ts';
import { InputError } from '../../shared/errors.ts';
import { localBoxToWorld } from '../../shared/engine/geometry/placement.ts';
import type { Box3, Grain, Part, PieceResult, Placement, Vec3, WorldAxis } from '../../shared/engine/types.ts';
import { materialToneHex } from './woodTone.ts';
import { partSize, placementMatrixElements } from './partGeometry.ts';

/** One part instance to draw. */
export interface SceneMesh {
  /** Unique in the scene: `<partId>#<instance>`. */
  key: string;
  partId: string;
  instance: number;
  /** The instance's readable name, e.g. `front-left leg`. */
  label: string;
  /** World box of the instance after the exploded-view shift (mm). */
  worldBox: Box3;
  /** Local → world matrix, column-major (three's `Matrix4.elements`), mm. */
  matrixElements: number[];
  /** Display tone of the part's species or sheet good, `#rrggbb`. */
  toneHex: string;
  /** Grain of the part and the world axis it runs along (null for sheet goods). */
  grain: { kind: Grain; worldAxis: WorldAxis | null };
  materialKind: 'solid' | 'sheet';
}

/** What to draw for one result. */
export interface SceneModel {
  meshes: SceneMesh[];
  /** World box around every mesh as drawn (exploded or not), mm. */
  bounds: Box3;
}

/** Options for {@link sceneModel}. */
export interface SceneModelOptions {
  /** 0 = assembled, 1 = fully exploded; each part moves `Placement.explodeMm × explode`. */
  explode: number;
}

function grainAxis(grain: Grain, placement: Placement): WorldAxis | null {
  if (grain === 'length') return placement.axes.length;
  if (grain === 'width') return placement.axes.width;
  return null;
}

function unionBox(boxes: readonly Box3[]): Box3 {
  const min = [Infinity, Infinity, Infinity];
  const max = [-Infinity, -Infinity, -Infinity];
  for (const b of boxes) {
    for (let i = 0; i < 3; i++) {
      min[i] = Math.min(min[i]!, b.min[i]!);
      max[i] = Math.max(max[i]!, b.max[i]!);
    }
  }
  return { min: min as unknown as Vec3, max: max as unknown as Vec3 };
}

/** The meshes to draw for `result`, each part instance at its placement, shifted by `explode`. */
export function sceneModel(result: PieceResult, options: SceneModelOptions): SceneModel {
  const { explode } = options;
  if (!Number.isFinite(explode) || explode < 0 || explode > 1) {
    throw new InputError('explode', 'must be a number from 0 (assembled) to 1 (fully exploded)', '0 to 1');
  }
  const parts = new Map<string, Part>(result.parts.map((p) => [p.id, p]));
  const meshes = result.placements.map((placement): SceneMesh => {
    const part = parts.get(placement.partId);
    assert(part, `placement ${placement.label} names a part the result does not have: ${placement.partId}`);
    const offset: Vec3 = [placement.explodeMm[0] * explode, placement.explodeMm[1] * explode, placement.explodeMm[2] * explode];
    const size = partSize(part);
    const at = placement.positionMm;
    return {
      key: `${part.id}#${placement.instance}`,
      partId: part.id,
      instance: placement.instance,
      label: placement.label,
      worldBox: localBoxToWorld({ min: [0, 0, 0], max: size }, size, placement.axes, [at[0] + offset[0], at[1] + offset[1], at[2] + offset[2]]),
      matrixElements: placementMatrixElements(part, placement, offset),
      toneHex: materialToneHex(part.material),
      grain: { kind: part.grain, worldAxis: grainAxis(part.grain, placement) },
      materialKind: part.material.kind,
    };
  });
  const bounds = meshes.length > 0
    ? unionBox(meshes.map((m) => m.worldBox))
    : { min: result.bboxMinMm, max: [result.bboxMinMm[0] + result.bboxMm[0], result.bboxMinMm[1] + result.bboxMm[1], result.bboxMinMm[2] + result.bboxMm[2]] as Vec3 };
  return { meshes, bounds };
}
