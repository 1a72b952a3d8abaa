import type { StaleStockError } from '../api/useSaveStock.ts';

interface Props {
  conflict: StaleStockError;
  /** Saving the draft over theirs is under way. */
  overwriting: boolean;
  /** Drops the draft and shows the stock as they saved it. */
  onLoadTheirs: () => void;
  /** Saves the draft again, over the version they saved. */
  onOverwrite: () => void;
}

/** When the stock was saved, in the reader's own clock and manner. */
function savedAt(iso: string | null): string {
  if (!iso) return 'an unknown time';
  const at = new Date(iso);
  const sameDay = at.toDateString() === new Date().toDateString();
  return sameDay ? at.toLocaleTimeString([], { hour: 'numeric', minute: '2-digit' }) : at.toLocaleString([], { dateStyle: 'medium', timeStyle: 'short' });
}

/**
 * Someone saved the workshop's stock while this maker was editing it (the API answered 409):
 * nothing of the draft was saved, and the maker chooses to load theirs (dropping the draft) or
 * to save the draft over it. Fixed to the window, so it shows from either Save button.
 */
export function StockConflictNotice({ conflict, overwriting, onLoadTheirs, onOverwrite }: Props) {
  const { current } = conflict;
  return (
    <div role="alertdialog" aria-labelledby="stock-conflict-title" aria-describedby="stock-conflict-body"
      className="no-print fixed bottom-4 right-4 z-30 w-[26rem] max-w-[calc(100vw-2rem)] rounded-sm border-2 border-pencil bg-sheet p-4 shadow-lg">
      <p id="stock-conflict-title" className="font-semibold text-pencil">
        {current.updatedBy ?? 'Someone'} saved the stock at {savedAt(current.updatedAt)} while you were editing
      </p>
      <p id="stock-conflict-body" className="mt-1 text-sm">
        Your changes were not saved, and theirs were not overwritten. Load theirs to drop your changes, or save yours over theirs.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <button type="button" className="btn" disabled={overwriting} onClick={onLoadTheirs}>Load theirs (drop my changes)</button>
        <button type="button" className="btn btn-primary" disabled={overwriting} onClick={onOverwrite}>
          {overwriting ? 'Saving…' : 'Save mine over theirs'}
        </button>
      </div>
    </div>
  );
}
