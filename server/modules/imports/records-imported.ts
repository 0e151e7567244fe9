import type { Knex } from 'knex';
import { copyLatestMeasurements, refreshTrees } from '../advice/refresh-trees';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { chunks } from './imports.repository';

/**
 * Up to this many trees an import re-advises in its own transaction, as a single write does
 * (`refreshTrees`); beyond, the advice is left to the worker pool, so the request thread stays free.
 */
export const ADVISE_IN_PLACE = 200;

/**
 * Records of these trees were written in bulk, inside `trx`. A few trees: `refreshTrees`. More:
 * bump their versions, copy their latest readings onto the tree rows, and mark every kept season
 * of the stand stale, so no reader takes the stand's advice as current until the workers have
 * re-advised the trees. Returns the seasons the caller brings current after the commit
 * (`ctx.advice.ensure`), or none when the advice was made here.
 */
export async function recordsImported(
  trx: Knex.Transaction,
  sugarbushId: number,
  treeIds: readonly number[],
): Promise<number[]> {
  const ids = [...new Set(treeIds)];
  if (ids.length === 0) return [];
  if (ids.length <= ADVISE_IN_PLACE) {
    await refreshTrees(trx, sugarbushId, ids);
    return [];
  }
  for (const part of chunks(ids)) {
    await trx('trees').whereIn('id', part).increment('record_version', 1);
    await copyLatestMeasurements(trx, part);
  }
  await trx('sugarbushes').where({ id: sugarbushId }).increment('record_seq', 1);
  await trx('advice_state')
    .where({ sugarbush_id: sugarbushId })
    .update({ state: 'updating', done: 0, updated_at: new Date().toISOString() });
  const kept = await trx('advice_state').where({ sugarbush_id: sugarbushId }).select('season');
  return [...new Set([upcomingSeason(), ...kept.map((r) => Number(r.season))])];
}
