import type { Knex } from 'knex';
import { drilledHoleColumns } from '../tapholes/tapholes.repository';

/** Trees read per page: an export of any size holds one page of rows at a time. */
export const PAGE = 1000;

export interface RegisterRow {
  id: number;
  tag: string;
  species: string;
  lat: number | null;
  lng: number | null;
  status: string;
  latest_dbh_cm: number | null;
  latest_measured_on: string | null;
  latest_crown_dieback_pct: number | null;
}

/**
 * The stand's records page by page in tag order (the (stand, tag) index, code-point order on
 * both engines), each page a query of its own: the one SQLite connection is free between pages,
 * and a slow download holds nothing.
 */
export function exportsRepository(db: Knex) {
  return {
    async *treePages(sugarbushId: number): AsyncGenerator<RegisterRow[]> {
      let after: string | null = null;
      for (;;) {
        const rows: RegisterRow[] = await db('trees')
          .where({ sugarbush_id: sugarbushId })
          .modify((q) => {
            if (after !== null) q.where('tag', '>', after);
          })
          .orderBy('tag')
          .limit(PAGE)
          .select(
            'id',
            'tag',
            'species',
            'lat',
            'lng',
            'status',
            'latest_dbh_cm',
            'latest_measured_on',
            'latest_crown_dieback_pct',
          );
        if (rows.length === 0) return;
        yield rows;
        if (rows.length < PAGE) return;
        after = rows[rows.length - 1].tag;
      }
    },

    /** Standing readings of these trees (no later row corrects them), by date. */
    measurementsOf(treeIds: readonly number[]) {
      return db('measurements as m')
        .whereIn('m.tree_id', treeIds)
        .whereNotExists(
          db('measurements as c').select(db.raw('1')).whereRaw('c.corrects_id = m.id'),
        )
        .orderBy([
          { column: 'm.measured_on', order: 'asc' },
          { column: 'm.id', order: 'asc' },
        ])
        .select('m.tree_id', 'm.measured_on', 'm.dbh_cm', 'm.crown_dieback_pct', 'm.note');
    },

    tapholesOf(treeIds: readonly number[]) {
      return db('tapholes')
        .whereIn('tree_id', treeIds)
        .orderBy([
          { column: 'season', order: 'asc' },
          { column: 'height_cm', order: 'asc' },
          { column: 'azimuth_deg', order: 'asc' },
          { column: 'id', order: 'asc' },
        ])
        .select(...drilledHoleColumns);
    },

    async standName(sugarbushId: number): Promise<string> {
      const row = await db('sugarbushes').where({ id: sugarbushId }).first('name');
      return String(row?.name ?? 'stand');
    },
  };
}
