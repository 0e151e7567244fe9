import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PlanItem } from '../../shared/schemas/plan';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let consultant: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;
const trees: Record<string, number> = {};

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  consultant = await signIn(t.app, team.users.consultant);
  tapper = await signIn(t.app, team.users.tapper);
  for (const tag of ['H-01', 'H-02', 'H-03']) {
    trees[tag] = await addTree(t.db, team.standId, tag);
    await t.db('measurements').insert({
      tree_id: trees[tag],
      measured_on: '2026-10-01',
      season: 2026,
      dbh_cm: 40,
    });
  }
  await recordsWritten(t.db, team.standId);
});
afterAll(() => t.close());

const write = async (url: string, category: string, body: string) => {
  const res = await consultant.agent
    .post(url)
    .set('x-csrf-token', consultant.csrf)
    .send({ category, body });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; createdAt: string };
};

const planItems = async (query = '') => {
  const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/plan?pageSize=50${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return new Map((res.body.items as PlanItem[]).map((i) => [i.tag, i]));
};

describe('hazard notes in the plan', () => {
  it('when a tree has open hazard notes, then its plan item and its advice carry them oldest first, and no other tree does', async () => {
    const first = await write(
      `/api/trees/${trees['H-01']}/notes`,
      'hazard',
      'Dead top over the lateral.',
    );
    const second = await write(
      `/api/trees/${trees['H-01']}/notes`,
      'hazard',
      'Wasp nest at the base.',
    );
    await write(`/api/trees/${trees['H-02']}/notes`, 'health', 'Crown looks thin.');
    const settled = await write(
      `/api/trees/${trees['H-03']}/notes`,
      'hazard',
      'Hanger, since cut.',
    );
    await consultant.agent
      .patch(`/api/notes/${settled.id}`)
      .set('x-csrf-token', consultant.csrf)
      .send({ resolved: true });
    await write(`/api/sugarbushes/${team.standId}/notes`, 'hazard', 'Ice on the north road.');

    for (const query of ['', '&sort=-dbh', '&q=H-0']) {
      const items = await planItems(query);
      expect(items.get('H-01')!.hazards).toEqual([
        { noteId: first.id, body: 'Dead top over the lateral.', createdAt: first.createdAt },
        { noteId: second.id, body: 'Wasp nest at the base.', createdAt: second.createdAt },
      ]);
      expect(items.get('H-02')!.hazards).toEqual([]);
      expect(items.get('H-03')!.hazards).toEqual([]);
    }
    const teamTree = (await planItems()).get('T-001');
    expect(teamTree?.hazards).toEqual([]);

    const advice = await tapper.agent.get(`/api/trees/${trees['H-01']}/advice`);
    expect(advice.status).toBe(200);
    expect(advice.body.hazards.map((h: { body: string }) => h.body)).toEqual([
      'Dead top over the lateral.',
      'Wasp nest at the base.',
    ]);
  });

  it('when a hazard is resolved or reopened, then the next plan page and advice show it so at once', async () => {
    const note = await write(`/api/trees/${trees['H-02']}/notes`, 'hazard', 'Loose bark slab.');
    const body = async () => (await planItems()).get('H-02')!.hazards.map((h) => h.body);
    const adviceBodies = async () =>
      (await tapper.agent.get(`/api/trees/${trees['H-02']}/advice`)).body.hazards.map(
        (h: { body: string }) => h.body,
      );
    expect(await body()).toEqual(['Loose bark slab.']);
    expect(await adviceBodies()).toEqual(['Loose bark slab.']);
    const change = (resolved: boolean) =>
      consultant.agent
        .patch(`/api/notes/${note.id}`)
        .set('x-csrf-token', consultant.csrf)
        .send({ resolved });
    await change(true);
    expect(await body()).toEqual([]);
    expect(await adviceBodies()).toEqual([]);
    await change(false);
    expect(await body()).toEqual(['Loose bark slab.']);
  });
});
