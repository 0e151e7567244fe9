import type { Knex } from 'knex';

/**
 * Issued plans: the owner freezes a season's plan and the crew works from that copy. A header per
 * issue (who, when, the guideline and the stand's guideline version, the totals as JSON) and one
 * row per tree with what the crew was told. Tree rows hold the tree's id without a foreign key:
 * the copy outlives any later change to the register.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('issued_plans', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.integer('season').notNullable();
    t.integer('version').notNullable();
    t.integer('issued_by').references('users.id').onDelete('SET NULL');
    t.string('issued_by_name', 200).notNullable();
    t.timestamp('issued_at').notNullable();
    t.string('profile_key', 60).notNullable();
    t.string('profile_label', 200).notNullable();
    t.text('profile_source').notNullable();
    /** The stand's `advice_version` the copy was taken at (a change of guideline bumps it). */
    t.integer('advice_version').notNullable();
    t.text('totals').notNullable();
    t.unique(['sugarbush_id', 'season', 'version']);
  });
  await knex.schema.createTable('issued_plan_trees', (t) => {
    t.integer('issued_plan_id').notNullable().references('issued_plans.id').onDelete('CASCADE');
    t.integer('tree_id').notNullable();
    t.string('tag', 60).notNullable();
    t.string('verdict', 20).notNullable();
    t.integer('taps').notNullable();
    t.double('bit_cm');
    t.double('depth_cm');
    t.double('conductive_share').notNullable();
    t.integer('warning_mask').notNullable();
    /** JSON `[{ azimuthDeg, heightCm }]`. */
    t.text('placements').notNullable();
    /** JSON: the text of the tree's open hazard notes when the plan was issued. */
    t.text('hazards').notNullable();
    t.primary(['issued_plan_id', 'tree_id']);
    t.index(['issued_plan_id', 'tag']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('issued_plan_trees');
  await knex.schema.dropTableIfExists('issued_plans');
}
