import { useState } from 'react';
import { CLIMATE_PRESETS, CLIMATE_PRESET_IDS, DEFAULT_CLIMATE, MC_LIMITS, type Climate } from '../../shared/wood/climate.ts';
import { useEditorStore } from '../state/useEditorStore.ts';

type McKey = 'buildMcPercent' | 'lowMcPercent' | 'highMcPercent';

const FIELDS: { key: McKey; label: string }[] = [
  { key: 'buildMcPercent', label: 'Built at' },
  { key: 'lowMcPercent', label: 'Driest season' },
  { key: 'highMcPercent', label: 'Most humid season' },
];

/** Why a moisture content cannot be used, or null. */
function mcProblem(key: McKey, text: string, climate: Climate): string | null {
  if (!/^\d+(?:\.\d*)?$/.test(text.trim())) return 'give a moisture content in %, e.g. 8';
  const value = Number(text);
  if (value < MC_LIMITS.min || value > MC_LIMITS.max) return `must be between ${MC_LIMITS.min} % and ${MC_LIMITS.max} %`;
  if (key === 'lowMcPercent' && value > climate.highMcPercent) return `must not be above the most humid (${climate.highMcPercent} %)`;
  if (key === 'highMcPercent' && value < climate.lowMcPercent) return `must not be below the driest (${climate.lowMcPercent} %)`;
  return null;
}

/** The moisture the piece will see: a regional preset or the maker's own numbers; changes recompute movement. */
export function ClimateEditor({ climate, readOnly }: { climate: Climate | undefined; readOnly: boolean }) {
  const setClimate = useEditorStore((s) => s.setClimate);
  const current = climate ?? DEFAULT_CLIMATE;
  const [drafts, setDrafts] = useState<Partial<Record<McKey, { text: string; forValue: number }>>>({});
  const preset = CLIMATE_PRESET_IDS.find((id) => {
    const p = CLIMATE_PRESETS[id];
    return p.buildMcPercent === current.buildMcPercent && p.lowMcPercent === current.lowMcPercent && p.highMcPercent === current.highMcPercent;
  });

  return (
    <fieldset className="grid gap-3 px-3 py-3 sm:grid-cols-[minmax(12rem,1.3fr)_repeat(3,minmax(6rem,1fr))]" disabled={readOnly}>
      <legend className="sr-only">Climate</legend>
      <div>
        <label htmlFor="climate-preset" className="block text-xs text-graphite-soft">Climate</label>
        <select id="climate-preset" className="field mt-0.5 font-sans" value={preset ?? 'custom'}
          onChange={(e) => {
            const p = CLIMATE_PRESETS[e.target.value as keyof typeof CLIMATE_PRESETS];
            if (p) setClimate({ buildMcPercent: p.buildMcPercent, lowMcPercent: p.lowMcPercent, highMcPercent: p.highMcPercent });
          }}>
          {CLIMATE_PRESET_IDS.map((id) => <option key={id} value={id}>{CLIMATE_PRESETS[id].label}</option>)}
          {!preset && <option value="custom">Your own moisture contents</option>}
        </select>
        <p className="mt-0.5 text-[11px] text-graphite-faint">Regional averages: WH2010 ch. 13; seasonal range approximate.</p>
      </div>
      {FIELDS.map(({ key, label }) => {
        const draft = drafts[key];
        const live = draft && draft.forValue === current[key] ? draft.text : null;
        const problem = live !== null ? mcProblem(key, live, current) : null;
        return (
          <div key={key}>
            <label htmlFor={`mc-${key}`} className="block text-xs text-graphite-soft">{label} <span className="font-mono">% MC</span></label>
            <input id={`mc-${key}`} className={`field mt-0.5 ${problem ? 'border-pencil' : ''}`} inputMode="decimal"
              value={live ?? String(current[key])} aria-invalid={problem ? true : undefined} aria-describedby={problem ? `mc-${key}-error` : undefined}
              onChange={(e) => {
                const text = e.target.value;
                const bad = mcProblem(key, text, current);
                const value = Number(text);
                setDrafts((d) => ({ ...d, [key]: { text, forValue: bad ? current[key] : value } }));
                if (!bad) setClimate({ buildMcPercent: current.buildMcPercent, lowMcPercent: current.lowMcPercent, highMcPercent: current.highMcPercent, [key]: value });
              }} />
            {problem && <p id={`mc-${key}-error`} role="alert" className="mt-0.5 text-[11px] text-pencil">{problem}</p>}
          </div>
        );
      })}
    </fieldset>
  );
}
