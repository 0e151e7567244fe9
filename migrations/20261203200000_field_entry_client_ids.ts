import type { Knex } from 'knex';

/**
 * A reading or a drilled hole may carry the id the recording device gave it (a UUID), so that
 * sending it again — a retry after a lost answer, a queue replayed after a reload — stores it
 * once. Rows written by imports, seeds and older clients have none (several NULLs are allowed by
 * a unique index on both engines).
 */
export async function up(knex: Knex): Promise<void> {
  for (const table of ['measurements', 'tapholes']) {
    await knex.schema.alterTable(table, (t) => {
      t.string('client_id', 36).nullable();
      t.unique(['client_id'], { indexName: `${table}_client_id_unique` });
    });
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ['measurements', 'tapholes']) {
    await knex.schema.alterTable(table, (t) => {
      t.dropUnique(['client_id'], `${table}_client_id_unique`);
      t.dropColumn('client_id');
    });
  }
}
