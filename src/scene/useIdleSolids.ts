import { useEffect, useState } from 'react';
import { useThree } from '@react-three/fiber';
import type { Part } from '../../shared/engine/types.ts';
import type { PartSolidCache } from './partGeometry.ts';
import { whenIdle } from './whenIdle.ts';

/**
 * Builds the cut solids of `parts` in idle time, a boolean operation at a time, so typing a new
 * size never waits for the joinery to be cut: the view draws plain boxes meanwhile. Returns a
 * number that changes whenever more solids are ready (re-render to swap them in), and marks the
 * canvas `data-solids-ready` ("true" once every part has its cut solid) for tests.
 */
export function useIdleSolids(solids: PartSolidCache, parts: readonly Part[]): number {
  const [finished, setFinished] = useState(0);
  const invalidate = useThree((s) => s.invalidate);
  const canvas = useThree((s) => s.gl.domElement);

  useEffect(() => {
    let cancel: (() => void) | null = null;
    const run = (hasTime: () => boolean): void => {
      cancel = null;
      const before = solids.pendingCount(parts);
      const left = solids.buildPending(parts, hasTime);
      if (left < before) setFinished((n) => n + 1);
      if (left > 0) cancel = whenIdle(run);
    };
    const waiting = solids.pendingCount(parts) > 0;
    canvas.dataset.solidsReady = waiting ? 'false' : 'true';
    if (waiting) cancel = whenIdle(run);
    return () => cancel?.();
  }, [solids, parts, canvas]);

  // After the render that swapped solids in: say so, and draw the frame.
  useEffect(() => {
    canvas.dataset.solidsReady = solids.pendingCount(parts) === 0 ? 'true' : 'false';
    invalidate();
  }, [finished, solids, parts, canvas, invalidate]);

  return finished;
}
