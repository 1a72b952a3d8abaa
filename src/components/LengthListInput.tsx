import { useId, useState } from 'react';
import { isInputError } from '../../shared/errors.ts';
import { formatLength, parseLength } from '../../shared/units/index.ts';
import { lengthFormat } from '../editor/displayUnits.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';

/**
 * Several lengths in one field, separated by commas (`6', 8'` or `4, 6, 8`), each read by
 * `parseLength` like the editor's fields; applied when the field is left or Enter is pressed.
 */
export function LengthListInput({ label, valuesMm, onChange, maxMm }: { label: string; valuesMm: readonly number[]; onChange: (mm: number[]) => void; maxMm: number }) {
  const id = useId();
  const units = useDisplayUnits();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const commit = () => {
    if (draft === null) return;
    const texts = draft.split(',').map((t) => t.trim()).filter((t) => t !== '');
    if (texts.length === 0) return setError('give at least one length, separated by commas');
    try {
      const values = texts.map((t, i) => parseLength(t, { field: `${label} ${i + 1}`, defaultUnit: units.unit, max: maxMm }));
      setError(null);
      setDraft(null);
      onChange([...new Set(values)].sort((a, b) => a - b));
    } catch (e) {
      if (!isInputError(e)) throw e;
      setError(`${e.field} ${e.message}`);
    }
  };
  return (
    <div>
      <label htmlFor={id} className="block text-xs text-graphite-soft">{label}</label>
      <input id={id} className={`field ${error ? 'border-pencil bg-pencil-soft/40' : ''}`} value={draft ?? valuesMm.map((v) => formatLength(v, lengthFormat(units))).join(', ')}
        autoComplete="off" spellCheck={false} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => setDraft(e.target.value)} onBlur={commit} onKeyDown={(e) => e.key === 'Enter' && commit()} />
      {error && <p id={`${id}-error`} role="alert" className="mt-0.5 text-[11px] leading-snug text-pencil">{error}</p>}
    </div>
  );
}
