import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import { roomFitOutcome } from '../editor/roomFitOutcome.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useRoomLength } from '../state/useRoomLength.ts';
import { NicheFitPanel } from './NicheFitPanel.tsx';
import { RoomChecksList } from './RoomChecksList.tsx';

interface Props {
  result: PieceResult;
  spec: PieceSpec;
  design: { id: string; workshopId: string; title: string };
  canEdit: boolean;
}

/**
 * Room fit for the design: where the piece stands, every check with its numbers and fix,
 * what was assumed about the piece, the way to the 3D room view, and fit to the niche.
 */
export function RoomFitPanel({ result, spec, design, canEdit }: Props) {
  const length = useRoomLength();
  // A length never breaks across lines at the dash of 9-15/16".
  const whole = (mm: number) => <span className="whitespace-nowrap">{length(mm)}</span>;
  const roomView = useEditorStore((s) => s.roomView);
  const { setRoomView, setFormTab } = useEditorStore.getState();
  const outcome = roomFitOutcome(spec.room, result);

  if (outcome.kind === 'none') {
    return (
      <div className="space-y-2 px-3 py-4 text-sm text-graphite-soft">
        <p>No room entered for this design. Enter the room the piece goes in to check the footprint, the lid, doors and drawers opened, the walkway and the way in through the door.</p>
        <button type="button" className="btn" onClick={() => setFormTab('room')}>Enter the room</button>
      </div>
    );
  }
  if (outcome.kind === 'invalid') {
    return (
      <div role="alert" className="space-y-2 px-3 py-4 text-sm">
        <p><span className="font-semibold text-pencil">The room cannot be checked:</span> {outcome.field.replace(/^room\./, '')} {lengthsInUserUnits(outcome.message, length)}</p>
        <button type="button" className="btn" onClick={() => setFormTab('room')}>Show the room form</button>
      </div>
    );
  }

  const { fit, room } = outcome;
  const failing = fit.checks.filter((c) => !c.passed).length;
  const niche = fit.placed.niche;
  const roomName = room.name || 'the room';
  return (
    <div className="grid min-h-0 gap-0 lg:grid-cols-[minmax(0,1fr)_17rem]">
      <div className="min-w-0">
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule/70 px-3 py-2 text-[13px]">
          <p className="min-w-0 flex-1">
            <span className="font-semibold">{room.name || 'Room'}</span>{' '}
            <span className="dim text-graphite-soft">{whole(room.width)} × {whole(room.depth)}, ceiling {whole(room.ceiling)}</span>
            <br />
            <span className="text-graphite-soft">
              Against the {room.placement.wall} wall, {whole(fit.placed.standoffMm)} off it
              {niche && <>, in a niche {whole(niche.fromMm)} to {whole(niche.toMm)} along it</>}.{' '}
              {failing === 0 ? 'Every check passes.' : `${failing} of ${fit.checks.length} checks ${failing === 1 ? 'does' : 'do'} not pass.`}
            </span>
          </p>
          <button type="button" className="btn px-2 py-1 text-xs" aria-pressed={roomView} onClick={() => setRoomView(!roomView)}>
            {roomView ? 'Show the piece alone' : 'See it in the room (3D)'}
          </button>
        </div>
        <RoomChecksList checks={fit.checks} />
        <details className="border-t border-rule/70 px-3 py-2 text-xs text-graphite-soft">
          <summary className="cursor-pointer">What room fit assumed about the piece</summary>
          <ul className="mt-1 list-disc pl-5">
            {fit.assumptions.map((a) => <li key={a}>{lengthsInUserUnits(a, length)}</li>)}
          </ul>
        </details>
        <p className="border-t border-rule/70 px-3 py-2 text-[11px] text-graphite-faint">
          Room fit checks clearances as modelled from what you entered: measure the room and the way in, and follow local codes.
        </p>
      </div>
      <div className="border-t border-rule bg-paper/40 lg:border-l lg:border-t-0">
        <NicheFitPanel designId={design.id} workshopId={design.workshopId} title={design.title} spec={spec} roomName={roomName} canEdit={canEdit} />
      </div>
    </div>
  );
}
