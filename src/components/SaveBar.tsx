import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { StaleSaveError, useSaveRevision } from '../api/useSaveRevision.ts';
import { useForkWithSpec } from '../api/useForkWithSpec.ts';
import { linkTo } from '../routes/paths.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ErrorNotice } from './ErrorNotice.tsx';

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
  const forkMine = useForkWithSpec(designId);
  const baseRevision = useEditorStore((s) => s.baseRevision);
  const { markSaved, load } = useEditorStore.getState();
  const navigate = useNavigate();
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
        <div role="alertdialog" aria-labelledby="conflict-title" className="absolute right-4 z-30 mt-2 w-[26rem] rounded-sm border-2 border-pencil bg-sheet p-4 shadow-lg">
          <p id="conflict-title" className="font-semibold text-pencil">Someone saved a newer revision</p>
          <p className="mt-1 text-sm">
            Revision {conflict.head.number}
            {conflict.head.author ? ` by ${conflict.head.author.name}` : ''}
            {conflict.head.message ? ` — “${conflict.head.message}”` : ''} was saved while you were editing revision {baseRevision}. Nothing was overwritten.
          </p>
          <div className="mt-3 flex flex-wrap gap-2">
            <button type="button" className="btn" onClick={() => { load(designId, conflict.head.number, conflict.head.spec); save.reset(); }}>
              Load theirs (drop my changes)
            </button>
            <button type="button" className="btn btn-primary" disabled={forkMine.isPending || baseRevision === null}
              onClick={() => baseRevision !== null && forkMine.mutate(
                { workshopId, title: `${title} (my variation)`, fromRevision: baseRevision, spec, message: message.trim() || 'My changes, forked after a save conflict' },
                { onSuccess: (fork) => { save.reset(); navigate(linkTo.design(fork.id)); } },
              )}>
              {forkMine.isPending ? 'Forking…' : 'Fork mine'}
            </button>
          </div>
          {forkMine.error && <ErrorNotice title="Could not fork" error={forkMine.error} className="mt-2" />}
        </div>
      )}
      {save.error && !conflict && <ErrorNotice title="Could not save" error={save.error} className="absolute right-4 z-30 mt-2 w-96" />}
    </div>
  );
}
