import { useMemo } from 'react';
import { Matrix4, Quaternion, Vector3, type LineBasicMaterial, type MeshBasicMaterial, type MeshStandardMaterial } from 'three';
import type { ThreeEvent } from '@react-three/fiber';
import type { PartSolid } from './partGeometry.ts';
import type { SceneMesh } from './sceneModel.ts';

/** Pointer travel (px) past which a press is an orbit drag, not a click on a part. */
const CLICK_SLOP_PX = 4;

const noRaycast = (): void => {};

/**
 * One placed part: its shared solid and outline at the instance's transform. When the piece is
 * cut away it also draws the solid twice more into the stencil buffer only (back faces count up,
 * front faces down) at its own render order, so its section cap (SectionCaps) fills exactly
 * where the section plane passes through this part.
 */
export function PartMesh(props: {
  mesh: SceneMesh;
  solid: PartSolid;
  material: MeshStandardMaterial;
  outline: LineBasicMaterial;
  /** The stencil counters and this instance's render order while the piece is cut away. */
  section: { back: MeshBasicMaterial; front: MeshBasicMaterial; renderOrder: number } | null;
  /** False for a hit on the cut-away side of the section plane (three's world point, m). */
  isVisibleAt: (point: Vector3) => boolean;
  onSelect: (partId: string) => void;
  onHover: (partId: string | null) => void;
}) {
  const { mesh, solid, material, outline, section, isVisibleAt, onSelect, onHover } = props;
  const { position, quaternion } = useMemo(() => {
    const p = new Vector3();
    const q = new Quaternion();
    new Matrix4().fromArray(mesh.matrixElements).decompose(p, q, new Vector3());
    return { position: p, quaternion: q };
  }, [mesh.matrixElements]);

  // Hits on the cut-away side are not stopped, so the part behind the section gets the event.
  const onClick = (e: ThreeEvent<MouseEvent>): void => {
    if (e.delta > CLICK_SLOP_PX || !isVisibleAt(e.point)) return;
    e.stopPropagation();
    onSelect(mesh.partId);
  };
  const onPointerMove = (e: ThreeEvent<PointerEvent>): void => {
    if (!isVisibleAt(e.point)) return;
    e.stopPropagation();
    onHover(mesh.partId);
  };

  return (
    <group position={position} quaternion={quaternion}>
      <mesh
        geometry={solid.geometry}
        material={material}
        castShadow
        receiveShadow
        name={mesh.key}
        userData={{ partId: mesh.partId, instance: mesh.instance }}
        onClick={onClick}
        onPointerMove={onPointerMove}
        onPointerOut={() => onHover(null)}
      />
      {section && (
        <>
          <mesh geometry={solid.geometry} material={section.back} renderOrder={section.renderOrder} raycast={noRaycast} />
          <mesh geometry={solid.geometry} material={section.front} renderOrder={section.renderOrder} raycast={noRaycast} />
        </>
      )}
      <lineSegments geometry={solid.edges} material={outline} raycast={noRaycast} />
    </group>
  );
}
