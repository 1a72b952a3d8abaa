import { useState, type FormEvent } from 'react';
import type { Part } from '../../shared/engine/types.ts';
import { useAddComment } from '../api/useAddComment.ts';
import { useComments } from '../api/useComments.ts';
import { timeAgo } from '../editor/timeAgo.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { LoadingBlock } from './LoadingBlock.tsx';

type Scope = 'design' | 'revision' | 'part';

/** Comments on the design, on a revision, or on the selected part; click a part tag to select it. */
export function CommentsPanel({ designId, revision, parts, canComment }: { designId: string; revision: number; parts: readonly Part[]; canComment: boolean }) {
  const comments = useComments(designId);
  const add = useAddComment(designId);
  const selectedPartId = useEditorStore((s) => s.selectedPartId);
  const select = useEditorStore((s) => s.select);
  const [scope, setScope] = useState<Scope>('design');
  const [onlyPart, setOnlyPart] = useState(false);
  const [body, setBody] = useState('');
  const names = new Map(parts.map((p) => [p.id, p.name]));
  const selectedName = selectedPartId ? names.get(selectedPartId) ?? selectedPartId : null;
  const effectiveScope: Scope = scope === 'part' && !selectedPartId ? 'design' : scope;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const text = body.trim();
    if (!text) return;
    add.mutate(
      {
        body: text,
        ...(effectiveScope !== 'design' ? { revision } : {}),
        ...(effectiveScope === 'part' && selectedPartId ? { partId: selectedPartId } : {}),
      },
      { onSuccess: () => setBody('') },
    );
  };

  const list = (comments.data ?? []).filter((c) => !onlyPart || (selectedPartId !== null && c.partId === selectedPartId));

  return (
    <div className="flex min-h-0 flex-col">
      <div className="flex items-center justify-between border-b border-rule px-3 py-1.5 text-xs">
        <label className="flex items-center gap-1.5">
          <input type="checkbox" className="accent-[var(--color-pencil)]" checked={onlyPart} disabled={!selectedPartId} onChange={(e) => setOnlyPart(e.target.checked)} />
          Only the selected part{selectedName ? ` (${selectedName})` : ''}
        </label>
      </div>
      <div className="min-h-0 flex-1 overflow-auto">
        {comments.isPending ? (
          <LoadingBlock label="Loading comments…" />
        ) : comments.isError ? (
          <ErrorNotice title="Could not load comments" error={comments.error} onRetry={() => void comments.refetch()} className="m-3" />
        ) : list.length === 0 ? (
          <p className="px-3 py-4 text-sm text-graphite-soft">{onlyPart ? 'No comments on this part yet.' : 'No comments yet.'}</p>
        ) : (
          <ul className="divide-y divide-rule/70" aria-label="Comments">
            {list.map((c) => (
              <li key={c.id} className="px-3 py-2 text-sm">
                <p className="text-xs text-graphite-soft">
                  <span className="font-medium text-graphite">{c.author?.name ?? 'A former member'}</span> · {timeAgo(c.createdAt)}
                  {c.revision !== null && <span className="ml-1 font-mono">r{c.revision}</span>}
                  {c.partId && (
                    <button type="button" className="ml-1 rounded-sm border border-rule px-1 hover:border-pencil hover:text-pencil" onClick={() => select(c.partId)}>
                      {names.get(c.partId) ?? c.partId}
                    </button>
                  )}
                </p>
                <p className="mt-0.5 whitespace-pre-wrap">{c.body}</p>
              </li>
            ))}
          </ul>
        )}
      </div>
      {canComment && (
        <form onSubmit={submit} className="border-t border-rule p-3">
          <label htmlFor="comment-body" className="sr-only">Comment</label>
          <textarea id="comment-body" rows={2} className="field font-sans" placeholder="Write a comment…" value={body} maxLength={5000} onChange={(e) => setBody(e.target.value)} />
          <div className="mt-2 flex items-center justify-between gap-2">
            <label className="flex items-center gap-1 text-xs">
              <span className="text-graphite-soft">On</span>
              <select className="rounded-sm border border-rule bg-sheet px-1 py-0.5" value={effectiveScope} onChange={(e) => setScope(e.target.value as Scope)} aria-label="What the comment is about">
                <option value="design">the design</option>
                <option value="revision">revision {revision}</option>
                <option value="part" disabled={!selectedPartId}>{selectedName ? `the ${selectedName.toLowerCase()}` : 'a part (select one first)'}</option>
              </select>
            </label>
            <button type="submit" className="btn py-1 text-xs" disabled={add.isPending || !body.trim()}>{add.isPending ? 'Posting…' : 'Post'}</button>
          </div>
          {add.error && <ErrorNotice title="Could not post" error={add.error} className="mt-2" />}
        </form>
      )}
    </div>
  );
}
