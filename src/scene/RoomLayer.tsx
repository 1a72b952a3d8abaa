import { useEffect, useMemo } from 'react';
import { BoxGeometry, BufferGeometry, DoubleSide, EdgesGeometry, Float32BufferAttribute, LineBasicMaterial, MeshBasicMaterial, MeshStandardMaterial } from 'three';
import type { Box3 } from '../../shared/engine/types.ts';
import type { RoomSceneData } from './roomSceneModel.ts';
import { GRAPHITE, PENCIL_RED } from './woodMaterials.ts';

const noRaycast = (): void => {};

/** Floor boards' tone, a shade under the paper. */
const FLOOR_HEX = '#e6dcc8';
const SOLID_HEX = '#cfc4ae';
const GLASS_HEX = '#bcd3d8';

/** The twelve edges of a box, as line segments (mm). */
function boxEdges(box: Box3): BufferGeometry {
  const [x0, y0, z0] = box.min;
  const [x1, y1, z1] = box.max;
  const c = [[x0, y0], [x1, y0], [x1, y1], [x0, y1]] as const;
  const points: number[] = [];
  for (let i = 0; i < 4; i++) {
    const [ax, ay] = c[i]!;
    const [bx, by] = c[(i + 1) % 4]!;
    points.push(ax, ay, z0, bx, by, z0, ax, ay, z1, bx, by, z1, ax, ay, z0, ax, ay, z1);
  }
  const g = new BufferGeometry();
  g.setAttribute('position', new Float32BufferAttribute(points, 3));
  return g;
}

/** A flat box (an opening in a wall plane) gets a sliver of thickness so it draws as a pane. */
function paneBox(box: Box3, thicknessMm: number): Box3 {
  const min = [...box.min] as [number, number, number];
  const max = [...box.max] as [number, number, number];
  for (let i = 0; i < 3; i++) {
    if (max[i]! - min[i]! < thicknessMm) {
      const mid = (min[i]! + max[i]!) / 2;
      min[i] = mid - thicknessMm / 2;
      max[i] = mid + thicknessMm / 2;
    }
  }
  return { min, max };
}

function Block(props: { box: Box3; material: MeshStandardMaterial | MeshBasicMaterial; outline: LineBasicMaterial; shadows?: boolean }) {
  const { box, material, outline, shadows } = props;
  const [sx, sy, sz] = [box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]];
  const geometry = useMemo(() => new BoxGeometry(sx, sy, sz), [sx, sy, sz]);
  const edges = useMemo(() => new EdgesGeometry(geometry), [geometry]);
  useEffect(() => () => {
    geometry.dispose();
    edges.dispose();
  }, [geometry, edges]);
  return (
    <group position={[box.min[0] + sx / 2, box.min[1] + sy / 2, box.min[2] + sz / 2]}>
      <mesh geometry={geometry} material={material} raycast={noRaycast} castShadow={shadows} receiveShadow={shadows} />
      <lineSegments geometry={edges} material={outline} raycast={noRaycast} />
    </group>
  );
}

/**
 * The room around the piece, drawn lightly (room coordinates, mm, Z up): the floor, the walls as
 * faint panes with their edges inked, door and window openings outlined, and baseboards, sills,
 * door landings and obstacles as pale blocks — in pencil red where the piece runs into them.
 */
export function RoomLayer(props: { room: RoomSceneData; collidingSolidIds: ReadonlySet<string> }) {
  const { room, collidingSolidIds } = props;
  const m = useMemo(() => ({
    floor: new MeshStandardMaterial({ color: FLOOR_HEX, roughness: 0.95 }),
    wall: new MeshBasicMaterial({ color: '#ffffff', transparent: true, opacity: 0.1, side: DoubleSide, depthWrite: false }),
    solid: new MeshStandardMaterial({ color: SOLID_HEX, transparent: true, opacity: 0.45, depthWrite: false }),
    landing: new MeshBasicMaterial({ color: SOLID_HEX, transparent: true, opacity: 0.18, depthWrite: false }),
    hit: new MeshStandardMaterial({ color: PENCIL_RED, transparent: true, opacity: 0.55, depthWrite: false, emissive: PENCIL_RED, emissiveIntensity: 0.3 }),
    glass: new MeshBasicMaterial({ color: GLASS_HEX, transparent: true, opacity: 0.35, side: DoubleSide, depthWrite: false }),
    opening: new MeshBasicMaterial({ color: '#ffffff', transparent: true, opacity: 0.5, side: DoubleSide, depthWrite: false }),
    ink: new LineBasicMaterial({ color: GRAPHITE, transparent: true, opacity: 0.55 }),
    faint: new LineBasicMaterial({ color: GRAPHITE, transparent: true, opacity: 0.22 }),
    red: new LineBasicMaterial({ color: PENCIL_RED }),
  }), []);
  useEffect(() => () => Object.values(m).forEach((x) => x.dispose()), [m]);

  const box = room.roomBox;
  const outline = useMemo(() => boxEdges(box), [box]);
  useEffect(() => () => outline.dispose(), [outline]);
  const [w, d, h] = [box.max[0] - box.min[0], box.max[1] - box.min[1], box.max[2] - box.min[2]];

  return (
    <group>
      <mesh position={[box.min[0] + w / 2, box.min[1] + d / 2, box.min[2] - 0.5]} material={m.floor} receiveShadow raycast={noRaycast}>
        <planeGeometry args={[w, d]} />
      </mesh>
      <lineSegments geometry={outline} material={m.ink} raycast={noRaycast} />
      {/* Walls: back, front, left, right, as faint panes. */}
      <mesh position={[w / 2, box.max[1], h / 2]} rotation-x={Math.PI / 2} material={m.wall} raycast={noRaycast}><planeGeometry args={[w, h]} /></mesh>
      <mesh position={[w / 2, box.min[1], h / 2]} rotation-x={Math.PI / 2} material={m.wall} raycast={noRaycast}><planeGeometry args={[w, h]} /></mesh>
      <mesh position={[box.min[0], d / 2, h / 2]} rotation-y={Math.PI / 2} material={m.wall} raycast={noRaycast}><planeGeometry args={[h, d]} /></mesh>
      <mesh position={[box.max[0], d / 2, h / 2]} rotation-y={Math.PI / 2} material={m.wall} raycast={noRaycast}><planeGeometry args={[h, d]} /></mesh>
      {room.doors.map((door) => <Block key={door.id} box={paneBox(door.opening, 4)} material={m.opening} outline={m.ink} />)}
      {room.windows.map((win) => <Block key={win.id} box={paneBox(win.opening, 4)} material={m.glass} outline={m.ink} />)}
      {room.solids.map((solid) => {
        const hit = collidingSolidIds.has(solid.id);
        const material = hit ? m.hit : solid.kind === 'door' ? m.landing : m.solid;
        return <Block key={solid.id} box={solid.box} material={material} outline={hit ? m.red : solid.kind === 'door' ? m.faint : m.ink} shadows={!hit && solid.kind !== 'door'} />;
      })}
    </group>
  );
}
