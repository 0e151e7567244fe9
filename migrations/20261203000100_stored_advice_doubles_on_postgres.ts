import type { Knex } from 'knex';
import { widenRealColumns } from './20261202150000_double_precision_on_postgres';

/**
 * The stored-advice columns (latest DBH and crown rating, advice DBH and conductive share) were
 * made with `t.float`: on PostgreSQL they become `double precision` like every other decimal.
 */
export async function up(knex: Knex): Promise<void> {
  await widenRealColumns(knex);
}

export async function down(): Promise<void> {
  // Narrowing back to `real` would only lose digits.
}
