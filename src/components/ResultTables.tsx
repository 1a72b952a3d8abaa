import { useState } from 'react';
import type { PieceResult, PieceSpec } from '../../shared/engine/types.ts';
import { isMovementCheck, problemCount } from '../editor/checkGroups.ts';
import { roomFitOutcome } from '../editor/roomFitOutcome.ts';
import { ChecksList } from './ChecksList.tsx';
import { ClimateEditor } from './ClimateEditor.tsx';
import { CutListTable } from './CutListTable.tsx';
import { JoineryTable } from './JoineryTable.tsx';
import { RoomFitPanel } from './RoomFitPanel.tsx';
import { TabPanel, Tabs } from './Tabs.tsx';

type TabKey = 'cut-list' | 'joinery' | 'checks' | 'movement' | 'room';

/** The cut list, joinery schedule, checks, wood movement and room fit of the built piece, as tabs. */
export function ResultTables({ result, spec, readOnly, design }: { result: PieceResult; spec: PieceSpec; readOnly: boolean; design: { id: string; workshopId: string; title: string } }) {
  const [tab, setTab] = useState<TabKey>('cut-list');
  const movement = result.checks.filter(isMovementCheck);
  const problems = problemCount(result.checks);
  const room = roomFitOutcome(spec.room, result);
  const roomProblems = room.kind === 'fit' ? room.fit.checks.filter((c) => !c.passed).length : room.kind === 'invalid' ? 1 : 0;
  const badge = (n: number, alarm: boolean) => (
    <span className={`ml-1.5 rounded-full px-1.5 font-mono text-[11px] ${alarm ? 'bg-pencil text-sheet' : 'bg-paper-deep text-graphite-soft'}`}>{n}</span>
  );
  return (
    <section aria-label="Parts, joinery and checks" className="flex min-h-0 flex-col">
      <Tabs
        label="Tables"
        idPrefix="tables"
        active={tab}
        onChange={setTab}
        tabs={[
          { key: 'cut-list', label: <>Cut list{badge(result.parts.reduce((n, p) => n + p.quantity, 0), false)}</> },
          { key: 'joinery', label: <>Joinery{badge(result.derived.joinery.length, false)}</> },
          { key: 'checks', label: <>Checks{badge(result.checks.length, problems > 0)}</> },
          { key: 'movement', label: <>Wood movement{badge(movement.length, problemCount(movement) > 0)}</> },
          { key: 'room', label: <>Room fit{room.kind === 'none' ? null : badge(room.kind === 'fit' ? room.fit.checks.length : 1, roomProblems > 0)}</> },
        ]}
      />
      <TabPanel idPrefix="tables" tabKey={tab} className="min-h-0 flex-1 overflow-auto">
        {tab === 'cut-list' && <CutListTable groups={result.derived.cutList} />}
        {tab === 'joinery' && <JoineryTable rows={result.derived.joinery} parts={result.parts} />}
        {tab === 'checks' && <ChecksList checks={result.checks} parts={result.parts} empty="No checks: nothing to warn about." />}
        {tab === 'movement' && (
          <>
            <ClimateEditor climate={spec.climate} readOnly={readOnly} />
            <div className="border-t border-rule">
              <ChecksList checks={movement} parts={result.parts} empty="No solid part here needs room to move." />
            </div>
          </>
        )}
        {tab === 'room' && <RoomFitPanel result={result} spec={spec} design={design} canEdit={!readOnly} />}
      </TabPanel>
    </section>
  );
}
