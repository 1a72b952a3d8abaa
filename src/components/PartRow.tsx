import type { ReactNode } from 'react';
import { useEditorStore } from '../state/useEditorStore.ts';

/**
 * A table row that stands for a part: hover and click select it (shared with the 3D view and
 * the other tables), Enter or Space select it from the keyboard, and the selected row is marked.
 */
export function PartRow({ partId, name, children }: { partId: string; name: string; children: ReactNode }) {
  const selected = useEditorStore((s) => s.selectedPartId === partId);
  const hovered = useEditorStore((s) => s.hoveredPartId === partId);
  const select = useEditorStore((s) => s.select);
  const hover = useEditorStore((s) => s.hover);
  const toggle = () => select(selected ? null : partId);
  return (
    <tr
      tabIndex={0}
      aria-selected={selected}
      data-part-row={partId}
      title={`${name}: click to show it in the 3D view`}
      className={`cursor-pointer border-b border-rule/60 outline-none focus-visible:bg-pencil-soft/50 ${selected ? 'bg-pencil-soft/70 shadow-[inset_3px_0_0_var(--color-pencil)]' : hovered ? 'bg-paper-deep/70' : 'hover:bg-paper-deep/50'}`}
      onClick={toggle}
      onMouseEnter={() => hover(partId)}
      onMouseLeave={() => hover(null)}
      onKeyDown={(e) => {
        if (e.key === 'Enter' || e.key === ' ') {
          e.preventDefault();
          toggle();
        }
      }}
    >
      {children}
    </tr>
  );
}
