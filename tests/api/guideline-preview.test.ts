import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { makeTestApp, signIn } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let standId: number;
let owner: Awaited<ReturnType<typeof signIn>>;
const SEASON = 2027;

interface Item {
  treeId: number;
  taps: number;
  verdict: string;
}

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  standId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  owner = await signIn(t.app, 'owner@fernside.example', 'maple-demo-2027');
});
afterAll(() => t.close());

/** Every item of the season's plan, through the plan API, page by page. */
async function wholePlan() {
  const items: Item[] = [];
  let taps = 0;
  for (let page = 1; ; page++) {
    const res = await owner.agent.get(
      `/api/sugarbushes/${standId}/plan?season=${SEASON}&pageSize=500&page=${page}`,
    );
    taps = res.body.totals.taps;
    items.push(...res.body.items);
    if (items.length >= res.body.total) break;
  }
  return { taps, byTree: new Map(items.map((i) => [i.treeId, i])) };
}

const preview = (profile: string) =>
  owner.agent
    .post(`/api/sugarbushes/${standId}/guideline-preview`)
    .set('x-csrf-token', owner.csrf)
    .send({ profile, season: SEASON });

const choose = (profile: string) =>
  owner.agent
    .patch(`/api/sugarbushes/${standId}`)
    .set('x-csrf-token', owner.csrf)
    .send({ profile });

describe('previewing a guideline before saving it', () => {
  it('when the owner previews the traditional set, then its figures are what the plan shows once it is saved', async () => {
    const before = await wholePlan();
    const res = await preview('traditional');
    expect(res.status).toBe(200);
    const p = res.body;
    expect(p.from).toMatchObject({ profile: 'conservative', taps: before.taps });
    expect(p.to.profile).toBe('traditional');
    expect(p.to.taps - p.from.taps).toBe(p.tapsAdded - p.tapsRemoved);
    expect(p.treesChanged).toBeGreaterThan(0);
    // Nothing is saved by a preview.
    expect((await wholePlan()).taps).toBe(before.taps);

    expect((await choose('traditional')).status).toBe(200);
    const after = await wholePlan();
    expect(after.taps).toBe(p.to.taps);
    const changed = [...after.byTree.values()].filter(
      (i) => before.byTree.get(i.treeId)!.taps !== i.taps,
    );
    expect(p.treesChanged).toBe(changed.length);
    expect(p.changesTotal).toBe(changed.length);
    for (const c of p.changes.slice(0, 25)) {
      expect(before.byTree.get(c.treeId)!.taps).toBe(c.fromTaps);
      expect(after.byTree.get(c.treeId)!.taps).toBe(c.toTaps);
    }
  });

  it('when the owner previews a stricter set, then the trees it calls too small are counted', async () => {
    const before = await wholePlan(); // traditional, from the test above
    const res = await preview('conservative');
    expect(res.status).toBe(200);
    expect((await choose('conservative')).status).toBe(200);
    const after = await wholePlan();
    const becameTooSmall = [...after.byTree.values()].filter(
      (i) => i.verdict === 'too-small' && before.byTree.get(i.treeId)!.taps > 0,
    ).length;
    expect(becameTooSmall).toBeGreaterThan(0);
    expect(res.body.treesBecomeTooSmall).toBe(becameTooSmall);
  });

  it('when the profile is unknown or a custom set is missing, then 400 names the field', async () => {
    const unknown = await preview('generous');
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields.profile).toBeTruthy();
    const custom = await preview('custom');
    expect(custom.status).toBe(400);
    expect(custom.body.error.fields.customProfile).toBeTruthy();
  });

  it('when a forester asks for a preview, then 403', async () => {
    const forester = await signIn(t.app, 'forester@fernside.example', 'maple-demo-2027');
    const res = await forester.agent
      .post(`/api/sugarbushes/${standId}/guideline-preview`)
      .set('x-csrf-token', forester.csrf)
      .send({ profile: 'traditional' });
    expect(res.status).toBe(403);
  });
});
