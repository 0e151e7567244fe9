import os from 'node:os';
import { MessageChannel, type MessagePort } from 'node:worker_threads';
import type { Knex } from 'knex';
import { Piscina } from 'piscina';
import type { DatabaseTarget } from '../../config';
import { AppError } from '../../errors';
import type { Logger } from '../../lib/logger';
import type { AdviceStatus } from '../../../shared/schemas/advice-status';
import type { PlanTotals } from '../../../shared/rules/index';
import { adviceRepository, type PlanFilter, type WalkStart } from './advice.repository';
import type { GuidelinePreview } from '../../../shared/schemas/guideline-preview';
import type { EvaluatedTree, GuidelineChoice } from '../compliance/compliance-task';
import type { TrendResult } from '../trends/stand-trends';
import type { AdviceTask, PreviewGuideline } from './advice-worker-tasks';
import type { IssuedPlanTask } from '../issued-plans/issued-plan-tasks';
import type { ImportOutcome, ImportTask } from '../imports/run-import';
import type { ProgressStep } from '../imports/import-progress';
import type { MapBuilt } from '../map/map-task';

/** Trees a worker advises in one task: small enough that a write never waits long for the lock. */
const CHUNK = 500;
const MAX_ROUNDS = 5;

type TaskInput = AdviceTask extends infer T
  ? T extends AdviceTask
    ? Omit<T, 'database'>
    : never
  : never;

export interface AdviceJobs {
  /** Resolves with the guideline version whose rows are complete for the season, once they are. */
  ensure(sugarbushId: number, season: number, opts?: { recheck?: boolean }): Promise<number>;
  status(sugarbushId: number, season: number): Promise<AdviceStatus>;
  /** Trees advised of those stale, of the job this process runs for the season now; null if none. */
  running(sugarbushId: number, season: number): { done: number; total: number } | null;
  /** Whole-stand reads of the stored rows, in a worker: the season's totals … */
  totals(sugarbushId: number, season: number, standVersion: number): Promise<PlanTotals>;
  /**
   * … the woods map's answer as bytes, serialised (and gzipped when asked) in the worker and
   * handed over without a copy; `incomplete` where a tree has no current row …
   */
  mapBytes(
    sugarbushId: number,
    season: number,
    standVersion: number,
    gzip: boolean,
  ): Promise<MapBuilt>;
  /** … and the ids of the rows a filter keeps, in a sort's order. */
  orderedIds(
    sugarbushId: number,
    season: number,
    standVersion: number,
    filter: PlanFilter & { sort?: string; from?: WalkStart | null },
  ): Promise<number[]>;
  /** What another guideline would change against the stored plan, worked out in a worker. */
  preview(
    sugarbushId: number,
    season: number,
    standVersion: number,
    guideline: PreviewGuideline,
  ): Promise<GuidelinePreview>;
  /** Every tree tapped in a season held against each guideline, in a worker, not stored. */
  compliance(
    sugarbushId: number,
    season: number,
    guidelines: GuidelineChoice[],
  ): Promise<EvaluatedTree[]>;
  /** Seasons with a measurement or a taphole of the stand on record (read in a worker). */
  recordedSeasons(sugarbushId: number): Promise<number[]>;
  /** The stand's figures season by season from each season's stored rows, in a worker. */
  trends(
    sugarbushId: number,
    seasons: { season: number; standVersion: number }[],
    upcoming: number,
  ): Promise<TrendResult>;
  /** Issuing a plan and reading the issued copy against the stand, in a worker. */
  issuedPlan<T>(task: IssuedPlanTask): Promise<T>;
  /**
   * An import, whole, in a worker with its own connection (`runImport`); its steps come back
   * through a message port to `onStep` on this thread.
   */
  importFile(t: ImportTask, onStep?: (step: ProgressStep) => void): Promise<ImportOutcome>;
  close(): Promise<void>;
}

/**
 * Whole-stand advice, kept current by worker threads. One job per stand and season at a time in
 * this process; a second process on the same database may run its own, and the version stamps on
 * every row keep either from serving or keeping advice made from an older record.
 */
export function createAdviceJobs(opts: {
  db: Knex;
  database: DatabaseTarget;
  log: Logger;
}): AdviceJobs {
  const { db, database, log } = opts;
  const repo = adviceRepository(db);
  const running = new Map<string, { promise: Promise<number>; done: number; total: number }>();
  let pool: Piscina | null = null;
  const workers = () =>
    (pool ??= new Piscina({
      filename: new URL('./advice.worker.mjs', import.meta.url).href,
      minThreads: 0,
      maxThreads: Math.max(1, os.availableParallelism() - 1),
      idleTimeout: 15_000,
    }));
  const task = <T>(t: TaskInput, transferList?: MessagePort[]) =>
    workers().run({ ...t, database } as AdviceTask, { transferList }) as Promise<T>;

  async function adviceVersion(sugarbushId: number): Promise<number> {
    const row = await db('sugarbushes').where({ id: sugarbushId }).first('advice_version');
    if (!row) throw new AppError(404, 'not-found', 'Sugarbush not found');
    return Number(row.advice_version);
  }

  async function run(sugarbushId: number, season: number, job: { done: number; total: number }) {
    for (let round = 0; round < MAX_ROUNDS; round++) {
      const version = await adviceVersion(sugarbushId);
      const stale = await task<number[]>({
        kind: 'stale',
        sugarbushId,
        season,
        standVersion: version,
      });
      job.done = 0;
      job.total = stale.length;
      if (stale.length > 0) {
        await repo.setState({
          sugarbush_id: sugarbushId,
          season,
          stand_version: version,
          state: 'updating',
          done: 0,
          total: stale.length,
        });
        const chunks: number[][] = [];
        for (let i = 0; i < stale.length; i += CHUNK) chunks.push(stale.slice(i, i + CHUNK));
        await Promise.all(
          chunks.map(async (treeIds) => {
            // Not `job.done += await …`: that reads `done` before the wait and loses the others.
            const advised = await task<number>({ kind: 'advise', sugarbushId, season, treeIds });
            job.done += advised;
          }),
        );
      }
      if ((await adviceVersion(sugarbushId)) !== version) continue; // changed meanwhile: again
      const left = await task<number[]>({
        kind: 'stale',
        sugarbushId,
        season,
        standVersion: version,
      });
      if (left.length > 0) continue; // a tree was added or changed meanwhile
      // Stored advice changed: whatever was derived from it (cached totals) is out of date.
      if (stale.length > 0)
        await db('sugarbushes').where({ id: sugarbushId }).increment('record_seq', 1);
      await repo.setState({
        sugarbush_id: sugarbushId,
        season,
        stand_version: version,
        state: 'current',
        done: job.total,
        total: job.total,
      });
      return version;
    }
    throw new AppError(503, 'advice-busy', 'The stand keeps changing: try again in a moment');
  }

  return {
    async ensure(sugarbushId, season, opts) {
      const key = `${sugarbushId}:${season}`;
      const inFlight = running.get(key);
      if (inFlight) return inFlight.promise;
      const [version, state] = await Promise.all([
        adviceVersion(sugarbushId),
        repo.state(sugarbushId, season),
      ]);
      if (!opts?.recheck && state?.state === 'current' && Number(state.stand_version) === version)
        return version;
      const again = running.get(key); // another request started it while we looked
      if (again) return again.promise;
      const job = { done: 0, total: 0, promise: Promise.resolve(0) };
      job.promise = run(sugarbushId, season, job).finally(() => running.delete(key));
      running.set(key, job);
      return job.promise;
    },

    running(sugarbushId, season) {
      const job = running.get(`${sugarbushId}:${season}`);
      return job ? { done: job.done, total: job.total } : null;
    },

    async status(sugarbushId, season) {
      const job = running.get(`${sugarbushId}:${season}`);
      if (job) return { season, state: 'updating', done: job.done, total: job.total };
      const [version, state] = await Promise.all([
        adviceVersion(sugarbushId),
        repo.state(sugarbushId, season),
      ]);
      if (state?.state === 'current' && Number(state.stand_version) === version)
        return { season, state: 'current', done: Number(state.total), total: Number(state.total) };
      // Not current and nobody here is on it: start it, and say so.
      this.ensure(sugarbushId, season).catch((err: unknown) =>
        log.error(`Advice for stand ${sugarbushId}, season ${season} failed`, err),
      );
      return { season, state: 'updating', done: 0, total: Number(state?.total ?? 0) };
    },

    totals(sugarbushId, season, standVersion) {
      return task<PlanTotals>({ kind: 'totals', sugarbushId, season, standVersion });
    },

    mapBytes(sugarbushId, season, standVersion, gzip) {
      return task<MapBuilt>({ kind: 'map', sugarbushId, season, standVersion, gzip });
    },

    orderedIds(sugarbushId, season, standVersion, filter) {
      return task<number[]>({ kind: 'order', sugarbushId, season, standVersion, filter });
    },

    preview(sugarbushId, season, standVersion, guideline) {
      return task<GuidelinePreview>({
        kind: 'preview',
        sugarbushId,
        season,
        standVersion,
        guideline,
      });
    },

    compliance(sugarbushId, season, guidelines) {
      return task<EvaluatedTree[]>({ kind: 'compliance', sugarbushId, season, guidelines });
    },

    recordedSeasons(sugarbushId) {
      return task<number[]>({ kind: 'recorded-seasons', sugarbushId });
    },

    trends(sugarbushId, seasons, upcoming) {
      return task<TrendResult>({ kind: 'trends', sugarbushId, seasons, upcoming });
    },

    issuedPlan<T>(t: IssuedPlanTask) {
      return task<T>({ kind: 'issued-plan', task: t });
    },

    async importFile(t, onStep) {
      if (!onStep) return task<ImportOutcome>({ kind: 'import', ...t });
      const { port1, port2 } = new MessageChannel();
      port1.on('message', (step: ProgressStep) => onStep(step));
      try {
        return await task<ImportOutcome>({ kind: 'import', ...t, progress: port2 }, [port2]);
      } finally {
        port1.close();
      }
    },

    async close() {
      await Promise.allSettled([...running.values()].map((j) => j.promise));
      await pool?.destroy();
      pool = null;
    },
  };
}
