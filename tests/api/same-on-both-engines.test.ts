import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addMember,
  addSugarbush,
  addTree,
  addUser,
  csrfAgent,
  lastMailTo,
  linkToken,
  makeTestApp,
  signIn,
  standWithTeam,
} from './test-app';
import { engineName, onPostgres } from './test-database';

/**
 * What differs between SQLite and PostgreSQL underneath — value types, LIKE, float width, text
 * order, transaction isolation — must not show in the answers. This file runs on whichever engine
 * the suite runs on (PostgreSQL when TEST_DATABASE_URL is set).
 */
let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let forester: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  forester = await signIn(t.app, team.users.forester);
});
afterAll(() => t.close());

const post = (who: Awaited<ReturnType<typeof signIn>>, url: string, body: object) =>
  who.agent.post(url).set('x-csrf-token', who.csrf).send(body);

describe(`values on ${engineName}`, () => {
  it('when a measurement is read back, then its date is the YYYY-MM-DD text it was given and its timestamp an instant', async () => {
    const res = await post(forester, `/api/trees/${team.treeId}/measurements`, {
      measuredOn: '2026-10-03',
      dbhCm: 41.3,
      crownDiebackPct: 15,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const list = await forester.agent.get(`/api/trees/${team.treeId}/measurements`);
    const [m] = list.body.items;
    expect(m.measuredOn).toBe('2026-10-03');
    expect(m.dbhCm).toBe(41.3);
    expect(m.crownDiebackPct).toBe(15);
    expect(typeof m.createdAt).toBe('string');
    expect(m.createdAt.slice(0, 4)).toMatch(/^20\d\d$/);
    expect(typeof list.body.total).toBe('number');
    expect(m.confirmedOutlier).toBe(false);
    expect(m.superseded).toBe(false);
  });

  it('when a tree is placed to the centimetre, then its position comes back digit for digit', async () => {
    const res = await post(forester, `/api/sugarbushes/${team.standId}/trees`, {
      tag: 'P-1',
      species: 'sugar-maple',
      lat: 45.12345678,
      lng: -72.98765432,
      status: 'active',
    });
    expect(res.status).toBe(201);
    const read = await forester.agent.get(`/api/trees/${res.body.id}`);
    expect(read.body).toMatchObject({ lat: 45.12345678, lng: -72.98765432 });
  });

  it('when the register is searched by tag in another case, then it finds the tree as SQLite LIKE does', async () => {
    await addTree(t.db, team.standId, 'Ridge-North-7');
    const res = await forester.agent.get(`/api/sugarbushes/${team.standId}/trees?q=ridge-NORTH`);
    expect(res.body.items.map((i: { tag: string }) => i.tag)).toEqual(['Ridge-North-7']);
    expect(res.body.total).toBe(1);
  });

  it('when the team is searched by name or e-mail in another case, then the member is found', async () => {
    const owner = await signIn(t.app, team.users.owner);
    const byName = await owner.agent.get(`/api/sugarbushes/${team.standId}/members?q=FORESTER`);
    expect(byName.body.items.map((m: { email: string }) => m.email)).toEqual([team.users.forester]);
    const stands = await owner.agent.get('/api/sugarbushes?q=test ridge');
    expect(stands.body.items.map((s: { name: string }) => s.name)).toEqual(['Test Ridge']);
  });

  it('when tags differ in case and punctuation, then the register lists them in code-point order', async () => {
    const { standId } = await standWithTeamOf(t, 'order@test.example');
    const tags = ['b-2', 'B10', 'a10', 'a-2', 'A-3', 'a2'];
    for (const tag of tags) await addTree(t.db, standId, tag);
    const who = await signIn(t.app, 'order@test.example');
    const res = await who.agent.get(`/api/sugarbushes/${standId}/trees?pageSize=50`);
    const codePoint = [...tags].sort((x, y) => (x < y ? -1 : x > y ? 1 : 0));
    expect(res.body.items.map((i: { tag: string }) => i.tag)).toEqual(codePoint);
  });
});

describe(`sessions on ${engineName}`, () => {
  it('when a stored session has expired, then it no longer signs anyone in', async () => {
    const s = await signIn(t.app, team.users.consultant);
    expect((await s.agent.get('/api/auth/me')).status).toBe(200);
    await t
      .db('sessions')
      .whereLike('sess', `%"passport":{"user":${s.me.user.id}}%`)
      .update({ expired: new Date(Date.now() - 60_000).toISOString() });
    expect((await s.agent.get('/api/auth/me')).status).toBe(401);
  });
});

// PRAGMAs are SQLite's own: PostgreSQL enforces foreign keys and needs no journal setting.
describe.skipIf(onPostgres)('the SQLite connection', () => {
  it('when a connection is pooled, then it enforces foreign keys and writes ahead', async () => {
    expect(await t.db.raw('PRAGMA foreign_keys')).toEqual([{ foreign_keys: 1 }]);
    expect(await t.db.raw('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
  });
});

describe.skipIf(!onPostgres)('the PostgreSQL schema', () => {
  it('when migrated, then no column is single precision (real keeps only about seven digits)', async () => {
    const { rows } = await t.db.raw(
      `select table_name || '.' || column_name as col from information_schema.columns
        where table_schema = current_schema() and data_type = 'real'`,
    );
    expect(rows).toEqual([]);
  });

  it('when migrated, then tags collate by code point whatever the database locale', async () => {
    const { rows } = await t.db.raw(
      `select collation_name from information_schema.columns
        where table_schema = current_schema() and table_name = 'trees' and column_name = 'tag'`,
    );
    expect(rows).toEqual([{ collation_name: 'C' }]);
  });
});

describe(`writes at the same moment on ${engineName}`, () => {
  it('when the same new tag is posted twice at once, then one tree is made and the other answer is 409', async () => {
    const [a, b] = await Promise.all([
      post(forester, `/api/sugarbushes/${team.standId}/trees`, {
        tag: 'TWIN',
        species: 'sugar-maple',
      }),
      post(forester, `/api/sugarbushes/${team.standId}/trees`, {
        tag: 'TWIN',
        species: 'sugar-maple',
      }),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    expect(await t.db('trees').where({ sugarbush_id: team.standId, tag: 'TWIN' })).toHaveLength(1);
  });

  it('when two owners demote each other at once, then the stand keeps one owner', async () => {
    for (let round = 0; round < 8; round++) {
      const { standId, ownerIds, emails } = await twoOwners(t, round);
      const [a, b] = await Promise.all(
        [0, 1].map(async (i) => {
          const me = await signIn(t.app, emails[i]);
          return me.agent
            .patch(`/api/sugarbushes/${standId}/members/${ownerIds[1 - i]}`)
            .set('x-csrf-token', me.csrf)
            .send({ role: 'forester' });
        }),
      );
      // The later one is refused: 409 (last owner) or, once demoted, 403 (no longer an owner).
      const [won, lost] = [a.status, b.status].sort();
      expect(won).toBe(200);
      expect([403, 409]).toContain(lost);
      const owners = await t.db('memberships').where({ sugarbush_id: standId, role: 'owner' });
      expect(owners).toHaveLength(1);
    }
  });

  it('when an invitation link is accepted twice at once, then one account joins and the other answer is 409', async () => {
    const owner = await signIn(t.app, team.users.owner);
    const invited = await post(owner, `/api/sugarbushes/${team.standId}/invitations`, {
      email: 'twice@test.example',
      role: 'tapper',
    });
    expect(invited.status).toBe(201);
    await t.ctx.background.idle();
    const token = linkToken((await lastMailTo(t.db, 'twice@test.example')).body, '/invitations');
    const accept = async () => {
      const visitor = await csrfAgent(t.app);
      return visitor.agent
        .post(`/api/invitations/${token}/accept`)
        .set('x-csrf-token', visitor.csrf)
        .send({ name: 'Twice', password: 'a-long-enough-password' });
    };
    const [a, b] = await Promise.all([accept(), accept()]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect(await t.db('users').where({ email: 'twice@test.example' })).toHaveLength(1);
    const user = await t.db('users').where({ email: 'twice@test.example' }).first('id');
    expect(
      await t.db('memberships').where({ sugarbush_id: team.standId, user_id: user.id }),
    ).toHaveLength(1);
  });
});

async function standWithTeamOf(app: typeof t, email: string) {
  const standId = await addSugarbush(app.db, `Stand of ${email}`);
  await addMember(app.db, await addUser(app.db, email), standId, 'owner');
  return { standId };
}

async function twoOwners(app: typeof t, round: number) {
  const emails = [`first-${round}@test.example`, `second-${round}@test.example`];
  const ownerIds = [await addUser(app.db, emails[0]), await addUser(app.db, emails[1])];
  const standId = await addSugarbush(app.db, `Shared ${round}`);
  for (const id of ownerIds) await addMember(app.db, id, standId, 'owner');
  return { standId, ownerIds, emails };
}
