import type { Knex } from 'knex';

/**
 * The season log: the weather of each day (one reading per stand and date; a later entry replaces
 * it and the audit trail keeps the earlier one) and the sap collected, per day and collection
 * (null: the whole stand). Temperatures in °C, volumes in litres, sugar in °Brix. Sap entries are
 * corrected in place with the earlier values kept in the audit trail; they are never deleted.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('weather_days', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.date('date').notNullable();
    t.double('min_c').notNullable();
    t.double('max_c').notNullable();
    t.string('source', 16).notNullable();
    t.string('station', 40);
    t.integer('recorded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
    // The season's days are a range of this index; so is the latest day on record.
    t.unique(['sugarbush_id', 'date']);
  });

  await knex.schema.createTable('sap_entries', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.date('collected_on').notNullable();
    t.integer('season').notNullable();
    t.double('volume_l').notNullable();
    t.double('sugar_pct').notNullable();
    t.double('held_at_c');
    t.string('collection', 16);
    t.double('syrup_made_l');
    t.text('note');
    t.integer('recorded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
    t.index(['sugarbush_id', 'season', 'collected_on']);
    t.index(['sugarbush_id', 'season', 'collection', 'collected_on']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sap_entries');
  await knex.schema.dropTableIfExists('weather_days');
}
