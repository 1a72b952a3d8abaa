import type { OffcutStock, StockSettings } from '../../shared/materials/stockSettings.ts';
import { DEFAULT_STOCK_SETTINGS } from '../../shared/materials/stockSettings.ts';
import { MAX_BOARD_WIDTH_MM, MAX_KERF_MM, MAX_OFFCUT_COUNT, MAX_STOCK_LENGTH_MM as MAX_STOCK_MM, MAX_TRIM_MM } from '../../shared/schemas/stock.ts';
import { SHEET_GOODS, SHEET_GOOD_IDS } from '../../shared/wood/sheetGoods.ts';
import { LengthInput } from './LengthInput.tsx';
import { LengthListInput } from './LengthListInput.tsx';
import { READ_ONLY_FIELDS } from '../materials/readOnlyFields.ts';

/**
 * The workshop's stock the layouts draw from: sheet size, offcuts kept, board sizes for sale,
 * kerf and trim. Read-only (every field disabled) for a member who may not change it.
 */
export function StockOptionsForm({ settings, onChange, sheetIds, readOnly = false }: { settings: StockSettings; onChange: (next: StockSettings) => void; sheetIds: readonly string[]; readOnly?: boolean }) {
  const set = (patch: Partial<StockSettings>) => onChange({ ...settings, ...patch });
  const setOffcut = (i: number, patch: Partial<OffcutStock>) => set({ offcuts: settings.offcuts.map((o, j) => (j === i ? { ...o, ...patch } : o)) });
  // The stock is the workshop's, not the design's: every sheet good, this design's first.
  const offcutChoices = [...sheetIds, ...SHEET_GOOD_IDS.filter((id) => !sheetIds.includes(id))];
  return (
    <form aria-label="Stock" onSubmit={(e) => e.preventDefault()}>
      <fieldset disabled={readOnly} className={`grid gap-3 text-sm ${READ_ONLY_FIELDS}`}>
        <fieldset className="grid grid-cols-2 gap-2">
          <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Sheets for sale</legend>
          <LengthInput label="Sheet width" valueMm={settings.sheetWidthMm} maxMm={MAX_STOCK_MM} onChange={(sheetWidthMm) => set({ sheetWidthMm })} />
          <LengthInput label="Sheet length (along the grain)" valueMm={settings.sheetLengthMm} maxMm={MAX_STOCK_MM} onChange={(sheetLengthMm) => set({ sheetLengthMm })} />
        </fieldset>
        <fieldset>
          <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Offcuts in stock (used first)</legend>
          {settings.offcuts.length === 0 && <p className="text-xs text-graphite-faint">None.</p>}
          {settings.offcuts.map((o, i) => (
            <div key={i} className="mb-2 grid grid-cols-[1fr_1fr_3.5rem_auto] items-end gap-1 border-l-2 border-rule pl-2" data-offcut={i}>
              <label className="col-span-4 text-xs text-graphite-soft">
                Sheet good
                <select className="field font-sans" value={o.sheetId} onChange={(e) => setOffcut(i, { sheetId: e.target.value })}>
                  {offcutChoices.map((id) => <option key={id} value={id}>{SHEET_GOODS[id as keyof typeof SHEET_GOODS]?.name ?? id}</option>)}
                </select>
              </label>
              <LengthInput label="Length" valueMm={o.lengthMm} maxMm={MAX_STOCK_MM} onChange={(lengthMm) => setOffcut(i, { lengthMm })} />
              <LengthInput label="Width" valueMm={o.widthMm} maxMm={MAX_STOCK_MM} onChange={(widthMm) => setOffcut(i, { widthMm })} />
              <label className="text-xs text-graphite-soft">
                How many
                <input className="field" type="number" min={1} max={MAX_OFFCUT_COUNT} value={o.count} onChange={(e) => setOffcut(i, { count: Math.min(MAX_OFFCUT_COUNT, Math.max(1, Math.round(Number(e.target.value) || 1))) })} />
              </label>
              {!readOnly && <button type="button" className="btn px-2" aria-label={`Remove offcut ${i + 1}`} onClick={() => set({ offcuts: settings.offcuts.filter((_, j) => j !== i) })}>✕</button>}
            </div>
          ))}
          {!readOnly && (
            <button type="button" className="btn mt-1 px-2 py-0.5 text-xs"
              onClick={() => set({ offcuts: [...settings.offcuts, { sheetId: offcutChoices[0] ?? 'hardwood-plywood-3/4', lengthMm: 1219.2, widthMm: 609.6, count: 1 }] })}>
              Add an offcut
            </button>
          )}
        </fieldset>
        <fieldset className="grid grid-cols-2 gap-2">
          <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Boards for sale</legend>
          <LengthListInput label="Lengths" valuesMm={settings.boardLengthsMm} maxMm={MAX_STOCK_MM} onChange={(boardLengthsMm) => set({ boardLengthsMm })} />
          <LengthListInput label="Widths" valuesMm={settings.boardWidthsMm} maxMm={MAX_BOARD_WIDTH_MM} onChange={(boardWidthsMm) => set({ boardWidthsMm })} />
        </fieldset>
        <fieldset className="grid grid-cols-2 gap-2">
          <legend className="mb-1 text-xs font-semibold uppercase tracking-widest text-graphite-soft">Saw</legend>
          <LengthInput label="Kerf" valueMm={settings.kerfMm} maxMm={MAX_KERF_MM} allowZero onChange={(kerfMm) => set({ kerfMm })} />
          <LengthInput label="Edge trim" valueMm={settings.trimMm} maxMm={MAX_TRIM_MM} allowZero onChange={(trimMm) => set({ trimMm })} />
        </fieldset>
        {!readOnly && (
          <button type="button" className="btn justify-self-start px-2 py-0.5 text-xs" onClick={() => onChange({ ...DEFAULT_STOCK_SETTINGS, boardsInStock: settings.boardsInStock })}>
            Back to the usual sizes
          </button>
        )}
      </fieldset>
    </form>
  );
}
