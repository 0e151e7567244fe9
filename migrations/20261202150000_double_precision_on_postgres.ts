import type { Knex } from 'knex';

/**
 * Knex's `float` is SQLite's 8-byte REAL but PostgreSQL's 4-byte `real`, which keeps about seven
 * digits: a tree's latitude and longitude move by up to half a metre, and a computed share loses
 * its last digits. On PostgreSQL every such column becomes `double precision`, as on SQLite. New
 * columns use `t.double` (a PostgreSQL test fails on any `real` column left).
 */
export async function up(knex: Knex): Promise<void> {
  await widenRealColumns(knex);
}

/** Every `real` column of the schema becomes `double precision` (PostgreSQL only). */
export async function widenRealColumns(knex: Knex): Promise<void> {
  if (knex.client.config.client !== 'pg') return;
  const { rows } = await knex.raw<{ rows: { table_name: string; column_name: string }[] }>(
    `select table_name, column_name from information_schema.columns
      where table_schema = current_schema() and data_type = 'real'
      order by table_name, ordinal_position`,
  );
  for (const { table_name, column_name } of rows)
    await knex.raw('alter table ?? alter column ?? type double precision', [
      table_name,
      column_name,
    ]);
}

export async function down(): Promise<void> {
  // Narrowing back to `real` would only lose digits.
}
