import { useState } from 'react';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { SIZE_KEYS, type SizeKey } from '../../shared/room/fitToNiche.ts';
import { StaleSaveError, useSaveRevision } from '../api/useSaveRevision.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useLength } from '../state/useLength.ts';
import { useNicheFit } from '../state/useNicheFit.ts';
import { ErrorNotice } from './ErrorNotice.tsx';
import { SaveConflictDialog } from './SaveConflictDialog.tsx';

const SIZE_LABEL: Record<SizeKey, string> = { width: 'Width', depth: 'Depth', height: 'Height' };

interface Props {
  designId: string;
  workshopId: string;
  title: string;
  spec: PieceSpec;
  roomName: string;
  /** The maker may save revisions. */
  canEdit: boolean;
}

/**
 * Fit to the niche: the largest width, depth and height that pass every room check, keeping
 * the piece's proportions or the sizes the maker pins; the proposal shown from → to, and saved
 * as a new revision on request (a stale save is handled as the save bar handles it).
 */
export function NicheFitPanel({ designId, workshopId, title, spec, roomName, canEdit }: Props) {
  const length = useLength();
  const [pinned, setPinned] = useState<readonly SizeKey[]>([]);
  const [keepProportions, setKeepProportions] = useState(true);
  const { state, propose, clear } = useNicheFit();
  const save = useSaveRevision(designId);
  const [saved, setSaved] = useState<{ spec: PieceSpec; message: string } | null>(null);
  const baseRevision = useEditorStore((s) => s.baseRevision);
  const { replaceSpec, markSaved } = useEditorStore.getState();
  const conflict = save.error instanceof StaleSaveError ? save.error : null;
  const allPinned = pinned.length === SIZE_KEYS.length;

  const answer = state.status === 'done' ? state.answer : null;
  const stale = state.status !== 'idle' && state.spec !== spec && saved === null;
  const proposal = answer?.ok && answer.found && answer.changes.length > 0 && !stale ? answer : null;

  const apply = () => {
    if (!proposal || baseRevision === null) return;
    const next: PieceSpec = { ...spec, params: proposal.params };
    const message = `Fit to the niche in ${roomName}`;
    replaceSpec(next);
    setSaved({ spec: next, message });
    save.mutate({ baseRevision, spec: next, message }, {
      onSuccess: (revision) => {
        markSaved(revision.number, next);
        clear();
      },
    });
  };

  return (
    <section aria-label="Fit to the niche" className="relative space-y-2 px-3 py-2 text-[13px]">
      <h3 className="text-xs font-semibold uppercase tracking-[0.14em] text-graphite-soft">Fit to the niche</h3>
      <p className="text-xs text-graphite-soft">The largest size that passes every check where the piece stands.</p>
      <div className="flex flex-wrap gap-x-3 gap-y-1 text-xs">
        <label className="flex items-center gap-1">
          <input type="checkbox" className="accent-[var(--color-pencil)]" checked={keepProportions} onChange={(e) => setKeepProportions(e.target.checked)} />
          Keep proportions
        </label>
        {SIZE_KEYS.map((key) => (
          <label key={key} className="flex items-center gap-1">
            <input type="checkbox" className="accent-[var(--color-pencil)]" checked={pinned.includes(key)}
              onChange={(e) => setPinned(e.target.checked ? [...pinned, key] : pinned.filter((k) => k !== key))} />
            Pin {key}
          </label>
        ))}
      </div>
      <button type="button" className="btn" disabled={state.status === 'working' || allPinned} onClick={() => { save.reset(); setSaved(null); propose(spec, pinned, keepProportions); }}
        title={allPinned ? 'Leave at least one size free' : undefined}>
        {state.status === 'working' ? 'Working it out…' : 'Propose a size that fits'}
      </button>

      {state.status === 'working' && <p role="status" className="text-xs text-graphite-soft">Trying sizes against every check…</p>}
      {state.status === 'failed' && <p role="alert" className="text-xs text-pencil">The fit could not finish: {state.message}</p>}
      {stale && state.status === 'done' && <p className="text-xs text-caution">The design changed since this proposal; propose again.</p>}
      {answer && !stale && !answer.ok && <p role="alert" className="text-xs text-pencil">{answer.field}: {lengthsInUserUnits(answer.message, length)}</p>}
      {answer?.ok && !stale && !proposal && <p role="status" className="text-xs">{lengthsInUserUnits(answer.message, length)}</p>}

      {proposal && (
        <div className="rounded-sm border border-rule bg-sheet p-2">
          <table className="w-full text-xs" aria-label="Proposed size">
            <thead>
              <tr className="text-left text-graphite-soft"><th className="font-normal">Size</th><th className="font-normal">Now</th><th className="font-normal">Proposed</th></tr>
            </thead>
            <tbody>
              {SIZE_KEYS.map((key) => {
                const from = Number(spec.params[key]);
                const change = proposal.changes.find((c) => c.key === key);
                return (
                  <tr key={key} data-size={key}>
                    <th scope="row" className="py-0.5 text-left font-normal">{SIZE_LABEL[key]}</th>
                    <td className="dim">{length(from)}</td>
                    <td className="dim font-semibold">{change ? `→ ${length(change.toMm)}` : pinned.includes(key) ? 'pinned' : 'unchanged'}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          {canEdit ? (
            <button type="button" className="btn btn-primary mt-2" disabled={save.isPending || baseRevision === null} onClick={apply}>
              {save.isPending ? 'Saving…' : 'Apply as a new revision'}
            </button>
          ) : (
            <p className="mt-2 text-xs text-graphite-soft">A designer or owner can apply it as a new revision.</p>
          )}
          <p className="mt-1 text-[11px] text-graphite-faint">Saves the design as it is in the editor, room included, with these sizes.</p>
        </div>
      )}
      {saved && save.isSuccess && <p role="status" className="text-xs text-ok">Saved as a new revision: “{saved.message}”.</p>}
      {conflict && saved && (
        <SaveConflictDialog designId={designId} workshopId={workshopId} title={title} conflict={conflict} spec={saved.spec} message={saved.message} onResolved={() => save.reset()} />
      )}
      {save.error && !conflict && <ErrorNotice title="Could not save" error={save.error} className="mt-2" />}
    </section>
  );
}
