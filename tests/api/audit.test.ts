import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AuditItem, AuditPage } from '../../shared/schemas/audit';
import type { Role } from '../../shared/schemas/enums';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
const agents = {} as Record<Role | 'outsider', Awaited<ReturnType<typeof signIn>>>;
const ids = {} as Record<string, number>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  for (const who of ['owner', 'forester', 'tapper', 'consultant', 'outsider'] as const)
    agents[who] = await signIn(t.app, team.users[who]);
  for (const [role, email] of Object.entries(team.users))
    ids[role] = (await t.db('users').where({ email }).first('id')).id;

  const { agent: forester, csrf: fcsrf } = agents.forester;
  const first = await forester
    .post(`/api/trees/${team.treeId}/measurements`)
    .set('x-csrf-token', fcsrf)
    .send({ measuredOn: '2026-10-02', dbhCm: 41.2, crownDiebackPct: 5 });
  await forester
    .post(`/api/trees/${team.treeId}/measurements`)
    .set('x-csrf-token', fcsrf)
    .send({ measuredOn: '2026-10-02', dbhCm: 41.4, crownDiebackPct: 5, correctsId: first.body.id });
  await agents.tapper.agent
    .post(`/api/trees/${team.treeId}/tapholes`)
    .set('x-csrf-token', agents.tapper.csrf)
    .send({
      season: 2026,
      heightCm: 110,
      azimuthDeg: 180,
      depthCm: 5.08,
      bitCm: 0.79,
      collection: 'vacuum',
    });
  await agents.owner.agent
    .patch(`/api/sugarbushes/${team.standId}`)
    .set('x-csrf-token', agents.owner.csrf)
    .send({ profile: 'traditional' });
});
afterAll(() => t.close());

const audit = (query = '', who: Role | 'outsider' = 'owner') =>
  agents[who].agent.get(`/api/sugarbushes/${team.standId}/audit${query}`);

describe('the audit trail', () => {
  it('when the owner reads it, then every recorded, corrected and changed thing is there, newest first, with who did it and on which tree', async () => {
    const res = await audit();
    expect(res.status).toBe(200);
    const page: AuditPage = res.body;
    const entries = page.items.map((i: AuditItem) => [i.kind, i.action, i.userId, i.tree?.tag]);
    expect(entries).toEqual([
      ['sugarbush', 'update', ids.owner, undefined],
      ['taphole', 'create', ids.tapper, 'T-001'],
      ['measurement', 'correct', ids.forester, 'T-001'],
      ['measurement', 'create', ids.forester, 'T-001'],
    ]);
    expect(page.total).toBe(4);
    const correction = page.items[2];
    expect(correction.detail).toMatchObject({ dbhCm: 41.4 });
    expect(correction.userName).toBe('forester');
    expect(new Date(correction.at).toISOString().slice(0, 10)).toBe(
      new Date().toISOString().slice(0, 10),
    );
    expect(page.items[1].detail).toMatchObject({ season: 2026, heightCm: 110, azimuthDeg: 180 });
    expect(page.people.map((p) => p.id).sort()).toEqual(
      [ids.owner, ids.forester, ids.tapper].sort(),
    );
  });

  it('filters by kind and by person, and pages', async () => {
    const measured: AuditPage = (await audit('?kind=measurement')).body;
    expect(measured.items.map((i) => i.action)).toEqual(['correct', 'create']);
    const tapper: AuditPage = (await audit(`?userId=${ids.tapper}`)).body;
    expect(tapper.items.map((i) => i.kind)).toEqual(['taphole']);
    const second: AuditPage = (await audit('?page=2&pageSize=3')).body;
    expect(second).toMatchObject({ page: 2, pageSize: 3, total: 4 });
    expect(second.items.map((i) => i.action)).toEqual(['create']);
    expect((await audit('?kind=Tree!')).status).toBe(400);
  });

  it.each(['forester', 'tapper', 'consultant'] as const)(
    'when a %s asks for it, then it is refused with 403',
    async (who) => {
      const res = await audit('', who);
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    },
  );

  it('when someone outside the stand asks for it, then it is not found', async () => {
    const res = await audit('', 'outsider');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });

  it('when a tapper writes a note or a consultant changes the guideline, then both are refused with 403 and leave no entry', async () => {
    const note = await agents.tapper.agent
      .post(`/api/trees/${team.treeId}/notes`)
      .set('x-csrf-token', agents.tapper.csrf)
      .send({ category: 'finding', body: 'Sapsucker holes on the south face.' });
    expect(note.status).toBe(403);
    const guideline = await agents.consultant.agent
      .patch(`/api/sugarbushes/${team.standId}`)
      .set('x-csrf-token', agents.consultant.csrf)
      .send({ profile: 'conservative' });
    expect(guideline.status).toBe(403);
    expect((await t.db('sugarbushes').where({ id: team.standId }).first()).profile).toBe(
      'traditional',
    );
    expect((await audit()).body.total).toBe(4);
  });
});
