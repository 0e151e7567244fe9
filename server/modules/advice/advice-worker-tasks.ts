import type { MessagePort } from 'node:worker_threads';
import type { Knex } from 'knex';
import type { DatabaseTarget } from '../../config';
import { openDb } from '../../db';
import { adviseTree, type PlanTotals } from '../../../shared/rules/index';
import type { GuidelinePreview } from '../../../shared/schemas/guideline-preview';
import {
  evaluateCompliance,
  type EvaluatedTree,
  type GuidelineChoice,
} from '../compliance/compliance-task';
import { runImport, type ImportOutcome, type ImportTask } from '../imports/run-import';
import { throttled } from '../imports/progress-throttle';
import { diffPlans } from '../plans/plan-diff';
import { loadStandTrees } from '../plans/plans.repository';
import type { TrendResult } from '../trends/stand-trends';
import { computeTrends } from '../trends/trends-task';
import { runIssuedPlanTask, type IssuedPlanTask } from '../issued-plans/issued-plan-tasks';
import { trendsRepository } from '../trends/trends.repository';
import { buildMapBytes, movedMapBytes, type MapBuilt } from '../map/map-task';
import { adviceRepository, type PlanFilter, type WalkStart } from './advice.repository';
import { adviseAndStore } from './advise-and-store';
import { profileOf, standGuideline } from './stand-guideline';

interface OnStand {
  /** The app's database, which the worker opens on its own connection. */
  database: DatabaseTarget;
  sugarbushId: number;
  season: number;
}

/** Work a worker thread does on its own database connection, so the request thread stays free. */
export type AdviceTask =
  /** Trees without a row made from their current record and this guideline version. */
  | (OnStand & { kind: 'stale'; standVersion: number })
  /** Advise these trees and store the rows. */
  | (OnStand & { kind: 'advise'; treeIds: number[] })
  /** The woods map's answer, serialised (and gzipped when `gzip`), its bytes handed over. */
  | (OnStand & { kind: 'map'; standVersion: number; gzip: boolean })
  /** The season's totals over the stand's current rows. */
  | (OnStand & { kind: 'totals'; standVersion: number })
  /** The ids of the current rows matching a filter, in a sort's order. */
  | (OnStand & {
      kind: 'order';
      standVersion: number;
      filter: PlanFilter & { sort?: string; from?: WalkStart | null };
    })
  /** The stored plan against every tree under another guideline, which is not stored. */
  | (OnStand & { kind: 'preview'; standVersion: number; guideline: PreviewGuideline })
  /** Every tree tapped in the season, held against each guideline (not stored). */
  | (OnStand & { kind: 'compliance'; guidelines: GuidelineChoice[] })
  /**
   * A CSV or GPX file read, checked, matched and (all rows or none) written; its steps posted
   * to `progress` (throttled), which the request thread only stores.
   */
  | (ImportTask & { kind: 'import'; database: DatabaseTarget; progress?: MessagePort })
  /** Seasons with a measurement or a taphole of the stand on record. */
  | (Omit<OnStand, 'season'> & { kind: 'recorded-seasons' })
  /** Issuing a plan, and what reads the issued copy against the whole stand. */
  | { kind: 'issued-plan'; database: DatabaseTarget; task: IssuedPlanTask }
  /** The stand's figures season by season from its record and each season's stored advice. */
  | (Omit<OnStand, 'season'> & {
      kind: 'trends';
      seasons: { season: number; standVersion: number }[];
      upcoming: number;
    });

/** A guideline to preview: a profile key (or `custom` with its JSON), and both sides' names. */
export interface PreviewGuideline {
  profile: string;
  customJson: string | null;
  from: { profile: string; label: string };
  label: string;
}

const connections = new Map<string, Knex>();

/** One pool per database and worker thread; a worker needs few PostgreSQL connections. */
function dbFor(target: DatabaseTarget): Knex {
  const key = target.client === 'pg' ? target.url : target.filename;
  let db = connections.get(key);
  if (!db) {
    db = openDb(
      target.client === 'pg' ? { ...target, poolMax: Math.min(2, target.poolMax) } : target,
    );
    connections.set(key, db);
  }
  return db;
}

export async function runAdviceTask(
  task: AdviceTask,
): Promise<
  | number[]
  | number
  | PlanTotals
  | GuidelinePreview
  | EvaluatedTree[]
  | TrendResult
  | ImportOutcome
  | MapBuilt
  | Awaited<ReturnType<typeof runIssuedPlanTask>>
> {
  const db = dbFor(task.database);
  if (task.kind === 'import') {
    const { progress, ...work } = task;
    try {
      return await runImport(
        db,
        work,
        progress ? throttled((step) => progress.postMessage(step)) : undefined,
      );
    } finally {
      progress?.close();
    }
  }
  if (task.kind === 'issued-plan') return runIssuedPlanTask(db, task.task);
  if (task.kind === 'recorded-seasons')
    return trendsRepository(db).recordedSeasons(task.sugarbushId);
  if (task.kind === 'trends')
    return computeTrends(db, task.sugarbushId, task.seasons, task.upcoming);
  if (task.kind === 'compliance')
    return evaluateCompliance(db, task.sugarbushId, task.season, task.guidelines);
  if (task.kind === 'stale')
    return adviceRepository(db).staleTreeIds(task.sugarbushId, task.season, task.standVersion);
  if (task.kind === 'map') return movedMapBytes(await buildMapBytes(db, task));
  if (task.kind === 'totals')
    return adviceRepository(db).totals(task.sugarbushId, task.season, task.standVersion);
  if (task.kind === 'order')
    return adviceRepository(db).orderedIds(
      task.sugarbushId,
      task.season,
      task.standVersion,
      task.filter,
    );
  if (task.kind === 'advise')
    return adviseAndStore(db, task.sugarbushId, task.season, task.treeIds);
  const { guideline } = task;
  const { sunnyAzimuthDeg } = await standGuideline(db, task.sugarbushId);
  const profile = profileOf(guideline.profile, guideline.customJson);
  const [stored, trees] = await Promise.all([
    adviceRepository(db).all(task.sugarbushId, task.season, task.standVersion),
    loadStandTrees(db, task.sugarbushId),
  ]);
  const after = trees.map((tree) => {
    const a = adviseTree(tree, { season: task.season, profile, sunnyAzimuthDeg });
    return { treeId: tree.id, tag: tree.tag, taps: a.taps, verdict: a.verdict, dbhCm: a.dbhCm };
  });
  const before = stored.map((r) => ({
    treeId: Number(r.id),
    tag: r.tag,
    taps: Number(r.taps),
    verdict: r.verdict,
    dbhCm: r.dbh_cm,
  }));
  return diffPlans(
    { ...guideline.from, items: before },
    { profile: profile.key, label: guideline.label, items: after },
    task.season,
  );
}
