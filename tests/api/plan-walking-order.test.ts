import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PlanItem } from '../../shared/schemas/plan';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let tapper: Awaited<ReturnType<typeof signIn>>;

// Along one east–west line, about 40 m apart; the tags are not in the order they stand.
const lat = 45.5;
const east = (steps: number) => -72.1 + steps * 0.0005;
const placed: [tag: string, steps: number][] = [
  ['W-01', 0],
  ['W-02', 3],
  ['W-03', 1],
  ['W-04', 2],
  ['W-05', 7],
];

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  tapper = await signIn(t.app, team.users.tapper);
  for (const [tag, steps] of placed) {
    const id = await addTree(t.db, team.standId, tag, { lat, lng: east(steps) });
    await t.db('measurements').insert({
      tree_id: id,
      measured_on: '2026-10-01',
      season: 2026,
      dbh_cm: 40,
    });
  }
  // The team's own tree, T-001, has no position.
  await recordsWritten(t.db, team.standId);
});
afterAll(() => t.close());

const tags = async (query: string) => {
  const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/plan?season=2027${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return { tags: (res.body.items as PlanItem[]).map((i) => i.tag), total: res.body.total };
};

describe('the plan in walking order', () => {
  it('when a tapper asks for the walk, then the trees come nearest first from the stand’s first tree, and a tree without a position comes last', async () => {
    expect(await tags('&sort=walk')).toEqual({
      tags: ['W-01', 'W-03', 'W-04', 'W-02', 'W-05', 'T-001'],
      total: 6,
    });
  });

  it('when the tapper stands by W-05, then the walk starts there and works back west', async () => {
    const from = `&sort=walk&fromLat=${lat + 0.00002}&fromLng=${east(6.8)}`;
    expect((await tags(from)).tags).toEqual(['W-05', 'W-02', 'W-04', 'W-03', 'W-01', 'T-001']);
  });

  it('pages through the same walk, and keeps to a filter', async () => {
    expect((await tags('&sort=walk&pageSize=2&page=2')).tags).toEqual(['W-04', 'W-02']);
    expect(await tags('&sort=walk&q=W-0&fromLat=45.5&fromLng=-72.1')).toEqual({
      tags: ['W-01', 'W-03', 'W-04', 'W-02', 'W-05'],
      total: 5,
    });
  });

  it('when a start is off the globe, then it is refused with 400 naming the field', async () => {
    const res = await tapper.agent.get(
      `/api/sugarbushes/${team.standId}/plan?sort=walk&fromLat=95&fromLng=0`,
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('fromLat');
  });
});
