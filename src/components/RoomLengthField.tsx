import { useState } from 'react';
import { isInputError } from '../../shared/errors.ts';
import { parseLength } from '../../shared/units/index.ts';
import { roomFieldProblem } from '../editor/roomFieldProblem.ts';
import { roomFieldId, storedProblemAt, type RoomFormState } from '../editor/roomForm.ts';
import { pathText, valueAt, withValueAt, type RoomPath } from '../editor/roomPath.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useRoomLength } from '../state/useRoomLength.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';

interface Props {
  state: RoomFormState;
  path: RoomPath;
  label: string;
  /** Left empty, the field is removed from the room (a default applies). */
  optional?: { placeholder: string };
  hint?: string;
}

/**
 * One length of the room, typed as in the parameter form (`12' 6-1/2"`, `1 3/4"`, `44.5 mm`; a
 * bare number in the maker's unit) and written back in feet and inches when the maker reads inches. A good value goes into the room at once; a bad one stays in the
 * field, marked, with its reason, and never reaches the checks.
 */
export function RoomLengthField({ state, path, label, optional, hint }: Props) {
  const units = useDisplayUnits();
  const length = useRoomLength();
  const setRoom = useEditorStore((s) => s.setRoom);
  const sealStep = useEditorStore((s) => s.sealStep);
  const value = valueAt(state.room, path);
  const [draft, setDraft] = useState<{ text: string; forValue: unknown; problem: string | null } | null>(null);
  const live = draft && draft.forValue === value ? draft : null;
  const problem = live?.problem ?? storedProblemAt(state, path);
  const id = roomFieldId(path);
  const shown = typeof value === 'number' ? length(value) : typeof value === 'string' ? value : '';

  const onText = (text: string) => {
    let next: number | undefined;
    if (optional && text.trim() === '') next = undefined;
    else {
      try {
        next = parseLength(text, { field: pathText(path), defaultUnit: units.unit, allowZero: true });
      } catch (error) {
        if (!isInputError(error)) throw error;
        setDraft({ text, forValue: value, problem: error.message });
        return;
      }
    }
    const candidate = withValueAt(state.room, path, next);
    const refused = roomFieldProblem(candidate, path);
    setDraft({ text, forValue: refused ? value : next, problem: refused });
    if (!refused) setRoom(candidate, pathText(path));
  };

  return (
    <div className="min-w-0">
      <label htmlFor={id} className="block truncate text-[11px] leading-tight text-graphite-soft" title={label}>{label}</label>
      <input
        id={id}
        className={`field mt-0.5 px-1.5 py-0.5 text-[13px] ${problem ? 'border-pencil bg-pencil-soft/40' : ''}`}
        autoComplete="off"
        spellCheck={false}
        readOnly={state.readOnly}
        placeholder={optional?.placeholder}
        value={live ? live.text : shown}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-error` : hint ? `${id}-hint` : undefined}
        onChange={(e) => onText(e.target.value)}
        onBlur={() => {
          sealStep();
          // A good value is written back in the maker's unit; a bad one stays to be fixed.
          if (live && !live.problem) setDraft(null);
        }}
      />
      {problem ? (
        <p id={`${id}-error`} role="alert" className="mt-0.5 text-[11px] leading-snug text-pencil">{lengthsInUserUnits(problem, length)}</p>
      ) : (
        hint && <p id={`${id}-hint`} className="mt-0.5 text-[11px] leading-snug text-graphite-faint">{hint}</p>
      )}
    </div>
  );
}
