import type { Knex } from 'knex';
import { adviseTree } from '../../../shared/rules/index';
import { loadStandTrees } from '../plans/plans.repository';
import { adviceRepository } from './advice.repository';
import { toAdviceRow } from './advice-rows';
import { standGuideline } from './stand-guideline';

/**
 * Advise trees of a stand for a season from what the database holds now and store the rows,
 * stamped with the record and guideline versions read. Runs in worker threads for a whole stand
 * and in a write's own transaction for the trees it touched.
 */
export async function adviseAndStore(
  db: Knex,
  sugarbushId: number,
  season: number,
  treeIds?: readonly number[],
): Promise<number> {
  const { profile, sunnyAzimuthDeg, adviceVersion } = await standGuideline(db, sugarbushId);
  const trees = await loadStandTrees(db, sugarbushId, treeIds);
  const rows = trees.map((tree) =>
    toAdviceRow(adviseTree(tree, { season, profile, sunnyAzimuthDeg }), {
      treeId: tree.id,
      season,
      sugarbushId,
      treeVersion: tree.recordVersion,
      standVersion: adviceVersion,
    }),
  );
  await adviceRepository(db).upsert(rows);
  return rows.length;
}
