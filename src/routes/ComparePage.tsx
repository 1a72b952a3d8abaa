import { Link, useParams, useSearchParams } from 'react-router-dom';
import type { ParamDef } from '../../shared/engine/paramDef.ts';
import { paramDefs } from '../../shared/engine/params.ts';
import type { ParamValue } from '../../shared/engine/types.ts';
import type { RevisionInfo } from '../../shared/schemas/designs.ts';
import { useCompare } from '../api/useCompare.ts';
import { useDesign } from '../api/useDesign.ts';
import { useRevision } from '../api/useRevision.ts';
import { ErrorNotice } from '../components/ErrorNotice.tsx';
import { LoadingBlock } from '../components/LoadingBlock.tsx';
import { paramCompareRows, partCompareRows, type PartChange } from '../editor/compareRows.ts';
import { formatFieldValue } from '../editor/fieldValue.ts';
import { choicesFor } from '../editor/fieldChoices.ts';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { timeAgo } from '../editor/timeAgo.ts';
import { useLength } from '../state/useLength.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';
import { linkTo } from './paths.ts';

const CHANGE_WORDS: Record<PartChange, string> = { added: 'added', removed: 'removed', resized: 'resized', recounted: 'quantity', same: '' };

/** A difference below the shown precision, in mm for lengths (the finest unit a maker reads). */
function hiddenText(def: ParamDef, difference: number): string {
  const figure = Number(difference.toPrecision(2));
  if (def.kind === 'length') return `${figure} mm`;
  return def.unit ? `${figure} ${def.unit}` : String(figure);
}

function revisionNumber(text: string | null): number | null {
  const n = Number(text);
  return Number.isInteger(n) && n >= 1 ? n : null;
}

/** Two revisions side by side: parameters and parts, changed rows marked. */
export function ComparePage() {
  const { designId = '' } = useParams();
  const [params] = useSearchParams();
  const from = revisionNumber(params.get('from'));
  const to = revisionNumber(params.get('to'));
  const design = useDesign(designId);
  const compare = useCompare(designId, from, to);
  const a = useRevision(designId, from);
  const b = useRevision(designId, to);
  const units = useDisplayUnits();
  const length = useLength();

  if (from === null || to === null) return <ErrorNotice title="Choose two revisions" error={new Error('The address must name two revisions, e.g. ?from=1&to=2.')} className="mx-auto mt-8 max-w-xl" />;
  if (design.isPending || compare.isPending || a.isPending || b.isPending) return <LoadingBlock label="Comparing the revisions…" className="mx-auto max-w-7xl" />;
  const error = design.error ?? compare.error ?? a.error ?? b.error;
  if (error || !design.data || !compare.data || !a.data || !b.data) return <ErrorNotice title="Could not compare these revisions" error={error} className="mx-auto mt-8 max-w-xl" />;

  const defs = paramDefs(a.data.spec.kind);
  const show = (def: ParamDef, v: ParamValue) => {
    if (def.kind === 'boolean') return v ? 'yes' : 'no';
    const choice = choicesFor(def).find((c) => c.value === v);
    return choice ? choice.label : formatFieldValue(def, v, units);
  };
  // Rows are marked by what the maker reads, not by the server's exact comparison: a change
  // smaller than the shown precision is noted faintly instead.
  const rows = paramCompareRows(defs, a.data.spec, b.data.spec, show);
  const changedCount = rows.filter((r) => r.changed).length;
  const builtA = buildOutcome(a.data.spec);
  const builtB = buildOutcome(b.data.spec);
  const parts = builtA.ok && builtB.ok ? partCompareRows(builtA.result, builtB.result, length) : null;

  return (
    <div className="mx-auto w-full max-w-[1400px] px-4 py-6">
      <p className="text-xs text-graphite-soft">
        <Link to={linkTo.design(designId)} className="hover:text-pencil">← Back to the editor</Link>
      </p>
      <h1 className="mt-1 text-2xl font-semibold tracking-tight">{design.data.title}: r{from} and r{to} compared</h1>
      <div className="mt-4 grid gap-4 md:grid-cols-2">
        <RevisionCard label="Before" info={compare.data.from} />
        <RevisionCard label="After" info={compare.data.to} />
      </div>

      <section aria-labelledby="param-title" className="card mt-6 overflow-hidden">
        <h2 id="param-title" className="border-b border-rule px-3 py-2 font-semibold">
          Parameters <span className="ml-2 text-sm font-normal text-graphite-soft">{changedCount} changed</span>
        </h2>
        <table className="w-full text-[13px]" aria-label="Parameters compared">
          <thead className="bg-paper-deep/60 text-left text-xs text-graphite-soft">
            <tr><th className="px-3 py-1.5 font-medium" scope="col">Parameter</th><th className="px-3 py-1.5 text-right font-medium" scope="col">r{from}</th><th className="px-3 py-1.5 text-right font-medium" scope="col">r{to}</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.def.key} data-changed={r.changed} className={`border-b border-rule/60 ${r.changed ? 'bg-pencil-soft/60 font-medium' : 'text-graphite-soft'}`}>
                <th scope="row" className="px-3 py-1 text-left font-normal">
                  {r.changed && <span className="mr-1 text-pencil" aria-label="changed">●</span>}
                  <span className="text-graphite-faint">{r.def.group} · </span>{r.def.label}
                </th>
                <td className="dim px-3 py-1 text-right">{r.fromText}</td>
                <td className="dim px-3 py-1 text-right">
                  {r.toText}
                  {r.hiddenDifference !== null && (
                    <span className="ml-1.5 text-[11px] text-graphite-faint" title="The two values differ by less than the precision shown">
                      ({hiddenText(r.def, r.hiddenDifference)} apart)
                    </span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="parts-title" className="card mt-6 overflow-hidden">
        <h2 id="parts-title" className="border-b border-rule px-3 py-2 font-semibold">Parts</h2>
        {parts ? (
          <table className="w-full text-[13px]" aria-label="Parts compared">
            <thead className="bg-paper-deep/60 text-left text-xs text-graphite-soft">
              <tr>
                <th className="px-3 py-1.5 font-medium" scope="col">Part</th>
                <th className="px-3 py-1.5 text-right font-medium" scope="col">r{from}: qty · L × W × T</th>
                <th className="px-3 py-1.5 text-right font-medium" scope="col">r{to}: qty · L × W × T</th>
                <th className="px-3 py-1.5 font-medium" scope="col">Change</th>
              </tr>
            </thead>
            <tbody>
              {parts.map((p) => (
                <tr key={p.partId} data-changed={p.change !== 'same'} className={`border-b border-rule/60 ${p.change === 'same' ? 'text-graphite-soft' : 'bg-pencil-soft/60'}`}>
                  <th scope="row" className="px-3 py-1 text-left font-normal">{p.name}</th>
                  <td className="dim px-3 py-1 text-right">{p.from ? `${p.from.quantity} · ${[p.from.lengthMm, p.from.widthMm, p.from.thicknessMm].map((n) => length(n)).join(' × ')}` : '—'}</td>
                  <td className="dim px-3 py-1 text-right">{p.to ? `${p.to.quantity} · ${[p.to.lengthMm, p.to.widthMm, p.to.thicknessMm].map((n) => length(n)).join(' × ')}` : '—'}</td>
                  <td className="px-3 py-1 text-xs font-semibold text-pencil">{CHANGE_WORDS[p.change]}</td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : (
          <p className="px-3 py-4 text-sm text-graphite-soft">One of these revisions does not build with this version of the engine, so its parts cannot be listed.</p>
        )}
      </section>
    </div>
  );
}

function RevisionCard({ label, info }: { label: string; info: RevisionInfo }) {
  return (
    <div className="card px-4 py-3">
      <p className="font-mono text-xs uppercase tracking-widest text-pencil">{label} · r{info.number}</p>
      <p className="mt-1">{info.message || <span className="italic text-graphite-faint">no message</span>}</p>
      <p className="text-xs text-graphite-soft">{info.author?.name ?? 'someone'} · {timeAgo(info.createdAt)}</p>
    </div>
  );
}
