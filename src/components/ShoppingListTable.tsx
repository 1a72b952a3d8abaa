import { centsText } from '../../shared/materials/money.ts';
import { shoppingListCsv, type ShoppingList } from '../../shared/materials/shoppingList.ts';
import { saveBlob } from '../export/download.ts';

/** What to buy, how many and what it costs; prints on its own page and exports as CSV. */
export function ShoppingListTable({ list, fileStem }: { list: ShoppingList; fileStem: string }) {
  const exportCsv = () => saveBlob(new Blob(['\uFEFF', shoppingListCsv(list)], { type: 'text/csv;charset=utf-8' }), `${fileStem}-shopping-list.csv`);
  return (
    <section aria-labelledby="shopping-heading" className="shopping-list">
      <div className="mb-2 flex flex-wrap items-center gap-2">
        <h2 id="shopping-heading" className="mr-auto text-base font-semibold">Shopping list</h2>
        <button type="button" className="btn no-print" onClick={exportCsv}>Export CSV</button>
        <button type="button" className="btn no-print" onClick={() => window.print()}>Print</button>
      </div>
      <table className="w-full border-collapse text-[13px]" aria-label="Shopping list">
        <thead className="text-xs text-graphite-soft">
          <tr className="border-b border-graphite">
            <th className="w-8 px-2 py-1 text-left font-medium"><span className="sr-only">Bought</span></th>
            <th className="px-2 py-1 text-left font-medium">Item</th>
            <th className="px-2 py-1 text-left font-medium">Size</th>
            <th className="px-2 py-1 text-right font-medium">Qty</th>
            <th className="px-2 py-1 text-right font-medium">Bd ft</th>
            <th className="px-2 py-1 text-right font-medium">Unit price</th>
            <th className="px-2 py-1 text-right font-medium">Cost ({list.currency})</th>
          </tr>
        </thead>
        <tbody className="dim">
          {list.rows.map((r, i) => (
            <tr key={i} className="border-b border-rule/60">
              <td className="px-2 py-1 text-graphite-faint" aria-hidden="true">☐</td>
              <td className="px-2 py-1 font-sans">{r.item}</td>
              <td className="px-2 py-1">{r.size}</td>
              <td className="px-2 py-1 text-right">{r.quantity} {r.unit}{r.quantity === 1 || /s$/.test(r.unit) ? '' : 's'}</td>
              <td className="px-2 py-1 text-right">{r.boardFeet === null ? '' : r.boardFeet.toFixed(2)}</td>
              <td className="px-2 py-1 text-right">{r.unitPriceCents === null ? '—' : centsText(r.unitPriceCents)}</td>
              <td className="px-2 py-1 text-right">{r.costCents === null ? <span className="font-sans text-pencil">no price</span> : centsText(r.costCents)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t border-graphite">
            <td colSpan={6} className="px-2 py-1 text-right font-semibold">Total{list.unpriced > 0 ? ` (${list.unpriced} line${list.unpriced === 1 ? '' : 's'} without a price left out)` : ''}</td>
            <td className="dim px-2 py-1 text-right font-semibold">{centsText(list.totalCents)}</td>
          </tr>
        </tfoot>
      </table>
    </section>
  );
}
