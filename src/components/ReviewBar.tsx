import { useState } from 'react';
import type { ApprovalState } from '../../shared/schemas/designs.ts';
import { useDecideApproval } from '../api/useDecideApproval.ts';
import { ApprovalBadge } from './ApprovalBadge.tsx';
import { ErrorNotice } from './ErrorNotice.tsx';

/** For a reviewer: approve the revision on screen, or ask for changes, with an optional note. */
export function ReviewBar({ designId, revision, approval }: { designId: string; revision: number; approval: ApprovalState }) {
  const decide = useDecideApproval(designId);
  const [note, setNote] = useState('');
  const send = (decision: 'approved' | 'changes_requested') =>
    decide.mutate({ revision, decision, note: note.trim() }, { onSuccess: () => setNote('') });
  return (
    <div className="flex flex-wrap items-center gap-2 border-b border-ok/40 bg-ok-soft/40 px-4 py-2 text-sm" role="region" aria-label="Review">
      <span className="font-medium">You are reviewing revision <span className="font-mono">r{revision}</span>.</span>
      <ApprovalBadge approval={approval} />
      <label htmlFor="review-note" className="sr-only">Note to the designer</label>
      <input id="review-note" className="field w-72 font-sans" placeholder="A note for the designer (optional)" value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} />
      <button type="button" className="btn border-ok bg-ok text-sheet hover:bg-ok/90" disabled={decide.isPending} onClick={() => send('approved')}>
        Approve r{revision}
      </button>
      <button type="button" className="btn" disabled={decide.isPending} onClick={() => send('changes_requested')}>
        Request changes
      </button>
      {decide.isSuccess && <span role="status" className="text-xs text-ok">Your decision is recorded.</span>}
      {decide.error && <ErrorNotice title="Could not record the decision" error={decide.error} className="w-full" />}
    </div>
  );
}
