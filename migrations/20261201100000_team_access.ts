import type { Knex } from 'knex';

/**
 * Team access: invitations by e-mail (single-use links, only their hash stored), and a payload on
 * one-time tokens so a sign-up waiting for its e-mail to be confirmed needs no user row yet.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('tokens', (t) => {
    t.text('payload'); // JSON, e.g. the name and password hash of a sign-up awaiting its link
    t.index(['purpose', 'user_id']);
    t.index(['purpose', 'email']);
  });
  await knex.schema.createTable('invitations', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.string('email', 254).notNullable();
    t.string('role', 16).notNullable();
    t.string('token_hash', 128).notNullable().unique();
    t.integer('invited_by').references('users.id').onDelete('SET NULL');
    t.timestamp('expires_at').notNullable();
    t.timestamp('accepted_at');
    t.integer('accepted_by').references('users.id').onDelete('SET NULL');
    t.timestamp('revoked_at');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['sugarbush_id', 'email']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('invitations');
  await knex.schema.alterTable('tokens', (t) => {
    t.dropIndex(['purpose', 'user_id']);
    t.dropIndex(['purpose', 'email']);
    t.dropColumn('payload');
  });
}
