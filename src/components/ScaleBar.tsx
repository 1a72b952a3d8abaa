/**
 * A scale bar drawn in a diagram's mm, so a printed diagram can be measured: 12 in (or 300 mm)
 * split in quarters, at (`x`, `y`).
 */
export function ScaleBar({ x, y, unit, textMm }: { x: number; y: number; unit: 'in' | 'mm'; textMm: number }) {
  const length = unit === 'in' ? 304.8 : 300;
  const label = unit === 'in' ? '12 in' : '300 mm';
  const h = textMm * 0.45;
  return (
    <g aria-hidden="true">
      {[0, 1, 2, 3].map((i) => (
        <rect key={i} x={x + (i * length) / 4} y={y} width={length / 4} height={h} className={i % 2 === 0 ? 'fill-graphite' : 'fill-sheet stroke-graphite'} strokeWidth={h / 8} />
      ))}
      <text x={x} y={y + h + textMm * 1.1} fontSize={textMm} className="fill-graphite-soft font-mono">0</text>
      <text x={x + length} y={y + h + textMm * 1.1} fontSize={textMm} textAnchor="end" className="fill-graphite-soft font-mono">{label}</text>
    </g>
  );
}
