import type { DiagramPart } from '../../shared/layout/diagram.ts';

/**
 * A part's label on a cutting diagram, in the diagram's mm: its cut-list name and size, upright
 * for tall narrow parts, or its tag number when the name does not fit (the key below names it).
 */
export function DiagramPartLabel({ part, size }: { part: DiagramPart; size: string }) {
  const cx = part.x + part.w / 2;
  const cy = part.y + part.h / 2;
  const rotate = part.vertical ? `rotate(-90 ${cx} ${cy})` : undefined;
  if (part.labelMm === 0) {
    const r = Math.max(4, Math.min(part.w, part.h, 50) * 0.42);
    return (
      <g aria-hidden="true">
        <circle cx={cx} cy={cy} r={r} className="fill-sheet stroke-graphite" strokeWidth={r / 8} />
        <text x={cx} y={cy} fontSize={r * 1.1} textAnchor="middle" dominantBaseline="central" className="fill-graphite font-mono font-semibold">{part.tag}</text>
      </g>
    );
  }
  const s = part.labelMm;
  if (part.lines === 1) {
    return (
      <text x={cx} y={cy} fontSize={s} textAnchor="middle" dominantBaseline="central" transform={rotate} className="fill-graphite font-mono" aria-hidden="true">
        <tspan fontWeight={600}>{part.name}</tspan> · {size}
      </text>
    );
  }
  return (
    <text x={cx} y={cy} fontSize={s} textAnchor="middle" transform={rotate} className="fill-graphite font-mono" aria-hidden="true">
      <tspan x={cx} dy={-s * 0.25} fontWeight={600}>{part.name}</tspan>
      <tspan x={cx} dy={s * 1.3}>{size}</tspan>
    </text>
  );
}
