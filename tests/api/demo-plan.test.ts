import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { verdicts, warningCodes } from '../../shared/rules/index';
import { makeTestApp, signIn } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let standId: number;
let tapper: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  standId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  tapper = await signIn(t.app, 'tapper@fernside.example', 'maple-demo-2027');
});
afterAll(() => t.close());

describe("the demo stand's plan for 2027", () => {
  it('shows every verdict on at least one tree', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${standId}/plan?season=2027&pageSize=1`);
    expect(res.status).toBe(200);
    const { totals } = res.body;
    const perVerdict: Record<string, number> = {
      tap: totals.treesToTap - totals.reduced,
      'tap-reduced': totals.reduced,
      rest: totals.rested,
      'too-small': totals.tooSmall,
      retired: totals.retired,
      unmeasured: totals.unmeasured,
    };
    for (const v of verdicts) {
      const found = await tapper.agent.get(
        `/api/sugarbushes/${standId}/plan?season=2027&verdict=${v.key}&pageSize=1`,
      );
      expect(found.body.total, v.key).toBeGreaterThan(0);
      expect(found.body.total, v.key).toBe(perVerdict[v.key]);
    }
  });

  it('raises every warning code on at least one tree, and the totals count them', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${standId}/plan?season=2027&pageSize=1`);
    for (const code of warningCodes) {
      expect(res.body.totals.warningsByCode[code], code).toBeGreaterThan(0);
    }
  });

  it('pages, sorts and filters the plan like any list', async () => {
    const res = await tapper.agent.get(
      `/api/sugarbushes/${standId}/plan?season=2027&sort=-taps&page=2&pageSize=25`,
    );
    expect(res.body).toMatchObject({
      season: 2027,
      page: 2,
      pageSize: 25,
      profile: { key: 'conservative' },
    });
    expect(res.body.items).toHaveLength(25);
    expect(res.body.total).toBe(res.body.totals.trees);
    const taps = res.body.items.map((i: { taps: number }) => i.taps);
    expect(taps).toEqual([...taps].sort((a, b) => b - a));
    expect(res.body.items[0]).toHaveProperty('treeId');
    expect(res.body.items[0]).toHaveProperty('tag');
  });

  it("gives one tree's advice with placements, a projection and sourced warnings", async () => {
    const tree = await t.db('trees').where({ sugarbush_id: standId, tag: 'OL-0064' }).first('id');
    const res = await tapper.agent.get(`/api/trees/${tree.id}/advice?season=2027`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ treeId: tree.id, tag: 'OL-0064', season: 2027 });
    expect(res.body.placements.length).toBeLessThanOrEqual(res.body.taps);
    expect(res.body.projection).toHaveLength(20);
    const overtapped = res.body.warnings.find((w: { code: string }) => w.code === 'overtapped');
    expect(overtapped?.source).toBeTruthy();
  });

  it('answers concurrent requests alike, and a new measurement shows in the very next plan', async () => {
    const url = `/api/sugarbushes/${standId}/plan?season=2027&pageSize=1`;
    const answers = await Promise.all([1, 2, 3].map(() => tapper.agent.get(url)));
    const unmeasured = answers[0].body.totals.unmeasured;
    expect(answers.map((a) => a.body.totals)).toEqual([0, 1, 2].map(() => answers[0].body.totals));
    const forester = await signIn(t.app, 'forester@fernside.example', 'maple-demo-2027');
    const tree = await t.db('trees').where({ sugarbush_id: standId, tag: 'OL-1181' }).first('id');
    const recorded = await forester.agent
      .post(`/api/trees/${tree.id}/measurements`)
      .set('x-csrf-token', forester.csrf)
      .send({ measuredOn: '2026-11-30', dbhCm: 36.5 });
    expect(recorded.status).toBe(201);
    const after = await tapper.agent.get(url);
    expect(after.body.totals.unmeasured).toBe(unmeasured - 1);
  });

  it("sends the whole stand's map data compressed when the client accepts it", async () => {
    const res = await tapper.agent
      .get(`/api/sugarbushes/${standId}/map?season=2027`)
      .set('accept-encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.body.count).toBeGreaterThan(1000);
    expect(res.body.ids).toHaveLength(res.body.count);
  });

  it('refuses a season that is not a year with 400', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${standId}/plan?season=soon`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.season).toBeTruthy();
  });
});
