import type { Knex } from 'knex';

/**
 * A DBH far off the tree's reading before it (more than about 2.5 cm a year, or a shrink beyond
 * tape error) is left out of the advice until a forester confirms it; the confirmation is kept
 * with the measurement.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurements', (t) => {
    t.boolean('confirmed_outlier').notNullable().defaultTo(false);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('measurements', (t) => {
    t.dropColumn('confirmed_outlier');
  });
}
