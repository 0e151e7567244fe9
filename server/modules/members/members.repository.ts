import type { Knex } from 'knex';
import type { Membership } from '../../../shared/schemas/auth';
import type { Role } from '../../../shared/schemas/enums';
import type { Member } from '../../../shared/schemas/members';

interface MemberRow {
  id: number;
  name: string;
  email: string;
  role: Role;
  created_at: string;
}

const toMember = (r: MemberRow): Member => ({
  userId: r.id,
  name: r.name,
  email: r.email,
  role: r.role,
  since: r.created_at,
});

const memberSorts = {
  name: 'u.name',
  email: 'u.email',
  role: 'm.role',
  since: 'm.created_at',
} as const;
export type MemberSort = keyof typeof memberSorts;

export function membersRepository(db: Knex) {
  const team = (sugarbushId: number) =>
    db('memberships as m')
      .join('users as u', 'u.id', 'm.user_id')
      .where('m.sugarbush_id', sugarbushId);

  return {
    async roleOf(userId: number, sugarbushId: number): Promise<Role | null> {
      const row = await db('memberships')
        .where({ user_id: userId, sugarbush_id: sugarbushId })
        .first('role');
      return (row?.role as Role) ?? null;
    },
    async membershipsOf(userId: number): Promise<Membership[]> {
      const rows = await db('memberships')
        .where({ user_id: userId })
        .orderBy('sugarbush_id')
        .select('sugarbush_id', 'role');
      return rows.map((r) => ({ sugarbushId: r.sugarbush_id, role: r.role }));
    },
    add: (userId: number, sugarbushId: number, role: Role) =>
      db('memberships').insert({ user_id: userId, sugarbush_id: sugarbushId, role }),

    async list(
      sugarbushId: number,
      opts: { offset: number; limit: number; q?: string; sort?: MemberSort; descending?: boolean },
    ): Promise<{ items: Member[]; total: number }> {
      const q = team(sugarbushId).modify((qb) => {
        if (opts.q)
          qb.where((w) =>
            w.whereILike('u.name', `%${opts.q}%`).orWhereILike('u.email', `%${opts.q}%`),
          );
      });
      const [{ n }] = await q.clone().count({ n: '*' });
      const rows: MemberRow[] = await q
        .select('u.id', 'u.name', 'u.email', 'm.role', 'm.created_at')
        .orderBy(memberSorts[opts.sort ?? 'name'], opts.descending ? 'desc' : 'asc')
        .orderBy('u.id')
        .offset(opts.offset)
        .limit(opts.limit);
      return { items: rows.map(toMember), total: Number(n) };
    },

    async find(sugarbushId: number, userId: number): Promise<Member | undefined> {
      const row: MemberRow | undefined = await team(sugarbushId)
        .where('u.id', userId)
        .first('u.id', 'u.name', 'u.email', 'm.role', 'm.created_at');
      return row ? toMember(row) : undefined;
    },

    /** Members whose role is one of these. */
    async countWithRole(sugarbushId: number, roles: readonly Role[]): Promise<number> {
      const [{ n }] = await db('memberships')
        .where({ sugarbush_id: sugarbushId })
        .whereIn('role', roles)
        .count({ n: '*' });
      return Number(n);
    },

    setRole: (sugarbushId: number, userId: number, role: Role) =>
      db('memberships').where({ sugarbush_id: sugarbushId, user_id: userId }).update({ role }),

    remove: (sugarbushId: number, userId: number) =>
      db('memberships').where({ sugarbush_id: sugarbushId, user_id: userId }).delete(),
  };
}
