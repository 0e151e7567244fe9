import type { Knex } from 'knex';
import type { Membership } from '../../../shared/schemas/auth';
import type { Role } from '../../../shared/schemas/enums';

export function membersRepository(db: Knex) {
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
    async list(sugarbushId: number) {
      const rows = await db('memberships as m')
        .join('users as u', 'u.id', 'm.user_id')
        .where('m.sugarbush_id', sugarbushId)
        .orderBy('u.name')
        .select('u.id', 'u.name', 'u.email', 'm.role', 'm.created_at');
      return rows.map((r) => ({
        userId: r.id,
        name: r.name,
        email: r.email,
        role: r.role as Role,
        since: r.created_at,
      }));
    },
  };
}
