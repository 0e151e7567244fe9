import type { Knex } from 'knex';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isPostgres } from '../../server/lib/db-engine';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
});
afterAll(() => t.close());

/** From now on the database refuses every audit entry about this kind of thing. */
async function refuseAudit(db: Knex, entity: string) {
  if (isPostgres(db)) {
    await db.raw(`create or replace function refuse_audit() returns trigger language plpgsql as $$
      begin raise exception 'audit entry refused'; end $$`);
    await db.raw(
      `create trigger refuse_${entity}_audit before insert on audit_events for each row
       when (new.entity = '${entity}') execute function refuse_audit()`,
    );
  } else {
    await db.raw(`create trigger refuse_${entity}_audit before insert on audit_events
      when new.entity = '${entity}' begin select raise(abort, 'audit entry refused'); end`);
  }
}

async function allowAudit(db: Knex, entity: string) {
  await db.raw(
    isPostgres(db)
      ? `drop trigger refuse_${entity}_audit on audit_events`
      : `drop trigger refuse_${entity}_audit`,
  );
}

/** What a change to a tree leaves behind: its rows, the tree's copied columns, its advice. */
async function treeState(treeId: number) {
  const count = async (table: string) =>
    Number((await t.db(table).where({ tree_id: treeId }).count({ n: '*' }))[0].n);
  const tree = await t.db('trees').where({ id: treeId }).first('record_version', 'latest_dbh_cm');
  const advice = await t
    .db('tree_advice')
    .where({ tree_id: treeId })
    .orderBy('season')
    .select('season', 'tree_version', 'payload');
  return {
    measurements: await count('measurements'),
    tapholes: await count('tapholes'),
    notes: await count('notes'),
    tree,
    advice,
    audit: Number((await t.db('audit_events').count({ n: '*' }))[0].n),
  };
}

describe('a change and its audit entry are one transaction', () => {
  it('when the audit entry of a measurement fails, then the measurement, the tree row and its advice are as before', async () => {
    const first = await owner.agent
      .post(`/api/trees/${team.treeId}/measurements`)
      .set('x-csrf-token', owner.csrf)
      .send({ measuredOn: '2025-10-02', dbhCm: 40.1 });
    expect(first.status).toBe(201);
    const before = await treeState(team.treeId);
    expect(before.measurements).toBe(1);

    await refuseAudit(t.db, 'measurement');
    try {
      const res = await owner.agent
        .post(`/api/trees/${team.treeId}/measurements`)
        .set('x-csrf-token', owner.csrf)
        .send({ measuredOn: '2026-10-02', dbhCm: 40.6 });
      expect(res.status).toBe(500);
    } finally {
      await allowAudit(t.db, 'measurement');
    }
    expect(await treeState(team.treeId)).toEqual(before);

    // With the audit allowed again the same reading is taken, with its entry.
    const again = await owner.agent
      .post(`/api/trees/${team.treeId}/measurements`)
      .set('x-csrf-token', owner.csrf)
      .send({ measuredOn: '2026-10-02', dbhCm: 40.6 });
    expect(again.status).toBe(201);
    const after = await treeState(team.treeId);
    expect(after.measurements).toBe(2);
    expect(after.audit).toBe(before.audit + 1);
    expect(Number(after.tree.record_version)).toBeGreaterThan(Number(before.tree.record_version));
  });

  it('when the audit entry of a taphole fails, then the hole and the advice are as before', async () => {
    const before = await treeState(team.treeId);
    await refuseAudit(t.db, 'taphole');
    try {
      const res = await owner.agent
        .post(`/api/trees/${team.treeId}/tapholes`)
        .set('x-csrf-token', owner.csrf)
        .send({
          season: 2026,
          heightCm: 100,
          azimuthDeg: 180,
          depthCm: 5,
          bitCm: 0.79,
          collection: 'bucket',
        });
      expect(res.status).toBe(500);
    } finally {
      await allowAudit(t.db, 'taphole');
    }
    expect(await treeState(team.treeId)).toEqual(before);
  });

  it('when the audit entry of a note or of its resolving fails, then neither the note nor the change is kept', async () => {
    const before = await treeState(team.treeId);
    await refuseAudit(t.db, 'note');
    try {
      const res = await owner.agent
        .post(`/api/trees/${team.treeId}/notes`)
        .set('x-csrf-token', owner.csrf)
        .send({ category: 'hazard', body: 'Dead limb over the path' });
      expect(res.status).toBe(500);
      expect(await treeState(team.treeId)).toEqual(before);
    } finally {
      await allowAudit(t.db, 'note');
    }

    const made = await owner.agent
      .post(`/api/trees/${team.treeId}/notes`)
      .set('x-csrf-token', owner.csrf)
      .send({ category: 'hazard', body: 'Dead limb over the path' });
    expect(made.status).toBe(201);
    await refuseAudit(t.db, 'note');
    try {
      const res = await owner.agent
        .patch(`/api/notes/${made.body.id}`)
        .set('x-csrf-token', owner.csrf)
        .send({ resolved: true });
      expect(res.status).toBe(500);
    } finally {
      await allowAudit(t.db, 'note');
    }
    const note = await t.db('notes').where({ id: made.body.id }).first('resolved_at');
    expect(note.resolved_at).toBeNull();
  });

  it('when the audit entry of a role change fails, then the member keeps the role', async () => {
    const forester = await t.db('users').where({ email: team.users.forester }).first('id');
    await refuseAudit(t.db, 'member');
    try {
      const res = await owner.agent
        .patch(`/api/sugarbushes/${team.standId}/members/${forester.id}`)
        .set('x-csrf-token', owner.csrf)
        .send({ role: 'tapper' });
      expect(res.status).toBe(500);
    } finally {
      await allowAudit(t.db, 'member');
    }
    const row = await t
      .db('memberships')
      .where({ user_id: forester.id, sugarbush_id: team.standId })
      .first('role');
    expect(row.role).toBe('forester');
  });
});
