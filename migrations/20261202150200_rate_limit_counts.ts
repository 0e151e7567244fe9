import type { Knex } from 'knex';

/**
 * Sign-in, sign-up and reset attempts counted per address and per account, in the database so
 * that every app process on it counts the same attempts (`bucket` = limiter and key).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('rate_limits', (t) => {
    t.string('bucket', 400).primary();
    t.integer('hits').notNullable();
    t.bigInteger('reset_at').notNullable().index(); // epoch milliseconds
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('rate_limits');
}
