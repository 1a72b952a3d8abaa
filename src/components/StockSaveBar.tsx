import { ErrorNotice } from './ErrorNotice.tsx';

interface Props {
  /** The form differs from what the workshop has saved. */
  dirty: boolean;
  /** Problems in the form; saving waits until there are none. */
  problemCount: number;
  saving: boolean;
  canEdit: boolean;
  updatedAt: string | null;
  updatedBy: string | null;
  saveError: unknown;
  onSave: () => void;
  onDiscard: () => void;
}

/** Whether the workshop's stock on the page is saved, and the Save and Discard buttons for those who may change it. */
export function StockSaveBar({ dirty, problemCount, saving, canEdit, updatedAt, updatedBy, saveError, onSave, onDiscard }: Props) {
  const status = dirty
    ? 'Unsaved changes: the layouts already use them. Save to keep them for the whole workshop.'
    : updatedAt
      ? `Saved for the workshop ${new Date(updatedAt).toLocaleDateString()}${updatedBy ? ` by ${updatedBy}` : ''}.`
      : 'The usual stock: nothing saved for this workshop yet.';
  return (
    <div className="grid gap-1.5" data-testid="stock-save-bar">
      <p role="status" className={`text-xs ${dirty ? 'text-pencil' : 'text-graphite-soft'}`}>{status}</p>
      {canEdit ? (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn btn-primary px-2 py-0.5 text-xs" disabled={!dirty || problemCount > 0 || saving} onClick={onSave}>
            {saving ? 'Saving…' : 'Save stock'}
          </button>
          {dirty && <button type="button" className="btn px-2 py-0.5 text-xs" disabled={saving} onClick={onDiscard}>Discard changes</button>}
          {problemCount > 0 && <span className="self-center text-xs text-pencil">Fix {problemCount === 1 ? 'the problem' : `the ${problemCount} problems`} marked first.</span>}
        </div>
      ) : (
        <p className="text-xs text-graphite-soft">Only the workshop's owners and designers can change its stock.</p>
      )}
      {saveError != null && <ErrorNotice title="Could not save the workshop's stock" error={saveError} />}
    </div>
  );
}
