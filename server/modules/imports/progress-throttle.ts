import { performance } from 'node:perf_hooks';
import type { ProgressStep } from './import-progress';

/** Counts go to the request thread at most this often: it only stores them, but fewer is calmer. */
export const PROGRESS_EVERY_MS = 100;

/**
 * A step reporter that passes each step's first and last count at once and the counts between
 * at most every `everyMs`: a loop over 10,000 rows may call it for each row.
 */
export function throttled(
  send: (step: ProgressStep) => void,
  everyMs = PROGRESS_EVERY_MS,
  now: () => number = () => performance.now(),
): (step: ProgressStep) => void {
  let phase: ProgressStep['phase'] | null = null;
  let last = -Infinity;
  return (step) => {
    const t = now();
    const edge = step.phase !== phase || step.done >= step.total;
    if (!edge && t - last < everyMs) return;
    phase = step.phase;
    last = t;
    send(step);
  };
}
