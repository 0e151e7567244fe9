import type { Knex } from 'knex';

/** Rows per INSERT: well under SQLite's bound-variable limit for the widest table. */
export const BATCH_ROWS = 150;

export async function insertInBatches(
  trx: Knex.Transaction,
  table: string,
  rows: Record<string, unknown>[],
): Promise<void> {
  for (let i = 0; i < rows.length; i += BATCH_ROWS) {
    await trx(table).insert(rows.slice(i, i + BATCH_ROWS));
  }
}

/** SQLite's CURRENT_TIMESTAMP shape, so seeded rows look like rows the app writes. */
export const stamp = (date: string, time = '12:00:00') => `${date} ${time}`;
