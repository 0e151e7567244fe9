import type { Knex } from 'knex';
import { AppError } from '../../errors';
import { upcomingSeason } from '../../../shared/schemas/plan';
import { adviceRepository } from './advice.repository';
import { adviseAndStore } from './advise-and-store';

/**
 * Each tree's newest measurement that no later row corrects, copied onto the tree row: these
 * trees, or every tree of a stand after a bulk write (the demo seed, an import).
 */
export async function copyLatestMeasurements(
  db: Knex,
  which: readonly number[] | { sugarbushId: number },
): Promise<void> {
  const latest = (column: string) =>
    db('measurements as m')
      .select(`m.${column}`)
      .whereRaw('m.tree_id = trees.id')
      .whereNotExists(db('measurements as c').select(db.raw('1')).whereRaw('c.corrects_id = m.id'))
      .orderBy([
        { column: 'm.measured_on', order: 'desc' },
        { column: 'm.id', order: 'desc' },
      ])
      .limit(1);
  await db('trees')
    .modify((q) => {
      if (Array.isArray(which)) q.whereIn('id', which);
      else q.where('sugarbush_id', (which as { sugarbushId: number }).sugarbushId);
    })
    .update({
      latest_dbh_cm: latest('dbh_cm'),
      latest_measured_on: latest('measured_on'),
      latest_crown_dieback_pct: latest('crown_dieback_pct'),
    });
}

/**
 * The trees' records changed (a measurement, a taphole, an edit): bump their versions and the
 * stand's change counter, copy the latest measurement onto the tree rows, and re-advise them for
 * every season the stand keeps, plus the upcoming one. Call it inside the write's transaction, so
 * the answer to the write is sent only once the advice follows it.
 */
export async function refreshTrees(
  trx: Knex.Transaction,
  sugarbushId: number,
  treeIds: readonly number[],
): Promise<void> {
  if (treeIds.length === 0) return;
  await trx('trees').whereIn('id', treeIds).increment('record_version', 1);
  await trx('sugarbushes').where({ id: sugarbushId }).increment('record_seq', 1);
  await copyLatestMeasurements(trx, treeIds);
  const seasons = new Set([
    upcomingSeason(),
    ...(await adviceRepository(trx).keptSeasons(sugarbushId)),
  ]);
  try {
    for (const season of seasons) await adviseAndStore(trx, sugarbushId, season, treeIds);
  } catch (err) {
    // A saved custom guideline that no longer passes blocks advice, not the record: the plan
    // says so (409) until the owner fixes it, and the next stand-wide job catches up.
    if (err instanceof AppError && err.code === 'profile-invalid') return;
    throw err;
  }
}

/** The stand's guideline or sunny side changed: every kept row is now from an older version. */
export async function guidelineChanged(trx: Knex.Transaction, sugarbushId: number): Promise<void> {
  await trx('sugarbushes').where({ id: sugarbushId }).increment('advice_version', 1);
  await trx('sugarbushes').where({ id: sugarbushId }).increment('record_seq', 1);
}

/** The boundary changed: advice stays, but what is derived from the stand (the map) is older. */
export async function boundaryChanged(trx: Knex.Transaction, sugarbushId: number): Promise<void> {
  await trx('sugarbushes').where({ id: sugarbushId }).increment('record_seq', 1);
}
