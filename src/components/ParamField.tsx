import { useId, useState } from 'react';
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import type { ParamValue } from '../../shared/engine/types.ts';
import type { DisplayUnits } from '../editor/displayUnits.ts';
import { choicesFor } from '../editor/fieldChoices.ts';
import { formatFieldValue, parseFieldText, rangeText } from '../editor/fieldValue.ts';

interface Props {
  def: ParamDef;
  value: ParamValue;
  units: DisplayUnits;
  readOnly: boolean;
  /** A reason from the engine's whole-spec check that names this field. */
  engineError: string | null;
  onChange: (value: ParamValue, typing: boolean) => void;
  onDone: () => void;
}

/**
 * One parameter as a form control. Text is read as it is typed: a good value goes to the
 * editor at once, a bad one stays in the field with its reason and never reaches the engine.
 * The typed text is kept only while it still stands for the current value, so an undo
 * elsewhere shows the value it brought back.
 */
export function ParamField({ def, value, units, readOnly, engineError, onChange, onDone }: Props) {
  const id = useId();
  const [draft, setDraft] = useState<{ text: string; forValue: ParamValue } | null>(null);
  const live = draft && draft.forValue === value ? draft.text : null;
  const parsed = live !== null ? parseFieldText(def, live, units) : null;
  const error = parsed && !parsed.ok ? parsed.message : engineError;
  const range = rangeText(def, units);
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [def.help || range ? hintId : null, error ? errorId : null].filter(Boolean).join(' ') || undefined;

  if (def.kind === 'boolean') {
    return (
      <div className="py-1">
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-0.5 accent-[var(--color-pencil)]" checked={value === true} disabled={readOnly} onChange={(e) => onChange(e.target.checked, false)} aria-describedby={describedBy} />
          <span>{def.label}</span>
        </label>
        {def.help && <p id={hintId} className="ml-6 text-[11px] leading-snug text-graphite-faint">{def.help}</p>}
      </div>
    );
  }

  const control = (() => {
    if (def.kind === 'enum' || def.kind === 'species' || def.kind === 'sheet') {
      return (
        <select id={id} className="field font-sans" value={String(value)} disabled={readOnly} aria-describedby={describedBy} onChange={(e) => {
          performance.mark('param-change');
          onChange(e.target.value, false);
        }}>
          {choicesFor(def).map((choice) => (
            <option key={choice.value} value={choice.value}>
              {choice.label}
            </option>
          ))}
        </select>
      );
    }
    return (
      <input
        id={id}
        className={`field ${error ? 'border-pencil bg-pencil-soft/40' : ''}`}
        inputMode={def.kind === 'length' ? 'text' : 'decimal'}
        autoComplete="off"
        spellCheck={false}
        readOnly={readOnly}
        value={live ?? formatFieldValue(def, value, units)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        onChange={(e) => {
          const text = e.target.value;
          performance.mark('param-change');
          const result = parseFieldText(def, text, units);
          setDraft({ text, forValue: result.ok ? result.value : value });
          if (result.ok) onChange(result.value, true);
        }}
        onBlur={() => {
          onDone();
          // A good value is written back in the maker's unit and precision; a bad one stays to be fixed.
          if (parsed?.ok) setDraft(null);
        }}
      />
    );
  })();

  return (
    <div className="py-1">
      <div className="flex items-baseline justify-between gap-2">
        <label htmlFor={id} className="text-[13px] leading-tight text-graphite">
          {def.label}
        </label>
        {def.unit && def.kind !== 'length' && <span className="font-mono text-[11px] text-graphite-faint">{def.unit}</span>}
      </div>
      <div className="mt-0.5">{control}</div>
      {error ? (
        <p id={errorId} role="alert" className="mt-0.5 text-[11px] leading-snug text-pencil">
          {error}
        </p>
      ) : (
        (def.help || range) && (
          <p id={hintId} className="mt-0.5 text-[11px] leading-snug text-graphite-faint">
            {def.help}
            {def.help && range ? ' ' : ''}
            {range && <span className="dim whitespace-nowrap">[{range}]</span>}
          </p>
        )
      )}
    </div>
  );
}
