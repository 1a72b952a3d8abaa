import { useCallback, useEffect, useRef, useState } from 'react';
import type { PieceSpec } from '../../shared/engine/types.ts';
import type { SizeKey } from '../../shared/room/fitToNiche.ts';
import type { NicheFitAnswer, NicheFitRequest } from '../editor/nicheFit.ts';

/** Where a fit-to-niche question stands; `spec` is the spec it was asked for. */
export type NicheFitState =
  | { status: 'idle' }
  | { status: 'working'; spec: PieceSpec }
  | { status: 'done'; spec: PieceSpec; answer: NicheFitAnswer }
  | { status: 'failed'; spec: PieceSpec; message: string };

/**
 * Fit to the niche in a Web Worker (about a second of engine builds, kept off the page's
 * thread so the editor stays responsive). Only the newest question's answer is kept.
 */
export function useNicheFit() {
  const worker = useRef<Worker | null>(null);
  const latest = useRef(0);
  const [state, setState] = useState<NicheFitState>({ status: 'idle' });
  useEffect(() => () => worker.current?.terminate(), []);

  const propose = useCallback((spec: PieceSpec, pinned: readonly SizeKey[], keepProportions: boolean) => {
    const id = ++latest.current;
    setState({ status: 'working', spec });
    worker.current ??= new Worker(new URL('../editor/nicheFit.worker.ts', import.meta.url), { type: 'module' });
    worker.current.onmessage = (event: MessageEvent<NicheFitAnswer>) => {
      if (event.data.id === latest.current) setState({ status: 'done', spec, answer: event.data });
    };
    worker.current.onerror = (event) => {
      event.preventDefault();
      worker.current?.terminate();
      worker.current = null;
      if (id === latest.current) setState({ status: 'failed', spec, message: event.message || 'the fit stopped with an error' });
    };
    const request: NicheFitRequest = { id, spec, pinned, keepProportions };
    worker.current.postMessage(request);
  }, []);

  const clear = useCallback(() => {
    latest.current++;
    setState({ status: 'idle' });
  }, []);

  return { state, propose, clear };
}
