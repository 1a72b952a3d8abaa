import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { costOf } from '../../shared/materials/cost.ts';
import type { PriceList } from '../../shared/materials/priceList.ts';
import { shoppingList } from '../../shared/materials/shoppingList.ts';
import type { MaterialsTakeoff } from '../../shared/materials/takeoff.ts';
import { can } from '../../shared/permissions.ts';
import { SHEET_GOODS, isSheetGoodId } from '../../shared/wood/sheetGoods.ts';
import { useDesign } from '../api/useDesign.ts';
import { useMe } from '../api/useMe.ts';
import { usePriceList } from '../api/usePriceList.ts';
import { BoardDiagramView } from '../components/BoardDiagramView.tsx';
import { CostSummary } from '../components/CostSummary.tsx';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { ExtrasTable } from '../components/ExtrasTable.tsx';
import { LayoutProgress } from '../components/LayoutProgress.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { PriceListEditor } from '../components/PriceListEditor.tsx';
import { SheetDiagramView } from '../components/SheetDiagramView.tsx';
import { ShoppingListTable } from '../components/ShoppingListTable.tsx';
import { StockOptionsForm } from '../components/StockOptionsForm.tsx';
import { TakeoffNumbers } from '../components/TakeoffNumbers.tsx';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { exportFileStem } from '../export/download.ts';
import { extrasOf, suggestedQuantities, unitItems } from '../materials/extras.ts';
import { useTakeoffRun } from '../materials/useTakeoffRun.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useStockSettings } from '../state/useStockSettings.ts';
import { linkTo } from './paths.ts';

const EMPTY_PRICES: PriceList = { currency: 'USD', items: [] };

/**
 * A design's materials: what to buy and how to cut it. The layouts run in a Web Worker with a
 * progress bar and Cancel; the diagrams are drawn to scale; the cost comes from the workshop's
 * price list; the shopping list prints and exports as CSV.
 */
export function MaterialsPage() {
  const { designId = '' } = useParams();
  const design = useDesign(designId);
  const me = useMe();
  const editorDesign = useEditorStore((s) => s.designId);
  const editorSpec = useEditorStore((s) => s.history?.present ?? null);
  const editorSaved = useEditorStore((s) => s.savedSpec);
  const workshopId = design.data?.workshopId;
  const prices = usePriceList(workshopId);

  if (design.isPending) return <LoadingBlock label="Opening the design…" className="mx-auto max-w-7xl" />;
  if (design.isError) return <ErrorNotice title="Could not open this design" error={design.error} onRetry={() => void design.refetch()} className="mx-auto mt-8 max-w-xl" />;

  // The editor's spec when it holds this design (unsaved changes included), else the saved head.
  const fromEditor = editorDesign === design.data.id && editorSpec !== null;
  const spec = fromEditor ? editorSpec : design.data.headRevision.spec;
  const role = me.data?.workshops.find((w) => w.id === design.data.workshopId)?.role ?? null;
  const outcome = buildOutcome(spec);
  return (
    <div className="mx-auto w-full max-w-[1400px] px-4 py-3">
      <header className="mb-3 flex flex-wrap items-end gap-x-4 gap-y-1 border-b border-rule pb-2">
        <div className="mr-auto">
          <p className="no-print text-xs text-graphite-soft">
            <Link to={linkTo.design(design.data.id)} className="hover:text-pencil">← Back to the design</Link>
          </p>
          <h1 className="text-lg font-semibold">
            Materials — {design.data.title} <span className="font-mono text-sm font-normal text-graphite-soft">r{design.data.head.number}{fromEditor && spec !== editorSaved ? ' with unsaved changes' : ''}</span>
          </h1>
        </div>
        <p className="text-xs text-graphite-soft">Buy a little over: boards hide checks and sheets get damaged. Check every layout against your stock before you cut.</p>
      </header>
      {outcome.ok ? (
        <MaterialsBody result={outcome.result} workshopId={design.data.workshopId} priceList={prices.data?.priceList ?? EMPTY_PRICES}
          priceData={prices.data ?? null} pricesError={prices.error} canEditPrices={can(role, 'priceList.manage')} fileStem={exportFileStem(design.data.title, design.data.head.number)} />
      ) : (
        <ErrorNotice title="This design does not build, so there is nothing to lay out" error={new Error(outcome.message)} />
      )}
    </div>
  );
}

type Built = Extract<ReturnType<typeof buildOutcome>, { ok: true }>['result'];

function MaterialsBody({ result, workshopId, priceList, priceData, pricesError, canEditPrices, fileStem }: {
  result: Built; workshopId: string; priceList: PriceList; priceData: ReturnType<typeof usePriceList>['data'] | null; pricesError: unknown; canEditPrices: boolean; fileStem: string;
}) {
  const settings = useStockSettings((s) => s.settings);
  const setSettings = useStockSettings((s) => s.setSettings);
  const { run, cancel, rerun } = useTakeoffRun(result, settings);
  const [quantities, setQuantities] = useState<Record<string, number> | null>(null);
  const suggested = useMemo(() => suggestedQuantities(result, priceList), [result, priceList]);
  const shownQuantities = useMemo(() => ({ ...suggested, ...(quantities ?? {}) }), [suggested, quantities]);
  const sheetIds = useMemo(() => [...new Set(result.parts.flatMap((p) => (p.material.kind === 'sheet' ? [p.material.sheetId] : [])))], [result]);

  const takeoff: MaterialsTakeoff | null = run.status === 'done' ? run.takeoff : run.status === 'running' || run.status === 'error' ? run.previous : null;
  const cost = useMemo(() => (takeoff ? costOf(takeoff, priceList, extrasOf(priceList, shownQuantities)) : null), [takeoff, priceList, shownQuantities]);
  const list = useMemo(() => (takeoff && cost ? shoppingList(takeoff, cost) : null), [takeoff, cost]);
  const longestBoard = takeoff ? Math.max(1, ...takeoff.boards.flatMap((b) => b.layout.boards.map((p) => p.lengthMm))) : 1;

  return (
    <div className="grid gap-4 lg:grid-cols-[20rem_minmax(0,1fr)]">
      <aside className="no-print grid content-start gap-4" aria-label="Stock and hardware">
        <div className="card p-3">
          <h2 className="mb-2 text-sm font-semibold">Stock</h2>
          <StockOptionsForm settings={settings} onChange={setSettings} sheetIds={sheetIds} />
        </div>
        <div className="card p-3">
          <h2 className="mb-2 text-sm font-semibold">Hardware and finish</h2>
          <ExtrasTable items={unitItems(priceList)} quantities={shownQuantities} onChange={(key, q) => setQuantities({ ...(quantities ?? {}), [key]: q })} />
          <p className="mt-1 text-[11px] text-graphite-faint">Finish starts at the finishing schedule's three coats (typical coverage, approximate: the can's label governs).</p>
        </div>
      </aside>

      <div className="grid min-w-0 content-start gap-5">
        {run.status === 'running' && <LayoutProgress progress={run.progress} onCancel={cancel} />}
        {run.status === 'error' && <ErrorNotice title={`The layout could not run${run.field ? ` (${run.field})` : ''}`} error={new Error(run.message)} />}
        {takeoff?.cancelled && run.status === 'done' && (
          <p role="status" className="no-print flex items-center gap-3 rounded-sm border border-caution/60 bg-caution-soft px-3 py-2 text-sm">
            Stopped early: these are the best layouts found before you cancelled.
            <button type="button" className="btn ml-auto" onClick={rerun}>Run again</button>
          </p>
        )}
        {!takeoff && run.status !== 'error' && <LoadingBlock label="Laying out the parts…" />}
        {takeoff && (
          <div className={run.status === 'running' ? 'opacity-60' : ''}>
            <TakeoffNumbers takeoff={takeoff} />
            <section aria-labelledby="sheets-heading" className="mt-5">
              <h2 id="sheets-heading" className="mb-2 text-base font-semibold">Sheet cutting diagrams</h2>
              {takeoff.sheets.length === 0 && <p className="text-sm text-graphite-soft">No sheet goods in this design.</p>}
              <div className="grid gap-5">
                {takeoff.sheets.flatMap((s) =>
                  s.layout.sheets.map((plan, i) => (
                    <SheetDiagramView key={`${s.sheetId}-${i}`} plan={plan} kerfMm={s.layout.kerfMm} faceGrain={!(isSheetGoodId(s.sheetId) && SHEET_GOODS[s.sheetId].kind === 'mdf')}
                      title={`${s.sheetName} — ${plan.offcut ? 'offcut' : 'sheet'} ${i + 1} of ${s.layout.sheets.length}`} />
                  )),
                )}
              </div>
            </section>
            <section aria-labelledby="boards-heading" className="mt-6 break-before-page">
              <h2 id="boards-heading" className="mb-1 text-base font-semibold">Board cutting diagrams</h2>
              <p className="mb-2 text-xs text-graphite-soft">Parts at their rough size (milling allowance included), all boards at one scale; grain runs along each board. Crosscut first at the numbered red lines, then rip. Dashed outlines keep grain-match groups together.</p>
              <div className="grid gap-4">
                {takeoff.boards.map((b) => (
                  <div key={`${b.speciesId}:${b.quarters}`} className="grid gap-2">
                    <h3 className="text-sm font-semibold">{b.speciesName} {b.quarters}/4</h3>
                    {b.layout.splitGroups.length > 0 && (
                      <p className="text-xs text-pencil">Grain match split: {b.layout.splitGroups.length} group{b.layout.splitGroups.length === 1 ? ' is' : 's are'} too wide for one board, so {b.layout.splitGroups.length === 1 ? 'its' : 'their'} boards come from several (red outlines). Pick boards of like colour and figure.</p>
                    )}
                    {b.layout.boards.map((plan, i) => (
                      <BoardDiagramView key={i} plan={plan} kerfMm={b.layout.kerfMm} longestMm={longestBoard} splitGroups={b.layout.splitGroups} title={`Board ${i + 1} of ${b.layout.boards.length} — ${plan.stockName}`} />
                    ))}
                  </div>
                ))}
              </div>
            </section>
            {cost && (
              <section aria-labelledby="cost-heading" className="mt-6 break-before-page">
                <h2 id="cost-heading" className="mb-2 text-base font-semibold">Cost</h2>
                {pricesError ? <ErrorNotice title="Could not read the workshop's price list" error={pricesError} /> : <CostSummary cost={cost} />}
              </section>
            )}
            {list && <div className="mt-6"><ShoppingListTable list={list} fileStem={fileStem} /></div>}
          </div>
        )}
        {priceData && <div className="mt-2 border-t border-rule pt-4"><PriceListEditor workshopId={workshopId} data={priceData} canEdit={canEditPrices} /></div>}
      </div>
    </div>
  );
}
