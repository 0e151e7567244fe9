import type { Knex } from 'knex';

/** Mail held by the local outbox transport, and one-time tokens (password reset, invitations). */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('outbox', (t) => {
    t.increments('id').primary();
    t.string('to_address', 254).notNullable();
    t.string('subject', 200).notNullable();
    t.text('body').notNullable();
    t.text('raw');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.createTable('tokens', (t) => {
    t.increments('id').primary();
    t.string('token_hash', 128).notNullable().unique();
    t.string('purpose', 24).notNullable();
    t.integer('user_id').references('users.id').onDelete('CASCADE');
    t.integer('sugarbush_id').references('sugarbushes.id').onDelete('CASCADE');
    t.string('email', 254);
    t.string('role', 16);
    t.timestamp('expires_at').notNullable();
    t.timestamp('used_at');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('tokens');
  await knex.schema.dropTableIfExists('outbox');
}
