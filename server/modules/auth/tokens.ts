import { createHash, randomBytes } from 'node:crypto';
import type { Knex } from 'knex';

const digest = (token: string) => createHash('sha256').update(token).digest('hex');

/** One-time tokens: only their hash is stored. */
export function tokensRepository(db: Knex) {
  return {
    async issue(row: {
      purpose: 'password-reset' | 'invitation';
      userId?: number;
      sugarbushId?: number;
      email?: string;
      role?: string;
      ttlHours: number;
    }): Promise<string> {
      const token = randomBytes(24).toString('base64url');
      await db('tokens').insert({
        token_hash: digest(token),
        purpose: row.purpose,
        user_id: row.userId ?? null,
        sugarbush_id: row.sugarbushId ?? null,
        email: row.email ?? null,
        role: row.role ?? null,
        expires_at: new Date(Date.now() + row.ttlHours * 3600_000).toISOString(),
      });
      return token;
    },
    /** The live token row, marked used in the same step; undefined when unknown, used or expired. */
    async consume(token: string, purpose: string) {
      return db.transaction(async (trx) => {
        const row = await trx('tokens')
          .where({ token_hash: digest(token), purpose })
          .first();
        if (!row || row.used_at || new Date(row.expires_at).getTime() < Date.now())
          return undefined;
        await trx('tokens').where({ id: row.id }).update({ used_at: new Date().toISOString() });
        return row as {
          user_id: number | null;
          sugarbush_id: number | null;
          email: string | null;
          role: string | null;
        };
      });
    },
  };
}
