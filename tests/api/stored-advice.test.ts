import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadStandTrees } from '../../server/modules/plans/plans.repository';
import { standGuideline } from '../../server/modules/advice/stand-guideline';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { adviseTree } from '../../shared/rules/index';
import { makeTestApp, signIn } from './test-app';

const SEASON = 2027;
const PASSWORD = 'maple-demo-2027';
let t: Awaited<ReturnType<typeof makeTestApp>>;
let standId: number;
const as = {} as Record<'owner' | 'forester' | 'tapper', Awaited<ReturnType<typeof signIn>>>;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  standId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  for (const role of ['owner', 'forester', 'tapper'] as const)
    as[role] = await signIn(t.app, `${role}@fernside.example`, PASSWORD);
});
afterAll(() => t.close());

/** What the advisor says now, from the tree's record as the database holds it. */
async function freshAdvice(treeIds?: number[]) {
  const { profile, sunnyAzimuthDeg } = await standGuideline(t.db, standId);
  const trees = await loadStandTrees(t.db, standId, treeIds);
  return new Map(
    trees.map((tree) => [
      tree.id,
      JSON.parse(
        JSON.stringify({
          ...adviseTree(tree, { season: SEASON, profile, sunnyAzimuthDeg }),
          treeId: tree.id,
          tag: tree.tag,
        }),
      ),
    ]),
  );
}

async function planItems(query = '') {
  const items: { treeId: number }[] = [];
  for (let page = 1; ; page++) {
    const res = await as.tapper.agent.get(
      `/api/sugarbushes/${standId}/plan?season=${SEASON}&pageSize=500&page=${page}${query}`,
    );
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    // The advice itself; a tree's hazard notes travel beside it (tests/api/plan-hazards.test.ts).
    items.push(
      ...res.body.items.map(({ hazards: _hazards, ...advice }: { hazards: unknown }) => advice),
    );
    if (items.length >= res.body.total) return { items, totals: res.body.totals };
  }
}

const treeByTag = async (tag: string) =>
  (await t.db('trees').where({ sugarbush_id: standId, tag }).first('id')).id as number;

async function expectServedAsFresh(treeId: number) {
  const tag = (await t.db('trees').where({ id: treeId }).first('tag')).tag as string;
  const { items } = await planItems(`&q=${encodeURIComponent(tag)}`);
  const served = items.find((i) => i.treeId === treeId);
  expect(served).toEqual((await freshAdvice([treeId])).get(treeId));
}

const post = (who: keyof typeof as, path: string, body: object) =>
  as[who].agent.post(path).set('x-csrf-token', as[who].csrf).send(body);
const patch = (who: keyof typeof as, path: string, body: object) =>
  as[who].agent.patch(path).set('x-csrf-token', as[who].csrf).send(body);

describe('advice kept current', () => {
  it('when the stand is first read, then every tree is served what a fresh adviseTree gives', async () => {
    const { items, totals } = await planItems();
    const fresh = await freshAdvice();
    expect(items).toHaveLength(fresh.size);
    expect(totals.trees).toBe(fresh.size);
    for (const item of items) expect(item).toEqual(fresh.get(item.treeId));
  });

  it('after each kind of change, the changed tree is served fresh advice at once, and at the end so is every tree', async () => {
    const a = await treeByTag('OL-0010');
    const b = await treeByTag('OL-0020');
    const c = await treeByTag('OL-0030');

    let res = await post('forester', `/api/trees/${a}/measurements`, {
      measuredOn: '2026-10-20',
      dbhCm:
        Number((await t.db('trees').where({ id: a }).first('latest_dbh_cm')).latest_dbh_cm) + 0.6,
      crownDiebackPct: 20,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    await expectServedAsFresh(a);

    res = await post('tapper', `/api/trees/${b}/tapholes`, {
      season: 2027,
      heightCm: 95,
      azimuthDeg: 200,
      depthCm: 5.08,
      bitCm: 0.79,
      collection: 'vacuum',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    await expectServedAsFresh(b);

    res = await patch('forester', `/api/trees/${c}`, { status: 'dead' });
    expect(res.status).toBe(200);
    await expectServedAsFresh(c);

    res = await post('forester', `/api/sugarbushes/${standId}/trees`, {
      tag: 'OL-NEW-1',
      species: 'sugar-maple',
    });
    expect(res.status).toBe(201);
    const d = res.body.id as number;
    await expectServedAsFresh(d);

    res = await patch('owner', `/api/sugarbushes/${standId}`, { profile: 'traditional' });
    expect(res.status).toBe(200);
    await expectServedAsFresh(a);

    res = await post('forester', `/api/trees/${d}/measurements`, {
      measuredOn: '2026-10-21',
      dbhCm: 44.5,
    });
    expect(res.status).toBe(201);
    await expectServedAsFresh(d);

    res = await patch('owner', `/api/sugarbushes/${standId}`, { sunnyAzimuthDeg: 150 });
    expect(res.status).toBe(200);

    const { items, totals } = await planItems();
    const fresh = await freshAdvice();
    expect(items).toHaveLength(fresh.size);
    for (const item of items) expect(item).toEqual(fresh.get(item.treeId));
    expect(totals.taps).toBe([...fresh.values()].reduce((sum, f) => sum + f.taps, 0));
  });

  it('when a stored row was made from an older record, then it is never served', async () => {
    const tree = await treeByTag('OL-0040');
    const row = await t.db('tree_advice').where({ tree_id: tree, season: SEASON }).first();
    await t
      .db('tree_advice')
      .where({ tree_id: tree, season: SEASON })
      .update({
        taps: 42,
        tree_version: row.tree_version - 1,
        payload: JSON.stringify({ ...JSON.parse(row.payload), taps: 42 }),
      });
    await t.db('sugarbushes').where({ id: standId }).increment('record_seq', 1);
    const { items } = await planItems();
    expect(items.some((i) => (i as unknown as { taps: number }).taps === 42)).toBe(false);
    expect(items.find((i) => i.treeId === tree)).toEqual((await freshAdvice([tree])).get(tree));
  });
});

describe('the stand re-advised in worker threads', () => {
  it('when the guideline changes, then the status says updating or current, and other requests answer while the stand is re-advised', async () => {
    const changed = await patch('owner', `/api/sugarbushes/${standId}`, {
      profile: 'ontario-buckets',
    });
    expect(changed.status).toBe(200);
    const stored = await t
      .db('advice_state')
      .where({ sugarbush_id: standId, season: SEASON })
      .first();
    const version = (await t.db('sugarbushes').where({ id: standId }).first('advice_version'))
      .advice_version;
    expect(Number(stored.stand_version)).toBeLessThan(Number(version));

    const order: string[] = [];
    const plan = as.tapper.agent
      .get(`/api/sugarbushes/${standId}/plan?season=${SEASON}&pageSize=1`)
      .then((r) => {
        order.push('plan');
        return r;
      });
    const status = await as.tapper.agent.get(
      `/api/sugarbushes/${standId}/advice-status?season=${SEASON}`,
    );
    expect(status.status).toBe(200);
    expect(['updating', 'current']).toContain(status.body.state);
    const trivial = await request(t.app).get('/api/auth/csrf');
    order.push('trivial');
    expect(trivial.status).toBe(200);
    const res = await plan;
    expect(res.status).toBe(200);
    expect(res.body.profile.key).toBe('ontario-buckets');
    expect(order).toEqual(['trivial', 'plan']);

    const after = await as.tapper.agent.get(
      `/api/sugarbushes/${standId}/advice-status?season=${SEASON}`,
    );
    expect(after.body).toMatchObject({ season: SEASON, state: 'current' });
    expect(after.body.total).toBeGreaterThan(1000);
  });

  it('when the outsider asks for the status, then the stand is not found', async () => {
    const outsider = await signIn(t.app, 'outsider@elsewhere.example', PASSWORD);
    const res = await outsider.agent.get(`/api/sugarbushes/${standId}/advice-status`);
    expect(res.status).toBe(404);
  });
});
