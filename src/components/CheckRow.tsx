import type { ReactNode } from 'react';

/** One number of a check, already in the maker's words and unit. */
export interface CheckRowNumber {
  key: string;
  label: string;
  text: string;
}

interface Props {
  /** The verdict or severity badge: its words and its colours. */
  badge: { label: string; cls: string };
  title: string;
  message: string;
  numbers: readonly CheckRowNumber[];
  fix: string | null | undefined;
  /** Marks the row (a selected part is involved). */
  highlighted?: boolean;
  /** `data-*` attributes tests and styles find the row by, e.g. `{ 'data-check': id }`. */
  data: Readonly<Record<`data-${string}`, string | boolean>>;
  /** Under the fix: the parts to look at, for instance. */
  children?: ReactNode;
}

/** One check in a list: the badge, what was found, its numbers and the fix. Shared by the piece's and the room's checks. */
export function CheckRow({ badge, title, message, numbers, fix, highlighted = false, data, children }: Props) {
  return (
    <li {...data} className={`grid grid-cols-[5.5rem_1fr] gap-3 px-3 py-2 ${highlighted ? 'bg-pencil-soft/40' : ''}`}>
      <span className={`h-fit rounded-sm px-1.5 py-0.5 text-center text-[11px] font-semibold uppercase tracking-wider ${badge.cls}`}>{badge.label}</span>
      <div className="min-w-0 text-[13px]">
        <p className="font-semibold">{title}</p>
        <p className="text-graphite">{message}</p>
        {numbers.length > 0 && (
          <dl className="mt-1 flex flex-wrap gap-x-4 gap-y-0.5 text-xs">
            {numbers.map((n) => (
              <div key={n.key} className="flex gap-1">
                <dt className="text-graphite-soft">{n.label}</dt>
                <dd className="dim">{n.text}</dd>
              </div>
            ))}
          </dl>
        )}
        {fix && (
          <p className="mt-1 text-xs">
            <span className="font-semibold text-ok">Fix: </span>
            {fix}
          </p>
        )}
        {children}
      </div>
    </li>
  );
}
