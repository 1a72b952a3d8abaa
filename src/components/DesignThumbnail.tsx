import { useMemo } from 'react';
import type { PieceSpec } from '../../shared/engine/types.ts';
import { buildOutcome } from '../editor/pieceBuild.ts';
import { thumbnailOf } from '../editor/thumbnail.ts';

/** A small oblique line drawing of the piece a spec builds: no 3D canvas, prints cleanly. */
export function DesignThumbnail({ spec, title }: { spec: PieceSpec; title: string }) {
  const drawing = useMemo(() => {
    const outcome = buildOutcome(spec);
    return outcome.ok ? thumbnailOf(outcome.result) : null;
  }, [spec]);
  if (!drawing) {
    return <div className="flex h-full items-center justify-center text-xs text-graphite-faint">No drawing: the saved spec does not build</div>;
  }
  return (
    <svg viewBox={drawing.viewBox} className="h-full w-full" role="img" aria-label={`Drawing of ${title}`}>
      <g stroke="var(--color-graphite)" strokeLinejoin="round">
        {drawing.shapes.map((shape, i) => (
          <g key={`${shape.partId}-${i}`}>
            <polygon points={shape.side} strokeWidth={1} vectorEffect="non-scaling-stroke" fill="#e3d6bd" />
            <polygon points={shape.top} strokeWidth={1} vectorEffect="non-scaling-stroke" fill="#efe5d2" />
            <polygon points={shape.front} strokeWidth={1} vectorEffect="non-scaling-stroke" fill="#f8f2e6" />
          </g>
        ))}
      </g>
    </svg>
  );
}
