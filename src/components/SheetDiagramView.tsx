import { useId, useMemo } from 'react';
import { sheetDiagram } from '../../shared/layout/diagram.ts';
import type { SheetPlan } from '../../shared/layout/sheetTypes.ts';
import { useDisplayUnits } from '../state/usePreferences.ts';
import { useLength } from '../state/useLength.ts';
import { DiagramPartLabel } from './DiagramPartLabel.tsx';
import { ScaleBar } from './ScaleBar.tsx';

interface Props {
  plan: SheetPlan;
  kerfMm: number;
  /** False for MDF and other stock with no face grain. */
  faceGrain: boolean;
  /** Caption, e.g. `Hardwood plywood, 1/2 — sheet 1 of 2`. */
  title: string;
}

// Grain lines every so many mm: enough to read the direction, few enough to stay quiet.
const GRAIN_STEP_MM = 45;

/**
 * One sheet's cutting diagram, to scale: the trimmed edge hatched, the face grain as fine lines
 * along the sheet, each part with its cut-list name and finished size, and every saw cut as a
 * kerf-wide pencil-red band numbered in the order the saw makes it.
 */
export function SheetDiagramView({ plan, kerfMm, faceGrain, title }: Props) {
  const hatch = useId();
  const length = useLength();
  const { unit } = useDisplayUnits();
  const d = useMemo(() => sheetDiagram(plan, kerfMm), [plan, kerfMm]);
  const text = d.lengthMm / 75;
  const badge = text * 0.85;
  const footer = text * 4;
  const keyed = d.parts.filter((p) => p.labelMm === 0);
  const sizeOf = (p: (typeof d.parts)[number]) => `${length(p.lengthMm)} × ${length(p.widthMm)}`;
  return (
    <figure className="sheet-diagram break-inside-avoid" aria-label={title}>
      <figcaption className="mb-1 flex flex-wrap items-baseline justify-between gap-x-4 text-sm">
        <span className="font-semibold">{title}</span>
        <span className="dim text-xs text-graphite-soft">
          {plan.offcut ? `${plan.stockName} · ` : ''}{length(plan.widthMm)} × {length(plan.lengthMm)} · yield {(plan.yield * 100).toFixed(0)} % · {d.cuts.length} cuts
        </span>
      </figcaption>
      <svg viewBox={`${-text} ${-text} ${d.lengthMm + 2 * text} ${d.widthMm + footer + text}`} className="h-auto w-full" role="img" aria-label={`${title}: ${d.parts.length} parts, ${d.cuts.length} saw cuts`}>
        <defs>
          <pattern id={hatch} width={text * 0.6} height={text * 0.6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1={0} y1={0} x2={0} y2={text * 0.6} className="stroke-graphite-faint" strokeWidth={text * 0.08} />
          </pattern>
        </defs>
        <rect x={0} y={0} width={d.lengthMm} height={d.widthMm} fill={`url(#${hatch})`} className="stroke-graphite" strokeWidth={text * 0.12} />
        <rect {...{ x: d.usable.x, y: d.usable.y, width: d.usable.w, height: d.usable.h }} className="fill-paper-deep" />
        {d.parts.map((p) => (
          <g key={`${p.partId}-${p.instance}`} data-part={p.name}>
            <title>{`${p.name} #${p.instance + 1}: ${sizeOf(p)}`}</title>
            <rect x={p.x} y={p.y} width={p.w} height={p.h} className="fill-sheet stroke-graphite" strokeWidth={text * 0.1} />
            {faceGrain &&
              Array.from({ length: Math.floor(p.h / GRAIN_STEP_MM) }, (_, i) => (
                <line key={i} x1={p.x + p.w * 0.04} x2={p.x + p.w * 0.96} y1={p.y + (i + 0.5) * (p.h / Math.floor(p.h / GRAIN_STEP_MM))} y2={p.y + (i + 0.5) * (p.h / Math.floor(p.h / GRAIN_STEP_MM))}
                  className="stroke-[#d9c9a8]" strokeWidth={text * 0.06} />
              ))}
            <DiagramPartLabel part={p} size={sizeOf(p)} />
          </g>
        ))}
        {d.cuts.map((c) => (
          <g key={c.order} data-cut={c.order}>
            <rect x={c.kerf.x} y={c.kerf.y} width={Math.max(c.kerf.w, text * 0.12)} height={Math.max(c.kerf.h, text * 0.12)} className="fill-pencil" opacity={0.85} />
            <circle cx={c.x1 === c.x2 ? c.x1 : c.x1 + badge * 1.6} cy={c.y1 === c.y2 ? c.y1 : c.y1 + badge * 1.6} r={badge} className="fill-pencil" />
            <text x={c.x1 === c.x2 ? c.x1 : c.x1 + badge * 1.6} y={c.y1 === c.y2 ? c.y1 : c.y1 + badge * 1.6} fontSize={badge * 1.05} textAnchor="middle" dominantBaseline="central" className="fill-sheet font-mono font-semibold">
              {c.order}
            </text>
          </g>
        ))}
        <ScaleBar x={0} y={d.widthMm + text * 1.2} unit={unit} textMm={text} />
        <text x={d.lengthMm} y={d.widthMm + text * 2.2} fontSize={text} textAnchor="end" className="fill-graphite-soft font-sans">
          {faceGrain ? `Face grain runs ↔ along the ${length(d.lengthMm)} length · ` : 'No face grain: parts may turn · '}hatched: {length(plan.trimMm)} edge trim · red: saw kerf {length(kerfMm)}, cut order numbered
        </text>
      </svg>
      {keyed.length > 0 && (
        <p className="mt-1 text-xs text-graphite-soft">
          {keyed.map((p) => (
            <span key={p.tag} className="mr-3 inline-block">
              <span className="dim font-semibold text-graphite">{p.tag}</span> {p.name} {sizeOf(p)}
            </span>
          ))}
        </p>
      )}
    </figure>
  );
}
