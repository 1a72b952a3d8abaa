import type { Vec3 } from '../../shared/engine/types.ts';
import { PAINT_COLOURS } from '../editor/paintColours.ts';
import { useEditorStore, type ViewName } from '../state/useEditorStore.ts';
import { useLength } from '../state/useLength.ts';
import { usePaintView } from '../state/usePaintView.ts';

const VIEWS: { view: ViewName; label: string }[] = [
  { view: 'three-quarter', label: '¾' },
  { view: 'front', label: 'Front' },
  { view: 'side', label: 'Side' },
  { view: 'top', label: 'Top' },
];

const AXES = [
  { axis: 'y', label: 'Front to back', index: 1 },
  { axis: 'x', label: 'Side to side', index: 0 },
  { axis: 'z', label: 'Top down', index: 2 },
] as const;

/**
 * Preset views, the explode slider and the cut-away plane, under the 3D view; with
 * `roomAvailable`, the switch that stands the piece in its room (explode and cut-away then rest)
 * and, while it does, the switch between framing the piece and framing the whole room;
 * with `painted` (the finish is paint), the colour the view paints it.
 */
export function ViewControls({ bboxMin, bboxSize, roomAvailable = false, painted = false }: { bboxMin: Vec3; bboxSize: Vec3; roomAvailable?: boolean; painted?: boolean }) {
  const paintId = usePaintView((s) => s.paintId);
  const setPaint = usePaintView((s) => s.setPaint);
  const view = useEditorStore((s) => s.view);
  const inRoom = useEditorStore((s) => s.roomView) && roomAvailable;
  const roomFraming = useEditorStore((s) => s.roomFraming);
  const explode = useEditorStore((s) => s.explode);
  const cutaway = useEditorStore((s) => s.cutaway);
  const { setView, setExplode, setCutaway, setRoomView, setRoomFraming } = useEditorStore.getState();
  const length = useLength();
  const axis = AXES.find((a) => a.axis === cutaway?.axis);
  const lo = axis ? bboxMin[axis.index] : 0;
  const hi = axis ? bboxMin[axis.index] + bboxSize[axis.index] : 1;

  return (
    <div className="flex flex-wrap items-center gap-x-5 gap-y-2 border-t border-rule bg-sheet px-3 py-2 text-xs">
      <div role="group" aria-label="Preset view" className="flex overflow-hidden rounded-sm border border-graphite">
        {VIEWS.map((v) => (
          <button key={v.view} type="button" aria-pressed={view === v.view} onClick={() => setView(v.view)}
            className={`px-2 py-1 ${view === v.view ? 'bg-graphite text-sheet' : 'hover:bg-paper-deep'}`}>
            {v.label}
          </button>
        ))}
      </div>
      {roomAvailable && (
        <button type="button" aria-pressed={inRoom} onClick={() => setRoomView(!inRoom)} title="Show the piece standing in its room, opened as the room-fit checks open it"
          className={`rounded-sm border border-graphite px-2 py-1 ${inRoom ? 'bg-graphite text-sheet' : 'hover:bg-paper-deep'}`}>
          In the room
        </button>
      )}
      {inRoom && (
        <button type="button" aria-pressed={roomFraming === 'room'} onClick={() => setRoomFraming(roomFraming === 'room' ? 'piece' : 'room')}
          title="Frame the whole room instead of the piece and the room around it"
          className={`rounded-sm border border-graphite px-2 py-1 ${roomFraming === 'room' ? 'bg-graphite text-sheet' : 'hover:bg-paper-deep'}`}>
          Whole room
        </button>
      )}
      <label className={`flex items-center gap-2 ${inRoom ? 'opacity-50' : ''}`}>
        <span className="text-graphite-soft">Explode</span>
        <input type="range" disabled={inRoom} min={0} max={1} step={0.05} value={explode} onChange={(e) => setExplode(Number(e.target.value))} className="w-28 accent-[var(--color-pencil)]" aria-valuetext={`${Math.round(explode * 100)} %`} />
        <span className="dim w-8 text-right">{Math.round(explode * 100)}%</span>
      </label>
      <div className="flex items-center gap-2">
        <label htmlFor="cutaway-axis" className="text-graphite-soft">Cut-away</label>
        <select id="cutaway-axis" disabled={inRoom} className="rounded-sm border border-rule bg-sheet px-1 py-0.5 disabled:opacity-50"
          value={cutaway?.axis ?? ''}
          onChange={(e) => {
            const next = AXES.find((a) => a.axis === e.target.value);
            setCutaway(next ? { axis: next.axis, positionMm: bboxMin[next.index] + bboxSize[next.index] / 2 } : null);
          }}>
          <option value="">Off</option>
          {AXES.map((a) => <option key={a.axis} value={a.axis}>{a.label}</option>)}
        </select>
        {cutaway && axis && (
          <label className="flex items-center gap-2">
            <span className="sr-only">Section position</span>
            <input type="range" min={lo} max={hi} step={0.5} value={cutaway.positionMm}
              onChange={(e) => setCutaway({ axis: cutaway.axis, positionMm: Number(e.target.value) })}
              className="w-28 accent-[var(--color-pencil)]" aria-valuetext={length(cutaway.positionMm - lo)} />
            <span className="dim w-16">{length(cutaway.positionMm - lo)}</span>
          </label>
        )}
      </div>
      {painted && (
        <label className="flex items-center gap-2">
          <span className="text-graphite-soft">Paint</span>
          <select aria-label="Paint colour" className="rounded-sm border border-rule bg-sheet px-1 py-0.5" value={paintId} onChange={(e) => setPaint(e.target.value)}>
            {PAINT_COLOURS.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
          </select>
          <span aria-hidden="true" className="inline-block h-3.5 w-3.5 rounded-sm border border-graphite/40" style={{ background: PAINT_COLOURS.find((p) => p.id === paintId)?.hex }} />
        </label>
      )}
    </div>
  );
}
