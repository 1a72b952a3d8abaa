import type { LayoutEffort, OffcutStock, StockSettings } from '../../shared/materials/stockSettings.ts';
import { DEFAULT_STOCK_SETTINGS } from '../../shared/materials/stockSettings.ts';
import { SHEET_GOODS, SHEET_GOOD_IDS } from '../../shared/wood/sheetGoods.ts';
import { LengthInput } from './LengthInput.tsx';
import { LengthListInput } from './LengthListInput.tsx';

const EFFORTS: { value: LayoutEffort; label: string }[] = [
  { value: 'quick', label: 'Quick' },
  { value: 'standard', label: 'Standard' },
  { value: 'thorough', label: 'Thorough (slower)' },
];

// 20 m: longer than any stock a shop handles, shorter than a typing slip.
const MAX_STOCK_MM = 20_000;

/** The stock the layouts draw from: sheet size, offcuts in stock, board sizes, kerf, trim, effort. */
export function StockOptionsForm({ settings, onChange, sheetIds }: { settings: StockSettings; onChange: (next: StockSettings) => void; sheetIds: readonly string[] }) {
  const set = (patch: Partial<StockSettings>) => onChange({ ...settings, ...patch });
  const setOffcut = (i: number, patch: Partial<OffcutStock>) => set({ offcuts: settings.offcuts.map((o, j) => (j === i ? { ...o, ...patch } : o)) });
  const offcutChoices = sheetIds.length > 0 ? sheetIds : SHEET_GOOD_IDS;
  return (
    <form aria-label="Stock" className="grid gap-3 text-sm" onSubmit={(e) => e.preventDefault()}>
      <fieldset className="grid grid-cols-2 gap-2">
        <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Sheets for sale</legend>
        <LengthInput label="Sheet width" valueMm={settings.sheetWidthMm} maxMm={MAX_STOCK_MM} onChange={(sheetWidthMm) => set({ sheetWidthMm })} />
        <LengthInput label="Sheet length (along the grain)" valueMm={settings.sheetLengthMm} maxMm={MAX_STOCK_MM} onChange={(sheetLengthMm) => set({ sheetLengthMm })} />
      </fieldset>
      <fieldset>
        <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Offcuts in stock (used first)</legend>
        {settings.offcuts.length === 0 && <p className="text-xs text-graphite-faint">None.</p>}
        {settings.offcuts.map((o, i) => (
          <div key={i} className="mb-1 grid grid-cols-[1fr_5.5rem_5.5rem_3.5rem_auto] items-end gap-1" data-offcut={i}>
            <label className="text-xs text-graphite-soft">
              Sheet good
              <select className="field font-sans" value={o.sheetId} onChange={(e) => setOffcut(i, { sheetId: e.target.value })}>
                {offcutChoices.map((id) => <option key={id} value={id}>{SHEET_GOODS[id as keyof typeof SHEET_GOODS]?.name ?? id}</option>)}
              </select>
            </label>
            <LengthInput label="Length" valueMm={o.lengthMm} maxMm={MAX_STOCK_MM} onChange={(lengthMm) => setOffcut(i, { lengthMm })} />
            <LengthInput label="Width" valueMm={o.widthMm} maxMm={MAX_STOCK_MM} onChange={(widthMm) => setOffcut(i, { widthMm })} />
            <label className="text-xs text-graphite-soft">
              How many
              <input className="field" type="number" min={1} max={100} value={o.count} onChange={(e) => setOffcut(i, { count: Math.min(100, Math.max(1, Math.round(Number(e.target.value) || 1))) })} />
            </label>
            <button type="button" className="btn px-2" aria-label={`Remove offcut ${i + 1}`} onClick={() => set({ offcuts: settings.offcuts.filter((_, j) => j !== i) })}>✕</button>
          </div>
        ))}
        <button type="button" className="btn mt-1 px-2 py-0.5 text-xs"
          onClick={() => set({ offcuts: [...settings.offcuts, { sheetId: offcutChoices[0] ?? 'hardwood-plywood-3/4', lengthMm: 1219.2, widthMm: 609.6, count: 1 }] })}>
          Add an offcut
        </button>
      </fieldset>
      <fieldset className="grid grid-cols-2 gap-2">
        <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Boards for sale</legend>
        <LengthListInput label="Lengths" valuesMm={settings.boardLengthsMm} maxMm={MAX_STOCK_MM} onChange={(boardLengthsMm) => set({ boardLengthsMm })} />
        <LengthListInput label="Widths" valuesMm={settings.boardWidthsMm} maxMm={2_000} onChange={(boardWidthsMm) => set({ boardWidthsMm })} />
      </fieldset>
      <fieldset className="grid grid-cols-[1fr_1fr_1.5fr] gap-2">
        <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Saw and optimiser</legend>
        <LengthInput label="Kerf" valueMm={settings.kerfMm} maxMm={20} allowZero onChange={(kerfMm) => set({ kerfMm })} />
        <LengthInput label="Edge trim" valueMm={settings.trimMm} maxMm={100} allowZero onChange={(trimMm) => set({ trimMm })} />
        <label className="text-xs text-graphite-soft">
          Effort
          <select className="field font-sans" value={settings.effort} onChange={(e) => set({ effort: e.target.value as LayoutEffort })}>
            {EFFORTS.map((e) => <option key={e.value} value={e.value}>{e.label}</option>)}
          </select>
        </label>
      </fieldset>
      <button type="button" className="btn justify-self-start px-2 py-0.5 text-xs" onClick={() => onChange(DEFAULT_STOCK_SETTINGS)}>Back to the usual stock</button>
    </form>
  );
}
