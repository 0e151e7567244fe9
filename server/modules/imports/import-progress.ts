import type { ImportKind, ImportPhase, ImportProgress } from '../../../shared/schemas/imports';
import { importPhases } from '../../../shared/schemas/imports';

/** How long a finished import's last state can still be read (the page's last poll). */
export const KEEP_FINISHED_MS = 60_000;
/** Imports one user may have running in this process at once; a 429 beyond. */
export const MAX_PER_USER = 8;

interface Entry extends ImportProgress {
  userId: number;
  sugarbushId: number;
  finished: boolean;
}

export type ProgressStep = Pick<ImportProgress, 'phase' | 'done' | 'total'>;

const order = (phase: ImportPhase) => importPhases.indexOf(phase);

/**
 * Each running import's step, in this process's memory, under its stand and the id the browser
 * chose; read only by the user who started it. Steps only move forward, and within a step the
 * count only grows, so a late message from the worker never turns the bar back. A finished
 * import's last state stays for `KEEP_FINISHED_MS`.
 */
export function importProgressStore() {
  const entries = new Map<string, Entry>();
  const keyOf = (sugarbushId: number, importId: string) => `${sugarbushId}:${importId}`;

  return {
    /** Start an import's record; false when that id is already running or the user has too many. */
    start(
      at: { sugarbushId: number; userId: number; importId: string },
      what: { kind: ImportKind; dryRun: boolean },
    ): 'started' | 'running' | 'too-many' {
      const key = keyOf(at.sugarbushId, at.importId);
      const before = entries.get(key);
      if (before && !before.finished) return 'running';
      let mine = 0;
      for (const e of entries.values()) if (e.userId === at.userId && !e.finished) mine++;
      if (mine >= MAX_PER_USER) return 'too-many';
      entries.set(key, {
        ...at,
        ...what,
        phase: 'receiving',
        done: 0,
        total: 0,
        finished: false,
      });
      return 'started';
    },

    /** A step reported: ignored when it would go back. */
    step(sugarbushId: number, importId: string, next: ProgressStep): void {
      const e = entries.get(keyOf(sugarbushId, importId));
      if (!e || e.finished) return;
      const ahead = order(next.phase) - order(e.phase);
      if (ahead < 0) return;
      if (ahead === 0) {
        e.done = Math.max(e.done, Math.min(next.done, next.total));
        e.total = Math.max(e.total, next.total);
        return;
      }
      e.phase = next.phase;
      e.done = Math.min(next.done, next.total);
      e.total = next.total;
    },

    /** The import answered (`done`) or did not (`failed`); its state is forgotten a minute later. */
    finish(sugarbushId: number, importId: string, ok: boolean): void {
      const key = keyOf(sugarbushId, importId);
      const e = entries.get(key);
      if (!e || e.finished) return;
      if (ok) {
        e.phase = 'done';
        e.done = e.total;
      } else e.phase = 'failed';
      e.finished = true;
      setTimeout(() => {
        if (entries.get(key) === e) entries.delete(key);
      }, KEEP_FINISHED_MS).unref();
    },

    /** The import's state for the user who started it; null for anyone else, or none known. */
    read(sugarbushId: number, importId: string, userId: number): ImportProgress | null {
      const e = entries.get(keyOf(sugarbushId, importId));
      if (!e || e.userId !== userId) return null;
      return {
        importId: e.importId,
        kind: e.kind,
        dryRun: e.dryRun,
        phase: e.phase,
        done: e.done,
        total: e.total,
      };
    },
  };
}

export type ImportProgressStore = ReturnType<typeof importProgressStore>;
