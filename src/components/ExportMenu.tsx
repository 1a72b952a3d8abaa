import { useEffect, useId, useRef, useState } from 'react';
import type { PaperSize } from '../../shared/drawing/types.ts';
import type { PieceResult } from '../../shared/engine/types.ts';
import { usePriceList } from '../api/usePriceList.ts';
import { useStock } from '../api/useStock.ts';
import { exportFileStem, saveBlob } from '../export/download.ts';
import type { SvgViewId } from '../export/viewSvg.ts';
import { usePreferences } from '../state/usePreferences.ts';

/** The export code (drawing model, jsPDF, the font, papaparse) loads only when something is exported. */
const loadExports = () => import('../export/exportPlanSet.ts');

const SIZES: readonly { id: PaperSize; label: string }[] = [
  { id: 'letter', label: 'Letter' },
  { id: 'a4', label: 'A4' },
  { id: 'a3', label: 'A3' },
];
const VIEWS: readonly { id: SvgViewId; label: string }[] = [
  { id: 'front', label: 'Front' },
  { id: 'side', label: 'Side' },
  { id: 'top', label: 'Top' },
  { id: 'exploded', label: 'Exploded' },
];

type Progress = { done: number; total: number };

function message(error: unknown): string {
  return error instanceof Error && error.message ? error.message : 'something went wrong';
}

/** Which stock the materials pages and cutting diagrams are laid out on, in the menu's words. */
function stockText(stock: ReturnType<typeof useStock>): string {
  if (stock.isPending) return 'Reading the workshop\'s stock…';
  if (!stock.data) return 'The workshop\'s stock could not be read: the cutting diagrams use the default stock (6 and 8 ft boards, 4 × 8 ft sheets).';
  const onHand = stock.data.stock.boardsInStock.length;
  return `Cutting diagrams use the workshop's stock, as on the Materials page${onHand ? ` (${onHand} board${onHand === 1 ? '' : 's'} on hand first)` : ''}.`;
}

/**
 * The editor's Export menu: the plan set as a PDF (sheet size, orientation and units chosen
 * here, a progress bar while it draws), one SVG per view, the cut list as CSV and the spec as
 * JSON. `result` is null while the parameters do not build; nothing can be exported then.
 * The plan set's materials pages are laid out on the workshop's stock (boards on hand and their
 * defects, sizes, kerf and trim), as the Materials page lays them out, and costed from the
 * workshop's price list; both read by the design's `workshopId`.
 */
export function ExportMenu({ result, title, revision, dirty, workshopName, workshopId }: {
  result: PieceResult | null;
  title: string;
  revision: number;
  /** Unsaved changes: the files say so, because they no longer match the revision. */
  dirty: boolean;
  workshopName: string;
  /** The design's workshop: its stock and price list go into the plan set. */
  workshopId: string;
}) {
  const preferredUnit = usePreferences((s) => s.unit);
  const prices = usePriceList(workshopId);
  const stock = useStock(workshopId);
  const [open, setOpen] = useState(false);
  const [units, setUnits] = useState<'in' | 'mm'>(preferredUnit);
  const [size, setSize] = useState<PaperSize | null>(null);
  const [orientation, setOrientation] = useState<'landscape' | 'portrait'>('landscape');
  const [progress, setProgress] = useState<Progress | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const wrapper = useRef<HTMLDivElement>(null);
  const panelId = useId();
  const busy = progress !== null;
  const sheetSize: PaperSize = size ?? (units === 'in' ? 'letter' : 'a4');
  // Short enough for the title block's revision cell.
  const revisionText = dirty ? `${revision} draft` : String(revision);
  const stem = `${exportFileStem(title, revision)}${dirty ? '-unsaved' : ''}`;

  useEffect(() => {
    if (!open) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape' && !busy) setOpen(false);
    };
    const onPointer = (event: PointerEvent) => {
      if (!busy && wrapper.current && !wrapper.current.contains(event.target as Node)) setOpen(false);
    };
    window.addEventListener('keydown', onKey);
    window.addEventListener('pointerdown', onPointer);
    return () => {
      window.removeEventListener('keydown', onKey);
      window.removeEventListener('pointerdown', onPointer);
    };
  }, [open, busy]);

  const run = async (what: string, make: () => Promise<void>) => {
    setError(null);
    setDone(null);
    try {
      await make();
      setDone(what);
    } catch (e) {
      setError(`Could not export the ${what}: ${message(e)}. Your design is unchanged; try again, or choose another sheet size.`);
    }
  };

  const exportPdf = () => run('plan set', async () => {
    if (!result) return;
    setProgress({ done: 0, total: 0 });
    try {
      const { exportPlanSet } = await loadExports();
      const blob = await exportPlanSet(result, {
        title, revision: revisionText, workshopName, units, sheet: { size: sheetSize, orientation },
        priceList: prices.data?.priceList ?? null,
        stock: stock.data?.stock ?? null,
        onProgress: (d, total) => setProgress({ done: d, total }),
      });
      saveBlob(blob, `${stem}-plan-set.pdf`);
    } finally {
      setProgress(null);
    }
  });

  const exportView = (view: SvgViewId) => run(`${view} view`, async () => {
    if (!result) return;
    const { exportSvg } = await loadExports();
    saveBlob(exportSvg(result, view, { title, revision: revisionText, workshopName, units, sheet: { size: sheetSize, orientation } }), `${stem}-${view}.svg`);
  });

  const exportCsv = () => run('cut list', async () => {
    if (!result) return;
    const { exportCutListCsv } = await loadExports();
    saveBlob(exportCutListCsv(result, units), `${stem}-cut-list.csv`);
  });

  const exportSpec = () => run('spec', async () => {
    if (!result) return;
    const { exportSpecJson } = await loadExports();
    saveBlob(exportSpecJson(result.spec), `${stem}-spec.json`);
  });

  const choice = (selected: boolean) => `px-2 py-0.5 text-xs ${selected ? 'bg-graphite text-sheet' : 'text-graphite hover:bg-paper-deep'}`;

  return (
    <div ref={wrapper} className="relative">
      <button type="button" className="btn" aria-expanded={open} aria-controls={panelId} disabled={!result}
        title={result ? 'Plan set, views, cut list and spec' : 'The piece must build before it can be exported'}
        onClick={() => setOpen((o) => !o)}>
        Export ▾
      </button>
      {open && result && (
        <div id={panelId} role="dialog" aria-label="Export" className="card absolute right-0 top-full z-30 mt-1 w-80 space-y-3 p-3 text-sm">
          <section aria-labelledby={`${panelId}-pdf`} className="space-y-2">
            <h2 id={`${panelId}-pdf`} className="font-semibold">Plan set (PDF)</h2>
            <div className="flex flex-wrap items-center gap-2">
              <label htmlFor={`${panelId}-size`} className="text-xs text-graphite-soft">Sheet</label>
              <select id={`${panelId}-size`} className="field w-auto py-0.5 font-sans text-xs" value={sheetSize} disabled={busy} onChange={(e) => setSize(e.target.value as PaperSize)}>
                {SIZES.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
              </select>
              <div className="flex overflow-hidden rounded-sm border border-graphite" role="radiogroup" aria-label="Orientation">
                {(['landscape', 'portrait'] as const).map((o) => (
                  <button key={o} type="button" role="radio" aria-checked={orientation === o} disabled={busy} className={choice(orientation === o)} onClick={() => setOrientation(o)}>
                    {o === 'landscape' ? 'Landscape' : 'Portrait'}
                  </button>
                ))}
              </div>
              <div className="flex overflow-hidden rounded-sm border border-graphite" role="radiogroup" aria-label="Drawing units">
                {(['in', 'mm'] as const).map((u) => (
                  <button key={u} type="button" role="radio" aria-checked={units === u} disabled={busy} className={`font-mono ${choice(units === u)}`} onClick={() => setUnits(u)}>
                    {u === 'in' ? 'inch' : 'mm'}
                  </button>
                ))}
              </div>
            </div>
            <p className="text-xs text-graphite-soft">
              {prices.data?.priceList.items.length
                ? `The materials page is costed from the workshop's price list (${prices.data.priceList.currency}).`
                : prices.isPending ? 'Reading the workshop\'s price list…' : 'No price list in this workshop: the materials page lists what to buy without cost.'}
              {' '}{stockText(stock)}
            </p>
            <button type="button" className="btn btn-primary w-full justify-center" disabled={busy} onClick={() => void exportPdf()}>
              {busy ? 'Drawing the plan set…' : 'Download the plan set'}
            </button>
            {progress && (
              <div role="status" aria-live="polite" className="space-y-1">
                <progress className="h-1.5 w-full accent-pencil" value={progress.done} max={progress.total || 1} aria-label="Plan set progress" />
                <p className="dim text-xs text-graphite-soft">
                  {progress.total ? `Sheet ${progress.done} of ${progress.total}` : 'Loading the drawing tools and the font…'}
                </p>
              </div>
            )}
          </section>

          <section aria-labelledby={`${panelId}-other`} className="space-y-2 border-t border-rule pt-2">
            <h2 id={`${panelId}-other`} className="font-semibold">Views (SVG), cut list, spec</h2>
            <div className="flex flex-wrap gap-1">
              {VIEWS.map((v) => (
                <button key={v.id} type="button" className="btn px-2 py-0.5 text-xs" disabled={busy} onClick={() => void exportView(v.id)}>
                  {v.label} view
                </button>
              ))}
            </div>
            <div className="flex flex-wrap gap-1">
              <button type="button" className="btn px-2 py-0.5 text-xs" disabled={busy} onClick={() => void exportCsv()}>Cut list (CSV)</button>
              <button type="button" className="btn px-2 py-0.5 text-xs" disabled={busy} onClick={() => void exportSpec()}>Spec (JSON)</button>
            </div>
            <p className="text-xs text-graphite-soft">
              Lengths in {units === 'in' ? 'inches' : 'millimetres'}; the spec JSON is always in millimetres.
              {dirty && ` These files show your unsaved changes, marked “${revisionText}”, not revision ${revision} as saved.`}
            </p>
          </section>

          {error && <p role="alert" className="rounded-sm border border-pencil/60 bg-pencil-soft/50 px-2 py-1 text-xs text-graphite"><span className="font-semibold text-pencil">Export failed. </span>{error}</p>}
          {done && !error && <p role="status" className="text-xs text-ok">The {done} is downloading.</p>}
        </div>
      )}
    </div>
  );
}
