import type { Knex } from 'knex';

/** Which engine a Knex instance (or transaction) talks to, for the few places where SQL differs. */
export const isPostgres = (db: Knex): boolean => db.client.config.client === 'pg';

/** A unique index refused the row: SQLite's and PostgreSQL's (SQLSTATE 23505) words for it. */
export const isUniqueViolation = (err: unknown): boolean => {
  const code = (err as { code?: unknown } | null)?.code;
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === '23505';
};

/**
 * Take the row lock that serialises a read-check-write transaction on this row (`SELECT … FOR
 * UPDATE`) — a second transaction waits here until the first commits, then reads what it left.
 * SQLite needs none: its one pooled connection runs each transaction alone.
 */
export async function lockRow(trx: Knex.Transaction, table: string, id: number): Promise<void> {
  if (isPostgres(trx)) await trx(table).where({ id }).forUpdate().first('id');
}

/**
 * On SQLite, take the write lock as the first statement of a transaction that reads before it
 * writes on a connection of its own (a worker's). Otherwise a write another connection commits
 * between its first read and its first write leaves its snapshot stale, and SQLite ends the
 * transaction with SQLITE_BUSY at once — no busy timeout waits that out. A write as the first
 * statement takes the lock and a fresh snapshot together, waiting its turn. PostgreSQL needs none.
 */
export async function takeWriteLock(
  trx: Knex.Transaction,
  table: string,
  id: number,
): Promise<void> {
  if (!isPostgres(trx)) await trx(table).where({ id }).update({ id: trx.raw('id') });
}
