import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { costOf } from '../../shared/materials/cost.ts';
import type { PriceList } from '../../shared/materials/priceList.ts';
import { DEFAULT_STOCK_SETTINGS, stockBoardId, type LayoutEffort, type StockSettings } from '../../shared/materials/stockSettings.ts';
import { shoppingList } from '../../shared/materials/shoppingList.ts';
import type { MaterialsTakeoff } from '../../shared/materials/takeoff.ts';
import { can } from '../../shared/permissions.ts';
import { stockProblems, type StockResponse } from '../../shared/schemas/stock.ts';
import { SPECIES, isSpeciesId } from '../../shared/wood/species.ts';
import { SHEET_GOODS, isSheetGoodId } from '../../shared/wood/sheetGoods.ts';
import { useDesign } from '../api/useDesign.ts';
import { useMe } from '../api/useMe.ts';
import { usePriceList } from '../api/usePriceList.ts';
import { isStaleStock, useSaveStock } from '../api/useSaveStock.ts';
import { useStock } from '../api/useStock.ts';
import { BoardDiagramView } from '../components/BoardDiagramView.tsx';
import { CostSummary } from '../components/CostSummary.tsx';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { ExtrasTable } from '../components/ExtrasTable.tsx';
import { LayoutProgress } from '../components/LayoutProgress.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { PriceListEditor } from '../components/PriceListEditor.tsx';
import { SheetDiagramView } from '../components/SheetDiagramView.tsx';
import { ShoppingListTable } from '../components/ShoppingListTable.tsx';
import { StockBoardsTable } from '../components/StockBoardsTable.tsx';
import { StockConflictNotice } from '../components/StockConflictNotice.tsx';
import { StockOptionsForm } from '../components/StockOptionsForm.tsx';
import { StockSaveBar } from '../components/StockSaveBar.tsx';
import { TakeoffNumbers } from '../components/TakeoffNumbers.tsx';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { lengthsInUserUnits } from '../editor/roomText.ts';
import { exportFileStem } from '../export/download.ts';
import { extrasOf, suggestedQuantities, unitItems } from '../materials/extras.ts';
import { stockFieldName } from '../materials/stockFieldName.ts';
import { useTakeoffRun } from '../materials/useTakeoffRun.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useLength } from '../state/useLength.ts';
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
  const stock = useStock(workshopId);

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
          priceData={prices.data ?? null} pricesError={prices.error} canEditPrices={can(role, 'priceList.manage')} fileStem={exportFileStem(design.data.title, design.data.head.number)}
          stockData={stock.data ?? null} stockError={stock.error} canEditStock={can(role, 'stock.manage')} />
      ) : (
        <ErrorNotice title="This design does not build, so there is nothing to lay out" error={new Error(outcome.message)} />
      )}
    </div>
  );
}

type Built = Extract<ReturnType<typeof buildOutcome>, { ok: true }>['result'];

const EFFORTS: { value: LayoutEffort; label: string }[] = [
  { value: 'quick', label: 'Quick' },
  { value: 'standard', label: 'Standard' },
  { value: 'thorough', label: 'Thorough (slower)' },
];

/** What the last layout did with each board on hand, by its row in the stock. */
function boardUsage(takeoff: MaterialsTakeoff, boards: StockSettings['boardsInStock']): Map<number, string> {
  const usage = new Map<number, string>();
  boards.forEach((board, i) => {
    const group = takeoff.boards.find((g) => g.speciesId === board.speciesId && g.quarters === board.quarters);
    const wood = `${isSpeciesId(board.speciesId) ? SPECIES[board.speciesId].name : board.speciesId} ${board.quarters}/4`;
    if (!group) return usage.set(i, `no ${wood} parts in this design`);
    const at = group.layout.boards.findIndex((plan) => plan.stockId === stockBoardId(i));
    usage.set(i, at >= 0 ? `board ${at + 1} of ${wood}` : 'not needed');
  });
  return usage;
}

function MaterialsBody({ result, workshopId, priceList, priceData, pricesError, canEditPrices, fileStem, stockData, stockError, canEditStock }: {
  result: Built; workshopId: string; priceList: PriceList; priceData: ReturnType<typeof usePriceList>['data'] | null; pricesError: unknown; canEditPrices: boolean; fileStem: string;
  stockData: StockResponse | null; stockError: unknown; canEditStock: boolean;
}) {
  // The form edits a draft of the workshop's stock; the layouts follow the draft, Save keeps it.
  // The draft remembers the version it started from, so a save made meanwhile is a conflict.
  const [draft, setDraft] = useState<{ stock: StockSettings; version: string | null } | null>(null);
  const [effort, setEffort] = useState<LayoutEffort>('standard');
  const saveStock = useSaveStock(workshopId);
  const length = useLength();
  const settings = draft?.stock ?? stockData?.stock ?? DEFAULT_STOCK_SETTINGS;
  const problems = useMemo(() => stockProblems(settings), [settings]);
  const stockReady = stockData !== null || stockError != null;
  // A stock with a problem is not laid out: the last layouts stay until it is fixed.
  const { run, cancel, rerun } = useTakeoffRun(stockReady && problems.length === 0 ? result : null, settings, effort);
  const conflict = isStaleStock(saveStock.error) ? saveStock.error : null;
  const edit = (next: StockSettings) => {
    saveStock.reset();
    setDraft({ stock: next, version: draft ? draft.version : stockData?.version ?? null });
  };
  const save = (version: string | null) => {
    if (draft) saveStock.mutate({ version, stock: draft.stock }, { onSuccess: () => setDraft(null) });
  };
  const discard = () => {
    saveStock.reset();
    setDraft(null);
  };
  const saveBar = (
    <StockSaveBar dirty={draft !== null} problemCount={problems.length} saving={saveStock.isPending} canEdit={canEditStock}
      updatedAt={stockData?.updatedAt ?? null} updatedBy={stockData?.updatedBy ?? null} saveError={conflict ? null : saveStock.error}
      onSave={() => draft && save(draft.version)} onDiscard={discard} />
  );
  const solidWoods = result.parts.flatMap((p) => (p.material.kind === 'solid' ? [{ speciesId: p.material.speciesId, quarters: p.rough.quarters }] : []));
  const [quantities, setQuantities] = useState<Record<string, number> | null>(null);
  const suggested = useMemo(() => suggestedQuantities(result, priceList), [result, priceList]);
  const shownQuantities = useMemo(() => ({ ...suggested, ...(quantities ?? {}) }), [suggested, quantities]);
  const sheetIds = useMemo(() => [...new Set(result.parts.flatMap((p) => (p.material.kind === 'sheet' ? [p.material.sheetId] : [])))], [result]);

  const takeoff: MaterialsTakeoff | null = run.status === 'done' ? run.takeoff : run.status === 'running' || run.status === 'error' ? run.previous : null;
  const cost = useMemo(() => (takeoff ? costOf(takeoff, priceList, extrasOf(priceList, shownQuantities)) : null), [takeoff, priceList, shownQuantities]);
  const list = useMemo(() => (takeoff && cost ? shoppingList(takeoff, cost) : null), [takeoff, cost]);
  const longestBoard = takeoff ? Math.max(1, ...takeoff.boards.flatMap((b) => b.layout.boards.map((p) => p.lengthMm))) : 1;
  const usage = useMemo(() => (run.status === 'done' && problems.length === 0 ? boardUsage(run.takeoff, settings.boardsInStock) : new Map<number, string>()), [run, problems, settings]);
  const topProblems = problems.filter((p) => p.path[0] !== 'boardsInStock');

  return (
    <div className="grid gap-4 lg:grid-cols-[20rem_minmax(0,1fr)]">
      {conflict && draft && (
        <StockConflictNotice conflict={conflict} overwriting={saveStock.isPending} onLoadTheirs={discard} onOverwrite={() => save(conflict.current.version)} />
      )}
      <aside className="no-print grid content-start gap-4" aria-label="Stock and hardware">
        <div className="card grid gap-2 p-3">
          <h2 className="text-sm font-semibold">Workshop stock</h2>
          {stockError != null && <ErrorNotice title="Could not read the workshop's stock; the layouts use the usual sizes" error={stockError} />}
          {saveBar}
          {topProblems.length > 0 && (
            <ul role="alert" className="list-disc pl-4 text-xs text-pencil">
              {topProblems.map((p) => <li key={p.field}>{stockFieldName(p.path)} {lengthsInUserUnits(p.message, length)}.</li>)}
            </ul>
          )}
          <StockOptionsForm settings={settings} onChange={edit} sheetIds={sheetIds} readOnly={!canEditStock} />
          <p className="text-[11px] text-graphite-faint">
            <a href="#boards-on-hand" className="text-graphite underline decoration-rule hover:text-pencil">Boards on hand ({settings.boardsInStock.length})</a> are listed below the shopping list. Milling allowances belong to the design (its rough sizes).
          </p>
        </div>
        <div className="card p-3">
          <label className="text-xs text-graphite-soft">
            Layout effort
            <select className="field font-sans" value={effort} onChange={(e) => setEffort(e.target.value as LayoutEffort)}>
              {EFFORTS.map((e) => <option key={e.value} value={e.value}>{e.label}</option>)}
            </select>
          </label>
          <p className="mt-1 text-[11px] text-graphite-faint">How long this page searches for fewer sheets and boards; not saved.</p>
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
                    {b.layout.splitWarnings.length > 0 && (
                      <div className="text-xs text-pencil" data-split-warnings>
                        <p>Grain match split (red outlines): {b.layout.splitWarnings.length === 1 ? 'this group comes' : 'these groups come'} from several boards.</p>
                        <ul className="list-disc pl-5">{b.layout.splitWarnings.map((w) => <li key={w.group}>{w.message}</li>)}</ul>
                      </div>
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
        <section id="boards-on-hand" aria-labelledby="boards-on-hand-heading" className="no-print mt-2 grid gap-2 border-t border-rule pt-4">
          <div className="flex flex-wrap items-start gap-x-6 gap-y-2">
            <div className="mr-auto max-w-xl">
              <h2 id="boards-on-hand-heading" className="text-base font-semibold">Boards on hand</h2>
              <p className="text-xs text-graphite-soft">
                Boards already in the workshop are cut before any is bought, around their knots, checks and other defects. Mark each defect from the board's end and
                edge to its near side, and its size with the grain and across. A board is used for parts of its own species and thickness.
              </p>
            </div>
            <div className="w-80">{saveBar}</div>
          </div>
          <StockBoardsTable boards={settings.boardsInStock} onChange={(boardsInStock) => edit({ ...settings, boardsInStock })} readOnly={!canEditStock}
            newBoard={solidWoods[0] ?? { speciesId: 'white-oak', quarters: 4 }} usage={usage} problems={problems} />
        </section>
        {priceData && <div className="mt-2 border-t border-rule pt-4"><PriceListEditor workshopId={workshopId} data={priceData} canEdit={canEditPrices} /></div>}
      </div>
    </div>
  );
}
