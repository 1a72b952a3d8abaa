import type { MaterialsTakeoff } from '../../shared/materials/takeoff.ts';

const pct = (x: number) => `${(x * 100).toFixed(0)} %`;

/**
 * The takeoff's numbers: per sheet good the sheets to buy beside the area lower bound (no layout
 * can use fewer), offcuts used and yield; per species and thickness the board feet bought against
 * the board feet in the finished parts; match groups that had to be split; parts not placed.
 */
export function TakeoffNumbers({ takeoff }: { takeoff: MaterialsTakeoff }) {
  const unplaced = [...takeoff.sheets.flatMap((s) => s.layout.unplaced), ...takeoff.boards.flatMap((b) => b.layout.unplaced)];
  return (
    <section aria-label="Numbers" className="grid gap-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <Figure label="Sheets to buy" value={String(takeoff.sheetsBought)} note={`area lower bound ${takeoff.sheets.reduce((n, s) => n + s.layout.lowerBound, 0)}`} />
        <Figure label="Board feet to buy" value={takeoff.boards.reduce((n, b) => n + b.layout.boardFeetToBuy, 0).toFixed(1)} note={`${takeoff.boardFeetFinished.toFixed(1)} bd ft in the finished parts`} />
        <Figure label="Boards" value={String(takeoff.boards.reduce((n, b) => n + b.layout.boards.length, 0))} note={`${takeoff.boards.length} species and thickness${takeoff.boards.length === 1 ? '' : 'es'}`} />
      </div>
      <table className="w-full border-collapse text-[13px]" aria-label="Numbers by material">
        <thead className="text-xs text-graphite-soft">
          <tr className="border-b border-rule">
            <th className="px-2 py-1 text-left font-medium">Material</th>
            <th className="px-2 py-1 text-right font-medium">Bought</th>
            <th className="px-2 py-1 text-right font-medium">Lower bound / finished</th>
            <th className="px-2 py-1 text-right font-medium">Yield</th>
            <th className="px-2 py-1 text-left font-medium">Notes</th>
          </tr>
        </thead>
        <tbody className="dim">
          {takeoff.sheets.map((s) => (
            <tr key={s.sheetId} className="border-b border-rule/60" data-sheet-good={s.sheetId}>
              <td className="px-2 py-1 font-sans">{s.sheetName}</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">{s.layout.sheetsBought} sheet{s.layout.sheetsBought === 1 ? '' : 's'}{s.layout.offcutsUsed ? ` + ${s.layout.offcutsUsed} offcut${s.layout.offcutsUsed === 1 ? '' : 's'}` : ''}</td>
              <td className="whitespace-nowrap px-2 py-1 text-right" title="Area lower bound: total part area over the usable sheet area, rounded up (Martello & Vigo 1998)">≥ {s.layout.lowerBound} sheet{s.layout.lowerBound === 1 ? '' : 's'}</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">{pct(s.layout.yield)}</td>
              <td className="px-2 py-1 font-sans text-xs text-graphite-soft">{s.layout.sheetsBought === s.layout.lowerBound ? 'at the lower bound' : `${s.layout.sheetsBought - s.layout.lowerBound} above the bound`}{s.layout.cancelled ? ' · stopped early' : ''}</td>
            </tr>
          ))}
          {takeoff.boards.map((b) => (
            <tr key={`${b.speciesId}:${b.quarters}`} className="border-b border-rule/60" data-species={`${b.speciesId}:${b.quarters}`}>
              <td className="px-2 py-1 font-sans">{b.speciesName} {b.quarters}/4</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">{b.layout.boardFeetBought.toFixed(2)} bd ft</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">{b.layout.boardFeetFinished.toFixed(2)} bd ft finished</td>
              <td className="whitespace-nowrap px-2 py-1 text-right">{b.layout.boardFeetBought > 0 ? pct(b.layout.boardFeetFinished / b.layout.boardFeetBought) : '—'}</td>
              <td className="px-2 py-1 font-sans text-xs text-graphite-soft">
                {b.layout.boards.length} board{b.layout.boards.length === 1 ? '' : 's'}, {b.layout.boardFeetRough.toFixed(2)} bd ft rough
                {b.layout.splitWarnings.length > 0 && (
                  <span className="text-pencil" title={b.layout.splitWarnings.map((w) => w.message).join('\n')}>
                    {' '}· grain match split: {b.layout.splitWarnings.map((w) => w.label).join(', ')} will not come from one board
                  </span>
                )}
                {b.layout.cancelled ? ' · stopped early' : ''}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {unplaced.length > 0 && (
        <div role="alert" className="rounded-sm border border-pencil/60 bg-pencil-soft/40 px-3 py-2 text-sm">
          <p className="font-semibold text-pencil">Not placed — these parts need other stock:</p>
          <ul className="list-disc pl-5">{unplaced.map((u, i) => <li key={i}>{u.message}</li>)}</ul>
        </div>
      )}
    </section>
  );
}

function Figure({ label, value, note }: { label: string; value: string; note: string }) {
  return (
    <div className="card px-3 py-2">
      <p className="text-xs uppercase tracking-widest text-graphite-soft">{label}</p>
      <p className="dim text-2xl font-semibold">{value}</p>
      <p className="text-xs text-graphite-soft">{note}</p>
    </div>
  );
}
