import { INCH_PRECISIONS, MM_PRECISIONS, precisionLabel } from '../editor/displayUnits.ts';
import { usePreferences } from '../state/usePreferences.ts';

/** Inches or millimetres, and how fine: every length on screen follows this choice. */
export function UnitPreference({ compact = false }: { compact?: boolean }) {
  const { unit, inchPrecision, mmPrecision, setUnit, setInchPrecision, setMmPrecision } = usePreferences();
  return (
    <fieldset className="flex items-center gap-2 text-sm">
      <legend className={compact ? 'sr-only' : 'mr-1 text-graphite-soft'}>Lengths in</legend>
      <div className="flex overflow-hidden rounded-sm border border-graphite" role="radiogroup" aria-label="Length unit">
        {(['in', 'mm'] as const).map((u) => (
          <button
            key={u}
            type="button"
            role="radio"
            aria-checked={unit === u}
            onClick={() => setUnit(u)}
            className={`px-2 py-0.5 font-mono text-xs ${unit === u ? 'bg-graphite text-sheet' : 'text-graphite hover:bg-paper-deep'}`}
          >
            {u === 'in' ? 'inch' : 'mm'}
          </button>
        ))}
      </div>
      <label className="sr-only" htmlFor="length-precision">
        Precision
      </label>
      <select
        id="length-precision"
        className="rounded-sm border border-rule bg-sheet px-1 py-0.5 font-mono text-xs"
        value={unit === 'in' ? inchPrecision : mmPrecision}
        onChange={(e) => {
          const value = Number(e.target.value);
          if (unit === 'in') setInchPrecision(INCH_PRECISIONS.find((p) => p === value) ?? 16);
          else setMmPrecision(MM_PRECISIONS.find((p) => p === value) ?? 0.5);
        }}
      >
        {(unit === 'in' ? INCH_PRECISIONS : MM_PRECISIONS).map((p) => (
          <option key={p} value={p}>
            {precisionLabel(unit, p)}
          </option>
        ))}
      </select>
    </fieldset>
  );
}
