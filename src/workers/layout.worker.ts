/**
 * The layout worker: runs the materials takeoff off the page's thread, stepping the optimisers'
 * generators in slices of a few milliseconds and yielding between slices, so a cancel message
 * is read within one slice. Progress is posted after every slice; a cancelled run still returns
 * the best layouts found so far.
 */
import { isInputError } from '../../shared/errors.ts';
import { materialsTakeoffSteps, type TakeoffSteps } from '../../shared/materials/takeoff.ts';
import { takeoffOptionsFor } from '../../shared/materials/stockSettings.ts';
import type { FromLayoutWorker, ToLayoutWorker } from './layoutMessages.ts';

/** How long one slice of work may run before the worker reads its messages again, ms. */
const SLICE_MS = 12;

let current: { id: number; steps: TakeoffSteps; stop: boolean } | null = null;

const post = (message: FromLayoutWorker) => self.postMessage(message);

function slice(run: NonNullable<typeof current>): void {
  if (current !== run) return;
  const until = performance.now() + SLICE_MS;
  try {
    let next = run.steps.next(run.stop);
    while (!next.done) {
      if (performance.now() >= until) {
        post({ type: 'progress', id: run.id, progress: next.value });
        // A macrotask, not a microtask: messages waiting (a cancel) are read before the next slice.
        // The yield that gave this progress is answered, with the stop flag, when the slice resumes.
        setTimeout(() => slice(run), 0);
        return;
      }
      next = run.steps.next(run.stop);
    }
    current = null;
    post({ type: 'done', id: run.id, takeoff: next.value });
  } catch (error) {
    current = null;
    post({ type: 'error', id: run.id, field: isInputError(error) ? error.field : null, message: error instanceof Error ? error.message : String(error) });
  }
}

self.onmessage = (event: MessageEvent<ToLayoutWorker>) => {
  const message = event.data;
  if (message.type === 'cancel') {
    if (current?.id === message.id) current.stop = true;
    return;
  }
  let steps: TakeoffSteps;
  try {
    steps = materialsTakeoffSteps(message.result, takeoffOptionsFor(message.settings, message.effort));
  } catch (error) {
    post({ type: 'error', id: message.id, field: isInputError(error) ? error.field : null, message: error instanceof Error ? error.message : String(error) });
    return;
  }
  current = { id: message.id, steps, stop: false };
  slice(current);
};
