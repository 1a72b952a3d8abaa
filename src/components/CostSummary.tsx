import type { CostReport } from '../../shared/materials/cost.ts';
import { centsText } from '../../shared/materials/money.ts';

const CATEGORY: Record<string, string> = { lumber: 'Lumber', sheet: 'Sheet goods', hardware: 'Hardware', finish: 'Finish' };

/** The cost by material, hardware and finish, each material line with its waste factor; unpriced lines marked. */
export function CostSummary({ cost }: { cost: CostReport }) {
  const money = (cents: number) => `${centsText(cents)} ${cost.currency}`;
  return (
    <section aria-label="Cost" className="grid gap-2">
      <table className="w-full border-collapse text-[13px]" aria-label="Cost by line">
        <thead className="text-xs text-graphite-soft">
          <tr className="border-b border-rule">
            <th className="px-2 py-1 text-left font-medium">Line</th>
            <th className="px-2 py-1 text-right font-medium">Quantity</th>
            <th className="px-2 py-1 text-right font-medium">Unit price</th>
            <th className="px-2 py-1 text-right font-medium" title="What is bought over what ends up in the finished parts, less one">Waste</th>
            <th className="px-2 py-1 text-right font-medium">Cost</th>
          </tr>
        </thead>
        <tbody className="dim">
          {cost.lines.map((line) => (
            <tr key={line.key} className="border-b border-rule/60">
              <td className="px-2 py-1 font-sans"><span className="text-xs text-graphite-soft">{CATEGORY[line.category]} · </span>{line.description}</td>
              <td className="px-2 py-1 text-right">{line.unit === 'bd ft' ? line.quantity.toFixed(2) : line.quantity} {line.unit}</td>
              <td className="px-2 py-1 text-right">{line.unitPriceCents === null ? '—' : centsText(line.unitPriceCents)}</td>
              <td className="px-2 py-1 text-right">{line.wasteFactor === null ? '' : `+${(line.wasteFactor * 100).toFixed(0)} %`}</td>
              <td className="px-2 py-1 text-right">{line.costCents === null ? <span className="font-sans text-pencil">no price</span> : centsText(line.costCents)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          {(['lumber', 'sheet', 'hardware', 'finish'] as const).map((c) => (
            <tr key={c} className="text-xs text-graphite-soft">
              <td colSpan={4} className="px-2 pt-1 text-right">{CATEGORY[c]}</td>
              <td className="dim px-2 pt-1 text-right">{centsText(cost.totals[c])}</td>
            </tr>
          ))}
          <tr className="border-t border-graphite">
            <td colSpan={4} className="px-2 py-1 text-right font-semibold">Total</td>
            <td className="dim px-2 py-1 text-right text-base font-semibold" data-testid="cost-total">{money(cost.totals.total)}</td>
          </tr>
        </tfoot>
      </table>
      {cost.missingPrices.length > 0 && (
        <p className="text-xs text-pencil">Not in the total — no price in the workshop's list for: {cost.missingPrices.join(', ')}.</p>
      )}
    </section>
  );
}
