import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let forester: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  forester = await signIn(t.app, team.users.forester);
  tapper = await signIn(t.app, team.users.tapper);
});
afterAll(() => t.close());

const measure = (treeId: number, body: object) =>
  forester.agent
    .post(`/api/trees/${treeId}/measurements`)
    .set('x-csrf-token', forester.csrf)
    .send(body);
const drill = (treeId: number, body: object) =>
  tapper.agent.post(`/api/trees/${treeId}/tapholes`).set('x-csrf-token', tapper.csrf).send(body);

const hole = {
  season: 2026,
  heightCm: 110,
  azimuthDeg: 180,
  depthCm: 5.08,
  bitCm: 0.79,
  collection: 'vacuum',
};

const count = async (table: string, where: Record<string, unknown>) =>
  Number((await t.db(table).where(where).count({ n: '*' }))[0].n);

const adviceStamp = async (treeId: number) =>
  (await t.db('trees').where({ id: treeId }).first('record_version')).record_version;

describe('a reading sent again with the same client id', () => {
  it('when a forester sends a reading twice with one client id, then it is stored once and the resend answers 200 with it', async () => {
    const treeId = await addTree(t.db, team.standId, 'F-001');
    const clientId = randomUUID();
    const body = { measuredOn: '2026-10-02', dbhCm: 41.2, crownDiebackPct: 5, clientId };
    const first = await measure(treeId, body);
    expect(first.status).toBe(201);
    expect(first.body.clientId).toBe(clientId);
    const auditBefore = await count('audit_events', { entity: 'measurement' });
    const versionBefore = await adviceStamp(treeId);

    const again = await measure(treeId, body);
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(first.body.id);
    expect(again.body.dbhCm).toBe(41.2);
    expect(await count('measurements', { tree_id: treeId })).toBe(1);
    expect(await count('audit_events', { entity: 'measurement' })).toBe(auditBefore);
    // No advice refresh: the tree's record version stays where the first send left it.
    expect(await adviceStamp(treeId)).toBe(versionBefore);
  });

  it('when the same reading is sent several times at once, then one row is stored and every answer names it', async () => {
    const treeId = await addTree(t.db, team.standId, 'F-002');
    const clientId = randomUUID();
    const body = { measuredOn: '2026-10-02', dbhCm: 38, clientId };
    const answers = await Promise.all([1, 2, 3, 4].map(() => measure(treeId, body)));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await count('measurements', { tree_id: treeId })).toBe(1);
    expect(
      await count('audit_events', { entity: 'measurement', entity_id: answers[0].body.id }),
    ).toBe(1);
  });

  it('when a client id comes back with a different value or on another tree, then it is refused with 409 client-id-conflict', async () => {
    const treeId = await addTree(t.db, team.standId, 'F-003');
    const otherId = await addTree(t.db, team.standId, 'F-004');
    const clientId = randomUUID();
    expect((await measure(treeId, { measuredOn: '2026-10-02', dbhCm: 30, clientId })).status).toBe(
      201,
    );
    const changed = await measure(treeId, { measuredOn: '2026-10-02', dbhCm: 30.4, clientId });
    expect(changed.status).toBe(409);
    expect(changed.body.error.code).toBe('client-id-conflict');
    const elsewhere = await measure(otherId, { measuredOn: '2026-10-02', dbhCm: 30, clientId });
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.code).toBe('client-id-conflict');
    expect(await count('measurements', { tree_id: otherId })).toBe(0);
    expect(await count('measurements', { tree_id: treeId })).toBe(1);
  });

  it('when two readings carry no client id, then both are stored as before', async () => {
    const treeId = await addTree(t.db, team.standId, 'F-005');
    const body = { measuredOn: '2026-10-02', dbhCm: 33 };
    expect((await measure(treeId, body)).status).toBe(201);
    expect((await measure(treeId, body)).status).toBe(201);
    expect(await count('measurements', { tree_id: treeId })).toBe(2);
  });
});

describe('a drilled hole sent again with the same client id', () => {
  it('when a tapper sends a hole twice with one client id, then it is stored once and the resend answers 200', async () => {
    const treeId = await addTree(t.db, team.standId, 'F-010');
    await t.db('measurements').insert({
      tree_id: treeId,
      measured_on: '2025-10-01',
      season: 2025,
      dbh_cm: 45,
    });
    await recordsWritten(t.db, team.standId, [treeId]);
    const clientId = randomUUID();
    const first = await drill(treeId, { ...hole, clientId });
    expect(first.status).toBe(201);
    const auditBefore = await count('audit_events', { entity: 'taphole' });
    const again = await drill(treeId, { ...hole, clientId });
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(first.body.id);
    expect(again.body.clientId).toBe(clientId);
    expect(await count('tapholes', { tree_id: treeId })).toBe(1);
    expect(await count('audit_events', { entity: 'taphole' })).toBe(auditBefore);

    const moved = await drill(treeId, { ...hole, azimuthDeg: 90, clientId });
    expect(moved.status).toBe(409);
    expect(moved.body.error.code).toBe('client-id-conflict');
  });
});

describe('a tree that is dead or removed', () => {
  it.each(['dead', 'removed'])(
    'when a reading or a hole is sent for a %s tree, then it is refused with 409 tree-retired naming the tag and status',
    async (status) => {
      const treeId = await addTree(t.db, team.standId, `R-${status}`, { status });
      const reading = await measure(treeId, {
        measuredOn: '2026-10-02',
        dbhCm: 40,
        clientId: randomUUID(),
      });
      expect(reading.status).toBe(409);
      expect(reading.body.error.code).toBe('tree-retired');
      expect(reading.body.error.message).toContain(`R-${status}`);
      expect(reading.body.error.message).toContain(status);
      const drilled = await drill(treeId, hole);
      expect(drilled.status).toBe(409);
      expect(drilled.body.error.code).toBe('tree-retired');
      expect(await count('measurements', { tree_id: treeId })).toBe(0);
      expect(await count('tapholes', { tree_id: treeId })).toBe(0);
    },
  );

  it('when a reading stored before the tree was removed is sent again, then the resend still answers 200 with it', async () => {
    const treeId = await addTree(t.db, team.standId, 'R-late');
    const body = { measuredOn: '2026-10-02', dbhCm: 36, clientId: randomUUID() };
    const first = await measure(treeId, body);
    expect(first.status).toBe(201);
    await t.db('trees').where({ id: treeId }).update({ status: 'removed' });
    const again = await measure(treeId, body);
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(first.body.id);
  });

  it('when a held-out tree is measured, then the reading is stored', async () => {
    const treeId = await addTree(t.db, team.standId, 'R-held', { status: 'held-out' });
    expect((await measure(treeId, { measuredOn: '2026-10-02', dbhCm: 40 })).status).toBe(201);
  });
});

describe('the measuring round', () => {
  it("lists the stand's living trees with whether each has a reading this season, and the guideline", async () => {
    const t1 = await addTree(t.db, team.otherStandId, 'W-1', { lat: 44.1, lng: -72.1 });
    const t2 = await addTree(t.db, team.otherStandId, 'W-2', { lat: 44.2, lng: -72.2 });
    await addTree(t.db, team.otherStandId, 'W-3', { status: 'dead' });
    const season = new Date().getUTCFullYear();
    await t.db('measurements').insert([
      { tree_id: t1, measured_on: `${season}-01-15`, season, dbh_cm: 40 },
      { tree_id: t2, measured_on: `${season - 1}-10-01`, season: season - 1, dbh_cm: 30 },
    ]);
    await recordsWritten(t.db, team.otherStandId, [t1, t2]);
    const outsider = await signIn(t.app, team.users.outsider);
    const res = await outsider.agent.get(`/api/sugarbushes/${team.otherStandId}/round`);
    expect(res.status).toBe(200);
    expect(res.body.season).toBe(season);
    const tags: string[] = res.body.tags;
    expect(tags).toContain('W-1');
    expect(tags).toContain('W-2');
    expect(tags).not.toContain('W-3');
    expect(res.body.measured[tags.indexOf('W-1')]).toBe(1);
    expect(res.body.measured[tags.indexOf('W-2')]).toBe(0);
    expect(res.body.latestDbhCm[tags.indexOf('W-2')]).toBe(30);
    expect(res.body.lat[tags.indexOf('W-2')]).toBe(44.2);
    expect(res.body.guideline.profile.key).toBe('conservative');

    const record = await outsider.agent.get(`/api/trees/${t2}/record`);
    expect(record.status).toBe(200);
    expect(record.body.tag).toBe('W-2');
    expect(record.body.measurements).toEqual([
      expect.objectContaining({ measuredOn: `${season - 1}-10-01`, dbhCm: 30 }),
    ]);
    expect(record.body.tapholes).toEqual([]);
  });

  it('when someone outside the stand asks for its round, then it is not found', async () => {
    const res = await forester.agent.get(`/api/sugarbushes/${team.otherStandId}/round`);
    expect(res.status).toBe(404);
  });
});
