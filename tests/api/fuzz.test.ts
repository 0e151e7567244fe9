import fc from 'fast-check';
import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serve, signedInClient, type Answer, type Client, type Send } from './http-client';
import {
  jsonBody,
  multipartBody,
  queryString,
  rawJsonBody,
  senseCases,
  senseQueries,
} from './fuzz-inputs';
import { apiRouteTable, type RouteInfo } from './route-table';
import { makeTestApp } from './test-app';
import { twoStands, type StandRows, type TwoStands } from './two-stands';

/**
 * Random and malformed requests to every route that reads a body or a query (from the router
 * walk, route-table.ts), sent by the owner of stand A, who may call every one of them: never a
 * 5xx, every 4xx in the one error shape, and no row changed by a refused request.
 */

/** Counted on every request; a refused request must leave them as they were. */
const notCompared: Record<string, string> = {
  knex_migrations: 'the schema’s own record',
  knex_migrations_lock: 'the schema’s own record',
  sessions: 'a session is touched by any request, refused or not',
  rate_limits: 'sign-in and sign-up attempts are counted whether or not they succeed',
  tree_advice: 'kept advice, rewritten by the workers in the background after an accepted change',
  advice_state: 'the stand’s advice stamps, moved by the same background work',
};

const t = await makeTestApp({ LOGIN_RATE_LIMIT: '10000000' });
const routes = apiRouteTable(t.app);
/** Signing out would end the fuzzer's own session; it takes no body and is proven elsewhere. */
const bodyRoutes = routes.filter((r) => r.body !== undefined && r.key !== 'POST /api/auth/logout');
const jsonRoutes = bodyRoutes.filter((r) => r.body === 'json');
const multipartRoutes = bodyRoutes.filter((r) => r.body === 'multipart');
const queryRoutes = routes.filter((r) => r.method === 'get' && r.query);

let served: Awaited<ReturnType<typeof serve>>;
let world: TwoStands;
let owner: Client;
let extraMemberId: number;
let tables: string[];

const tally = { requests: 0, byStatus: new Map<number, number>(), serverErrors: 0, rowsChanged: 0 };
const problems: string[] = [];
const timing = new Map<string, [number, number]>();

async function tableNames(db: Knex): Promise<string[]> {
  const names: string[] =
    db.client.config.client === 'pg'
      ? (
          await db.raw(
            'select table_name as name from information_schema.tables where table_schema = current_schema()',
          )
        ).rows.map((r: { name: string }) => r.name)
      : (
          await db.raw(
            "select name from sqlite_master where type = 'table' and name not like 'sqlite_%'",
          )
        ).map((r: { name: string }) => r.name);
  return names.filter((n) => !(n in notCompared)).sort();
}

/** Row counts of every table and the rows of stand A a request may name, as one string. */
async function snapshot(stand: StandRows): Promise<string> {
  const counts = await t.db.raw(
    `select ${tables.map((n, i) => `(select count(*) from "${n}") as c${i}`).join(', ')}`,
  );
  const first = (t.db.client.config.client === 'pg' ? counts.rows : counts)[0];
  const rows = await Promise.all([
    t.db('sugarbushes').where({ id: stand.id }),
    t.db('trees').where({ sugarbush_id: stand.id }).orderBy('id'),
    t.db('notes').where({ sugarbush_id: stand.id }).orderBy('id'),
    t.db('photos').where({ sugarbush_id: stand.id }).orderBy('id'),
    t.db('basemaps').where({ sugarbush_id: stand.id }).orderBy('id'),
    t.db('memberships').where({ sugarbush_id: stand.id }).orderBy('user_id'),
    t.db('invitations').where({ sugarbush_id: stand.id }).orderBy('id'),
    t.db('users').orderBy('id'),
  ]);
  return JSON.stringify([first, rows]);
}

function pathFor(route: RouteInfo): string {
  const s = world.A;
  const values: Record<string, number | string> = {
    id: s.id,
    treeId: s.treeId,
    noteId: s.noteId,
    photoId: s.photoId,
    basemapId: s.basemapId,
    z: 0,
    x: 0,
    y: 0,
    season: s.season,
    token: 'a-token-that-was-never-sent-to-anyone',
    importId: '3f0c6a52-8d1e-4b7a-9c2f-5e4d3b2a1f00',
    userId: extraMemberId,
    invitationId: s.invitationId,
    ...s.extra,
  };
  return route.path.replace(/:(\w+)/g, (_m, name: string) => {
    if (values[name] === undefined) throw new Error(`No value for :${name} in fuzz.test.ts`);
    return String(values[name]);
  });
}

const errorShaped = (json: unknown) => {
  const e = (json as { error?: Record<string, unknown> } | undefined)?.error;
  if (!e || typeof e.code !== 'string' || typeof e.message !== 'string') return false;
  if (Object.keys(e).some((k) => !['code', 'message', 'fields'].includes(k))) return false;
  return (
    e.fields === undefined ||
    (typeof e.fields === 'object' &&
      e.fields !== null &&
      Object.values(e.fields).every((v) => typeof v === 'string'))
  );
};

/**
 * The rows as they stood after the last accepted request. A refused request is compared with it
 * (one snapshot per write); an accepted one, once its background work (mail) is done, replaces it.
 */
let standing = '';
/** The answer to the latest request `probe` sent. */
let lastAnswer: Answer | undefined;

/** Send one request and check it; returns false (and notes why) on a broken promise. */
async function probe(route: RouteInfo, send: Send, query = ''): Promise<boolean> {
  const path = pathFor(route) + (query ? `?${query}` : '');
  const writes = route.method !== 'get';
  let res: Answer;
  const t0 = performance.now();
  try {
    res = await owner.request(route.method.toUpperCase(), path, send);
  } catch (err) {
    problems.push(`${route.key} ${query}: the connection failed: ${String(err)}`);
    return false;
  }
  tally.requests += 1;
  lastAnswer = res;
  const k = `${route.key} ${res.status}`;
  const e = timing.get(k) ?? [0, 0];
  timing.set(k, [e[0] + 1, e[1] + performance.now() - t0]);
  tally.byStatus.set(res.status, (tally.byStatus.get(res.status) ?? 0) + 1);
  const what = () =>
    `${route.method.toUpperCase()} ${path} ${String(send.raw ?? JSON.stringify(send.json)).slice(0, 300)} → ${res.status} ${res.text.slice(0, 300)}`;
  if (res.status >= 500) {
    tally.serverErrors += 1;
    problems.push(what());
    return false;
  }
  if (res.status >= 400 && !errorShaped(res.json)) {
    problems.push(`not the error shape: ${what()}`);
    return false;
  }
  if (!writes) return true;
  if (res.status < 400) await t.ctx.background.idle();
  const now = await snapshot(world.A);
  const changed = now !== standing;
  standing = now;
  if (res.status >= 400 && changed) {
    tally.rowsChanged += 1;
    problems.push(`rows changed by a refused request: ${what()}`);
    return false;
  }
  return true;
}

beforeAll(async () => {
  served = await serve(t.app);
  world = await twoStands(t.db, served, new Set(routes.map((r) => r.key)));
  owner = await signedInClient(served, 'owner-a@test.example');
  extraMemberId = await world.freshMember(world.A.id);
  tables = await tableNames(t.db);
  await t.ctx.background.idle();
  standing = await snapshot(world.A);
}, 60_000);

let started = 0;
afterAll(async () => {
  const seconds = (performance.now() - started) / 1000;
  const statuses = [...tally.byStatus].sort(([a], [b]) => a - b).map(([s, n]) => `${s}×${n}`);
  console.log(
    `fuzz: ${tally.requests} requests in ${seconds.toFixed(1)} s ` +
      `(${(tally.requests / seconds).toFixed(0)}/s) over ${jsonRoutes.length} JSON, ` +
      `${multipartRoutes.length} multipart and ${queryRoutes.length} query routes; ` +
      `5xx: ${tally.serverErrors}; rows changed by refused requests: ${tally.rowsChanged}; ` +
      `statuses ${statuses.join(' ')}; ${tables.length} tables compared`,
  );
  if (process.env.FUZZ_TIMING)
    console.log(
      [...timing]
        .sort((a, b) => b[1][1] - a[1][1])
        .slice(0, 25)
        .map(([k, [n, ms]]) => `${k}: ${n} × ${(ms / n).toFixed(1)} ms`)
        .join('\n'),
    );
  await served.close();
  await t.close();
});

const route = (list: RouteInfo[]) => fc.constantFrom(...list);
const runs = (n: number) => ({ numRuns: n, endOnFailure: true });

describe('random and malformed requests', () => {
  it('when JSON bodies are random objects of real, unknown and dangerous fields, then no 5xx, the error shape, and nothing changes on refusal', async () => {
    started = performance.now();
    await fc.assert(
      fc.asyncProperty(route(jsonRoutes), jsonBody, (r, send) => probe(r, send)),
      runs(3_500),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);

  it('when bodies are malformed text (non-finite numbers, cut short, deeply nested, too large), then no 5xx and the error shape', async () => {
    await fc.assert(
      fc.asyncProperty(route(jsonRoutes), rawJsonBody, (r, send) => probe(r, send)),
      runs(2_500),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);

  it('when uploads are random files, truncated forms or broken boundaries, then no 5xx and the error shape', async () => {
    await fc.assert(
      fc.asyncProperty(route(multipartRoutes), multipartBody, (r, send) => probe(r, send)),
      runs(1_000),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);

  it('when list and filter queries hold unknown sorts, strange numbers and impossible dates, then no 5xx and the error shape', async () => {
    await fc.assert(
      // Reads change nothing, so four go at once.
      fc.asyncProperty(
        fc.array(fc.tuple(route(queryRoutes), queryString), { minLength: 4, maxLength: 4 }),
        async (batch) => (await Promise.all(batch.map(([r, q]) => probe(r, {}, q)))).every(Boolean),
      ),
      runs(700),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);
});

describe('dates and sizes within sense', () => {
  const byKey = new Map(routes.map((r) => [r.key, r]));
  const named = (key: string) => {
    const r = byKey.get(key);
    if (!r) throw new Error(`No route ${key}`);
    return r;
  };
  const fieldsOf = (a: Answer) =>
    Object.keys((a.json as { error?: { fields?: object } })?.error?.fields ?? {});

  it('when an entry is right, then it is taken (so a refusal below is the one field’s)', async () => {
    for (const c of senseCases) {
      const res = await owner.request('POST', pathFor(named(c.route)), { json: c.base });
      expect(res.status, `${c.route}: ${res.text}`).toBe(201);
    }
    await t.ctx.background.idle();
    standing = await snapshot(world.A);
  });

  const entries = senseCases.flatMap((c) =>
    Object.entries(c.nonsense).flatMap(([field, values]) =>
      values.map((value) => ({ route: c.route, field, body: { ...c.base, [field]: value } })),
    ),
  );
  it(`when one field of an entry is out of sense (${entries.length} kinds), then 400 names it and nothing is written`, async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...entries), async ({ route: key, field, body }) => {
        const sent = await probe(named(key), { json: body });
        const res = lastAnswer!;
        return sent && res.status === 400 && fieldsOf(res).includes(field);
      }),
      runs(600),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);

  it(`when a query names a season out of range or an order a list does not have (${senseQueries.length} kinds), then 400 names it`, async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...senseQueries), async ({ route: key, query, field }) => {
        const sent = await probe(named(key), {}, query);
        const res = lastAnswer!;
        return sent && res.status === 400 && fieldsOf(res).includes(field);
      }),
      runs(400),
    );
    expect(problems.splice(0)).toEqual([]);
  }, 120_000);
});

it('when the whole run is done, then it sent at least 10,000 requests', () => {
  expect(tally.requests).toBeGreaterThanOrEqual(10_000);
});
