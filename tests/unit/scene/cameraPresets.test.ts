import { describe, expect, it } from 'vitest';
import { PerspectiveCamera, Vector3 } from 'three';
import { CAMERA_FOV_DEG, fitCamera, presetCamera, type PresetView } from '../../../src/scene/cameraPresets.ts';
import { engineToThree } from '../../../src/scene/sceneFrame.ts';
import { buildPiece, defaultSpec } from '../../../shared/engine/index.ts';
import type { Box3, Vec3 } from '../../../shared/engine/types.ts';
import { sceneModel } from '../../../src/scene/sceneModel.ts';

/** A chest-like box: 40 × 19 × 23 in with a lid overhang reaching into negative x and y (mm). */
const CHEST: Box3 = { min: [-19, -25, 0], max: [1035, 483, 584] };
const VIEWS: PresetView[] = ['front', 'side', 'top', 'three-quarter'];

function cornersOnScreen(view: PresetView, aspect: number): number[][] {
  const { position, target } = presetCamera(view, CHEST, aspect);
  const camera = new PerspectiveCamera(CAMERA_FOV_DEG, aspect, 0.01, 100);
  camera.position.set(...position);
  camera.lookAt(new Vector3(...target));
  camera.updateMatrixWorld();
  const out: number[][] = [];
  for (const x of [CHEST.min[0], CHEST.max[0]]) for (const y of [CHEST.min[1], CHEST.max[1]]) for (const z of [CHEST.min[2], CHEST.max[2]]) {
    const p = new Vector3(...engineToThree([x, y, z])).project(camera);
    out.push([p.x, p.y]);
  }
  return out;
}

describe('presetCamera', () => {
  it('frames the whole piece in every view and aspect, filling most of the view', () => {
    for (const view of VIEWS) {
      for (const aspect of [0.6, 1, 1.8, 2.6]) {
        const corners = cornersOnScreen(view, aspect);
        const reach = Math.max(...corners.flat().map(Math.abs));
        expect(reach).toBeLessThanOrEqual(1);
        // The frame margin is 1.2: the farthest corner sits about 1/1.2 of the way to the edge.
        expect(reach).toBeGreaterThan(0.7);
      }
    }
  });

  it('looks at the front from in front, at the side from the right and at the top from above', () => {
    const centre = engineToThree([(CHEST.min[0] + CHEST.max[0]) / 2, (CHEST.min[1] + CHEST.max[1]) / 2, (CHEST.min[2] + CHEST.max[2]) / 2]);
    const front = presetCamera('front', CHEST).position;
    // The piece's front faces three's +z (engine y runs to the back, toward −z).
    expect(front[2]).toBeGreaterThan(centre[2]);
    expect(front[0]).toBeCloseTo(centre[0], 9);
    expect(presetCamera('side', CHEST).position[0]).toBeGreaterThan(engineToThree(CHEST.max)[0]);
    expect(presetCamera('top', CHEST).position[1]).toBeGreaterThan(engineToThree(CHEST.max)[1]);
    const quarter = presetCamera('three-quarter', CHEST).position;
    expect(quarter[0]).toBeGreaterThan(centre[0]);
    expect(quarter[1]).toBeGreaterThan(centre[1]);
    expect(quarter[2]).toBeGreaterThan(centre[2]);
  });
});

/** Furthest reach of `bounds`' corners from the screen centre (1 = the edge) seen from `camera`. */
function reachOnScreen(fit: { position: Vec3; target: Vec3 }, bounds: Box3, aspect: number): number {
  const camera = new PerspectiveCamera(CAMERA_FOV_DEG, aspect, 0.01, 100);
  camera.position.set(...fit.position);
  camera.lookAt(new Vector3(...fit.target));
  camera.updateMatrixWorld();
  let reach = 0;
  for (const x of [bounds.min[0], bounds.max[0]]) for (const y of [bounds.min[1], bounds.max[1]]) for (const z of [bounds.min[2], bounds.max[2]]) {
    const p = new Vector3(...engineToThree([x, y, z])).project(camera);
    reach = Math.max(reach, Math.abs(p.x), Math.abs(p.y));
  }
  return reach;
}

describe('fitCamera', () => {
  it('stands where the preset does when given the preset\'s direction', () => {
    const preset = presetCamera('three-quarter', CHEST, 1.6);
    const direction: Vec3 = [preset.position[0] - preset.target[0], preset.position[1] - preset.target[1], preset.position[2] - preset.target[2]];
    const fit = fitCamera(direction, CHEST, 1.6);
    for (let i = 0; i < 3; i++) expect(fit.position[i]).toBeCloseTo(preset.position[i]!, 9);
  });

  it('keeps a fully exploded chest in view, lid and all, where the assembled framing would not', () => {
    const result = buildPiece(defaultSpec('chest'));
    const assembled = sceneModel(result, { explode: 0 }).bounds;
    const exploded = sceneModel(result, { explode: 1 }).bounds;
    const direction: Vec3 = [0.62, 0.5, 1];
    // The assembled framing leaves the exploded parts running off the view (reach over 1)…
    expect(reachOnScreen(fitCamera(direction, assembled, 1.8), exploded, 1.8)).toBeGreaterThan(1);
    // …the refit frames all of them.
    expect(reachOnScreen(fitCamera(direction, exploded, 1.8), exploded, 1.8)).toBeLessThanOrEqual(1);
  });

  it('looks straight down without losing its bearings', () => {
    const fit = fitCamera([0, 1, 0], CHEST, 1);
    expect(fit.position.every(Number.isFinite)).toBe(true);
    expect(reachOnScreen(fit, CHEST, 1)).toBeLessThanOrEqual(1);
  });
});
