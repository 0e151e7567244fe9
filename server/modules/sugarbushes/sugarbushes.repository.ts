import type { Knex } from 'knex';
import type { Role } from '../../../shared/schemas/enums';
import type { Sugarbush } from '../../../shared/schemas/sugarbush';

interface Row {
  id: number;
  name: string;
  boundary: string | null;
  profile: string;
  custom_profile: string | null;
  sunny_azimuth_deg: number;
  role: Role;
  tree_count: number;
}

const toSugarbush = (r: Row): Sugarbush => ({
  id: r.id,
  name: r.name,
  boundary: r.boundary ? JSON.parse(r.boundary) : null,
  profile: r.profile,
  customProfile: r.custom_profile ? JSON.parse(r.custom_profile) : null,
  sunnyAzimuthDeg: r.sunny_azimuth_deg,
  role: r.role,
  treeCount: Number(r.tree_count),
});

export function sugarbushesRepository(db: Knex) {
  const base = (userId: number) =>
    db('sugarbushes as s')
      .join('memberships as m', function () {
        this.on('m.sugarbush_id', 's.id').andOn('m.user_id', db.raw('?', [userId]));
      })
      .select(
        's.id',
        's.name',
        's.boundary',
        's.profile',
        's.custom_profile',
        's.sunny_azimuth_deg',
        'm.role',
        db.raw('(select count(*) from trees t where t.sugarbush_id = s.id) as tree_count'),
      );
  return {
    async listFor(userId: number, opts: { offset: number; limit: number; q?: string }) {
      const q = base(userId).modify((qb) => {
        if (opts.q) qb.whereILike('s.name', `%${opts.q}%`);
      });
      const [{ n }] = await q.clone().clearSelect().count({ n: '*' });
      const rows: Row[] = await q.orderBy('s.name').offset(opts.offset).limit(opts.limit);
      return { items: rows.map(toSugarbush), total: Number(n) };
    },
    async findFor(userId: number, id: number) {
      const row: Row | undefined = await base(userId).where('s.id', id).first();
      return row ? toSugarbush(row) : undefined;
    },
    async create(input: {
      name: string;
      boundary: unknown;
      profile: string;
      sunnyAzimuthDeg: number;
    }) {
      const [row] = await db('sugarbushes')
        .insert({
          name: input.name,
          boundary: input.boundary ? JSON.stringify(input.boundary) : null,
          profile: input.profile,
          sunny_azimuth_deg: input.sunnyAzimuthDeg,
        })
        .returning('id');
      return typeof row === 'object' ? (row.id as number) : (row as number);
    },
    update: (id: number, patch: Record<string, unknown>) =>
      db('sugarbushes')
        .where({ id })
        .update({ ...patch, updated_at: db.fn.now() }),
  };
}
