import { useState } from 'react';
import { roomFieldProblem } from '../editor/roomFieldProblem.ts';
import { roomFieldId, storedProblemAt, type RoomFormState } from '../editor/roomForm.ts';
import { pathText, valueAt, withValueAt, type RoomPath } from '../editor/roomPath.ts';
import { useEditorStore } from '../state/useEditorStore.ts';

/** A name in the room (the room's own, a door's, a window's, an obstacle's); refused text stays marked with its reason. */
export function RoomTextField({ state, path, label, placeholder }: { state: RoomFormState; path: RoomPath; label: string; placeholder?: string }) {
  const setRoom = useEditorStore((s) => s.setRoom);
  const sealStep = useEditorStore((s) => s.sealStep);
  const value = valueAt(state.room, path);
  const [draft, setDraft] = useState<{ text: string; forValue: unknown; problem: string | null } | null>(null);
  const live = draft && draft.forValue === value ? draft : null;
  const problem = live?.problem ?? storedProblemAt(state, path);
  const id = roomFieldId(path);
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="block truncate text-[11px] leading-tight text-graphite-soft">{label}</label>
      <input
        id={id}
        className={`field mt-0.5 px-1.5 py-0.5 font-sans text-[13px] ${problem ? 'border-pencil bg-pencil-soft/40' : ''}`}
        autoComplete="off"
        readOnly={state.readOnly}
        placeholder={placeholder}
        value={live ? live.text : typeof value === 'string' ? value : ''}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-error` : undefined}
        onChange={(e) => {
          const text = e.target.value;
          const next = text === '' && placeholder ? undefined : text;
          const candidate = withValueAt(state.room, path, next);
          const refused = roomFieldProblem(candidate, path);
          setDraft({ text, forValue: refused ? value : next, problem: refused });
          if (!refused) setRoom(candidate, pathText(path));
        }}
        onBlur={() => {
          sealStep();
          if (live && !live.problem) setDraft(null);
        }}
      />
      {problem && <p id={`${id}-error`} role="alert" className="mt-0.5 text-[11px] leading-snug text-pencil">{problem}</p>}
    </div>
  );
}
