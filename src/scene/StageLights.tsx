import { useLayoutEffect, useMemo } from 'react';
import { DirectionalLight } from 'three';
import type { Box3 } from '../../shared/engine/types.ts';
import { boxSphere } from './sceneFrame.ts';

/** The paper of the drafting table, behind and under the piece. */
export const PAPER_HEX = '#f4efe4';
/** Shadow map size: soft enough, light enough for software rendering. */
const SHADOW_MAP_PX = 1024;

/**
 * Light as at a bench under a window: a soft sky fill, a key light from the front-left above
 * that casts the piece's shadow on the floor, and a weak back light to separate the edges.
 * The key light's shadow box follows the bounds; `shadowCatcher` false leaves out the paper floor
 * that shows the shadow (the room view has its own floor).
 */
export function StageLights(props: { bounds: Box3; shadowCatcher?: boolean }) {
  const { centre, radius } = boxSphere(props.bounds);
  const key = useMemo(() => {
    const light = new DirectionalLight('#fffaf0', 2.1);
    light.castShadow = true;
    light.shadow.mapSize.set(SHADOW_MAP_PX, SHADOW_MAP_PX);
    light.shadow.bias = -0.0004;
    light.shadow.normalBias = 0.002;
    return light;
  }, []);
  const [cx, cy, cz] = centre;

  useLayoutEffect(() => {
    const r = Math.max(radius, 0.05);
    key.position.set(cx - r * 1.6, cy + r * 3, cz + r * 2.2);
    key.target.position.set(cx, cy, cz);
    key.target.updateMatrixWorld();
    const cam = key.shadow.camera;
    cam.left = -r * 1.6;
    cam.right = r * 1.6;
    cam.top = r * 1.6;
    cam.bottom = -r * 1.6;
    cam.near = r * 0.5;
    cam.far = r * 8;
    cam.updateProjectionMatrix();
  }, [key, cx, cy, cz, radius]);

  const floorSize = Math.max(radius, 0.05) * 12;
  return (
    <>
      <hemisphereLight args={['#fffdf7', '#d9ccb4', 1.15]} />
      <primitive object={key} />
      <primitive object={key.target} />
      <directionalLight position={[cx + radius * 2, cy + radius, cz - radius * 3]} intensity={0.45} color="#f1ece2" />
      {props.shadowCatcher !== false && (
        <mesh rotation-x={-Math.PI / 2} position={[cx, 0, cz]} receiveShadow raycast={() => {}}>
          <planeGeometry args={[floorSize, floorSize]} />
          <shadowMaterial opacity={0.2} color="#3a2f25" />
        </mesh>
      )}
    </>
  );
}
