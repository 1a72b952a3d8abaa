import { useCallback, useEffect, useRef, useState } from 'react';
import type { PieceResult } from '../../shared/engine/types.ts';
import type { LayoutEffort, StockSettings } from '../../shared/materials/stockSettings.ts';
import type { MaterialsTakeoff, TakeoffProgress } from '../../shared/materials/takeoff.ts';
import type { FromLayoutWorker, ToLayoutWorker } from '../workers/layoutMessages.ts';

/** Where a takeoff run stands: running with its progress, finished, or refused with a reason. */
export type TakeoffRun =
  | { status: 'idle' }
  | { status: 'running'; progress: TakeoffProgress | null; previous: MaterialsTakeoff | null }
  | { status: 'done'; takeoff: MaterialsTakeoff }
  | { status: 'error'; field: string | null; message: string; previous: MaterialsTakeoff | null };

/** Fraction of the whole takeoff done, 0–1, from the layout under way and its attempts. */
export function progressFraction(progress: TakeoffProgress | null): number {
  if (!progress || progress.layouts === 0) return 0;
  return Math.min(1, (progress.layout + progress.done / Math.max(1, progress.total)) / progress.layouts);
}

/**
 * Lays out `result` on the stock in `settings` at `effort` in a Web Worker whenever any of them
 * changes; `cancel` stops the run under way and keeps its best layouts, `rerun` starts again.
 */
export function useTakeoffRun(result: PieceResult | null, settings: StockSettings, effort: LayoutEffort) {
  const worker = useRef<Worker | null>(null);
  const runId = useRef(0);
  const [run, setRun] = useState<TakeoffRun>({ status: 'idle' });
  const lastTakeoff = useRef<MaterialsTakeoff | null>(null);

  useEffect(() => {
    const w = new Worker(new URL('../workers/layout.worker.ts', import.meta.url), { type: 'module' });
    w.onmessage = (event: MessageEvent<FromLayoutWorker>) => {
      const message = event.data;
      if (message.id !== runId.current) return;
      if (message.type === 'progress') setRun({ status: 'running', progress: message.progress, previous: lastTakeoff.current });
      else if (message.type === 'done') {
        lastTakeoff.current = message.takeoff;
        setRun({ status: 'done', takeoff: message.takeoff });
      } else setRun({ status: 'error', field: message.field, message: message.message, previous: lastTakeoff.current });
    };
    w.onerror = (event) => setRun({ status: 'error', field: null, message: `The layout worker failed: ${event.message}`, previous: lastTakeoff.current });
    worker.current = w;
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, []);

  const start = useCallback(() => {
    if (!result || !worker.current) return;
    runId.current++;
    setRun({ status: 'running', progress: null, previous: lastTakeoff.current });
    worker.current.postMessage({ type: 'run', id: runId.current, result, settings, effort } satisfies ToLayoutWorker);
  }, [result, settings, effort]);

  useEffect(start, [start]);

  const cancel = useCallback(() => {
    worker.current?.postMessage({ type: 'cancel', id: runId.current } satisfies ToLayoutWorker);
  }, []);

  return { run, cancel, rerun: start };
}
