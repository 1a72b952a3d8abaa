/** The messages between the Materials page and the layout worker. Plain data only (structured clone). */
import type { PieceResult } from '../../shared/engine/types.ts';
import type { MaterialsTakeoff, TakeoffProgress } from '../../shared/materials/takeoff.ts';
import type { LayoutEffort, StockSettings } from '../../shared/materials/stockSettings.ts';

/** To the worker: start run `id` on the workshop's stock at an effort (any run under way is stopped and dropped), or stop run `id` keeping its best so far. */
export type ToLayoutWorker = { type: 'run'; id: number; result: PieceResult; settings: StockSettings; effort: LayoutEffort } | { type: 'cancel'; id: number };

/** From the worker: progress of run `id`, its takeoff, or the reason it could not run. */
export type FromLayoutWorker =
  | { type: 'progress'; id: number; progress: TakeoffProgress }
  | { type: 'done'; id: number; takeoff: MaterialsTakeoff }
  | { type: 'error'; id: number; field: string | null; message: string };
