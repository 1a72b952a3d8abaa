import type { UnitPrice } from '../../shared/materials/priceList.ts';

/** How many of each priced hardware and finish item the piece takes; the cost and shopping list follow. */
export function ExtrasTable({ items, quantities, onChange }: { items: readonly UnitPrice[]; quantities: Readonly<Record<string, number>>; onChange: (key: string, quantity: number) => void }) {
  if (items.length === 0) return <p className="text-xs text-graphite-soft">The price list has no hardware or finish items.</p>;
  return (
    <table className="w-full border-collapse text-[13px]" aria-label="Hardware and finish">
      <tbody>
        {items.map((item) => {
          const key = `${item.kind}:${item.itemId}`;
          return (
            <tr key={key} className="border-b border-rule/60">
              <td className="px-2 py-0.5 text-xs text-graphite-soft">{item.kind}</td>
              <td className="px-2 py-0.5">{item.name}</td>
              <td className="w-24 px-2 py-0.5">
                <input className="field text-right" type="number" min={0} max={1000} step={1} aria-label={`${item.name}, ${item.unit}s`} value={quantities[key] ?? 0}
                  onChange={(e) => onChange(key, Math.min(1000, Math.max(0, Math.round(Number(e.target.value) || 0))))} />
              </td>
              <td className="px-2 py-0.5 text-xs text-graphite-soft">{item.unit}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
