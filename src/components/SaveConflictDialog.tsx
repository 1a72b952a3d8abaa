import { useNavigate } from 'react-router-dom';
import type { PieceSpec } from '../../shared/engine/types.ts';
import type { StaleSaveError } from '../api/useSaveRevision.ts';
import { useForkWithSpec } from '../api/useForkWithSpec.ts';
import { linkTo } from '../routes/paths.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { ErrorNotice } from './ErrorNotice.tsx';

interface Props {
  designId: string;
  workshopId: string;
  title: string;
  conflict: StaleSaveError;
  /** The spec this save tried to store, and its message. */
  spec: PieceSpec;
  message: string;
  /** Clears the failed save once the maker has chosen. */
  onResolved: () => void;
}

/**
 * Someone saved first (the API answered 409): nothing was overwritten, and the maker chooses
 * to load their revision (dropping this edit) or to fork this edit into a design of its own.
 */
export function SaveConflictDialog({ designId, workshopId, title, conflict, spec, message, onResolved }: Props) {
  const forkMine = useForkWithSpec(designId);
  const baseRevision = useEditorStore((s) => s.baseRevision);
  const { load } = useEditorStore.getState();
  const navigate = useNavigate();
  return (
    <div role="alertdialog" aria-labelledby="conflict-title" className="absolute right-4 z-30 mt-2 w-[26rem] rounded-sm border-2 border-pencil bg-sheet p-4 shadow-lg">
      <p id="conflict-title" className="font-semibold text-pencil">Someone saved a newer revision</p>
      <p className="mt-1 text-sm">
        Revision {conflict.head.number}
        {conflict.head.author ? ` by ${conflict.head.author.name}` : ''}
        {conflict.head.message ? ` — “${conflict.head.message}”` : ''} was saved while you were editing revision {baseRevision}. Nothing was overwritten.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <button type="button" className="btn" onClick={() => { load(designId, conflict.head.number, conflict.head.spec); onResolved(); }}>
          Load theirs (drop my changes)
        </button>
        <button type="button" className="btn btn-primary" disabled={forkMine.isPending || baseRevision === null}
          onClick={() => baseRevision !== null && forkMine.mutate(
            { workshopId, title: `${title} (my variation)`, fromRevision: baseRevision, spec, message: message || 'My changes, forked after a save conflict' },
            { onSuccess: (fork) => { onResolved(); navigate(linkTo.design(fork.id)); } },
          )}>
          {forkMine.isPending ? 'Forking…' : 'Fork mine'}
        </button>
      </div>
      {forkMine.error && <ErrorNotice title="Could not fork" error={forkMine.error} className="mt-2" />}
    </div>
  );
}
