import { afterEach, describe, expect, it } from 'vitest';
import { addMember, addUser, makeTestApp, signIn, standWithTeam } from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

async function setup() {
  const t = await makeTestApp();
  closers.push(t.close);
  const team = await standWithTeam(t.db);
  const owner = await signIn(t.app, team.users.owner);
  const ownerId = (await t.db('users').where({ email: team.users.owner }).first('id')).id as number;
  const idOf = async (email: string) =>
    (await t.db('users').where({ email }).first('id')).id as number;
  return { ...t, ...team, owner, ownerId, idOf };
}

describe('the team', () => {
  it('when a consultant lists the team, then every member shows with name, e-mail and role', async () => {
    const { app, standId, users } = await setup();
    const { agent } = await signIn(app, users.consultant);
    const res = await agent.get(`/api/sugarbushes/${standId}/members?sort=role`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(4);
    expect(res.body.items.map((m: { role: string }) => m.role)).toEqual([
      'consultant',
      'forester',
      'owner',
      'tapper',
    ]);
    expect(res.body.items[0]).toMatchObject({ email: users.consultant, name: 'consultant' });
    expect(res.body.items[0]).not.toHaveProperty('password_hash');
  });

  it('when the owner changes a role, then the member holds the new role and may do its work', async () => {
    const { app, db, standId, treeId, users, owner, idOf } = await setup();
    const tapperId = await idOf(users.tapper);
    const res = await owner.agent
      .patch(`/api/sugarbushes/${standId}/members/${tapperId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ role: 'forester' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ userId: tapperId, role: 'forester' });
    const tapper = await signIn(app, users.tapper);
    const measured = await tapper.agent
      .post(`/api/trees/${treeId}/measurements`)
      .set('x-csrf-token', tapper.csrf)
      .send({ measuredOn: '2026-10-02', dbhCm: 40 });
    expect(measured.status).toBe(201);
    const audit = await db('audit_events').where({ entity: 'member', action: 'change-role' });
    expect(JSON.parse(audit[0].detail)).toEqual({ from: 'tapper', to: 'forester' });
  });

  it('when the owner removes a member, then that person no longer sees the stand', async () => {
    const { app, standId, users, owner, idOf } = await setup();
    const consultant = await signIn(app, users.consultant);
    const res = await owner.agent
      .delete(`/api/sugarbushes/${standId}/members/${await idOf(users.consultant)}`)
      .set('x-csrf-token', owner.csrf);
    expect(res.status).toBe(204);
    expect((await consultant.agent.get(`/api/sugarbushes/${standId}`)).status).toBe(404);
  });

  it('when the only owner would be demoted or removed, then 409 and the stand keeps its owner', async () => {
    const { db, standId, owner, ownerId } = await setup();
    const demote = await owner.agent
      .patch(`/api/sugarbushes/${standId}/members/${ownerId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ role: 'forester' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last-owner');
    const remove = await owner.agent
      .delete(`/api/sugarbushes/${standId}/members/${ownerId}`)
      .set('x-csrf-token', owner.csrf);
    expect(remove.status).toBe(409);
    expect(
      await db('memberships').where({ sugarbush_id: standId, user_id: ownerId }).first('role'),
    ).toEqual({ role: 'owner' });
  });

  it('when a second owner exists, then the first may step down', async () => {
    const { db, standId, owner, ownerId } = await setup();
    const second = await addUser(db, 'co-owner@test.example');
    await addMember(db, second, standId, 'owner');
    const res = await owner.agent
      .patch(`/api/sugarbushes/${standId}/members/${ownerId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ role: 'consultant' });
    expect(res.status).toBe(200);
  });

  it('when the member is of another stand, or the role unknown, then 404 or 400', async () => {
    const { standId, users, owner, idOf } = await setup();
    const outsiderId = await idOf(users.outsider);
    const other = await owner.agent
      .patch(`/api/sugarbushes/${standId}/members/${outsiderId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ role: 'tapper' });
    expect(other.status).toBe(404);
    const bad = await owner.agent
      .patch(`/api/sugarbushes/${standId}/members/${await idOf(users.tapper)}`)
      .set('x-csrf-token', owner.csrf)
      .send({ role: 'landlord' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toBeTruthy();
  });
});

describe('changing the stand, field by field', () => {
  it('when a forester redraws the boundary, then it is saved; when the forester renames the stand, then 403 and the name stays', async () => {
    const { app, db, standId, users } = await setup();
    const forester = await signIn(app, users.forester);
    const square = {
      type: 'Polygon',
      coordinates: [
        [
          [-72.5, 44.1],
          [-72.49, 44.1],
          [-72.49, 44.11],
          [-72.5, 44.11],
          [-72.5, 44.1],
        ],
      ],
    };
    const boundary = await forester.agent
      .patch(`/api/sugarbushes/${standId}`)
      .set('x-csrf-token', forester.csrf)
      .send({ boundary: square });
    expect(boundary.status).toBe(200);
    for (const body of [{ name: 'Forester Ridge' }, { boundary: null, name: 'Forester Ridge' }]) {
      const res = await forester.agent
        .patch(`/api/sugarbushes/${standId}`)
        .set('x-csrf-token', forester.csrf)
        .send(body);
      expect(res.status).toBe(403);
    }
    const row = await db('sugarbushes').where({ id: standId }).first();
    expect(row.name).toBe('Test Ridge');
    expect(JSON.parse(row.boundary).type).toBe('Polygon');
  });
});
