import type { Knex } from 'knex';
import { isPostgres } from '../../lib/db-engine';
import { insertedId } from '../../lib/paging';
import type { Role } from '../../../shared/schemas/enums';
import type { Invitation } from '../../../shared/schemas/invitation';

export interface InvitationRow {
  id: number;
  sugarbush_id: number;
  email: string;
  role: Role;
  token_hash: string;
  invited_by: number | null;
  expires_at: string;
  accepted_at: string | null;
  revoked_at: string | null;
  created_at: string;
}

type ListedRow = InvitationRow & { inviter_name: string | null };

const toInvitation = (r: ListedRow, now = Date.now()): Invitation => ({
  id: r.id,
  email: r.email,
  role: r.role,
  status: new Date(r.expires_at).getTime() < now ? 'expired' : 'pending',
  invitedBy: r.invited_by !== null ? { userId: r.invited_by, name: r.inviter_name ?? '' } : null,
  createdAt: r.created_at,
  expiresAt: r.expires_at,
});

export function invitationsRepository(db: Knex) {
  /** Invitations still open: neither accepted nor revoked (expired ones included). */
  const open = (sugarbushId: number) =>
    db('invitations as i')
      .leftJoin('users as u', 'u.id', 'i.invited_by')
      .where('i.sugarbush_id', sugarbushId)
      .whereNull('i.accepted_at')
      .whereNull('i.revoked_at');

  return {
    async listOpen(sugarbushId: number, range: { offset: number; limit: number; q?: string }) {
      const q = open(sugarbushId).modify((qb) => {
        if (range.q) qb.whereILike('i.email', `%${range.q}%`);
      });
      const [{ n }] = await q.clone().count({ n: '*' });
      const rows: ListedRow[] = await q
        .select('i.*', 'u.name as inviter_name')
        .orderBy('i.created_at', 'desc')
        .orderBy('i.id', 'desc')
        .offset(range.offset)
        .limit(range.limit);
      return { items: rows.map((r) => toInvitation(r)), total: Number(n) };
    },

    async findOpen(sugarbushId: number, id: number): Promise<Invitation | undefined> {
      const row: ListedRow | undefined = await open(sugarbushId)
        .where('i.id', id)
        .first('i.*', 'u.name as inviter_name');
      return row ? toInvitation(row) : undefined;
    },

    find: (id: number) => db<InvitationRow>('invitations').where({ id }).first(),

    findByTokenHash: (hash: string) =>
      db<InvitationRow>('invitations').where({ token_hash: hash }).first(),

    /**
     * The same row, locked until the transaction ends (PostgreSQL): a second acceptance of the
     * link waits, then reads it accepted. SQLite runs each transaction alone anyway.
     */
    lockByTokenHash: (hash: string) =>
      db<InvitationRow>('invitations')
        .where({ token_hash: hash })
        .modify((q) => {
          if (isPostgres(db)) q.forUpdate();
        })
        .first(),

    async create(row: {
      sugarbushId: number;
      email: string;
      role: Role;
      tokenHash: string;
      invitedBy: number;
      expiresAt: string;
    }): Promise<number> {
      const [id] = await db('invitations')
        .insert({
          sugarbush_id: row.sugarbushId,
          email: row.email,
          role: row.role,
          token_hash: row.tokenHash,
          invited_by: row.invitedBy,
          expires_at: row.expiresAt,
        })
        .returning('id');
      return insertedId(id);
    },

    /** Open invitations of this e-mail to this stand are revoked (a new one replaces them). */
    revokeOpenFor: (sugarbushId: number, email: string) =>
      db('invitations')
        .where({ sugarbush_id: sugarbushId, email })
        .whereNull('accepted_at')
        .whereNull('revoked_at')
        .update({ revoked_at: new Date().toISOString() }),

    revoke: (id: number) =>
      db('invitations').where({ id }).update({ revoked_at: new Date().toISOString() }),

    renew: (id: number, tokenHash: string, expiresAt: string) =>
      db('invitations').where({ id }).update({ token_hash: tokenHash, expires_at: expiresAt }),

    /** Marks it accepted unless someone else did first; false when it was no longer open. */
    async markAccepted(id: number, userId: number): Promise<boolean> {
      const changed = await db('invitations')
        .where({ id })
        .whereNull('accepted_at')
        .whereNull('revoked_at')
        .update({ accepted_at: new Date().toISOString(), accepted_by: userId });
      return changed === 1;
    },
  };
}
