import type { Knex } from 'knex';
import type { DatabaseTarget } from '../../config';
import { openDb } from '../../db';
import { adviseTree } from '../../../shared/rules/index';
import { loadStandTrees } from '../plans/plans.repository';
import { adviceRepository } from './advice.repository';
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
  /** Every tree under another guideline, answered and not stored (a preview). */
  | (OnStand & { kind: 'plan-with'; guideline: { profile: string; customJson: string | null } });

/** One tree's answer under a guideline that is not (yet) the stand's: what a preview compares. */
export interface PlannedTree {
  treeId: number;
  tag: string;
  taps: number;
  verdict: string;
  dbhCm: number | null;
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

export async function runAdviceTask(task: AdviceTask): Promise<number[] | number | PlannedTree[]> {
  const db = dbFor(task.database);
  if (task.kind === 'stale')
    return adviceRepository(db).staleTreeIds(task.sugarbushId, task.season, task.standVersion);
  if (task.kind === 'advise')
    return adviseAndStore(db, task.sugarbushId, task.season, task.treeIds);
  const { sunnyAzimuthDeg } = await standGuideline(db, task.sugarbushId);
  const profile = profileOf(task.guideline.profile, task.guideline.customJson);
  const trees = await loadStandTrees(db, task.sugarbushId);
  return trees.map((tree) => {
    const a = adviseTree(tree, { season: task.season, profile, sunnyAzimuthDeg });
    return { treeId: tree.id, tag: tree.tag, taps: a.taps, verdict: a.verdict, dbhCm: a.dbhCm };
  });
}
