import type { Logger } from './logger';

/**
 * Work that must not hold up the answer, such as sending mail: an answer then takes the same time
 * whether or not a mail goes out, so its timing tells nothing about which addresses have accounts.
 * Failures are logged; `idle()` resolves once everything started so far has settled.
 */
export interface Background {
  run(what: string, work: () => Promise<unknown>): void;
  idle(): Promise<void>;
}

export function createBackground(log: Logger): Background {
  const pending = new Set<Promise<unknown>>();
  return {
    run(what, work) {
      const job: Promise<unknown> = new Promise<void>((resolve) => setImmediate(resolve))
        .then(work)
        .catch((err: unknown) => log.error(`Background work failed: ${what}`, err))
        .finally(() => pending.delete(job));
      pending.add(job);
    },
    async idle() {
      while (pending.size > 0) await Promise.allSettled([...pending]);
    },
  };
}
