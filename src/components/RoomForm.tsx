import type { ReactNode } from 'react';
import { DEFAULT_WALKWAY_MM } from '../../shared/room/checks/walkway.ts';
import { WALLS } from '../../shared/room/roomSchema.ts';
import { newDoor, newObstacle, newRoom, newWindow } from '../editor/roomDefaults.ts';
import type { RoomFormState } from '../editor/roomForm.ts';
import { valueAt, withValueAt, type RoomPath } from '../editor/roomPath.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useRoomLength } from '../state/useRoomLength.ts';
import { RoomChoiceField } from './RoomChoiceField.tsx';
import { RoomLengthField } from './RoomLengthField.tsx';
import { RoomTextField } from './RoomTextField.tsx';

const WALL_CHOICES = WALLS.map((w) => ({ value: w, label: w[0]!.toUpperCase() + w.slice(1) }));
const SWING_CHOICES = [{ value: 'in', label: 'Into the room' }, { value: 'out', label: 'Out of it' }, { value: 'none', label: 'No leaf' }];
const HINGE_CHOICES = [{ value: 'left', label: 'Left' }, { value: 'right', label: 'Right' }];
const ALIGN_CHOICES = [{ value: 'left', label: 'Left end' }, { value: 'centre', label: 'Centre' }, { value: 'right', label: 'Right end' }];

type Row = { id: string };
const rowsAt = (room: unknown, key: string): Row[] => {
  const rows = valueAt(room, [key]);
  return Array.isArray(rows) ? (rows as Row[]) : [];
};

/**
 * The room the piece goes in, stored in the spec's room section: its size, baseboard, where the
 * piece stands, the walkway wanted, and rows of doors, windows and obstacles to add and remove.
 * Lengths are typed as in the parameter form. `placedLeftMm` is where the piece stands now
 * (from its wall's left corner), the starting position when the maker switches to a position.
 */
export function RoomForm({ state, placedLeftMm }: { state: RoomFormState; placedLeftMm: number | null }) {
  const setRoom = useEditorStore((s) => s.setRoom);
  const length = useRoomLength();
  const { room, readOnly } = state;

  if (room === undefined) {
    return (
      <div className="space-y-2 py-2 text-sm">
        <p className="text-graphite-soft">
          No room yet. Enter the room the piece goes in — its size, doors, windows, baseboard and what stands in it — and
          Casewright checks the footprint, the lid, doors and drawers opened, the walkway in front and the way in through the door.
        </p>
        {!readOnly && <button type="button" className="btn" onClick={() => setRoom(newRoom())}>Add a room</button>}
      </div>
    );
  }

  const edit = (path: RoomPath, value: unknown) => setRoom(withValueAt(room, path, value));
  const all = [...rowsAt(room, 'doors'), ...rowsAt(room, 'windows'), ...rowsAt(room, 'obstacles')];
  const addRow = (key: 'doors' | 'windows' | 'obstacles') => {
    const wall = valueAt(room, ['placement', 'wall']);
    const row = key === 'doors' ? newDoor(all) : key === 'windows' ? newWindow(all, typeof wall === 'string' ? (wall as 'back') : 'back') : newObstacle(all);
    edit([key], [...rowsAt(room, key), row]);
  };
  const removeRow = (key: string, index: number) => edit([key], rowsAt(room, key).filter((_, i) => i !== index));
  const atPosition = typeof valueAt(room, ['placement', 'position']) === 'number';
  const scribed = valueAt(room, ['placement', 'scribed']) === true;

  return (
    <form aria-label="Room" onSubmit={(e) => e.preventDefault()} className="space-y-3 py-2">
      <p className="text-[11px] leading-snug text-graphite-faint">
        Walls as on a plan with the front wall at the bottom. Along a wall, measure from its left corner as you face it.
      </p>
      <Section title="Room">
        <RoomTextField state={state} path={['name']} label="Name" placeholder="Room" />
        <div className="grid grid-cols-2 gap-x-2 gap-y-1.5">
          <RoomLengthField state={state} path={['width']} label="Width (left–right)" />
          <RoomLengthField state={state} path={['depth']} label="Depth (front–back)" />
          <RoomLengthField state={state} path={['ceiling']} label="Ceiling height" />
        </div>
        <div className="grid grid-cols-2 gap-x-2">
          <RoomLengthField state={state} path={['baseboard', 'height']} label="Baseboard height" />
          <RoomLengthField state={state} path={['baseboard', 'thickness']} label="Baseboard thickness" />
        </div>
      </Section>

      <Section title="Where the piece stands">
        <div className="grid grid-cols-2 gap-x-2">
          <RoomChoiceField state={state} path={['placement', 'wall']} label="Back against the" choices={WALL_CHOICES.map((c) => ({ ...c, label: `${c.label} wall` }))} fallback="back" />
          <div className="min-w-0">
            <label htmlFor="room-placement-mode" className="block text-[11px] leading-tight text-graphite-soft">Along the wall</label>
            <select id="room-placement-mode" className="field mt-0.5 px-1 py-0.5 font-sans text-[13px]" disabled={readOnly} value={atPosition ? 'position' : 'niche'}
              onChange={(e) => {
                const { position: _p, near: _n, ...rest } = (valueAt(room, ['placement']) ?? {}) as Record<string, unknown>;
                edit(['placement'], e.target.value === 'position' ? { ...rest, position: Math.max(0, Math.round(placedLeftMm ?? 0)) } : rest);
              }}>
              <option value="niche">In its niche</option>
              <option value="position">At a measured place</option>
            </select>
          </div>
        </div>
        {atPosition ? (
          <RoomLengthField state={state} path={['placement', 'position']} label="Left side from the wall's left corner" />
        ) : (
          <div className="grid grid-cols-2 gap-x-2">
            <RoomChoiceField state={state} path={['placement', 'align']} label="In the niche, at its" choices={ALIGN_CHOICES} fallback="centre" />
            <RoomLengthField state={state} path={['placement', 'near']} label="Niche near (from corner)" optional={{ placeholder: 'mid-wall' }} />
          </div>
        )}
        <div className="grid grid-cols-2 items-end gap-x-2">
          <RoomLengthField state={state} path={['placement', 'gap']} label="Gap to the wall" />
          <label className="flex items-center gap-1.5 pb-1 text-[12px]">
            <input type="checkbox" className="accent-[var(--color-pencil)]" checked={scribed} disabled={readOnly}
              onChange={(e) => edit(['placement', 'scribed'], e.target.checked)} />
            Scribed over the baseboard
          </label>
        </div>
        <RoomLengthField state={state} path={['clearances', 'walkway']} label="Clear floor wanted in front"
          optional={{ placeholder: `${length(DEFAULT_WALKWAY_MM)} (common practice)` }} />
      </Section>

      <Rows title="Doors" addLabel="Add a door" readOnly={readOnly} onAdd={() => addRow('doors')}>
        {rowsAt(room, 'doors').map((row, i) => (
          <RowCard key={i} label={`door ${row.id}`} readOnly={readOnly} onRemove={() => removeRow('doors', i)}>
            <RoomTextField state={state} path={['doors', i, 'id']} label="Name" />
            <RoomChoiceField state={state} path={['doors', i, 'wall']} label="Wall" choices={WALL_CHOICES} fallback="front" />
            <RoomLengthField state={state} path={['doors', i, 'position']} label="From the corner" />
            <RoomLengthField state={state} path={['doors', i, 'width']} label="Clear width" />
            <RoomLengthField state={state} path={['doors', i, 'height']} label="Clear height" />
            <RoomChoiceField state={state} path={['doors', i, 'swing']} label="Swings" choices={SWING_CHOICES} fallback="in" />
            <RoomChoiceField state={state} path={['doors', i, 'hinge']} label="Hinged on the" choices={HINGE_CHOICES} fallback="left" />
          </RowCard>
        ))}
      </Rows>

      <Rows title="Windows" addLabel="Add a window" readOnly={readOnly} onAdd={() => addRow('windows')}>
        {rowsAt(room, 'windows').map((row, i) => (
          <RowCard key={i} label={`window ${row.id}`} readOnly={readOnly} onRemove={() => removeRow('windows', i)}>
            <RoomTextField state={state} path={['windows', i, 'id']} label="Name" />
            <RoomChoiceField state={state} path={['windows', i, 'wall']} label="Wall" choices={WALL_CHOICES} fallback="back" />
            <RoomLengthField state={state} path={['windows', i, 'position']} label="From the corner" />
            <RoomLengthField state={state} path={['windows', i, 'width']} label="Width" />
            <RoomLengthField state={state} path={['windows', i, 'sillHeight']} label="Sill height (top)" />
            <RoomLengthField state={state} path={['windows', i, 'headHeight']} label="Head height" />
            <RoomLengthField state={state} path={['windows', i, 'sillDepth']} label="Sill sticks out" />
            <RoomLengthField state={state} path={['windows', i, 'sillThickness']} label="Sill thickness" />
          </RowCard>
        ))}
      </Rows>

      <Rows title="Obstacles" addLabel="Add an obstacle" readOnly={readOnly} onAdd={() => addRow('obstacles')}
        note="A bed, a radiator, a shelf: a box measured from the room's front-left corner.">
        {rowsAt(room, 'obstacles').map((row, i) => (
          <RowCard key={i} label={`obstacle ${String(valueAt(room, ['obstacles', i, 'label']) ?? row.id)}`} readOnly={readOnly} onRemove={() => removeRow('obstacles', i)}>
            <RoomTextField state={state} path={['obstacles', i, 'label']} label="What it is" />
            <RoomLengthField state={state} path={['obstacles', i, 'x']} label="From the left wall" />
            <RoomLengthField state={state} path={['obstacles', i, 'y']} label="From the front wall" />
            <RoomLengthField state={state} path={['obstacles', i, 'z']} label="Off the floor" />
            <RoomLengthField state={state} path={['obstacles', i, 'width']} label="Width (left–right)" />
            <RoomLengthField state={state} path={['obstacles', i, 'depth']} label="Depth (front–back)" />
            <RoomLengthField state={state} path={['obstacles', i, 'height']} label="Height" />
          </RowCard>
        ))}
      </Rows>

      {!readOnly && (
        <p className="border-t border-rule pt-2">
          <button type="button" className="text-xs text-graphite-soft underline-offset-2 hover:text-pencil hover:underline" onClick={() => setRoom(undefined)}>
            Remove the room from this design
          </button>
        </p>
      )}
    </form>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="space-y-1.5">
      <legend className="mb-1 text-xs font-semibold uppercase tracking-[0.14em] text-graphite-soft">{title}</legend>
      {children}
    </fieldset>
  );
}

function Rows({ title, addLabel, readOnly, onAdd, note, children }: { title: string; addLabel: string; readOnly: boolean; onAdd: () => void; note?: string; children: ReactNode[] }) {
  return (
    <fieldset className="space-y-1.5">
      <legend className="mb-1 text-xs font-semibold uppercase tracking-[0.14em] text-graphite-soft">{title}</legend>
      {note && <p className="text-[11px] leading-snug text-graphite-faint">{note}</p>}
      {children.length === 0 && <p className="text-[12px] text-graphite-faint">None.</p>}
      {children}
      {!readOnly && <button type="button" className="btn px-2 py-0.5 text-xs" onClick={onAdd}>+ {addLabel}</button>}
    </fieldset>
  );
}

function RowCard({ label, readOnly, onRemove, children }: { label: string; readOnly: boolean; onRemove: () => void; children: ReactNode }) {
  return (
    <div role="group" aria-label={label} className="relative rounded-sm border border-rule bg-sheet px-2 pb-1.5 pt-1">
      {!readOnly && (
        <button type="button" className="absolute right-1 top-0.5 text-xs text-graphite-soft hover:text-pencil" aria-label={`Remove ${label}`} title={`Remove ${label}`} onClick={onRemove}>✕</button>
      )}
      <div className="grid grid-cols-2 gap-x-2 gap-y-1 pr-4">{children}</div>
    </div>
  );
}
