import { useMemo } from 'react';
import { PlaneGeometry, Quaternion, Vector3 } from 'three';
import type { Box3 } from '../../shared/engine/types.ts';
import { boxSphere } from './sceneFrame.ts';
import type { SceneMesh } from './sceneModel.ts';
import type { WoodMaterials } from './woodMaterials.ts';

/** Render order of a part instance's stencil count; its cap draws right after it. */
export function sectionRenderOrder(index: number): number {
  return 1 + 2 * index;
}

const noRaycast = (): void => {};

/**
 * The cut faces: one quad per part instance lying in the section plane (three's world), big
 * enough for the whole piece, drawn only where that instance's stencil count says the plane is
 * inside it, in the part's section tone and hatch.
 */
export function SectionCaps(props: {
  plane: { normal: readonly [number, number, number]; constant: number };
  bounds: Box3;
  meshes: readonly SceneMesh[];
  hatches: ReadonlyMap<string, number>;
  materials: WoodMaterials;
}) {
  const { plane, bounds, meshes, hatches, materials } = props;
  const quad = useMemo(() => new PlaneGeometry(1, 1), []);
  const { position, quaternion, size } = useMemo(() => {
    const { centre, radius } = boxSphere(bounds);
    const n = new Vector3(...plane.normal);
    const c = new Vector3(...centre);
    // The point of the plane nearest the piece's centre.
    const p = c.clone().addScaledVector(n, -(n.dot(c) + plane.constant));
    return { position: p, quaternion: new Quaternion().setFromUnitVectors(new Vector3(0, 0, 1), n), size: Math.max(radius, 0.05) * 4 };
  }, [plane, bounds]);
  return (
    <group position={position} quaternion={quaternion} scale={[size, size, 1]}>
      {meshes.map((mesh, i) => (
        <mesh
          key={mesh.key}
          geometry={quad}
          material={materials.sectionCap(mesh.toneHex, hatches.get(mesh.partId) ?? 0)}
          renderOrder={sectionRenderOrder(i) + 1}
          raycast={noRaycast}
        />
      ))}
    </group>
  );
}
