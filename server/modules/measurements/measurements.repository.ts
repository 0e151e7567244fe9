import type { Knex } from 'knex';
import type { Measurement, MeasurementInput } from '../../../shared/schemas/measurement';

const toMeasurement = (r: Record<string, unknown>): Measurement => ({
  id: r.id as number,
  treeId: r.tree_id as number,
  measuredOn: r.measured_on as string,
  season: r.season as number,
  dbhCm: r.dbh_cm as number,
  crownDiebackPct: (r.crown_dieback_pct as number | null) ?? null,
  note: (r.note as string | null) ?? null,
  correctsId: (r.corrects_id as number | null) ?? null,
  confirmedOutlier: Boolean(r.confirmed_outlier),
  superseded: Number(r.superseded) > 0,
  recordedBy: (r.recorded_by as number | null) ?? null,
  clientId: (r.client_id as string | null) ?? null,
  createdAt: r.created_at as string,
});

export function measurementsRepository(db: Knex) {
  const withSuperseded = () =>
    db('measurements as m').select(
      'm.*',
      db.raw('exists (select 1 from measurements c where c.corrects_id = m.id) as superseded'),
    );
  return {
    async listForTree(treeId: number, opts: { offset: number; limit: number; desc: boolean }) {
      const [{ n }] = await db('measurements').where({ tree_id: treeId }).count({ n: '*' });
      const rows = await withSuperseded()
        .where('m.tree_id', treeId)
        .orderBy([
          { column: 'm.measured_on', order: opts.desc ? 'desc' : 'asc' },
          { column: 'm.id', order: opts.desc ? 'desc' : 'asc' },
        ])
        .offset(opts.offset)
        .limit(opts.limit);
      return { items: rows.map(toMeasurement), total: Number(n) };
    },
    async find(id: number) {
      const row = await withSuperseded().where('m.id', id).first();
      return row ? toMeasurement(row) : undefined;
    },
    async findByClientId(clientId: string) {
      const row = await withSuperseded().where('m.client_id', clientId).first();
      return row ? toMeasurement(row) : undefined;
    },
    /** The tree's standing readings (no later row corrects them), leaving out one being corrected. */
    async standing(treeId: number, except?: number | null) {
      const rows: { measured_on: string; dbh_cm: number; confirmed_outlier: number }[] = await db(
        'measurements as m',
      )
        .where('m.tree_id', treeId)
        .whereNotExists(
          db('measurements as c').select(db.raw('1')).whereRaw('c.corrects_id = m.id'),
        )
        .modify((q) => {
          if (except) q.whereNot('m.id', except);
        })
        .orderBy(['m.measured_on', 'm.id'])
        .select('m.measured_on', 'm.dbh_cm', 'm.confirmed_outlier');
      return rows.map((r) => ({
        measuredOn: r.measured_on,
        dbhCm: r.dbh_cm,
        confirmedOutlier: Boolean(r.confirmed_outlier),
      }));
    },
    async create(
      treeId: number,
      userId: number,
      m: MeasurementInput & { confirmedOutlier: boolean },
    ): Promise<number> {
      const [row] = await db('measurements')
        .insert({
          tree_id: treeId,
          measured_on: m.measuredOn,
          season: Number(m.measuredOn.slice(0, 4)),
          dbh_cm: m.dbhCm,
          crown_dieback_pct: m.crownDiebackPct ?? null,
          note: m.note ?? null,
          corrects_id: m.correctsId ?? null,
          confirmed_outlier: m.confirmedOutlier,
          recorded_by: userId,
          client_id: m.clientId ?? null,
        })
        .returning('id');
      return typeof row === 'object' ? (row.id as number) : (row as number);
    },
  };
}
