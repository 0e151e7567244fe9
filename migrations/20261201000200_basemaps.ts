import type { Knex } from 'knex';

/**
 * Offline raster basemaps uploaded as MBTiles. The file itself lives beside the database
 * (`BASEMAP_DIR/<id>.mbtiles`); this row holds what was read from it at upload.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('basemaps', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.string('name', 120).notNullable();
    t.string('file_name', 255).notNullable(); // as uploaded, for the record
    t.string('format', 8).notNullable(); // png, jpg or webp
    t.integer('min_zoom').notNullable();
    t.integer('max_zoom').notNullable();
    t.text('bounds').notNullable(); // JSON [west, south, east, north]
    t.text('center'); // JSON [lng, lat, zoom], when the file names one
    t.bigInteger('size_bytes').notNullable();
    t.integer('uploaded_by').references('users.id').onDelete('SET NULL');
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['sugarbush_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('basemaps');
}
