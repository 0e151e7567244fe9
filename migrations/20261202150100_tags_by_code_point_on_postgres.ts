import type { Knex } from 'knex';

/**
 * SQLite compares text byte by byte; a PostgreSQL database in a language locale (en_US.UTF-8)
 * ignores hyphens and case at first, so `A-2` would sort after `A10`. Tags are codes, not words:
 * on PostgreSQL they collate as "C" (code-point order), so the register, the map and exports list
 * them as on SQLite whatever locale the database was made with.
 */
export async function up(knex: Knex): Promise<void> {
  if (knex.client.config.client !== 'pg') return;
  await knex.raw('alter table trees alter column tag type varchar(40) collate "C"');
}

export async function down(knex: Knex): Promise<void> {
  if (knex.client.config.client !== 'pg') return;
  await knex.raw('alter table trees alter column tag type varchar(40) collate "default"');
}
