import { useId, useMemo } from 'react';
import type { BoardPlan } from '../../shared/layout/boardTypes.ts';
import { boardDiagram } from '../../shared/layout/diagram.ts';
import { useLength } from '../state/useLength.ts';
import { DiagramPartLabel } from './DiagramPartLabel.tsx';

interface Props {
  plan: BoardPlan;
  kerfMm: number;
  /** The longest board of the layout, so every board is drawn at one scale. */
  longestMm: number;
  title: string;
  /** Match groups spread over several boards, to mark their parts. */
  splitGroups: readonly string[];
}

const GRAIN_STEP_MM = 22;

/**
 * One board's cutting diagram, to scale: grain along its length, parts at their rough size
 * labelled with the cut-list name and rough size, crosscuts as numbered kerf-wide bands, knots
 * and checks hatched in pencil red, grain-match groups outlined and grain-matched runs bracketed
 * under the board with their note.
 */
export function BoardDiagramView({ plan, kerfMm, longestMm, title, splitGroups }: Props) {
  const hatch = useId();
  const length = useLength();
  const d = useMemo(() => boardDiagram(plan, kerfMm, splitGroups), [plan, kerfMm, splitGroups]);
  const text = longestMm / 90;
  // Room under the board for the brackets of grain-matched runs.
  const band = d.matchRuns.length > 0 ? text * 2.2 : 0;
  const rows = Math.max(1, Math.floor(d.widthMm / GRAIN_STEP_MM));
  const keyed = d.parts.filter((p) => p.labelMm === 0);
  const sizeOf = (p: (typeof d.parts)[number]) => `${length(p.lengthMm)} × ${length(p.widthMm)}`;
  return (
    <figure className="board-diagram break-inside-avoid" aria-label={title}>
      <figcaption className="mb-0.5 flex flex-wrap items-baseline justify-between gap-x-4 text-xs">
        <span className="font-semibold">{title}</span>
        <span className="dim text-graphite-soft">
          {plan.inStock ? 'in stock · ' : ''}{length(plan.lengthMm)} × {length(plan.widthMm)} · {plan.boardFeet.toFixed(2)} bd ft · yield {(plan.yield * 100).toFixed(0)} %
        </span>
      </figcaption>
      <svg viewBox={`0 0 ${d.lengthMm} ${d.widthMm + band}`} style={{ width: `${(100 * d.lengthMm) / longestMm}%` }} className="h-auto overflow-visible" role="img"
        aria-label={`${title}: ${d.parts.length} parts, ${d.crosscuts.length} crosscuts${d.defects.length ? `, ${d.defects.length} defects` : ''}`}>
        <defs>
          <pattern id={hatch} width={text * 0.5} height={text * 0.5} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1={0} y1={0} x2={0} y2={text * 0.5} className="stroke-pencil" strokeWidth={text * 0.12} />
          </pattern>
        </defs>
        <rect x={0} y={0} width={d.lengthMm} height={d.widthMm} className="fill-[#e8d9bb] stroke-graphite" strokeWidth={text * 0.1} />
        {Array.from({ length: rows }, (_, i) => (
          <line key={i} x1={0} x2={d.lengthMm} y1={(i + 0.5) * (d.widthMm / rows)} y2={(i + 0.5) * (d.widthMm / rows)} className="stroke-[#cdb78f]" strokeWidth={text * 0.06} />
        ))}
        {d.parts.map((p) => {
          const split = p.matchGroup !== null && splitGroups.includes(p.matchGroup);
          return (
            <g key={`${p.partId}-${p.instance}`} data-part={p.name}>
              <title>{`${p.name} #${p.instance + 1}: ${sizeOf(p)} rough${p.matchGroup ? ` · grain-match group${p.matchOrder !== null ? `, place ${p.matchOrder} in the run` : ''}${split ? ' (split over boards)' : ''}` : ''}`}</title>
              <rect x={p.x} y={p.y} width={p.w} height={p.h} className={`fill-sheet/85 ${split ? 'stroke-pencil' : 'stroke-graphite'}`} strokeWidth={text * 0.1}
                strokeDasharray={p.matchGroup ? `${text * 0.6} ${text * 0.3}` : undefined} />
              <DiagramPartLabel part={p} size={sizeOf(p)} />
            </g>
          );
        })}
        {d.defects.map((f, i) => (
          <g key={`defect-${i}`} data-defect={f.note}>
            <title>{`${f.note}: ${length(f.x)} to ${length(f.x + f.w)} from the end`}</title>
            <rect x={f.x} y={f.y} width={f.w} height={f.h} fill={`url(#${hatch})`} className="stroke-pencil" strokeWidth={text * 0.1} />
          </g>
        ))}
        {d.crosscuts.map((c) => (
          <g key={c.order}>
            <rect x={c.kerf.x} y={0} width={Math.max(c.kerf.w, text * 0.1)} height={d.widthMm} className="fill-pencil" opacity={0.85} />
            <circle cx={c.x1} cy={Math.min(text * 0.9, d.widthMm / 2)} r={Math.min(text * 0.7, d.widthMm / 2.2)} className="fill-pencil" />
            <text x={c.x1} y={Math.min(text * 0.9, d.widthMm / 2)} fontSize={Math.min(text * 0.8, d.widthMm / 2.4)} textAnchor="middle" dominantBaseline="central" className="fill-sheet font-mono font-semibold">
              {c.order}
            </text>
          </g>
        ))}
        {d.matchRuns.map((m) => {
          const y = d.widthMm + text * 0.5;
          return (
            <g key={m.group} data-run={m.group} className={m.partial ? 'stroke-pencil fill-pencil' : 'stroke-graphite fill-graphite'}>
              <path d={`M ${m.fromMm} ${y - text * 0.35} V ${y} H ${m.toMm} V ${y - text * 0.35}`} fill="none" strokeWidth={text * 0.1} />
              <text x={m.fromMm} y={y + text * 0.3} fontSize={m.labelMm > 0 ? Math.min(m.labelMm, text) : text * 0.75} dominantBaseline="hanging" stroke="none">
                {m.text}
              </text>
            </g>
          );
        })}
      </svg>
      {(keyed.length > 0 || d.defects.length > 0) && (
        <p className="mt-0.5 text-xs text-graphite-soft">
          {keyed.map((p) => (
            <span key={p.tag} className="mr-3 inline-block">
              <span className="dim font-semibold text-graphite">{p.tag}</span> {p.name} {sizeOf(p)}
            </span>
          ))}
          {d.defects.map((f, i) => (
            <span key={`d${i}`} className="mr-3 inline-block text-pencil">
              ▨ {f.note} at {length(f.x)}–{length(f.x + f.w)}
            </span>
          ))}
        </p>
      )}
    </figure>
  );
}
