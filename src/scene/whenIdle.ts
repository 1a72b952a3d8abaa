/**
 * Run work when the browser is idle, with a way to ask whether the idle slice has time left.
 * `requestIdleCallback` where the browser has it; elsewhere a short timer and an 8 ms slice.
 */

/** Slice of work given when the browser has no idle callback (about half a 60 Hz frame), ms. */
const FALLBACK_SLICE_MS = 8;
/** Leave this much of an idle slice unused, so input and drawing that follow are not late, ms. */
const SLICE_RESERVE_MS = 2;
/** Run even if the browser never goes idle (a long run of typing), ms. */
const IDLE_TIMEOUT_MS = 400;

/** Schedules `work` for the next idle time; returns a cancel function. */
export function whenIdle(work: (hasTime: () => boolean) => void): () => void {
  if (typeof window.requestIdleCallback === 'function') {
    const handle = window.requestIdleCallback((deadline) => work(() => deadline.timeRemaining() > SLICE_RESERVE_MS), { timeout: IDLE_TIMEOUT_MS });
    return () => window.cancelIdleCallback(handle);
  }
  const handle = window.setTimeout(() => {
    const end = performance.now() + FALLBACK_SLICE_MS;
    work(() => performance.now() < end);
  }, 16);
  return () => window.clearTimeout(handle);
}
