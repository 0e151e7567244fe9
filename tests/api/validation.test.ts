import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let forester: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  forester = await signIn(t.app, team.users.forester);
});
afterAll(() => t.close());

const countRows = async (table: string) => Number((await t.db(table).count({ n: '*' }))[0].n);
const post = (path: string) => forester.agent.post(path).set('x-csrf-token', forester.csrf);

describe('bad input gets a clear error and writes nothing', () => {
  it('when the JSON is malformed, then 400 malformed-json', async () => {
    const res = await post(`/api/trees/${team.treeId}/measurements`)
      .set('content-type', 'application/json')
      .send('{"dbhCm": 4');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed-json');
    expect(await countRows('measurements')).toBe(0);
  });

  it.each([
    [0, 'at least 2.5'],
    [-3, 'at least 2.5'],
    [2.4, 'at least 2.5'],
    [250.5, 'at most 250'],
    [5e-324, 'at least 2.5'],
    [1e308, 'at most 250'],
  ])('when DBH is %s cm, then 400 with a field error on dbhCm', async (dbhCm, message) => {
    const res = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2026-10-01',
      dbhCm,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.dbhCm).toContain(message);
    expect(await countRows('measurements')).toBe(0);
  });

  it('when the date is not a real date or dieback is not a 5 % class, then each field says so', async () => {
    const res = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2026-02-30',
      dbhCm: 30,
      crownDiebackPct: 12,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['crownDiebackPct', 'measuredOn']);
  });

  it('when DBH is exactly 250 cm, then it is accepted (the upper edge is inclusive)', async () => {
    const res = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2026-10-01',
      dbhCm: 250,
    });
    expect(res.status).toBe(201);
    expect(res.body.season).toBe(2026);
    await t.db('measurements').delete();
  });

  it('when the tree is unknown, then 404', async () => {
    const res = await post('/api/trees/987654/measurements').send({
      measuredOn: '2026-10-01',
      dbhCm: 30,
    });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });

  it('when a tag is already used in the stand, then 409 and no second tree', async () => {
    const before = await countRows('trees');
    const res = await post(`/api/sugarbushes/${team.standId}/trees`).send({
      tag: 'T-001',
      species: 'sugar-maple',
    });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({
      code: 'duplicate-tag',
      fields: { tag: expect.stringContaining('T-001') },
    });
    expect(await countRows('trees')).toBe(before);
  });

  it('when the same tag is used in another stand, then that is fine', async () => {
    const outsider = await signIn(t.app, team.users.outsider);
    const res = await outsider.agent
      .post(`/api/sugarbushes/${team.otherStandId}/trees`)
      .set('x-csrf-token', outsider.csrf)
      .send({ tag: 'T-001', species: 'red-maple' });
    expect(res.status).toBe(201);
  });
});

describe('corrections append, never overwrite', () => {
  it('when a forester corrects a measurement, then both rows remain and the old one is marked superseded', async () => {
    const first = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2025-10-01',
      dbhCm: 52,
    });
    const fix = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2025-10-01',
      dbhCm: 35.2,
      correctsId: first.body.id,
      note: 'Tape slipped',
    });
    expect(fix.status).toBe(201);
    const list = await forester.agent.get(`/api/trees/${team.treeId}/measurements`);
    expect(
      list.body.items.map((m: { dbhCm: number; superseded: boolean }) => [m.dbhCm, m.superseded]),
    ).toEqual([
      [52, true],
      [35.2, false],
    ]);
    const tree = await forester.agent.get(`/api/trees/${team.treeId}`);
    expect(tree.body.latestDbhCm).toBe(35.2);
    const again = await post(`/api/trees/${team.treeId}/measurements`).send({
      measuredOn: '2025-10-01',
      dbhCm: 36,
      correctsId: first.body.id,
    });
    expect(again.status).toBe(409);
  });
});
