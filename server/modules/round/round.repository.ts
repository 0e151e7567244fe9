import type { Knex } from 'knex';
import { roundStatuses } from '../../../shared/schemas/round';

export interface RoundRow {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  status: (typeof roundStatuses)[number];
  latest_dbh_cm: number | null;
  latest_measured_on: string | null;
  measured: number | boolean;
}

export function roundRepository(db: Knex) {
  return {
    /** The stand's living trees in tag order, each with whether it has a reading in `season`. */
    trees(sugarbushId: number, season: number): Promise<RoundRow[]> {
      return db('trees as t')
        .where('t.sugarbush_id', sugarbushId)
        .whereIn('t.status', roundStatuses)
        .orderBy('t.tag')
        .select(
          't.id',
          't.tag',
          't.lat',
          't.lng',
          't.status',
          't.latest_dbh_cm',
          't.latest_measured_on',
          db.raw(
            'exists (select 1 from measurements m where m.tree_id = t.id and m.season = ?) as measured',
            [season],
          ),
        );
    },
  };
}
