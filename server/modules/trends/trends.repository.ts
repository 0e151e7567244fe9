import type { Knex } from 'knex';
import type { TreeStatus } from '../../../shared/schemas/enums';

/** A tree of the stand as the trends read it: where it stands and when it was added. */
export interface TrendTreeRow {
  id: number;
  lat: number | null;
  lng: number | null;
  status: TreeStatus;
  createdOn: string;
}

/** The stored columns of one tree's advice for a season (never its JSON). */
export interface TrendAdvice {
  verdict: string;
  taps: number;
  dbhCm: number | null;
  share: number;
  warningMask: number;
}

export function trendsRepository(db: Knex) {
  const ofStand = (table: string, alias: string, sugarbushId: number) =>
    db(`${table} as ${alias}`)
      .join('trees as t', 't.id', `${alias}.tree_id`)
      .where('t.sugarbush_id', sugarbushId);

  return {
    /** Seasons with a measurement or a taphole of the stand on record. */
    async recordedSeasons(sugarbushId: number): Promise<number[]> {
      const [measured, tapped] = await Promise.all([
        ofStand('measurements', 'm', sugarbushId).distinct('m.season'),
        ofStand('tapholes', 'h', sugarbushId).distinct('h.season'),
      ]);
      const seasons = new Set([...measured, ...tapped].map((r) => Number(r.season)));
      return [...seasons].sort((a, b) => a - b);
    },

    async trees(sugarbushId: number): Promise<TrendTreeRow[]> {
      const rows = await db('trees')
        .where({ sugarbush_id: sugarbushId })
        .orderBy('id')
        .select('id', 'lat', 'lng', 'status', 'created_at');
      return rows.map((r) => ({
        id: Number(r.id),
        lat: r.lat,
        lng: r.lng,
        status: r.status,
        createdOn: String(r.created_at).slice(0, 10),
      }));
    },

    /** The season's stored advice made from each tree's current record and this guideline version. */
    async advice(
      sugarbushId: number,
      season: number,
      standVersion: number,
    ): Promise<Map<number, TrendAdvice>> {
      const rows = await db('trees as t')
        .join('tree_advice as a', function () {
          this.on('a.tree_id', 't.id').andOn('a.season', db.raw('?', [season]));
        })
        .where('t.sugarbush_id', sugarbushId)
        .where('a.stand_version', standVersion)
        .whereRaw('a.tree_version = t.record_version')
        .select('t.id', 'a.verdict', 'a.taps', 'a.dbh_cm', 'a.conductive_share', 'a.warning_mask');
      return new Map(
        rows.map((r) => [
          Number(r.id),
          {
            verdict: r.verdict,
            taps: Number(r.taps),
            dbhCm: r.dbh_cm === null ? null : Number(r.dbh_cm),
            share: Number(r.conductive_share),
            warningMask: Number(r.warning_mask),
          },
        ]),
      );
    },
  };
}
