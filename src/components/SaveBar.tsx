import { useState, type FormEvent } from 'react';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { StaleSaveError, useSaveRevision } from '../api/useSaveRevision.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { SaveConflictDialog } from './SaveConflictDialog.tsx';

interface Props {
  designId: string;
  workshopId: string;
  title: string;
  spec: PieceSpec;
  dirty: boolean;
  buildable: boolean;
}

/**
 * Save the edit as a new revision with a message. When someone saved first, the API answers
 * 409 and the maker chooses: load their revision (dropping this edit) or fork this edit.
 */
export function SaveBar({ designId, workshopId, title, spec, dirty, buildable }: Props) {
  const [message, setMessage] = useState('');
  const save = useSaveRevision(designId);
  const baseRevision = useEditorStore((s) => s.baseRevision);
  const { markSaved } = useEditorStore.getState();
  const conflict = save.error instanceof StaleSaveError ? save.error : null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (baseRevision === null) return;
    save.mutate(
      { baseRevision, spec, message: message.trim() },
      { onSuccess: (revision) => { markSaved(revision.number, spec); setMessage(''); } },
    );
  };

  return (
    <div className="min-w-0">
      <form onSubmit={submit} className="flex items-center gap-2">
        <label htmlFor="revision-message" className="sr-only">Revision message</label>
        <input id="revision-message" className="field w-56 font-sans" placeholder={dirty ? 'What changed? (optional)' : 'No unsaved changes'}
          value={message} maxLength={1000} onChange={(e) => setMessage(e.target.value)} disabled={!dirty} />
        <button type="submit" className="btn btn-primary" disabled={!dirty || !buildable || save.isPending}
          title={!buildable ? 'Fix the marked parameter first' : undefined}>
          {save.isPending ? 'Saving…' : 'Save revision'}
        </button>
      </form>
      {conflict && (
        <SaveConflictDialog designId={designId} workshopId={workshopId} title={title} conflict={conflict} spec={spec} message={message.trim()} onResolved={() => save.reset()} />
      )}
      {save.error && !conflict && <ErrorNotice title="Could not save" error={save.error} className="absolute right-4 z-30 mt-2 w-96" />}
    </div>
  );
}
