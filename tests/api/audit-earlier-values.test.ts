import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
});
afterAll(() => t.close());

const lastEntry = async (entity: string, entityId: number) => {
  const row = await t
    .db('audit_events')
    .where({ entity, entity_id: entityId })
    .orderBy('id', 'desc')
    .first('detail');
  return typeof row.detail === 'string' ? JSON.parse(row.detail) : row.detail;
};

describe('what a change replaces stays in the audit trail', () => {
  it('when a tree is moved and retired, then its entry keeps the earlier position and status', async () => {
    const before = await t.db('trees').where({ id: team.treeId }).first('lat', 'lng', 'status');
    const res = await owner.agent
      .patch(`/api/trees/${team.treeId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ lat: before.lat + 0.0001, status: 'dead' });
    expect(res.status, res.text).toBe(200);
    expect(await lastEntry('tree', team.treeId)).toEqual({
      lat: before.lat + 0.0001,
      status: 'dead',
      earlier: { lat: before.lat, status: before.status },
    });
  });

  it('when the boundary and the stand name change, then the entry names them and keeps what they were', async () => {
    const before = await t.db('sugarbushes').where({ id: team.standId }).first('name', 'boundary');
    const boundary = {
      type: 'Polygon',
      coordinates: [
        [
          [-72.6, 44.3],
          [-72.59, 44.3],
          [-72.59, 44.31],
          [-72.6, 44.3],
        ],
      ],
    };
    const res = await owner.agent
      .patch(`/api/sugarbushes/${team.standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ name: 'Renamed lot', boundary });
    expect(res.status, res.text).toBe(200);
    const detail = await lastEntry('sugarbush', team.standId);
    expect([...detail.fields].sort()).toEqual(['boundary', 'name']);
    expect(detail.earlier).toEqual({ name: before.name, boundary: before.boundary });
  });

  it('when a note’s follow-up moves and it is resolved, then each entry keeps what it replaced', async () => {
    const consultant = await signIn(t.app, team.users.consultant);
    const note = await consultant.agent
      .post(`/api/trees/${team.treeId}/notes`)
      .set('x-csrf-token', consultant.csrf)
      .send({ category: 'follow-up', body: 'Look at the crown again', followUpOn: '2027-05-01' });
    expect(note.status, note.text).toBe(201);
    const moved = await consultant.agent
      .patch(`/api/notes/${note.body.id}`)
      .set('x-csrf-token', consultant.csrf)
      .send({ followUpOn: '2027-06-15' });
    expect(moved.status, moved.text).toBe(200);
    expect(await lastEntry('note', note.body.id)).toMatchObject({
      followUpOn: '2027-06-15',
      earlier: { followUpOn: '2027-05-01', resolvedAt: null },
    });
  });
});
