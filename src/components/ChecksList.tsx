import type { Check, Part, Severity } from '../../shared/engine/types.ts';
import { checkNumber } from '../editor/checkNumbers.ts';
import { useLength } from '../state/useLength.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { CheckRow } from './CheckRow.tsx';

const SEVERITY: Record<Severity, { label: string; cls: string; order: number }> = {
  error: { label: 'Error', cls: 'bg-pencil text-sheet', order: 0 },
  warning: { label: 'Warning', cls: 'bg-caution text-sheet', order: 1 },
  caution: { label: 'Caution', cls: 'bg-caution-soft text-caution border border-caution/50', order: 2 },
  info: { label: 'Note', cls: 'bg-paper-deep text-graphite-soft', order: 3 },
};

/** The engine's checks, worst first: what is wrong, the numbers, the fix, and the parts to look at. */
export function ChecksList({ checks, parts, empty }: { checks: readonly Check[]; parts: readonly Part[]; empty: string }) {
  const length = useLength();
  const selected = useEditorStore((s) => s.selectedPartId);
  const select = useEditorStore((s) => s.select);
  const hover = useEditorStore((s) => s.hover);
  const names = new Map(parts.map((p) => [p.id, p.name]));
  const sorted = [...checks].sort((a, b) => SEVERITY[a.severity].order - SEVERITY[b.severity].order);
  if (sorted.length === 0) return <p className="px-3 py-4 text-sm text-graphite-soft">{empty}</p>;
  return (
    <ul className="divide-y divide-rule/70" aria-label="Checks">
      {sorted.map((check) => {
        const involved = check.partIds.includes(selected ?? '');
        return (
          <CheckRow
            key={check.id}
            data={{ 'data-check': check.id }}
            badge={SEVERITY[check.severity]}
            title={check.title}
            message={check.message}
            numbers={Object.entries(check.numbers).map(([key, value]) => ({ key, ...checkNumber(key, value, length) }))}
            fix={check.fix}
            highlighted={involved}
          >
            {check.partIds.length > 0 && (
              <p className="mt-1 flex flex-wrap gap-1">
                {check.partIds.map((id) => (
                  <button
                    key={id}
                    type="button"
                    className={`rounded-sm border px-1.5 py-0.5 text-[11px] ${selected === id ? 'border-pencil bg-pencil text-sheet' : 'border-rule bg-sheet hover:border-pencil hover:text-pencil'}`}
                    aria-pressed={selected === id}
                    onClick={() => select(selected === id ? null : id)}
                    onMouseEnter={() => hover(id)}
                    onMouseLeave={() => hover(null)}
                  >
                    {names.get(id) ?? id}
                  </button>
                ))}
              </p>
            )}
          </CheckRow>
        );
      })}
    </ul>
  );
}
