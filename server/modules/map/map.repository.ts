import type { Knex } from 'knex';
import { validateBoundary, type Boundary } from '../../../shared/geo/boundary';
import type { Species, TreeStatus } from '../../../shared/schemas/enums';

/** A tree of the stand with its stored advice for one season (null where no current row). */
export interface StandRow {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  species: Species;
  status: TreeStatus;
  verdict: string | null;
  taps: number | null;
  warning_mask: number | null;
  dbh_cm: number | null;
}

export function mapRepository(db: Knex) {
  return {
    /**
     * Every tree of the stand in tag order, with its stored advice for the season: the row made
     * from the tree's current record and this guideline version, looked up by its primary key.
     * Columns only; the advice's JSON is never read here. (A query: await it for the rows.)
     */
    standRows: (
      sugarbushId: number,
      season: number,
      standVersion: number,
    ): Knex.QueryBuilder<StandRow, StandRow[]> =>
      db<StandRow>('trees as t')
        .leftJoin('tree_advice as a', function () {
          this.on('a.tree_id', 't.id')
            .andOn('a.season', db.raw('?', [season]))
            .andOn('a.stand_version', db.raw('?', [standVersion]))
            .andOn('a.tree_version', 't.record_version');
        })
        .where('t.sugarbush_id', sugarbushId)
        .orderBy('t.tag')
        .select(
          't.id',
          't.tag',
          't.lat',
          't.lng',
          't.species',
          't.status',
          'a.verdict',
          'a.taps',
          'a.warning_mask',
          'a.dbh_cm',
        ),

    /** The stand's change counter: bumped by every change to what its map or figures show. */
    async recordSeq(sugarbushId: number): Promise<number> {
      const row = await db('sugarbushes').where({ id: sugarbushId }).first('record_seq');
      return Number(row?.record_seq ?? 0);
    },

    /**
     * The stand's boundary. Every write is validated, so a stored boundary that fails the check
     * can only be older data; it counts as no boundary rather than putting trees outside a shape
     * that is not one.
     */
    async boundary(sugarbushId: number): Promise<Boundary | null> {
      const row = await db('sugarbushes').where({ id: sugarbushId }).first('boundary');
      if (!row?.boundary) return null;
      const check = validateBoundary(JSON.parse(row.boundary));
      return check.ok ? check.boundary : null;
    },
  };
}
