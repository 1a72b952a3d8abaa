import { Component, lazy, Suspense, type ComponentType, type ReactNode } from 'react';
import type { PieceResult } from '../../shared/engine/types.ts';
import type { RoomScene } from '../../shared/room/roomScene.ts';
import { paintColour } from '../editor/paintColours.ts';
import { useEditorStore, type Cutaway, type ViewName } from '../state/useEditorStore.ts';
import { usePaintView } from '../state/usePaintView.ts';

/** What the 3D view takes (the contract of src/scene/PieceView.tsx). */
interface PieceViewProps {
  result: PieceResult;
  selectedPartId: string | null;
  onSelectPart: (partId: string | null) => void;
  hoveredPartId?: string | null;
  onHoverPart?: (partId: string | null) => void;
  explode: number;
  cutaway: Cutaway | null;
  view: ViewName;
  room?: RoomScene | null;
  roomFraming?: 'piece' | 'room';
  paintHex?: string | null;
  className?: string;
}

// A glob, not an import: the view is its own chunk (three.js stays out of the entry), and a
// build without src/scene still compiles and shows the fallback panel.
const sceneModules = import.meta.glob<{ default: ComponentType<PieceViewProps> }>('../scene/PieceView.tsx');
const loadPieceView = sceneModules['../scene/PieceView.tsx'];
const PieceView = loadPieceView ? lazy(loadPieceView) : null;

/**
 * The live 3D view, driven by the editor store; a quiet panel while it loads or when it cannot.
 * With `room` (room fit's scene) the piece is drawn standing in its room, opened as checked.
 */
export function SceneViewport({ result, stale, room = null }: { result: PieceResult; stale: boolean; room?: RoomScene | null }) {
  const selectedPartId = useEditorStore((s) => s.selectedPartId);
  const hoveredPartId = useEditorStore((s) => s.hoveredPartId);
  const explode = useEditorStore((s) => s.explode);
  const cutaway = useEditorStore((s) => s.cutaway);
  const view = useEditorStore((s) => s.view);
  const roomFraming = useEditorStore((s) => s.roomFraming);
  const select = useEditorStore((s) => s.select);
  const hover = useEditorStore((s) => s.hover);
  // A painted piece is shown in the paint picked under the view (a view setting, not saved).
  const paintId = usePaintView((s) => s.paintId);
  const paintHex = result.spec.params.finish === 'paint' ? paintColour(paintId).hex : null;
  return (
    <div className="relative h-full w-full" aria-label="3D view of the piece" role="region">
      {PieceView ? (
        <SceneErrorBoundary>
          <Suspense fallback={<ScenePanel text="The 3D view is loading…" />}>
            <PieceView
              result={result}
              selectedPartId={selectedPartId}
              onSelectPart={select}
              hoveredPartId={hoveredPartId}
              onHoverPart={hover}
              explode={explode}
              cutaway={cutaway}
              view={view}
              room={room}
              roomFraming={roomFraming}
              paintHex={paintHex}
              className="h-full w-full"
            />
          </Suspense>
        </SceneErrorBoundary>
      ) : (
        <ScenePanel text="The 3D view is loading… it is not part of this build yet; the tables below show the piece." />
      )}
      {stale && <span className="absolute right-2 top-2 rounded-sm bg-caution-soft px-2 py-0.5 text-xs text-caution">Showing the last piece that built</span>}
    </div>
  );
}

function ScenePanel({ text }: { text: string }) {
  return (
    <div role="status" className="flex h-full w-full items-center justify-center bg-paper/70 p-6 text-center text-sm text-graphite-soft">
      {text}
    </div>
  );
}

class SceneErrorBoundary extends Component<{ children: ReactNode }, { error: Error | null }> {
  override state: { error: Error | null } = { error: null };
  static getDerivedStateFromError(error: Error) {
    return { error };
  }
  override render() {
    if (this.state.error) {
      return <ScenePanel text={`The 3D view could not start in this browser (${this.state.error.message}). The tables still show every part.`} />;
    }
    return this.props.children;
  }
}
