import type { Knex } from 'knex';
import { mapRepository } from '../map/map.repository';
import { loadStandTrees } from '../plans/plans.repository';
import { standTrends, type TrendResult, type TrendTree } from './stand-trends';
import { trendsRepository } from './trends.repository';

/**
 * Whole-stand work for the trends, done in a worker thread on its own connection: the stand's
 * record and each season's stored advice read once, the figures worked out from them.
 */
export async function computeTrends(
  db: Knex,
  sugarbushId: number,
  seasons: readonly { season: number; standVersion: number }[],
  upcoming: number,
): Promise<TrendResult> {
  const repo = trendsRepository(db);
  const rows = await repo.trees(sugarbushId);
  const records = new Map((await loadStandTrees(db, sugarbushId)).map((t) => [t.id, t]));
  const boundary = await mapRepository(db).boundary(sugarbushId);
  const advised = [];
  for (const s of seasons)
    advised.push({
      season: s.season,
      advice: await repo.advice(sugarbushId, s.season, s.standVersion),
    });
  const trees: TrendTree[] = rows.map((row) => ({
    ...row,
    measurements: records.get(row.id)?.measurements ?? [],
    tapholes: records.get(row.id)?.tapholes ?? [],
    statusHistory: records.get(row.id)?.statusHistory,
  }));
  return standTrends({ upcoming, seasons: advised, trees, boundary });
}
