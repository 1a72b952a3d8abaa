import { useId, useState } from 'react';
import { isInputError } from '../../shared/errors.ts';
import { formatLength, parseLength } from '../../shared/units/index.ts';
import { lengthFormat } from '../editor/displayUnits.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';

interface Props {
  label: string;
  valueMm: number;
  onChange: (mm: number) => void;
  /** Largest accepted, mm. */
  maxMm: number;
  allowZero?: boolean;
  readOnly?: boolean;
  /** Keep the label for screen readers only, as in a table whose header names the column. */
  hideLabel?: boolean;
  className?: string;
}

/**
 * One length typed the way the editor takes it (`1/8"`, `3 mm`, `4' 0"`; a bare number in the
 * maker's unit), read by `parseLength`: a good value is applied when the field is left or Enter
 * is pressed, a bad one stays with its reason and is not applied.
 */
export function LengthInput({ label, valueMm, onChange, maxMm, allowZero = false, readOnly = false, hideLabel = false, className = '' }: Props) {
  const id = useId();
  const units = useDisplayUnits();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const commit = () => {
    if (draft === null) return;
    try {
      const mm = parseLength(draft, { field: label, defaultUnit: units.unit, max: maxMm, allowZero });
      setError(null);
      setDraft(null);
      if (Math.abs(mm - valueMm) > 1e-9) onChange(mm);
    } catch (e) {
      if (!isInputError(e)) throw e;
      setError(e.message);
    }
  };
  return (
    <div className={className}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'block text-xs text-graphite-soft'}>{label}</label>
      <input id={id} className={`field ${error ? 'border-pencil bg-pencil-soft/40' : ''}`} value={draft ?? formatLength(valueMm, lengthFormat(units))} readOnly={readOnly}
        autoComplete="off" spellCheck={false} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => setDraft(e.target.value)} onBlur={commit} onKeyDown={(e) => e.key === 'Enter' && commit()} />
      {error && <p id={`${id}-error`} role="alert" className="mt-0.5 text-[11px] leading-snug text-pencil">{error}</p>}
    </div>
  );
}
