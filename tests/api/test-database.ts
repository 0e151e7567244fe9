import { createHash } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import pg from 'pg';
import { afterAll } from 'vitest';
import { loadTestDatabaseUrl, type DatabaseTarget } from '../../server/config';
import { createPgDb, migrateLatest, migrationsDir } from '../../server/db';

/**
 * Where a test app keeps its data: a fresh temporary SQLite file, or — when `TEST_DATABASE_URL`
 * names a PostgreSQL server — a fresh database on it, copied from a migrated template and dropped
 * when the test file ends.
 */
const adminUrl = loadTestDatabaseUrl();
export const onPostgres = adminUrl !== undefined;
export const engineName = onPostgres ? 'PostgreSQL' : 'SQLite';

export interface TestDatabase {
  target: DatabaseTarget;
  /** A temporary folder of its own (basemaps and other files). */
  dir: string;
}

let admin: Promise<pg.Client> | undefined;
let template: Promise<string> | undefined;
const made: string[] = [];
const pools = new Set<Knex>();
let counter = 0;

/** A pool the file's end destroys (again, harmlessly, if the test closed it) before its databases are dropped. */
export function track(db: Knex): Knex {
  pools.add(db);
  return db;
}

export async function freshDatabase(): Promise<TestDatabase> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-test-'));
  if (!adminUrl)
    return { dir, target: { client: 'sqlite', filename: path.join(dir, 'test.sqlite') } };
  const client = await adminClient();
  const name = `clearwood_test_${process.pid}_${++counter}_${Math.random().toString(36).slice(2, 8)}`;
  await client.query(`create database ${name} template ${await (template ??= migratedTemplate())}`);
  made.push(name);
  return { dir, target: { client: 'pg', url: urlOf(name), poolMax: 4 } };
}

afterAll(async () => {
  for (const db of pools) await db.destroy();
  pools.clear();
  if (!admin) return;
  const client = await admin;
  while (made.length) await dropDatabase(client, made.pop()!);
  admin = undefined;
  await client.end();
});

/**
 * `with (force)` may not end an autovacuum worker busy in the database for a role that is not a
 * superuser (SQLSTATE 42501): such a worker finishes in moments, so try again a few times.
 */
async function dropDatabase(client: pg.Client, name: string) {
  for (let attempt = 1; ; attempt++) {
    try {
      await client.query(`drop database if exists ${name} with (force)`);
      return;
    } catch (err) {
      if ((err as { code?: string }).code !== '42501' || attempt >= 10) throw err;
      await new Promise((resolve) => setTimeout(resolve, 200 * attempt));
    }
  }
}

function adminClient(): Promise<pg.Client> {
  admin ??= (async () => {
    const client = new pg.Client({
      connectionString: adminUrl,
      application_name: 'clearwood-tests',
    });
    await client.connect();
    return client;
  })();
  return admin;
}

function urlOf(database: string): string {
  const u = new URL(adminUrl!);
  u.pathname = `/${database}`;
  return u.toString();
}

/**
 * One migrated database per set of migrations, kept as a template: every test database is a copy
 * of it, so a test app costs a file copy rather than a full migration. Its name carries a hash of
 * the migrations, so a changed migration makes a new one. Test workers build it one at a time.
 */
async function migratedTemplate(): Promise<string> {
  const hash = createHash('sha256');
  for (const f of fs.readdirSync(migrationsDir).sort())
    hash.update(f).update(fs.readFileSync(path.join(migrationsDir, f)));
  const name = `clearwood_template_${hash.digest('hex').slice(0, 12)}`;
  const client = await adminClient();
  const lock = 20_271_201;
  await client.query('select pg_advisory_lock($1)', [lock]);
  try {
    const found = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (found.rowCount === 0) {
      const building = `${name}_${process.pid}`;
      await client.query(`drop database if exists ${building}`);
      await client.query(`create database ${building}`);
      const db = createPgDb(urlOf(building), { poolMax: 1 });
      try {
        await migrateLatest(db);
      } finally {
        await db.destroy();
      }
      await client.query(`alter database ${building} rename to ${name}`);
      await dropOlderTemplates(client, name);
    }
  } finally {
    await client.query('select pg_advisory_unlock($1)', [lock]);
  }
  return name;
}

/** Templates of earlier migration sets; one still being copied from is left for next time. */
async function dropOlderTemplates(client: pg.Client, keep: string): Promise<void> {
  const { rows } = await client.query<{ datname: string }>(
    `select datname from pg_database where datname ~ '^clearwood_template_[0-9a-f]{12}$' and datname <> $1`,
    [keep],
  );
  for (const { datname } of rows)
    await client.query(`drop database if exists ${datname}`).catch(() => undefined);
}
