import { useState, type ChangeEvent } from 'react';
import type { PriceItem } from '../../shared/materials/priceList.ts';
import type { PriceListResponse } from '../../shared/schemas/priceLists.ts';
import { SHEET_GOODS, SHEET_GOOD_IDS } from '../../shared/wood/sheetGoods.ts';
import { SPECIES, SPECIES_IDS } from '../../shared/wood/species.ts';
import { useSavePriceList } from '../api/useSavePriceList.ts';
import { CsvRejectedError, useUploadPriceListCsv } from '../api/useUploadPriceListCsv.ts';
import { listOf, rowsOf, type PriceRow } from '../materials/priceRows.ts';
import { ErrorNotice } from './ErrorNotice.tsx';

const KINDS: PriceItem['kind'][] = ['lumber', 'sheet', 'hardware', 'finish'];
const UNIT_OF: Record<PriceItem['kind'], string> = { lumber: 'per bd ft', sheet: 'per sheet', hardware: 'per unit', finish: 'per unit' };

const itemName = (row: PriceRow) =>
  row.kind === 'lumber' ? SPECIES[row.item as keyof typeof SPECIES]?.name ?? row.item : row.kind === 'sheet' ? SHEET_GOODS[row.item as keyof typeof SHEET_GOODS]?.name ?? row.item : row.name;

/**
 * The workshop's price list: owners edit it as a table or replace it from a CSV file (checked
 * line by line on the server; nothing is saved when any line is bad, and every bad line is
 * listed); everyone else reads it.
 */
export function PriceListEditor({ workshopId, data, canEdit }: { workshopId: string; data: PriceListResponse; canEdit: boolean }) {
  const [rows, setRows] = useState<PriceRow[] | null>(null);
  const [problems, setProblems] = useState<Map<number, string[]>>(new Map());
  const save = useSavePriceList(workshopId);
  const upload = useUploadPriceListCsv(workshopId);
  const [uploaded, setUploaded] = useState<string | null>(null);
  const shown = rows ?? rowsOf(data.priceList);
  const editing = rows !== null;
  const currency = data.priceList.currency;

  const setRow = (i: number, patch: Partial<PriceRow>) => setRows(shown.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const onSave = () => {
    const checked = listOf(shown, currency);
    if (!checked.ok) return setProblems(checked.problems);
    setProblems(new Map());
    save.mutate(checked.list, { onSuccess: () => setRows(null) });
  };
  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    setUploaded(null);
    const text = await file.text();
    upload.mutate(text, { onSuccess: (saved) => { setRows(null); setUploaded(`Saved ${saved.priceList.items.length} prices from ${file.name}.`); } });
  };
  const rejected = upload.error instanceof CsvRejectedError ? upload.error : null;

  return (
    <section aria-labelledby="price-list-heading" className="no-print">
      <div className="mb-2 flex flex-wrap items-center gap-2">
        <h2 id="price-list-heading" className="mr-auto text-base font-semibold">Workshop price list <span className="text-xs font-normal text-graphite-soft">({currency}{data.updatedAt ? ` · saved ${new Date(data.updatedAt).toLocaleDateString()}${data.updatedBy ? ` by ${data.updatedBy}` : ''}` : ' · none saved yet'})</span></h2>
        {canEdit && !editing && <button type="button" className="btn" onClick={() => setRows(rowsOf(data.priceList))}>Edit prices</button>}
        {canEdit && editing && (
          <>
            <button type="button" className="btn" onClick={() => setRows([...shown, { kind: 'hardware', item: '', quarters: '', name: '', unit: 'each', price: '' }])}>Add a row</button>
            <button type="button" className="btn" onClick={() => { setRows(null); setProblems(new Map()); }}>Discard changes</button>
            <button type="button" className="btn btn-primary" disabled={save.isPending} onClick={onSave}>Save prices</button>
          </>
        )}
        {canEdit && (
          <label className="btn cursor-pointer">
            Upload CSV…
            <input type="file" accept=".csv,text/csv" className="sr-only" aria-label="Upload a price list CSV" onChange={(e) => void onFile(e)} />
          </label>
        )}
      </div>
      {!canEdit && <p className="mb-2 text-xs text-graphite-soft">Only the workshop's owner can change prices.</p>}
      {canEdit && (
        <p className="mb-2 text-xs text-graphite-soft">
          CSV columns: <code className="dim">kind, item, thickness, price, unit, name</code> — kind is lumber, sheet, hardware or finish; item a species or sheet-good id, or your own id; thickness in quarters (4/4, 8/4) for lumber. An upload replaces the whole list, and nothing is saved if any line is wrong.
        </p>
      )}
      {rejected && (
        <div role="alert" className="mb-2 rounded-sm border border-pencil/60 bg-pencil-soft/40 px-3 py-2 text-sm" data-testid="csv-errors">
          <p className="font-semibold text-pencil">Nothing was saved: fix these lines and upload again.</p>
          <ul className="mt-1 list-disc pl-5">
            {rejected.errors.map((e, i) => <li key={i}><span className="dim">Line {e.line}</span>{e.column ? ` (${e.column})` : ''}: {e.message}</li>)}
          </ul>
        </div>
      )}
      {upload.error && !rejected && <ErrorNotice title="Could not upload the price list" error={upload.error} className="mb-2" />}
      {save.error && <ErrorNotice title="Could not save the price list" error={save.error} className="mb-2" />}
      {uploaded && <p role="status" className="mb-2 text-sm text-ok">{uploaded}</p>}
      {problems.get(-1) && <p role="alert" className="mb-2 text-sm text-pencil">{problems.get(-1)?.join('; ')}</p>}
      <div className="max-h-[28rem] overflow-auto rounded-sm border border-rule">
        <table className="w-full border-collapse text-[13px]" aria-label="Price list">
          <thead className="sticky top-0 bg-sheet text-xs text-graphite-soft shadow-[0_1px_0_var(--color-rule)]">
            <tr>
              <th className="px-2 py-1 text-left font-medium">Kind</th>
              <th className="px-2 py-1 text-left font-medium">Item</th>
              <th className="px-2 py-1 text-left font-medium">Thickness</th>
              <th className="px-2 py-1 text-left font-medium">Unit</th>
              <th className="px-2 py-1 text-right font-medium">Price ({currency})</th>
              {editing && <th className="px-2 py-1"><span className="sr-only">Remove</span></th>}
            </tr>
          </thead>
          <tbody>
            {shown.length === 0 && <tr><td colSpan={6} className="px-2 py-3 text-center text-graphite-soft">No prices yet.</td></tr>}
            {shown.map((row, i) => (
              <tr key={i} className={`border-t border-rule/60 ${problems.has(i) ? 'bg-pencil-soft/40' : ''}`}>
                {editing ? (
                  <>
                    <td className="px-1 py-0.5">
                      <select className="field font-sans" aria-label={`Row ${i + 1} kind`} value={row.kind}
                        onChange={(e) => setRow(i, { kind: e.target.value as PriceItem['kind'], item: '', unit: e.target.value === 'lumber' ? 'bd ft' : e.target.value === 'sheet' ? 'sheet' : 'each' })}>
                        {KINDS.map((k) => <option key={k} value={k}>{k}</option>)}
                      </select>
                    </td>
                    <td className="px-1 py-0.5">
                      {row.kind === 'lumber' || row.kind === 'sheet' ? (
                        <select className="field font-sans" aria-label={`Row ${i + 1} item`} value={row.item} onChange={(e) => setRow(i, { item: e.target.value })}>
                          <option value="">Choose…</option>
                          {(row.kind === 'lumber' ? SPECIES_IDS : SHEET_GOOD_IDS).map((id) => <option key={id} value={id}>{row.kind === 'lumber' ? SPECIES[id as keyof typeof SPECIES].name : SHEET_GOODS[id as keyof typeof SHEET_GOODS].name}</option>)}
                        </select>
                      ) : (
                        <div className="flex gap-1">
                          <input className="field w-28" aria-label={`Row ${i + 1} item id`} placeholder="id" value={row.item} onChange={(e) => setRow(i, { item: e.target.value })} />
                          <input className="field font-sans" aria-label={`Row ${i + 1} name`} placeholder="name on the shopping list" value={row.name} onChange={(e) => setRow(i, { name: e.target.value })} />
                        </div>
                      )}
                      {problems.get(i) && <p className="text-[11px] text-pencil">{problems.get(i)?.join('; ')}</p>}
                    </td>
                    <td className="px-1 py-0.5">
                      {row.kind === 'lumber' && (
                        <span className="flex items-center gap-0.5"><input className="field w-12" aria-label={`Row ${i + 1} thickness in quarters`} value={row.quarters} onChange={(e) => setRow(i, { quarters: e.target.value })} />/4</span>
                      )}
                    </td>
                    <td className="px-1 py-0.5">
                      {row.kind === 'hardware' || row.kind === 'finish' ? <input className="field w-20 font-sans" aria-label={`Row ${i + 1} unit`} value={row.unit} onChange={(e) => setRow(i, { unit: e.target.value })} /> : <span className="text-graphite-soft">{UNIT_OF[row.kind]}</span>}
                    </td>
                    <td className="px-1 py-0.5"><input className="field w-24 text-right" aria-label={`Row ${i + 1} price`} value={row.price} onChange={(e) => setRow(i, { price: e.target.value })} /></td>
                    <td className="px-1 py-0.5"><button type="button" className="btn px-1.5 py-0" aria-label={`Remove row ${i + 1}`} onClick={() => setRows(shown.filter((_, j) => j !== i))}>✕</button></td>
                  </>
                ) : (
                  <>
                    <td className="px-2 py-1 text-graphite-soft">{row.kind}</td>
                    <td className="px-2 py-1">{itemName(row)}</td>
                    <td className="dim px-2 py-1">{row.kind === 'lumber' ? `${row.quarters}/4` : ''}</td>
                    <td className="px-2 py-1 text-graphite-soft">{row.kind === 'lumber' ? 'per bd ft' : row.kind === 'sheet' ? 'per sheet' : `per ${row.unit}`}</td>
                    <td className="dim px-2 py-1 text-right">{row.price}</td>
                  </>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
