import type { Knex } from 'knex';

/**
 * The trail of one thing in a stand (a tree's statuses, read with its record for the advice of
 * each season) is found by its kind and id, not by walking the stand's whole trail.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('audit_events', (t) => {
    t.index(['sugarbush_id', 'entity', 'entity_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('audit_events', (t) => {
    t.dropIndex(['sugarbush_id', 'entity', 'entity_id']);
  });
}
