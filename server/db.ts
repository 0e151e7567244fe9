import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import knexFactory, { type Knex } from 'knex';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const migrationsDir = path.join(root, 'migrations');

/** One Knex instance per database file; the pragmas run on every pooled connection. */
export function createDb(filename: string): Knex {
  if (filename !== ':memory:')
    fs.mkdirSync(path.dirname(path.resolve(filename)), { recursive: true });
  return knexFactory({
    client: 'better-sqlite3',
    connection: { filename },
    useNullAsDefault: true,
    pool: {
      min: 1,
      max: 1,
      afterCreate(
        conn: { pragma: (s: string) => unknown },
        done: (err: Error | null, c: unknown) => void,
      ) {
        try {
          conn.pragma('journal_mode = WAL');
          conn.pragma('foreign_keys = ON');
          conn.pragma('busy_timeout = 5000');
          conn.pragma('synchronous = NORMAL');
          done(null, conn);
        } catch (err) {
          done(err as Error, conn);
        }
      },
    },
  });
}

/**
 * Migrations are TypeScript files loaded through our own `import()`, so the same code path runs
 * under tsx (start, scripts) and under Vitest (tests) — the knex CLI is not used.
 */
const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () =>
    fs
      .readdirSync(migrationsDir)
      .filter((f) => /^\d{14}_[\w-]+\.ts$/.test(f))
      .sort(),
  getMigrationName: (name) => name,
  getMigration: (name) => import(pathToFileURL(path.join(migrationsDir, name)).href),
};

export async function migrateLatest(db: Knex): Promise<void> {
  await db.migrate.latest({ migrationSource });
}
