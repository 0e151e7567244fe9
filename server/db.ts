import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import knexFactory, { type Knex } from 'knex';
import pg from 'pg';
import type { DatabaseTarget } from './config';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const migrationsDir = path.join(root, 'migrations');

/** The database the config names: the SQLite file by default, PostgreSQL with `DATABASE_URL`. */
export function openDb(target: DatabaseTarget): Knex {
  return target.client === 'pg'
    ? createPgDb(target.url, { poolMax: target.poolMax })
    : createDb(target.filename);
}

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

const builtIn = pg.types;
const OID = { int8: 20, numeric: 1700, date: 1082, timestamp: 1114, timestamptz: 1184 } as const;

/**
 * Values come back from PostgreSQL as they do from SQLite: a `date` as its `YYYY-MM-DD` text (the
 * driver's default is a `Date` at local midnight, which shifts the day west of UTC), a timestamp
 * as an ISO string in UTC, and counts and sums as numbers (every one we keep is far below 2^53).
 */
const types = {
  getTypeParser(oid: number, format?: string) {
    switch (oid) {
      case OID.date:
        return (v: string) => v;
      case OID.timestamptz:
        return (v: string) => instant(v, builtIn.getTypeParser(OID.timestamptz));
      case OID.timestamp:
        return (v: string) => instant(`${v}+00`, builtIn.getTypeParser(OID.timestamptz));
      case OID.int8:
      case OID.numeric:
        return (v: string) => Number(v);
      default:
        return builtIn.getTypeParser(oid, format === 'binary' ? 'binary' : 'text');
    }
  },
};

/** An ISO instant; `infinity` and anything else that is not a finite date stays as text. */
function instant(v: string, parse: (v: string) => unknown): string {
  const d = parse(v);
  return d instanceof Date && Number.isFinite(d.getTime()) ? d.toISOString() : v;
}

/**
 * PostgreSQL through the `pg` driver, for several app processes on one database. Every
 * connection works in UTC, as SQLite does, so dates made in SQL agree with dates made in code.
 */
export function createPgDb(url: string, opts: { poolMax?: number } = {}): Knex {
  return knexFactory({
    client: 'pg',
    connection: { connectionString: url, types, application_name: 'clearwood' },
    pool: {
      min: 0,
      max: opts.poolMax ?? 10,
      afterCreate(conn: pg.Client, done: (err: Error | null, c: unknown) => void) {
        conn.query("SET TIME ZONE 'UTC'").then(
          () => done(null, conn),
          (err: Error) => done(err, conn),
        );
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

/** The database for a log line: the file, or the server and database name without a password. */
export function describeDb(target: DatabaseTarget): string {
  if (target.client === 'sqlite') return target.filename;
  const u = new URL(target.url);
  return `PostgreSQL ${u.hostname}${u.port ? `:${u.port}` : ''}${u.pathname}`;
}
