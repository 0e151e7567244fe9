import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adviseTree, type StandTree } from '../../shared/rules/index';
import { makeTestApp, signIn, standWithTeam } from './test-app';
import { engineName } from './test-database';

/**
 * Two app processes behind one load balancer: each its own Express app and its own connection
 * pool, one database between them (PostgreSQL when TEST_DATABASE_URL is set). A request may land
 * on either; nothing one process keeps in memory may make the other answer differently.
 */
let first: Awaited<ReturnType<typeof makeTestApp>>;
let second: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;

beforeAll(async () => {
  first = await makeTestApp();
  second = await makeTestApp({}, first.database);
  team = await standWithTeam(first.db);
});
afterAll(async () => {
  await second.close();
  await first.close();
});

const SEASON = 2027;

/** A session signed in through the first app, as cookie header and CSRF token. */
async function sessionFromFirst(email: string) {
  const { agent, csrf } = await signIn(first.app, email);
  const me = await agent.get('/api/auth/me');
  return { agent, csrf, cookie: me.request.cookies as unknown as string };
}

describe(`two app processes on one ${engineName} database`, () => {
  it('when a session made by the first is used on the second, then the second knows who it is and accepts its writes', async () => {
    const s = await sessionFromFirst(team.users.owner);
    const me = await request(second.app).get('/api/auth/me').set('Cookie', s.cookie);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(team.users.owner);
  });

  it('when a tree is measured and tapped through the second, then the first serves the new advice and plan, equal to a fresh run of the advisor', async () => {
    const s = await sessionFromFirst(team.users.owner);
    const treeId = team.treeId;
    const viaFirst = (url: string) => s.agent.get(url);
    const viaSecond = (url: string, body: object) =>
      request(second.app).post(url).set('Cookie', s.cookie).set('x-csrf-token', s.csrf).send(body);

    const earlier = [
      { measuredOn: '2024-10-02', dbhCm: 44.2, crownDiebackPct: 5 },
      { measuredOn: '2025-10-04', dbhCm: 44.9, crownDiebackPct: 5 },
    ];
    for (const m of earlier) {
      const res = await s.agent
        .post(`/api/trees/${treeId}/measurements`)
        .set('x-csrf-token', s.csrf)
        .send(m);
      expect(res.status).toBe(201);
    }
    // The first process has answered for the old record (and may keep whatever it likes).
    const before = await viaFirst(`/api/trees/${treeId}/advice?season=${SEASON}`);
    const planBefore = await viaFirst(`/api/sugarbushes/${team.standId}/plan?season=${SEASON}`);
    expect(before.status).toBe(200);
    expect(planBefore.status).toBe(200);

    const measured = await viaSecond(`/api/trees/${treeId}/measurements`, {
      measuredOn: '2026-10-03',
      dbhCm: 45.6,
      crownDiebackPct: 10,
    });
    expect(measured.status).toBe(201);
    const hole = {
      season: 2026,
      heightCm: 90,
      azimuthDeg: 200,
      depthCm: 5,
      bitCm: 0.79,
      collection: 'vacuum',
    };
    const tapped = await viaSecond(`/api/trees/${treeId}/tapholes`, hole);
    expect(tapped.status).toBe(201);

    const record: StandTree = {
      species: 'sugar-maple',
      status: 'active',
      measurements: [...earlier, { measuredOn: '2026-10-03', dbhCm: 45.6, crownDiebackPct: 10 }],
      tapholes: [hole as StandTree['tapholes'][number]],
    };
    const options = { season: SEASON, profile: 'conservative', sunnyAzimuthDeg: 180 };
    const fresh = asJson(adviseTree(record, { ...options, withProjection: true }));
    const freshItem = asJson(adviseTree(record, options));

    const after = await viaFirst(`/api/trees/${treeId}/advice?season=${SEASON}`);
    expect(after.status).toBe(200);
    expect(after.body).toMatchObject(fresh);
    expect(after.body.placements).not.toEqual(before.body.placements);

    const plan = await viaFirst(`/api/sugarbushes/${team.standId}/plan?season=${SEASON}`);
    const item = plan.body.items.find((i: { treeId: number }) => i.treeId === treeId);
    expect(item).toMatchObject({ ...freshItem, treeId, tag: 'T-001' });
    expect(plan.body.totals.taps).toBe(
      planBefore.body.totals.taps - planItemTaps(planBefore.body, treeId) + freshItem.taps,
    );
  });

  it('when the guideline and sunny side change through the second, then the first plans every tree by them', async () => {
    const s = await sessionFromFirst(team.users.owner);
    const planUrl = `/api/sugarbushes/${team.standId}/plan?season=${SEASON}`;
    const before = await s.agent.get(planUrl);
    expect(before.body.profile.key).toBe('conservative');
    const itemOf = (body: { items: { treeId: number }[] }) =>
      body.items.find((i) => i.treeId === team.treeId);
    const patched = await request(second.app)
      .patch(`/api/sugarbushes/${team.standId}`)
      .set('Cookie', s.cookie)
      .set('x-csrf-token', s.csrf)
      .send({ profile: 'traditional', sunnyAzimuthDeg: 135 });
    expect(patched.status).toBe(200);

    const plan = await s.agent.get(planUrl);
    expect(plan.status).toBe(200);
    expect(plan.body.profile.key).toBe('traditional');
    const record = await recordOf(s.agent, team.treeId);
    const fresh = asJson(
      adviseTree(record, { season: SEASON, profile: 'traditional', sunnyAzimuthDeg: 135 }),
    );
    expect(itemOf(plan.body)).toMatchObject(fresh);
    expect(itemOf(plan.body)).not.toEqual(itemOf(before.body));
  });

  it('when the session is ended through the second, then the first no longer accepts it', async () => {
    const s = await sessionFromFirst(team.users.tapper);
    const out = await request(second.app)
      .post('/api/auth/logout')
      .set('Cookie', s.cookie)
      .set('x-csrf-token', s.csrf);
    expect(out.status).toBe(204);
    expect((await s.agent.get('/api/auth/me')).status).toBe(401);
  });
});

describe(`sign-in throttles across two processes on ${engineName}`, () => {
  it('when wrong passwords are tried through both processes, then they count against one limit', async () => {
    const a = await makeTestApp({ LOGIN_RATE_LIMIT: '3' });
    const b = await makeTestApp({ LOGIN_RATE_LIMIT: '3' }, a.database);
    try {
      const { users } = await standWithTeam(a.db);
      const statuses: number[] = [];
      for (const app of [a.app, b.app, a.app, b.app]) {
        const agent = request.agent(app);
        const { body } = await agent.get('/api/auth/csrf');
        const res = await agent
          .post('/api/auth/login')
          .set('x-csrf-token', body.token)
          .send({ email: users.owner, password: 'not-the-password' });
        statuses.push(res.status);
      }
      expect(statuses).toEqual([401, 401, 401, 429]);
    } finally {
      await b.close();
      await a.close();
    }
  });
});

/** A tree's standing record as the API lists it: readings no later row corrects, every hole. */
async function recordOf(agent: request.Agent, treeId: number): Promise<StandTree> {
  const [tree, ms, hs] = await Promise.all([
    agent.get(`/api/trees/${treeId}`),
    agent.get(`/api/trees/${treeId}/measurements?pageSize=100`),
    agent.get(`/api/trees/${treeId}/tapholes?pageSize=100`),
  ]);
  type M = {
    measuredOn: string;
    dbhCm: number;
    crownDiebackPct: number | null;
    superseded: boolean;
  };
  type H = StandTree['tapholes'][number];
  return {
    species: tree.body.species,
    status: tree.body.status,
    measurements: (ms.body.items as M[])
      .filter((m) => !m.superseded)
      .sort((a, b) => a.measuredOn.localeCompare(b.measuredOn))
      .map((m) => ({
        measuredOn: m.measuredOn,
        dbhCm: m.dbhCm,
        crownDiebackPct: m.crownDiebackPct,
      })),
    tapholes: (hs.body.items as H[]).map((h) => ({
      season: h.season,
      heightCm: h.heightCm,
      azimuthDeg: h.azimuthDeg,
      depthCm: h.depthCm,
      bitCm: h.bitCm,
      collection: h.collection,
    })),
  };
}

const asJson = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

const planItemTaps = (plan: { items: { treeId: number; taps: number }[] }, treeId: number) =>
  plan.items.find((i) => i.treeId === treeId)?.taps ?? 0;
