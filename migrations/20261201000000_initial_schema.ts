import type { Knex } from 'knex';

/**
 * The first schema: accounts, stands, memberships, the tree register and its yearly records.
 * Every length is in centimetres, every azimuth in degrees (0 = north, clockwise), every date ISO.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable().unique();
    t.string('name', 120).notNullable();
    t.string('password_hash', 255).notNullable();
    t.string('unit_system', 8).notNullable().defaultTo('imperial');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('sugarbushes', (t) => {
    t.increments('id').primary();
    t.string('name', 120).notNullable();
    t.text('boundary'); // GeoJSON Polygon or MultiPolygon, as text
    t.string('profile', 40).notNullable().defaultTo('conservative');
    t.text('custom_profile'); // JSON, when profile = 'custom'
    t.float('sunny_azimuth_deg').notNullable().defaultTo(180);
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable('memberships', (t) => {
    t.increments('id').primary();
    t.integer('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.string('role', 16).notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.unique(['user_id', 'sugarbush_id']);
    t.index(['sugarbush_id']);
  });

  await knex.schema.createTable('trees', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.string('tag', 40).notNullable();
    t.string('species', 40).notNullable();
    t.float('lat');
    t.float('lng');
    t.string('status', 16).notNullable().defaultTo('active');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.timestamp('updated_at').notNullable().defaultTo(knex.fn.now());
    t.unique(['sugarbush_id', 'tag']);
  });

  await knex.schema.createTable('measurements', (t) => {
    t.increments('id').primary();
    t.integer('tree_id').notNullable().references('trees.id').onDelete('CASCADE');
    t.date('measured_on').notNullable();
    t.integer('season').notNullable();
    t.float('dbh_cm').notNullable();
    t.float('crown_dieback_pct');
    t.text('note');
    // A correction is a new row naming the row it replaces; nothing is overwritten.
    t.integer('corrects_id').references('measurements.id').index();
    t.integer('recorded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['tree_id', 'season']);
  });

  await knex.schema.createTable('tapholes', (t) => {
    t.increments('id').primary();
    t.integer('tree_id').notNullable().references('trees.id').onDelete('CASCADE');
    t.integer('season').notNullable();
    t.float('height_cm').notNullable();
    t.float('azimuth_deg').notNullable();
    t.float('depth_cm').notNullable();
    t.float('bit_cm').notNullable();
    t.string('collection', 16).notNullable();
    t.date('drilled_on');
    t.boolean('stain_hit');
    t.integer('recorded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['tree_id', 'season']);
  });

  await knex.schema.createTable('notes', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.integer('tree_id').references('trees.id').onDelete('CASCADE');
    t.integer('author_id').references('users.id').onDelete('SET NULL');
    t.string('category', 24).notNullable();
    t.text('body').notNullable();
    t.date('follow_up_on');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['tree_id']);
    t.index(['sugarbush_id']);
  });

  await knex.schema.createTable('audit_events', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').references('sugarbushes.id').onDelete('CASCADE');
    t.integer('user_id').references('users.id').onDelete('SET NULL');
    t.string('action', 40).notNullable();
    t.string('entity', 24).notNullable();
    t.integer('entity_id');
    t.text('detail');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['sugarbush_id', 'created_at']);
  });

  // The session store's own shape (connect-session-knex): sid, sess (JSON text), expired.
  await knex.schema.createTable('sessions', (t) => {
    t.string('sid').primary();
    t.text('sess').notNullable();
    t.timestamp('expired').notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'sessions',
    'audit_events',
    'notes',
    'tapholes',
    'measurements',
    'trees',
    'memberships',
    'sugarbushes',
    'users',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
