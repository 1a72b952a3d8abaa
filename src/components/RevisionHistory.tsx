import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { Link } from 'react-router-dom';
import type { Approval } from '../../shared/schemas/comments.ts';
import { useRestoreRevision } from '../api/useRestoreRevision.ts';
import { useRevisions } from '../api/useRevisions.ts';
import { revisionQuery } from '../api/useRevision.ts';
import { timeAgo } from '../editor/timeAgo.ts';
import { linkTo } from '../routes/paths.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { LoadingBlock } from './LoadingBlock.tsx';

/** Every revision, newest first: pick two to compare, restore an older one. */
export function RevisionHistory({ designId, headNumber, canEdit, dirty, approvals }: { designId: string; headNumber: number; canEdit: boolean; dirty: boolean; approvals: readonly Approval[] }) {
  const revisions = useRevisions(designId);
  const restore = useRestoreRevision(designId);
  const baseRevision = useEditorStore((s) => s.baseRevision);
  const load = useEditorStore((s) => s.load);
  const [picked, setPicked] = useState<number[]>([]);

  if (revisions.isPending) return <LoadingBlock label="Loading the history…" />;
  if (revisions.isError) return <ErrorNotice title="Could not load the history" error={revisions.error} onRetry={() => void revisions.refetch()} className="m-3" />;

  const toggle = (n: number) => setPicked((p) => (p.includes(n) ? p.filter((x) => x !== n) : [...p, n].slice(-2)));
  const [a, b] = [...picked].sort((x, y) => x - y);
  const decided = new Map<number, Approval>();
  for (const approval of approvals) if (!decided.has(approval.revision)) decided.set(approval.revision, approval);

  return (
    <div className="flex min-h-0 flex-col">
      <div className="flex items-center justify-between gap-2 border-b border-rule px-3 py-2 text-xs">
        <span className="text-graphite-soft">{picked.length < 2 ? 'Tick two revisions to compare them.' : `r${a} and r${b} chosen`}</span>
        {a !== undefined && b !== undefined ? (
          <Link className="btn py-0.5 text-xs" to={linkTo.compare(designId, a, b)}>Compare r{a} → r{b}</Link>
        ) : (
          <span className="btn pointer-events-none py-0.5 text-xs opacity-40" aria-hidden="true">Compare</span>
        )}
      </div>
      <ol className="min-h-0 flex-1 divide-y divide-rule/70 overflow-auto" aria-label="Revisions">
        {revisions.data.map((rev) => {
          const approval = decided.get(rev.number);
          return (
            <li key={rev.number} data-revision={rev.number} className={`px-3 py-2 text-sm ${rev.number === baseRevision ? 'bg-paper-deep/50' : ''}`}>
              <div className="flex items-start gap-2">
                <input type="checkbox" className="mt-1 accent-[var(--color-pencil)]" aria-label={`Choose revision ${rev.number} to compare`} checked={picked.includes(rev.number)} onChange={() => toggle(rev.number)} />
                <div className="min-w-0 flex-1">
                  <p className="flex flex-wrap items-baseline gap-x-2">
                    <span className="font-mono font-semibold">r{rev.number}</span>
                    {rev.number === headNumber && <span className="text-[11px] uppercase tracking-wider text-pencil">latest</span>}
                    {rev.number === baseRevision && <span className="text-[11px] uppercase tracking-wider text-graphite-soft">{canEdit ? 'editing' : 'showing'}</span>}
                    {approval && (
                      <span className={`text-[11px] font-medium ${approval.decision === 'approved' ? 'text-ok' : 'text-caution'}`}>
                        {approval.decision === 'approved' ? '✓ approved' : 'changes requested'}
                        {approval.reviewer ? ` by ${approval.reviewer.name}` : ''}
                      </span>
                    )}
                  </p>
                  <p className="truncate text-graphite" title={rev.message}>{rev.message || <span className="italic text-graphite-faint">no message</span>}</p>
                  <p className="text-xs text-graphite-soft">
                    {rev.author?.name ?? 'someone'} · {timeAgo(rev.createdAt)}
                    {rev.restoredFrom ? ` · restored r${rev.restoredFrom}` : ''}
                  </p>
                  {rev.number !== baseRevision && (
                    <div className="mt-1 flex gap-3 text-xs">
                      <OpenRevision designId={designId} number={rev.number} disabled={dirty} onOpen={load} />
                      {canEdit && rev.number !== headNumber && (
                        <button type="button" className="text-graphite underline-offset-2 hover:text-pencil hover:underline disabled:opacity-40" disabled={restore.isPending || dirty}
                          title={dirty ? 'Save or undo your changes first' : undefined}
                          onClick={() => restore.mutate({ revision: rev.number, baseRevision: headNumber, message: `Restored revision ${rev.number}` })}>
                          Restore as latest
                        </button>
                      )}
                    </div>
                  )}
                </div>
              </div>
            </li>
          );
        })}
      </ol>
      {restore.error && <ErrorNotice title="Could not restore" error={restore.error} className="m-3" />}
    </div>
  );
}

/** Loads an older revision into the editor to look at it; a save from it is checked against the latest. */
function OpenRevision({ designId, number, disabled, onOpen }: { designId: string; number: number; disabled: boolean; onOpen: (designId: string, revision: number, spec: PieceSpec) => void }) {
  const queryClient = useQueryClient();
  const [state, setState] = useState<'idle' | 'opening' | 'failed'>('idle');
  const open = async () => {
    setState('opening');
    try {
      const revision = await queryClient.fetchQuery(revisionQuery(designId, number));
      onOpen(designId, number, revision.spec);
      setState('idle');
    } catch {
      setState('failed');
    }
  };
  return (
    <button type="button" className="text-graphite underline-offset-2 hover:text-pencil hover:underline disabled:opacity-40" disabled={disabled || state === 'opening'}
      title={disabled ? 'Save or undo your changes first' : undefined} onClick={() => void open()}>
      {state === 'opening' ? 'Opening…' : state === 'failed' ? 'Could not open; try again' : 'Open'}
    </button>
  );
}
