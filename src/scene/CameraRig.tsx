import { useEffect, useRef } from 'react';
import { useFrame, useThree } from '@react-three/fiber';
import { Vector3 } from 'three';
import type { OrbitControls as OrbitControlsImpl } from 'three-stdlib';
import type { Box3 } from '../../shared/engine/types.ts';
import { fitCamera, presetCamera, type PresetView } from './cameraPresets.ts';

/** How quickly the camera closes on a preset: the remaining distance shrinks by e every 1/RATE s. */
const APPROACH_RATE_PER_S = 7;
/** Close enough (m) to stop moving and say the view has settled. */
const SETTLED_M = 1e-4;

/**
 * Moves the camera to the preset `view`, framed on `bounds`: a jump the first time, a short
 * glide after. A new `fitKey` (the explode amount) glides to frame `bounds` again from wherever
 * the maker is looking, so an exploded lid stays in view. Mutates the camera and controls in
 * `useFrame` only while gliding (no React state per frame) and marks the canvas
 * `data-camera-settled` so tests know when to look.
 */
export function CameraRig(props: { view: PresetView; bounds: Box3; framingKey: string; fitKey?: string }) {
  const { view, bounds, framingKey, fitKey = '' } = props;
  const camera = useThree((s) => s.camera);
  const controls = useThree((s) => s.controls) as OrbitControlsImpl | null;
  const invalidate = useThree((s) => s.invalidate);
  const canvas = useThree((s) => s.gl.domElement);
  const size = useThree((s) => s.size);
  const aspect = size.height > 0 ? size.width / size.height : 1;
  const aspectRef = useRef(aspect);
  aspectRef.current = aspect;
  const goal = useRef<{ position: Vector3; target: Vector3 } | null>(null);
  const placed = useRef(false);
  // Only a new view or a new piece reframes; typing a new width must not yank the camera.
  const boundsRef = useRef(bounds);
  boundsRef.current = bounds;

  useEffect(() => {
    if (!controls) return;
    const preset = presetCamera(view, boundsRef.current, aspectRef.current);
    const position = new Vector3(...preset.position);
    const target = new Vector3(...preset.target);
    if (!placed.current) {
      placed.current = true;
      camera.position.copy(position);
      controls.target.copy(target);
      controls.update();
      canvas.dataset.cameraSettled = 'true';
    } else {
      goal.current = { position, target };
      canvas.dataset.cameraSettled = 'false';
    }
    invalidate();
  }, [view, framingKey, controls, camera, canvas, invalidate]);

  const lastFit = useRef(fitKey);
  useEffect(() => {
    if (!controls || !placed.current || lastFit.current === fitKey) return;
    lastFit.current = fitKey;
    // From where the camera stands now (or is gliding to), toward the camera.
    const from = goal.current ?? { position: camera.position, target: controls.target };
    const direction = from.position.clone().sub(from.target);
    const fit = fitCamera([direction.x, direction.y, direction.z], boundsRef.current, aspectRef.current);
    goal.current = { position: new Vector3(...fit.position), target: new Vector3(...fit.target) };
    canvas.dataset.cameraSettled = 'false';
    invalidate();
  }, [fitKey, controls, camera, canvas, invalidate]);

  useFrame((_, delta) => {
    const g = goal.current;
    if (!g || !controls) return;
    const k = 1 - Math.exp(-Math.min(delta, 0.1) * APPROACH_RATE_PER_S);
    camera.position.lerp(g.position, k);
    controls.target.lerp(g.target, k);
    if (camera.position.distanceTo(g.position) < SETTLED_M && controls.target.distanceTo(g.target) < SETTLED_M) {
      camera.position.copy(g.position);
      controls.target.copy(g.target);
      goal.current = null;
      canvas.dataset.cameraSettled = 'true';
    }
    controls.update();
    invalidate();
  });
  return null;
}
