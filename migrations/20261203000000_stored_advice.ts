import type { Knex } from 'knex';

/**
 * Advice kept current (docs/decisions/009): per-tree and per-stand versions, the latest standing
 * measurement on the tree row (the register reads it without touching history), a row of advice
 * per tree and season, and each stand's state for a season (current, or updating n of N).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('trees', (t) => {
    t.integer('record_version').notNullable().defaultTo(0);
    t.float('latest_dbh_cm');
    t.date('latest_measured_on');
    t.float('latest_crown_dieback_pct');
  });
  await knex.schema.alterTable('sugarbushes', (t) => {
    t.integer('advice_version').notNullable().defaultTo(0);
    t.integer('record_seq').notNullable().defaultTo(0);
  });
  await knex.schema.createTable('tree_advice', (t) => {
    t.integer('tree_id').notNullable().references('trees.id').onDelete('CASCADE');
    t.integer('season').notNullable();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.integer('tree_version').notNullable();
    t.integer('stand_version').notNullable();
    t.string('verdict', 16).notNullable();
    t.integer('taps').notNullable();
    t.float('dbh_cm');
    t.float('conductive_share').notNullable();
    t.integer('warning_mask').notNullable();
    t.text('payload').notNullable(); // the advice as JSON, without projection
    t.primary(['tree_id', 'season']);
    t.index(['sugarbush_id', 'season', 'verdict']);
    t.index(['sugarbush_id', 'season', 'taps']);
    t.index(['sugarbush_id', 'season', 'dbh_cm']);
    t.index(['sugarbush_id', 'season', 'conductive_share']);
  });
  await knex.schema.createTable('advice_state', (t) => {
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.integer('season').notNullable();
    t.integer('stand_version').notNullable();
    t.string('state', 12).notNullable(); // 'current' or 'updating'
    t.integer('done').notNullable().defaultTo(0);
    t.integer('total').notNullable().defaultTo(0);
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
    t.primary(['sugarbush_id', 'season']);
  });
  await refreshLatestMeasurements(knex);
}

/** Each tree's newest measurement that no later row corrects, copied onto the tree row. */
async function refreshLatestMeasurements(knex: Knex): Promise<void> {
  const latest = (column: string) =>
    knex('measurements as m')
      .select(`m.${column}`)
      .whereRaw('m.tree_id = trees.id')
      .whereNotExists(
        knex('measurements as c').select(knex.raw('1')).whereRaw('c.corrects_id = m.id'),
      )
      .orderBy([
        { column: 'm.measured_on', order: 'desc' },
        { column: 'm.id', order: 'desc' },
      ])
      .limit(1);
  await knex('trees').update({
    latest_dbh_cm: latest('dbh_cm'),
    latest_measured_on: latest('measured_on'),
    latest_crown_dieback_pct: latest('crown_dieback_pct'),
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('advice_state');
  await knex.schema.dropTableIfExists('tree_advice');
  await knex.schema.alterTable('sugarbushes', (t) => {
    t.dropColumn('advice_version');
    t.dropColumn('record_seq');
  });
  await knex.schema.alterTable('trees', (t) => {
    t.dropColumn('record_version');
    t.dropColumn('latest_dbh_cm');
    t.dropColumn('latest_measured_on');
    t.dropColumn('latest_crown_dieback_pct');
  });
}
