import path from 'node:path';
import request from 'supertest';
import type { Knex } from 'knex';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { quietLogger } from '../../server/lib/logger';
import { refreshTrees } from '../../server/modules/advice/refresh-trees';
import { migrateLatest, openDb } from '../../server/db';
import { hashPassword } from '../../server/modules/auth/password';
import type { Role } from '../../shared/schemas/enums';
import { freshDatabase, track, type TestDatabase } from './test-database';

export const PASSWORD = 'correct-horse-battery';

/** The environment that points an app at this test database. */
export function databaseEnv({ target, dir }: TestDatabase): Record<string, string> {
  return target.client === 'pg'
    ? {
        DATABASE_URL: target.url,
        BASEMAP_DIR: path.join(dir, 'basemaps'),
        PHOTO_DIR: path.join(dir, 'photos'),
      }
    : { DATABASE_FILE: target.filename };
}

/**
 * A real app on a fresh database — a temporary SQLite file, or a PostgreSQL database of its own
 * when `TEST_DATABASE_URL` is set — migrated. Pass another app's `database` to open a second app
 * (its own pool, as a second process would have) on the same data.
 */
export async function makeTestApp(env: Record<string, string> = {}, database?: TestDatabase) {
  const own = database ?? (await freshDatabase());
  const config = loadConfig({
    NODE_ENV: 'test',
    ...databaseEnv(own),
    LOGIN_RATE_LIMIT: '1000',
    SESSION_SECRET: 'a-test-secret-of-enough-length',
    ...env,
  });
  const db = track(openDb(config.database));
  await migrateLatest(db);
  const app = createApp({ config, db, clientDir: null, log: quietLogger });
  const close = async () => {
    await app.ctx.background.idle();
    await app.ctx.advice.close();
    app.ctx.photos.close();
    await db.destroy();
  };
  return { app, db, config, database: own, ctx: app.ctx, close };
}

/**
 * A stored timestamp in epoch ms. SQLite's column defaults read `YYYY-MM-DD HH:MM:SS` (UTC, no
 * zone); values written from code, and every timestamp PostgreSQL returns, are ISO strings.
 */
export const storedTime = (value: string): number =>
  new Date(/^\d{4}-\d\d-\d\d \d/.test(value) ? `${value.replace(' ', 'T')}Z` : value).getTime();

let hashed: string | undefined;

export async function addUser(db: Knex, email: string, name = email.split('@')[0]) {
  hashed ??= await hashPassword(PASSWORD);
  const [row] = await db('users').insert({ email, name, password_hash: hashed }).returning('id');
  return row.id as number;
}

export async function addSugarbush(db: Knex, name: string) {
  const [row] = await db('sugarbushes').insert({ name }).returning('id');
  return row.id as number;
}

export async function addMember(db: Knex, userId: number, sugarbushId: number, role: Role) {
  await db('memberships').insert({ user_id: userId, sugarbush_id: sugarbushId, role });
}

export async function addTree(
  db: Knex,
  sugarbushId: number,
  tag: string,
  extra: Record<string, unknown> = {},
) {
  const [row] = await db('trees')
    .insert({ sugarbush_id: sugarbushId, tag, species: 'sugar-maple', status: 'active', ...extra })
    .returning('id');
  return row.id as number;
}

/** One stand with a member of every role, one tree, and an outsider who owns a second stand. */
export async function standWithTeam(db: Knex) {
  const standId = await addSugarbush(db, 'Test Ridge');
  const otherStandId = await addSugarbush(db, 'Other Hollow');
  const users: Record<Role | 'outsider', string> = {
    owner: 'owner@test.example',
    forester: 'forester@test.example',
    tapper: 'tapper@test.example',
    consultant: 'consultant@test.example',
    outsider: 'outsider@test.example',
  };
  for (const role of ['owner', 'forester', 'tapper', 'consultant'] as const) {
    await addMember(db, await addUser(db, users[role]), standId, role);
  }
  await addMember(db, await addUser(db, users.outsider), otherStandId, 'owner');
  const treeId = await addTree(db, standId, 'T-001');
  const otherTreeId = await addTree(db, otherStandId, 'X-001');
  return { standId, otherStandId, treeId, otherTreeId, users };
}

/** A signed-in agent and a CSRF token valid for its (regenerated) session. */
export async function signIn(
  app: Parameters<typeof request.agent>[0],
  email: string,
  password = PASSWORD,
) {
  const agent = request.agent(app);
  const first = await agent.get('/api/auth/csrf');
  const res = await agent
    .post('/api/auth/login')
    .set('x-csrf-token', first.body.token)
    .send({ email, password });
  if (res.status !== 200)
    throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  const { body } = await agent.get('/api/auth/csrf');
  return { agent, csrf: body.token as string, me: res.body };
}

/** A visitor who is not signed in, holding a CSRF token for their cookie-only id. */
export async function csrfAgent(app: Parameters<typeof request.agent>[0]) {
  const agent = request.agent(app);
  const { body } = await agent.get('/api/auth/csrf');
  return { agent, csrf: body.token as string };
}

/** The newest mail the local outbox holds for this address (read from the database). */
export async function lastMailTo(db: Knex, to: string) {
  const row = await db('outbox').where({ to_address: to }).orderBy('id', 'desc').first();
  if (!row) throw new Error(`no mail to ${to} in the outbox`);
  return row as { subject: string; body: string };
}

/** The token of the app link `path?token=…` or `path/<token>` in a mail's text. */
export function linkToken(text: string, path: string): string {
  const escaped = path.replace(/[/.]/g, (c) => `\\${c}`);
  const match = new RegExp(`${escaped}(?:\\?token=|/)([\\w-]+)`).exec(text);
  if (!match) throw new Error(`no ${path} link in: ${text}`);
  return match[1];
}

/**
 * After a test writes records straight into the database (as a bulk import would), bring the
 * trees' versions, latest measurements and stored advice up to date, as the services do.
 */
export async function recordsWritten(db: Knex, sugarbushId: number, treeIds?: number[]) {
  const ids =
    treeIds ?? (await db('trees').where({ sugarbush_id: sugarbushId }).pluck('id')).map(Number);
  await db.transaction((trx) => refreshTrees(trx, sugarbushId, ids));
}
