import type { Knex } from 'knex';

/**
 * Notes can be resolved (and reopened), their categories get their own names, and photos hang on
 * a tree or on a note. A photo row names the stored file and its thumbnail by key: the bytes live
 * in the photo store (a folder on disk, or an S3 bucket), never in the database.
 *
 * Categories: `finding` becomes `health`; `advice` becomes `tapping` on a tree and `management`
 * on the whole stand (advice on a stand is about its guideline and its laterals, not one trunk);
 * `hazard` and `follow-up` keep their names.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('notes', (t) => {
    t.timestamp('resolved_at');
    t.integer('resolved_by').references('users.id').onDelete('SET NULL');
  });
  await renameNoteCategories(knex);

  await knex.schema.createTable('photos', (t) => {
    t.increments('id').primary();
    t.integer('sugarbush_id').notNullable().references('sugarbushes.id').onDelete('CASCADE');
    t.integer('tree_id').references('trees.id').onDelete('CASCADE');
    t.integer('note_id').references('notes.id').onDelete('CASCADE');
    t.integer('uploaded_by').references('users.id').onDelete('SET NULL');
    t.string('storage_key', 200).notNullable();
    t.string('thumb_key', 200).notNullable();
    t.string('content_type', 40).notNullable();
    t.integer('byte_size').notNullable();
    t.integer('width').notNullable();
    t.integer('height').notNullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
    t.index(['tree_id']);
    t.index(['note_id']);
  });
}

/** The categories' new names, for notes written before them. */
export async function renameNoteCategories(knex: Knex): Promise<void> {
  await knex('notes').where({ category: 'finding' }).update({ category: 'health' });
  await knex('notes')
    .where({ category: 'advice' })
    .whereNotNull('tree_id')
    .update({ category: 'tapping' });
  await knex('notes').where({ category: 'advice' }).update({ category: 'management' });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('photos');
  await knex('notes').where({ category: 'health' }).update({ category: 'finding' });
  await knex('notes').whereIn('category', ['tapping', 'management']).update({ category: 'advice' });
  await knex.schema.alterTable('notes', (t) => {
    t.dropForeign(['resolved_by']);
    t.dropColumn('resolved_by');
    t.dropColumn('resolved_at');
  });
}
