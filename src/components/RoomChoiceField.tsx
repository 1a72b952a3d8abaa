import { roomFieldId, type RoomFormState } from '../editor/roomForm.ts';
import { valueAt, withValueAt, type RoomPath } from '../editor/roomPath.ts';
import { useEditorStore } from '../state/useEditorStore.ts';

/** A choice in the room (a wall, a swing, a hinge side); every choice on the list is valid. */
export function RoomChoiceField({ state, path, label, choices, fallback }: {
  state: RoomFormState;
  path: RoomPath;
  label: string;
  choices: readonly { value: string; label: string }[];
  /** The schema's default, shown when the room leaves the choice out. */
  fallback: string;
}) {
  const setRoom = useEditorStore((s) => s.setRoom);
  const value = valueAt(state.room, path);
  const id = roomFieldId(path);
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="block truncate text-[11px] leading-tight text-graphite-soft">{label}</label>
      <select id={id} className="field mt-0.5 px-1 py-0.5 font-sans text-[13px]" disabled={state.readOnly}
        value={typeof value === 'string' ? value : fallback}
        onChange={(e) => setRoom(withValueAt(state.room, path, e.target.value))}>
        {choices.map((c) => <option key={c.value} value={c.value}>{c.label}</option>)}
      </select>
    </div>
  );
}
