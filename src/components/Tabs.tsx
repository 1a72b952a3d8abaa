import { useId, useRef, type KeyboardEvent, type ReactNode } from 'react';

export interface TabDef<K extends string> {
  key: K;
  label: ReactNode;
}

/** A row of tabs with arrow-key movement (WAI-ARIA tabs pattern); the panel is the caller's. */
export function Tabs<K extends string>({ tabs, active, onChange, label, idPrefix }: { tabs: readonly TabDef<K>[]; active: K; onChange: (key: K) => void; label: string; idPrefix?: string }) {
  const auto = useId();
  const prefix = idPrefix ?? auto;
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const onKeyDown = (event: KeyboardEvent, index: number) => {
    const step = event.key === 'ArrowRight' ? 1 : event.key === 'ArrowLeft' ? -1 : 0;
    if (!step) return;
    event.preventDefault();
    const next = (index + step + tabs.length) % tabs.length;
    const tab = tabs[next];
    if (tab) onChange(tab.key);
    refs.current[next]?.focus();
  };
  return (
    <div role="tablist" aria-label={label} className="flex gap-0.5 overflow-x-auto border-b border-rule px-2">
      {tabs.map((tab, index) => (
        <button
          key={tab.key}
          ref={(el) => {
            refs.current[index] = el;
          }}
          id={`${prefix}-tab-${tab.key}`}
          role="tab"
          type="button"
          aria-selected={tab.key === active}
          aria-controls={`${prefix}-panel-${tab.key}`}
          tabIndex={tab.key === active ? 0 : -1}
          onClick={() => onChange(tab.key)}
          onKeyDown={(e) => onKeyDown(e, index)}
          className={`-mb-px whitespace-nowrap border-b-2 px-3 py-2 text-sm ${tab.key === active ? 'border-pencil font-semibold text-graphite' : 'border-transparent text-graphite-soft hover:text-pencil'}`}
        >
          {tab.label}
        </button>
      ))}
    </div>
  );
}

/** The panel belonging to the active tab. */
export function TabPanel({ idPrefix, tabKey, children, className = '' }: { idPrefix: string; tabKey: string; children: ReactNode; className?: string }) {
  return (
    <div role="tabpanel" id={`${idPrefix}-panel-${tabKey}`} aria-labelledby={`${idPrefix}-tab-${tabKey}`} tabIndex={0} className={className}>
      {children}
    </div>
  );
}
