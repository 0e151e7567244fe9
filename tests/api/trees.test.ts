import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let tapper: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  // 30 more trees with known diameters: tag R-01 … R-30, DBH 20 + i cm; R-07 is dead.
  for (let i = 1; i <= 30; i++) {
    const id = await addTree(t.db, team.standId, `R-${String(i).padStart(2, '0')}`, {
      status: i === 7 ? 'dead' : 'active',
      species: i % 5 === 0 ? 'red-maple' : 'sugar-maple',
    });
    await t.db('measurements').insert([
      { tree_id: id, measured_on: '2024-10-01', season: 2024, dbh_cm: 19 + i },
      { tree_id: id, measured_on: '2025-10-01', season: 2025, dbh_cm: 20 + i },
    ]);
  }
  await recordsWritten(t.db, team.standId);
  tapper = await signIn(t.app, team.users.tapper);
});
afterAll(() => t.close());

const list = (qs: string) => tapper.agent.get(`/api/sugarbushes/${team.standId}/trees?${qs}`);

describe('the tree register', () => {
  it('when paged, then each page holds pageSize rows and total counts all trees', async () => {
    const p1 = await list('page=1&pageSize=10');
    const p4 = await list('page=4&pageSize=10');
    expect(p1.body).toMatchObject({ total: 31, page: 1, pageSize: 10 });
    expect(p1.body.items).toHaveLength(10);
    expect(p4.body.items).toHaveLength(1);
  });

  it('when sorted by DBH descending, then the thickest tree comes first and unmeasured trees last', async () => {
    const res = await list('sort=-dbh&pageSize=100');
    const dbhs = res.body.items.map((x: { latestDbhCm: number | null }) => x.latestDbhCm);
    expect(dbhs[0]).toBe(50);
    expect(dbhs.at(-1)).toBeNull();
    const measured = dbhs.filter((d: number | null) => d !== null);
    expect(measured).toEqual([...measured].sort((a, b) => b - a));
  });

  it('when searched by tag, then only matching tags come back', async () => {
    const res = await list('q=R-2');
    expect(res.body.items.map((x: { tag: string }) => x.tag)).toEqual([
      'R-20',
      'R-21',
      'R-22',
      'R-23',
      'R-24',
      'R-25',
      'R-26',
      'R-27',
      'R-28',
      'R-29',
    ]);
  });

  it('when filtered by status and species, then the filters combine', async () => {
    expect((await list('status=dead')).body.items.map((x: { tag: string }) => x.tag)).toEqual([
      'R-07',
    ]);
    expect((await list('species=red-maple')).body.total).toBe(6);
  });

  it('when the sort or page is nonsense, then 400 names the parameter', async () => {
    const res = await list('sort=height&page=0');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['page', 'sort']);
  });
});
