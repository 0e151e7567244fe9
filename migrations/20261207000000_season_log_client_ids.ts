import type { Knex } from 'knex';

/**
 * A day's sap or weather sent from the season log may carry the id the recording device gave it
 * (a UUID), so that sending it again stores it once. Sap entries keep the id on their row (nullable,
 * unique). A weather day is one per date and a later reading replaces it, so the id cannot live on
 * the day: each id is kept in `weather_day_sends` with what it carried, and a resend is answered
 * with the day as it stands without writing it again.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sap_entries', (t) => {
    t.string('client_id', 36).nullable();
    t.unique(['client_id'], { indexName: 'sap_entries_client_id_unique' });
  });
  await knex.schema.createTable('weather_day_sends', (t) => {
    t.string('client_id', 36).primary();
    t.integer('sugarbush_id')
      .notNullable()
      .references('id')
      .inTable('sugarbushes')
      .onDelete('CASCADE');
    t.string('date', 10).notNullable();
    t.double('min_c').notNullable();
    t.double('max_c').notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('weather_day_sends');
  await knex.schema.alterTable('sap_entries', (t) => {
    t.dropUnique(['client_id'], 'sap_entries_client_id_unique');
    t.dropColumn('client_id');
  });
}
