import type { Knex } from 'knex';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';

/** Expired counts are cleared after this many increments in a process. */
const PRUNE_EVERY = 200;

/**
 * express-rate-limit's counts kept in the app's database (table `rate_limits`), so every app
 * process on one database counts the same attempts, and a restart does not forgive them. One
 * upsert per hit, the same SQL on SQLite and PostgreSQL; times are epoch milliseconds.
 */
export class DatabaseRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;
  private sincePrune = 0;

  constructor(
    private readonly db: Knex,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const row = await this.db('rate_limits')
      .where({ bucket: this.bucket(key) })
      .where('reset_at', '>', Date.now())
      .first('hits', 'reset_at');
    return row ? info(row) : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = Date.now();
    const resetAt = now + this.windowMs;
    // A window that has ended starts again at one hit.
    const [row] = await this.db('rate_limits')
      .insert({ bucket: this.bucket(key), hits: 1, reset_at: resetAt })
      .onConflict('bucket')
      .merge({
        hits: this.db.raw(
          'case when rate_limits.reset_at <= ? then 1 else rate_limits.hits + 1 end',
          [now],
        ),
        reset_at: this.db.raw(
          'case when rate_limits.reset_at <= ? then ? else rate_limits.reset_at end',
          [now, resetAt],
        ),
      })
      .returning(['hits', 'reset_at']);
    if (++this.sincePrune >= PRUNE_EVERY) {
      this.sincePrune = 0;
      await this.db('rate_limits').where('reset_at', '<=', now).delete();
    }
    return info(row);
  }

  async decrement(key: string): Promise<void> {
    await this.db('rate_limits')
      .where({ bucket: this.bucket(key) })
      .where('hits', '>', 0)
      .decrement('hits', 1);
  }

  async resetKey(key: string): Promise<void> {
    await this.db('rate_limits')
      .where({ bucket: this.bucket(key) })
      .delete();
  }

  private bucket(key: string): string {
    return `${this.prefix}${key}`;
  }
}

const info = (row: { hits: number | string; reset_at: number | string }): ClientRateLimitInfo => ({
  totalHits: Number(row.hits),
  resetTime: new Date(Number(row.reset_at)),
});
