/**
 * The live 3D view of a piece: every part as a solid in its wood, joinery cut into it, with
 * orbit, pan and zoom, preset views, an exploded view, a cut-away and part selection.
 *
 * Default export so pages can `React.lazy(() => import('../scene/PieceView.tsx'))` and keep
 * three.js out of their own chunk; nothing outside src/scene imports three.
 *
 * Props:
 *  - `result`: the engine's answer (shared/engine `buildPiece`). The view never recomputes
 *    what the engine knows; a new result redraws only the parts whose shape changed.
 *  - `selectedPartId` / `onSelectPart`: the selected part (every instance of it is drawn with a
 *    pencil-red glow and outline). Clicking a part selects it; clicking empty space gives null.
 *    A press that turns into an orbit drag does not select.
 *  - `hoveredPartId` / `onHoverPart` (optional): the part under the pointer, lightly tinted.
 *    Pass both to control hover from outside (e.g. a table row under the pointer); leave
 *    `hoveredPartId` undefined and the view tracks hover itself.
 *  - `explode`: 0 = assembled … 1 = fully exploded; each part moves `Placement.explodeMm × explode`.
 *  - `cutaway`: null, or a section plane across engine axis `x`, `y` or `z` at `positionMm`
 *    (engine world, mm). It takes away the part of the piece on the side of the preset view that
 *    looks along that axis (`y`: the front, `x`: the right side, `z`: the top) and paints the cut
 *    faces a darker tone, so tongues show in their grooves.
 *  - `view`: the preset camera; changing it glides the camera there. Orbiting leaves it alone.
 *  - `room` (optional): shared/room's scene for the fitted piece (`fitRoom(...).scene`). The view
 *    then draws the room lightly around the piece — floor, walls, door and window openings,
 *    baseboards, sills, door landings and obstacles — with the piece at its room placement, its
 *    lid and doors swung and drawers pulled to the positions the checks tested, and every part
 *    and room solid a check found meeting in pencil red. Presets frame the opened piece with the
 *    room around it (`roomFocusBox`); explode and the cut-away are set aside while the room is
 *    shown.
 *  - `roomFraming` (optional, room view only): `'piece'` (the default) frames the opened piece
 *    and its surroundings, `'room'` the whole room; a change glides the camera there.
 *  - `paintHex` (optional): the paint colour of a piece whose finish is paint; parts that take
 *    paint (all but the drawer boxes) are drawn flat in it instead of their wood.
 *  - `className`: sizing of the wrapper; the canvas fills it.
 *
 * For tests: the wrapper is `[data-testid="piece-view"]` with `data-part-count` (instances drawn)
 * and `data-selected-part`; the canvas keeps its drawing buffer (pixels can be sampled) and
 * carries `data-camera-settled="true"` once a preset view has been reached, and
 * `data-solids-ready="true"` once every part is drawn with its joinery cut (until then, after a
 * change, changed parts show as plain boxes while their cut solids are built in idle time).
 * Exploding refits the camera on the spread parts, keeping the direction it looks from.
 */
import { useEffect, useMemo, useState } from 'react';
import { Canvas, useThree } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import { Plane, Vector3 } from 'three';
import type { PieceResult } from '../../shared/engine/types.ts';
import { CameraRig } from './CameraRig.tsx';
import { CAMERA_FOV_DEG, type PresetView } from './cameraPresets.ts';
import { PartMesh } from './PartMesh.tsx';
import { createPartSolidCache } from './partGeometry.ts';
import { RoomLayer } from './RoomLayer.tsx';
import { RenderMarks } from './RenderMarks.tsx';
import { placeInRoom, roomFocusBox, type RoomSceneData } from './roomSceneModel.ts';
import { ENGINE_TO_THREE_ROTATION_X, SCENE_SCALE } from './sceneFrame.ts';
import { sceneModel } from './sceneModel.ts';
import { SectionCaps, sectionRenderOrder } from './SectionCaps.tsx';
import { sectionHatches } from './sectionHatch.ts';
import { keptBySection, sectionPlane, type Cutaway } from './sectionPlane.ts';
import { PAPER_HEX, StageLights } from './StageLights.tsx';
import { takesPaint } from '../editor/paintColours.ts';
import { useIdleSolids } from './useIdleSolids.ts';
import { createWoodMaterials, type Highlight } from './woodMaterials.ts';

export type { PresetView } from './cameraPresets.ts';
export type { RoomSceneData } from './roomSceneModel.ts';
export type { Cutaway } from './sectionPlane.ts';

export interface PieceViewProps {
  result: PieceResult;
  selectedPartId: string | null;
  onSelectPart: (partId: string | null) => void;
  hoveredPartId?: string | null;
  onHoverPart?: (partId: string | null) => void;
  explode: number;
  cutaway: null | Cutaway;
  view: PresetView;
  room?: RoomSceneData | null;
  roomFraming?: 'piece' | 'room';
  paintHex?: string | null;
  className?: string;
}

/** Clipping is per renderer in three; the view's materials carry the plane. */
function EnableLocalClipping() {
  const gl = useThree((s) => s.gl);
  useEffect(() => {
    gl.localClippingEnabled = true;
  }, [gl]);
  return null;
}

function PieceScene(props: PieceViewProps) {
  const { result, selectedPartId, onSelectPart, view } = props;
  const room = props.room ?? null;
  // The room view shows the piece assembled and whole, as it will stand.
  const explode = room ? 0 : props.explode;
  const cutaway = room ? null : props.cutaway;
  const invalidate = useThree((s) => s.invalidate);
  const [ownHover, setOwnHover] = useState<string | null>(null);
  const hovered = props.hoveredPartId !== undefined ? props.hoveredPartId : ownHover;
  const onHover = (partId: string | null): void => {
    if (partId === hovered) return;
    if (props.hoveredPartId === undefined) setOwnHover(partId);
    props.onHoverPart?.(partId);
  };

  const solids = useMemo(() => createPartSolidCache(), []);
  const materials = useMemo(() => createWoodMaterials(), []);
  const plane = useMemo(() => new Plane(), []);
  useEffect(() => () => {
    solids.dispose();
    materials.dispose();
  }, [solids, materials]);

  const pieceModel = useMemo(() => sceneModel(result, { explode }), [result, explode]);
  const assembledBounds = useMemo(() => sceneModel(result, { explode: 0 }).bounds, [result]);
  const inRoom = useMemo(() => (room ? placeInRoom(pieceModel, room) : null), [pieceModel, room]);
  const meshes = inRoom ? inRoom.meshes : pieceModel.meshes;
  // Exploded, the parts spread past the assembled box (the lid rises off the top): frame what is drawn.
  // In the room: the opened piece and what is around it, or the whole room when asked.
  const roomFraming = props.roomFraming ?? 'piece';
  const roomBounds = useMemo(() => (room && inRoom ? (roomFraming === 'room' ? room.roomBox : roomFocusBox(inRoom, room)) : null), [room, inRoom, roomFraming]);
  const frameBounds = roomBounds ?? (explode > 0 ? pieceModel.bounds : assembledBounds);
  // Cut solids come in idle time; until then a part is its plain box (typing never waits on CSG).
  useIdleSolids(solids, result.parts);
  const solidsReady = solids.pendingCount(result.parts) === 0;
  const partsById = useMemo(() => new Map(result.parts.map((p) => [p.id, p])), [result]);
  const hatches = useMemo(() => sectionHatches(result), [result]);
  // Free the solids of parts the new result no longer has (after it is drawn, never before).
  useEffect(() => {
    solids.retainOnly(result.parts);
  }, [solids, result]);

  const section = useMemo(() => (cutaway ? sectionPlane(cutaway) : null), [cutaway]);
  useEffect(() => {
    if (section) plane.set(new Vector3(...section.normal), section.constant);
    materials.setClipping(section ? plane : null);
    invalidate();
  }, [section, plane, materials, invalidate]);
  const isVisibleAt = useMemo(
    () => (point: Vector3): boolean => !section || keptBySection(section, [point.x, point.y, point.z]),
    [section],
  );

  const highlightOf = (partId: string): Highlight =>
    partId === selectedPartId || inRoom?.collidingPartIds.has(partId) ? 'selected' : partId === hovered ? 'hover' : 'none';

  return (
    <>
      <EnableLocalClipping />
      <color attach="background" args={[PAPER_HEX]} />
      <StageLights bounds={frameBounds} shadowCatcher={!room} />
      <group rotation-x={ENGINE_TO_THREE_ROTATION_X} scale={SCENE_SCALE}>
        {meshes.map((mesh, index) => {
          const part = partsById.get(mesh.partId)!;
          const highlight = highlightOf(mesh.partId);
          const painted = Boolean(props.paintHex) && takesPaint(part.role);
          return (
            <PartMesh
              key={mesh.key}
              mesh={mesh}
              solid={solids.peek(part) ?? solids.box(part)}
              material={materials.wood({
                toneHex: painted ? props.paintHex! : mesh.toneHex,
                texture: painted || mesh.materialKind === 'sheet' ? 'sheet' : 'grain',
                highlight,
              })}
              outline={materials.outline(highlight)}
              section={section ? { back: materials.stencilCounter('back'), front: materials.stencilCounter('front'), renderOrder: sectionRenderOrder(index) } : null}
              isVisibleAt={isVisibleAt}
              onSelect={onSelectPart}
              onHover={onHover}
            />
          );
        })}
        {room && inRoom && <RoomLayer room={room} collidingSolidIds={inRoom.collidingSolidIds} />}
      </group>
      {section && <SectionCaps plane={section} bounds={pieceModel.bounds} meshes={pieceModel.meshes} hatches={hatches} materials={materials} />}
      <OrbitControls makeDefault enableDamping={false} zoomToCursor />
      <CameraRig view={view} bounds={frameBounds} framingKey={`${result.kind}|${room ? `room:${roomFraming}` : 'piece'}`} fitKey={room ? `room:${roomFraming}` : explode.toFixed(2)} />
      <RenderMarks result={result} solidsReady={solidsReady} />
    </>
  );
}

export default function PieceView(props: PieceViewProps) {
  const { className, onSelectPart, selectedPartId } = props;
  const instanceCount = props.result.placements.length;
  return (
    <div className={className} style={{ position: 'relative', width: '100%', height: '100%', minHeight: 240 }} data-testid="piece-view" data-part-count={instanceCount} data-selected-part={selectedPartId ?? ''}>
      <Canvas
        frameloop="demand"
        flat
        shadows="percentage"
        dpr={[1, 2]}
        gl={{ preserveDrawingBuffer: true, antialias: true, stencil: true }}
        camera={{ fov: CAMERA_FOV_DEG, near: 0.01, far: 200, position: [0, 1, 3] }}
        onPointerMissed={() => onSelectPart(null)}
        style={{ position: 'absolute', inset: 0 }}
        aria-label="3D view of the piece: drag to orbit, right-drag to pan, scroll to zoom; click a part to select it"
        role="img"
      >
        <PieceScene {...props} />
      </Canvas>
    </div>
  );
}
