import type { TakeoffProgress } from '../../shared/materials/takeoff.ts';
import { progressFraction } from '../materials/useTakeoffRun.ts';

/** The optimiser's progress bar with what it is laying out, and the Cancel button that keeps the best so far. */
export function LayoutProgress({ progress, onCancel }: { progress: TakeoffProgress | null; onCancel: () => void }) {
  const fraction = progressFraction(progress);
  return (
    <div className="no-print flex items-center gap-3 rounded-sm border border-rule bg-sheet px-3 py-2" data-testid="layout-progress">
      <div className="min-w-0 flex-1">
        <p className="text-xs text-graphite-soft">
          Laying out{progress ? ` ${progress.label} (${progress.layout + 1} of ${progress.layouts}) — attempt ${progress.done}, best so far ${progress.best}` : '…'}
        </p>
        <div role="progressbar" aria-label="Layout progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(fraction * 100)} className="mt-1 h-1.5 overflow-hidden rounded-full bg-paper-deep">
          <div className="h-full bg-pencil transition-[width]" style={{ width: `${(fraction * 100).toFixed(1)}%` }} />
        </div>
      </div>
      <button type="button" className="btn" onClick={onCancel} title="Stop and keep the best layouts found so far">Cancel</button>
    </div>
  );
}
