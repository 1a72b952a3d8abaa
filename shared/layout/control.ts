/**
 * How a long layout run reports progress and is stopped. The optimisers are generators that
 * yield a {@link LayoutProgress} after each attempt and read back whether to stop, so a caller
 * can run them to the end here, or step them in chunks (a Web Worker between messages) and
 * cancel between any two attempts, keeping the best layout found so far.
 */

/** Progress of an optimiser run: attempts done of the planned total and the best count so far. */
export interface LayoutProgress {
  done: number;
  total: number;
  /** Sheets or boards bought by the best layout found so far. */
  best: number;
}

/** Callbacks that watch and stop a run; every field is optional. */
export interface LayoutControl {
  /** Called after each attempt. */
  onProgress?: (progress: LayoutProgress) => void;
  /** Checked after each attempt; return true to stop and keep the best layout so far. */
  shouldStop?: () => boolean;
  /** An `AbortSignal` or anything with an `aborted` flag; stops the run like `shouldStop`. */
  signal?: { readonly aborted: boolean };
}

/** A stepwise optimiser run: yields progress, receives `true` to stop, returns its result. */
export type LayoutSteps<T> = Generator<LayoutProgress, T, boolean | undefined>;

/** Runs `steps` to the end (or until `control` stops it) and returns its result. */
export function runLayoutSteps<T>(steps: LayoutSteps<T>, control: LayoutControl = {}): T {
  let next = steps.next();
  while (!next.done) {
    control.onProgress?.(next.value);
    const stop = (control.shouldStop?.() ?? false) || (control.signal?.aborted ?? false);
    next = steps.next(stop);
  }
  return next.value;
}
