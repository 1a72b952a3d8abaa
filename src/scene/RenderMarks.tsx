import { useEffect, useLayoutEffect, useRef } from 'react';
import { addAfterEffect } from '@react-three/fiber';
import type { PieceResult } from '../../shared/engine/types.ts';

/**
 * Marks the page's performance timeline after the first frame that draws a new engine result
 * (`piece-drawn`, plain boxes or solids) and after the first that draws it with every cut solid
 * (`solids-drawn`). The editor marks `param-change` on input and `tables-drawn` when its tables
 * show a result; the editor benchmark measures between them. Reads refs only: no React state.
 */
export function RenderMarks({ result, solidsReady }: { result: PieceResult; solidsReady: boolean }) {
  const want = useRef<{ result: PieceResult | null; solidsReady: boolean }>({ result: null, solidsReady: false });
  const drawn = useRef<{ piece: PieceResult | null; solids: PieceResult | null }>({ piece: null, solids: null });

  // In the commit, before the frame the change asks for, so that frame is the one marked.
  useLayoutEffect(() => {
    want.current = { result, solidsReady };
  }, [result, solidsReady]);

  useEffect(() => addAfterEffect(() => {
    const { result: shown, solidsReady: ready } = want.current;
    if (!shown) return;
    if (drawn.current.piece !== shown) {
      drawn.current.piece = shown;
      performance.mark('piece-drawn');
    }
    if (ready && drawn.current.solids !== shown) {
      drawn.current.solids = shown;
      performance.mark('solids-drawn');
    }
  }), []);
  return null;
}
