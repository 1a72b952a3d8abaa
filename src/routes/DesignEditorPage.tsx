import { useEffect, useMemo, useRef, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { paramDefs } from '../../shared/engine/params.ts';
import type { PieceResult } from '../../shared/engine/types.ts';
import { can } from '../../shared/permissions.ts';
import { useApprovals } from '../api/useApprovals.ts';
import { useArchiveDesign } from '../api/useArchiveDesign.ts';
import { useDesign } from '../api/useDesign.ts';
import { useMe } from '../api/useMe.ts';
import { ApprovalBadge } from '../components/ApprovalBadge.tsx';
import { CommentsPanel } from '../components/CommentsPanel.tsx';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { ExportMenu } from '../components/ExportMenu.tsx';
import { ForkPanel } from '../components/ForkPanel.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { ParamForm } from '../components/ParamForm.tsx';
import { ResultTables } from '../components/ResultTables.tsx';
import { RoomForm } from '../components/RoomForm.tsx';
import { ReviewBar } from '../components/ReviewBar.tsx';
import { RevisionHistory } from '../components/RevisionHistory.tsx';
import { SaveBar } from '../components/SaveBar.tsx';
import { SceneViewport } from '../components/SceneViewport.tsx';
import { TabPanel, Tabs } from '../components/Tabs.tsx';
import { ViewControls } from '../components/ViewControls.tsx';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { roomFitOutcome } from '../editor/roomFitOutcome.ts';
import { historyShortcut } from '../editor/shortcuts.ts';
import { useDebouncedValue } from '../state/useDebouncedValue.ts';
import { useEditorStore } from '../state/useEditorStore.ts';
import { useLength } from '../state/useLength.ts';
import { linkTo } from './paths.ts';

/** How long typing must pause before the engine rebuilds the piece. */
const APPLY_DELAY_MS = 180;

type SideTab = 'history' | 'comments' | 'fork';

/** The design editor: parameters, live 3D, tables and checks, revisions, comments and review. */
export function DesignEditorPage() {
  const { designId = '' } = useParams();
  const design = useDesign(designId);
  const me = useMe();
  const approvals = useApprovals(designId);
  const loadedDesignId = useEditorStore((s) => s.designId);
  const load = useEditorStore((s) => s.load);

  useEffect(() => {
    if (design.data && loadedDesignId !== design.data.id) load(design.data.id, design.data.headRevision.number, design.data.headRevision.spec);
  }, [design.data, loadedDesignId, load]);

  if (design.isPending) return <LoadingBlock label="Opening the design…" className="mx-auto max-w-7xl" />;
  if (design.isError) return <ErrorNotice title="Could not open this design" error={design.error} onRetry={() => void design.refetch()} className="mx-auto mt-8 max-w-xl" />;
  if (loadedDesignId !== design.data.id) return <LoadingBlock label="Opening the design…" className="mx-auto max-w-7xl" />;

  const role = me.data?.workshops.find((w) => w.id === design.data.workshopId)?.role ?? null;
  return <Editor design={design.data} role={role} workshops={me.data?.workshops ?? []} approvals={approvals.data ?? []} />;
}

type DesignData = NonNullable<ReturnType<typeof useDesign>['data']>;
type Workshops = NonNullable<NonNullable<ReturnType<typeof useMe>['data']>['workshops']>;

function Editor({ design, role, workshops, approvals }: { design: DesignData; role: Workshops[number]['role'] | null; workshops: Workshops; approvals: NonNullable<ReturnType<typeof useApprovals>['data']> }) {
  const history = useEditorStore((s) => s.history);
  const savedSpec = useEditorStore((s) => s.savedSpec);
  const baseRevision = useEditorStore((s) => s.baseRevision) ?? design.head.number;
  const { undo, redo, select } = useEditorStore.getState();
  const length = useLength();
  const [side, setSide] = useState<SideTab>('history');
  const canEdit = can(role, 'design.edit');
  const canReview = can(role, 'approval.decide');
  const archive = useArchiveDesign(design.id);

  const spec = history?.present ?? design.headRevision.spec;
  const settled = useDebouncedValue(spec, APPLY_DELAY_MS);
  const outcome = buildOutcome(settled);
  const lastGood = useRef<PieceResult | null>(null);
  if (outcome.ok) lastGood.current = outcome.result;
  const result = outcome.ok ? outcome.result : lastGood.current;
  const typedOutcome = buildOutcome(spec);
  const engineError = typedOutcome.ok ? null : { field: typedOutcome.field, message: typedOutcome.message };
  const dirty = spec !== savedSpec;
  const defs = useMemo(() => paramDefs(spec.kind), [spec.kind]);
  const formTab = useEditorStore((s) => s.formTab);
  const roomView = useEditorStore((s) => s.roomView);
  const roomFit = roomFitOutcome(spec.room, result);
  const fitted = roomFit.kind === 'fit' ? roomFit.fit : null;
  const partName = (id: string | null) => (id ? result?.parts.find((p) => p.id === id)?.name ?? id : null);
  const selectedPartId = useEditorStore((s) => s.selectedPartId);

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      const target = event.target as HTMLElement | null;
      // Text boxes outside the parameters (a comment, a message) keep the browser's own undo.
      if (target?.closest('textarea, #revision-message, #review-note, #fork-title, [role="search"]')) return;
      if (event.key === 'Escape' && !target?.closest('input, select')) return select(null);
      const action = historyShortcut(event);
      if (!action || !canEdit) return;
      event.preventDefault();
      if (action === 'undo') undo();
      else redo();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [canEdit, undo, redo, select]);

  return (
    <div className="flex min-h-0 flex-1 flex-col">
      <header className="relative flex flex-wrap items-center gap-x-4 gap-y-2 border-b border-rule bg-sheet/80 px-4 py-2">
        {/* The title keeps room to be read; the controls wrap to a second line before it is cut short. */}
        <div className="min-w-[min(100%,20rem)] flex-1">
          <p className="text-xs text-graphite-soft">
            <Link to={linkTo.workshop(design.workshopId)} className="hover:text-pencil">← Workshop</Link>
            <span className="mx-1.5">·</span>
            <span className="font-mono uppercase tracking-widest">{design.kind}</span>
            {design.origin && (
              <>
                <span className="mx-1.5">·</span>forked from{' '}
                {design.origin.title ? <Link className="underline-offset-2 hover:text-pencil hover:underline" to={linkTo.design(design.origin.designId)}>{design.origin.title}</Link> : 'another workshop'} r{design.origin.revisionNumber}
              </>
            )}
          </p>
          <h1 className="truncate text-lg font-semibold leading-tight">
            {design.title}{' '}
            <span className="font-mono text-sm font-normal text-graphite-soft">r{baseRevision}{dirty ? ' · unsaved changes' : ''}</span>
          </h1>
        </div>
        {result && <p className="dim text-sm text-graphite" aria-label="Overall width, depth and height">{result.bboxMm.map((n) => length(n)).join(' × ')}</p>}
        <ApprovalBadge approval={design.approval} />
        <Link to={linkTo.materials(design.id)} className="btn" title="Cutting diagrams, board feet and sheets, cost and the shopping list">Materials</Link>
        <ExportMenu result={outcome.ok && typedOutcome.ok ? outcome.result : null} title={design.title} revision={baseRevision} dirty={dirty}
          workshopName={workshops.find((w) => w.id === design.workshopId)?.name ?? ''} workshopId={design.workshopId} />
        {canEdit && (
          <div className="flex items-center gap-1" role="group" aria-label="Undo and redo">
            <button type="button" className="btn px-2" onClick={undo} disabled={!history?.past.length} title="Undo (Ctrl+Z)" aria-label="Undo">↶</button>
            <button type="button" className="btn px-2" onClick={redo} disabled={!history?.future.length} title="Redo (Ctrl+Shift+Z or Ctrl+Y)" aria-label="Redo">↷</button>
          </div>
        )}
        {can(role, 'design.archive') && (
          <button type="button" className="btn" disabled={archive.isPending} onClick={() => archive.mutate(!design.archived)}
            title={design.archived ? 'Show it in the workshop again' : 'Hide it from the workshop; its history is kept'}>
            {design.archived ? 'Unarchive' : 'Archive'}
          </button>
        )}
        {design.archived && <span className="rounded-sm bg-graphite px-1.5 py-0.5 text-[11px] uppercase tracking-widest text-sheet">Archived</span>}
        {canEdit && <SaveBar designId={design.id} workshopId={design.workshopId} title={design.title} spec={spec} dirty={dirty} buildable={typedOutcome.ok && roomFit.kind !== 'invalid'} />}
      </header>
      {archive.error && <ErrorNotice title="Could not change the archive state" error={archive.error} className="mx-4 mt-2" />}
      {canReview && <ReviewBar designId={design.id} revision={baseRevision} approval={design.approval} />}
      {!canEdit && !canReview && <p className="border-b border-rule bg-paper-deep/60 px-4 py-1.5 text-xs">You can look at this design but not change it.</p>}

      <div className="grid min-h-0 flex-1 grid-cols-[17.5rem_minmax(0,1fr)] xl:h-[calc(100vh-7rem)] xl:grid-cols-[19rem_minmax(0,1fr)_21rem]">
        <aside aria-label="Parameters" className="row-span-2 min-h-0 overflow-y-auto border-r border-rule bg-sheet/60 px-3 py-2 xl:row-span-1">
          {!canEdit && <p className="mb-2 rounded-sm bg-paper-deep px-2 py-1 text-xs text-graphite-soft">Read-only: the values of revision {baseRevision}.</p>}
          {engineError && (
            <p role="alert" className="mb-2 rounded-sm border border-pencil/60 bg-pencil-soft/50 px-2 py-1 text-xs">
              <span className="font-semibold text-pencil">The piece cannot be built:</span> {engineError.message}
            </p>
          )}
          <div className="-mx-3 -mt-2 mb-1">
            <Tabs label="Forms" idPrefix="form" active={formTab} onChange={useEditorStore.getState().setFormTab}
              tabs={[{ key: 'piece', label: 'Piece' }, { key: 'room', label: <>Room{roomFit.kind === 'invalid' && <span className="ml-1 text-pencil" aria-label="has a bad value">•</span>}</> }]} />
          </div>
          <TabPanel idPrefix="form" tabKey={formTab}>
            {formTab === 'piece' && <ParamForm defs={defs} spec={spec} readOnly={!canEdit} engineError={engineError} />}
            {formTab === 'room' && (
              <RoomForm state={{ room: spec.room, readOnly: !canEdit, invalid: roomFit.kind === 'invalid' ? roomFit : null }}
                placedLeftMm={fitted ? fitted.placed.pose.alongMm + fitted.scene.piece.boxMm.min[0] : null} />
            )}
          </TabPanel>
        </aside>

        <section aria-label="Piece" className="flex min-h-0 min-w-0 flex-col xl:overflow-hidden">
          {result ? (
            <>
              <div className="relative h-[44vh] min-h-[260px] border-b border-rule bg-paper">
                <SceneViewport result={result} stale={!outcome.ok} room={roomView && fitted ? fitted.scene : null} />
                {selectedPartId && (
                  <p className="absolute bottom-2 left-2 rounded-sm bg-sheet/90 px-2 py-0.5 text-xs shadow">
                    Selected: <span className="font-semibold">{partName(selectedPartId)}</span>
                    <button type="button" className="ml-2 text-graphite-soft hover:text-pencil" onClick={() => select(null)} aria-label="Clear the selection">✕</button>
                  </p>
                )}
              </div>
              <ViewControls bboxMin={result.bboxMinMm} bboxSize={result.bboxMm} roomAvailable={fitted !== null} painted={result.spec.params.finish === 'paint'} />
              <div className="flex min-h-[16rem] flex-1 flex-col overflow-hidden bg-sheet">
                <ResultTables result={result} spec={spec} readOnly={!canEdit} design={design} />
              </div>
            </>
          ) : (
            <ErrorNotice title="This revision does not build" error={new Error(engineError?.message ?? 'unknown reason')} className="m-4" />
          )}
        </section>

        <aside aria-label="Revisions and comments" className="col-start-2 flex min-h-[22rem] flex-col border-l border-t border-rule bg-sheet/60 xl:col-start-3 xl:row-start-1 xl:min-h-0 xl:border-t-0">
          <Tabs label="Design history and discussion" idPrefix="side" active={side} onChange={setSide}
            tabs={[{ key: 'history', label: 'History' }, { key: 'comments', label: 'Comments' }, { key: 'fork', label: 'Fork' }]} />
          <TabPanel idPrefix="side" tabKey={side} className="flex min-h-0 flex-1 flex-col">
            {side === 'history' && <RevisionHistory designId={design.id} headNumber={design.head.number} canEdit={canEdit} dirty={dirty} approvals={approvals} />}
            {side === 'comments' && <CommentsPanel designId={design.id} revision={baseRevision} parts={result?.parts ?? []} canComment={can(role, 'comment.create')} />}
            {side === 'fork' && <ForkPanel designId={design.id} title={design.title} revision={baseRevision} workshops={workshops} role={role} />}
          </TabPanel>
        </aside>
      </div>
    </div>
  );
}
