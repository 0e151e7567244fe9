import type { Knex } from 'knex';
import { hashToken, newSecretToken } from '../../lib/secret-token';

export type TokenPurpose = 'password-reset' | 'sign-up';

export interface TokenRow {
  id: number;
  purpose: TokenPurpose;
  user_id: number | null;
  email: string | null;
  payload: string | null;
}

const nowIso = () => new Date().toISOString();

/** One-time tokens for mailed links: only their hash is stored; each works once, then dies. */
export function tokensRepository(db: Knex) {
  /** Every live token of this purpose for this user or e-mail dies. */
  const retire = (purpose: TokenPurpose, who: { userId?: number; email?: string }) =>
    db('tokens')
      .where({ purpose })
      .whereNull('used_at')
      .modify((q) => {
        if (who.userId !== undefined) q.where('user_id', who.userId);
        else q.where('email', who.email ?? '');
      })
      .update({ used_at: nowIso() });

  return {
    retire,

    /** A new link; every earlier live link of the same purpose for the same person dies. */
    async issue(row: {
      purpose: TokenPurpose;
      userId?: number;
      email?: string;
      payload?: unknown;
      ttlHours: number;
    }): Promise<string> {
      const { token, hash } = newSecretToken();
      await db.transaction(async (trx) => {
        await tokensRepository(trx).retire(row.purpose, row);
        await trx('tokens').insert({
          token_hash: hash,
          purpose: row.purpose,
          user_id: row.userId ?? null,
          email: row.email ?? null,
          payload: row.payload === undefined ? null : JSON.stringify(row.payload),
          expires_at: new Date(Date.now() + row.ttlHours * 3600_000).toISOString(),
        });
      });
      return token;
    },

    /**
     * The live token row, used up in the same step together with every other live token of the
     * same purpose for the same person; undefined when unknown, used or expired.
     */
    async consume(token: string, purpose: TokenPurpose): Promise<TokenRow | undefined> {
      return db.transaction(async (trx) => {
        const row = await trx('tokens')
          .where({ token_hash: hashToken(token), purpose })
          .first();
        if (!row || row.used_at || new Date(row.expires_at).getTime() < Date.now())
          return undefined;
        // Only one use wins when the link is opened twice at once: the other finds it used.
        const won = await trx('tokens')
          .where({ id: row.id })
          .whereNull('used_at')
          .update({ used_at: nowIso() });
        if (won !== 1) return undefined;
        await tokensRepository(trx).retire(
          purpose,
          row.user_id !== null ? { userId: row.user_id } : { email: row.email },
        );
        return row as TokenRow;
      });
    },
  };
}
