import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addTree, csrfAgent, makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let forester: Agent;
let tapper: Agent;
let consultant: Agent;
let outsider: Agent;

const hole = (treeId: number, season: number, collection: string) => ({
  tree_id: treeId,
  season,
  height_cm: 90,
  azimuth_deg: 180,
  depth_cm: 5,
  bit_cm: 0.79,
  collection,
});

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  forester = await signIn(t.app, team.users.forester);
  tapper = await signIn(t.app, team.users.tapper);
  consultant = await signIn(t.app, team.users.consultant);
  outsider = await signIn(t.app, team.users.outsider);
  const second = await addTree(t.db, team.standId, 'T-002');
  // 2025: four holes on vacuum and two on buckets; 2024 and the other stand must not count.
  await t
    .db('tapholes')
    .insert([
      hole(team.treeId, 2025, 'vacuum'),
      hole(team.treeId, 2025, 'vacuum'),
      hole(second, 2025, 'vacuum'),
      hole(second, 2025, 'vacuum'),
      hole(second, 2025, 'bucket'),
      hole(team.treeId, 2025, 'bucket'),
      hole(team.treeId, 2024, 'vacuum'),
      hole(team.otherTreeId, 2025, 'vacuum'),
    ]);
});
afterAll(() => t.close());

const post = (who: Agent, body: object, standId = team.standId) =>
  who.agent.post(`/api/sugarbushes/${standId}/sap`).set('x-csrf-token', who.csrf).send(body);

/**
 * Worked by hand. Rule of 86 (Jones, UVM — P): sap per syrup = 86 / °Brix; revised for 66.0 °Brix
 * syrup (Perkins & Isselhardt, UVM Proctor — S): 87.1 / °Brix − 0.32. Keep it cold: above 40 °F
 * (4.4 °C) a caution, above 50 °F (10 °C) a warning (Ohio State maple program — S).
 *
 * vacuum: 12.9 L at 3 °Brix → 12.9 / 28.667 = 0.45 L; 12.9 / 28.713 = 0.44927 L; held at 6 °C
 *   (42.8 °F) → warm-sap; 4 taps → 3.225 L a tap.
 * bucket: 4.3 L at 2 °Brix → 4.3 / 43 = 0.1 L; 4.3 / 43.23 = 0.099468 L; held at 11 °C (51.8 °F)
 *   → spoiling-sap; 2 taps → 2.15 L a tap.
 * whole stand: 8.6 L at 2.5 °Brix → 8.6 / 34.4 = 0.25 L; 8.6 / 34.52 = 0.249131 L; held at 3 °C
 *   → no caution; all 6 taps → 1.4333 L a tap; 0.6 L of syrup made.
 */
const vacuum = {
  collectedOn: '2025-03-14',
  volumeL: 12.9,
  sugarPct: 3,
  heldAtC: 6,
  collection: 'vacuum',
};
const bucket = {
  collectedOn: '2025-03-15',
  volumeL: 4.3,
  sugarPct: 2,
  heldAtC: 11,
  collection: 'bucket',
};
const stand = {
  collectedOn: '2025-03-15',
  volumeL: 8.6,
  sugarPct: 2.5,
  heldAtC: 3,
  syrupMadeL: 0.6,
};
let vacuumId: number;

describe('recording sap', () => {
  it('when a tapper records a vacuum line’s sap, then it answers 201 with the syrup by both rules, a keep-it-cold caution and the yield per tap, as worked by hand', async () => {
    const res = await post(tapper, vacuum);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    vacuumId = res.body.id;
    expect(res.body).toMatchObject({
      sugarbushId: team.standId,
      season: 2025,
      collectedOn: '2025-03-14',
      volumeL: 12.9,
      sugarPct: 3,
      heldAtC: 6,
      collection: 'vacuum',
      syrupMadeL: null,
      note: null,
      taps: 4,
      recordedByName: 'tapper',
    });
    expect(res.body.expectedSyrupL).toBeCloseTo(0.45, 9);
    expect(res.body.expectedSyrupLRevised).toBeCloseTo(0.449272, 5);
    expect(res.body.yieldPerTapL).toBeCloseTo(3.225, 9);
    expect(res.body.cautions).toEqual([
      expect.objectContaining({
        code: 'warm-sap',
        level: 'caution',
        source: expect.stringMatching(/Ohio State/),
      }),
    ]);
  });

  it('when the forester records buckets held warm and the owner the whole stand, then each has its own taps, cautions and syrup', async () => {
    const b = await post(forester, bucket);
    expect(b.status).toBe(201);
    expect(b.body.taps).toBe(2);
    expect(b.body.expectedSyrupL).toBeCloseTo(0.1, 9);
    expect(b.body.expectedSyrupLRevised).toBeCloseTo(0.099468, 5);
    expect(b.body.yieldPerTapL).toBeCloseTo(2.15, 9);
    expect(b.body.cautions.map((c: { code: string; level: string }) => [c.code, c.level])).toEqual([
      ['spoiling-sap', 'warning'],
    ]);
    const s = await post(owner, stand);
    expect(s.status).toBe(201);
    expect(s.body).toMatchObject({ collection: null, taps: 6, syrupMadeL: 0.6, cautions: [] });
    expect(s.body.expectedSyrupL).toBeCloseTo(0.25, 9);
    expect(s.body.expectedSyrupLRevised).toBeCloseTo(0.249131, 5);
    expect(s.body.yieldPerTapL).toBeCloseTo(8.6 / 6, 9);
  });

  it('when the season is listed, then the totals add up as worked by hand, and a collection’s totals count its own taps', async () => {
    const res = await owner.agent.get(`/api/sugarbushes/${team.standId}/sap?season=2025`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ season: 2025, total: 3, page: 1, pageSize: 50 });
    expect(res.body.items.map((e: { collectedOn: string }) => e.collectedOn)).toEqual([
      '2025-03-14',
      '2025-03-15',
      '2025-03-15',
    ]);
    const totals = res.body.totals;
    expect(totals).toMatchObject({ taps: 6, days: 2, syrupMadeL: 0.6, entriesWithSyrup: 1 });
    // The one entry with syrup made: 8.6 L at 2.5 % → 8.6 / (86 / 2.5) = 0.25 L expected.
    expect(totals.expectedSyrupLWhereMade).toBeCloseTo(0.25, 9);
    expect(totals.volumeL).toBeCloseTo(25.8, 9);
    expect(totals.expectedSyrupL).toBeCloseTo(0.8, 9);
    expect(totals.expectedSyrupLRevised).toBeCloseTo(0.797871, 5);
    // (12.9 × 3 + 4.3 × 2 + 8.6 × 2.5) / 25.8 = 68.8 / 25.8
    expect(totals.meanSugarPct).toBeCloseTo(2.666667, 5);
    expect(totals.yieldPerTapL).toBeCloseTo(4.3, 9);

    const vac = await owner.agent.get(
      `/api/sugarbushes/${team.standId}/sap?season=2025&collection=vacuum`,
    );
    expect(vac.body.total).toBe(1);
    expect(vac.body.totals).toMatchObject({ taps: 4, days: 1, syrupMadeL: null });
    expect(vac.body.totals.yieldPerTapL).toBeCloseTo(3.225, 9);
    const whole = await owner.agent.get(
      `/api/sugarbushes/${team.standId}/sap?season=2025&collection=stand`,
    );
    expect(whole.body.items.map((e: { volumeL: number }) => e.volumeL)).toEqual([8.6]);

    const newest = await consultant.agent.get(
      `/api/sugarbushes/${team.standId}/sap?season=2025&sort=-collectedOn&pageSize=1&page=1`,
    );
    expect(newest.status).toBe(200);
    expect(newest.body.total).toBe(3);
    expect(newest.body.items).toHaveLength(1);
    expect(newest.body.items[0].collectedOn).toBe('2025-03-15');
    // The totals are the season's, not the page's.
    expect(newest.body.totals.volumeL).toBeCloseTo(25.8, 9);
  });

  it('when a season has no sap, then its totals are zero with no yield', async () => {
    const res = await owner.agent.get(`/api/sugarbushes/${team.standId}/sap?season=2024`);
    expect(res.body).toMatchObject({ items: [], total: 0 });
    expect(res.body.totals).toEqual({
      volumeL: 0,
      meanSugarPct: null,
      expectedSyrupL: 0,
      expectedSyrupLRevised: 0,
      syrupMadeL: null,
      entriesWithSyrup: 0,
      expectedSyrupLWhereMade: null,
      taps: 1,
      yieldPerTapL: 0,
      days: 0,
    });
  });
});

describe('correcting sap', () => {
  it('when the sugar content is corrected, then the entry answers with the new figures and the audit trail keeps the earlier value', async () => {
    const res = await forester.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', forester.csrf)
      .send({ sugarPct: 2.5, note: 'Refractometer recalibrated' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      id: vacuumId,
      sugarPct: 2.5,
      volumeL: 12.9,
      note: 'Refractometer recalibrated',
    });
    // 12.9 / (86 / 2.5) = 12.9 / 34.4
    expect(res.body.expectedSyrupL).toBeCloseTo(0.375, 9);
    const trail = await owner.agent.get(`/api/sugarbushes/${team.standId}/audit?kind=sap-entry`);
    const correction = trail.body.items.find(
      (e: { action: string; entityId: number }) =>
        e.action === 'correct' && e.entityId === vacuumId,
    );
    expect(correction.detail).toEqual({
      earlier: { sugarPct: 3, note: null },
      sugarPct: 2.5,
      note: 'Refractometer recalibrated',
    });
    expect(trail.body.items.filter((e: { action: string }) => e.action === 'create')).toHaveLength(
      3,
    );
  });

  it('when the date is corrected into another year, then the entry moves to that season and counts that season’s taps', async () => {
    const res = await owner.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ collectedOn: '2024-03-30' });
    expect(res.body).toMatchObject({ season: 2024, taps: 1 });
    const back = await owner.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ collectedOn: '2025-03-14' });
    expect(back.body).toMatchObject({ season: 2025, taps: 4 });
  });

  it('when a correction is empty or out of range, then it is refused with 400 and the field', async () => {
    const empty = await owner.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', owner.csrf)
      .send({});
    expect(empty.status).toBe(400);
    const sugar = await owner.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ sugarPct: 40 });
    expect(sugar.status).toBe(400);
    expect(sugar.body.error.fields.sugarPct).toBeTruthy();
  });

  it('when the consultant corrects, then 403; the outsider 404; a missing entry 404; signed out 401', async () => {
    const send = (who: Agent, id = vacuumId) =>
      who.agent.patch(`/api/sap/${id}`).set('x-csrf-token', who.csrf).send({ volumeL: 13 });
    expect((await send(consultant)).status).toBe(403);
    expect((await send(outsider)).status).toBe(404);
    expect((await send(owner, 999999)).status).toBe(404);
    const anon = await csrfAgent(t.app);
    const res = await anon.agent
      .patch(`/api/sap/${vacuumId}`)
      .set('x-csrf-token', anon.csrf)
      .send({ volumeL: 13 });
    expect(res.status).toBe(401);
    // There is no way to delete an entry.
    const del = await owner.agent.delete(`/api/sap/${vacuumId}`).set('x-csrf-token', owner.csrf);
    expect(del.status).toBe(404);
    expect(await t.db('sap_entries').where({ id: vacuumId }).first()).toBeTruthy();
  });
});

describe('who records sap', () => {
  it('when the consultant records sap, then 403; the outsider 404; signed out 401; everyone on the team reads it', async () => {
    expect((await post(consultant, vacuum)).status).toBe(403);
    expect((await post(outsider, vacuum)).status).toBe(404);
    expect((await request(t.app).get(`/api/sugarbushes/${team.standId}/sap`)).status).toBe(401);
    for (const who of [owner, forester, tapper, consultant])
      expect((await who.agent.get(`/api/sugarbushes/${team.standId}/sap?season=2025`)).status).toBe(
        200,
      );
    expect((await outsider.agent.get(`/api/sugarbushes/${team.standId}/sap`)).status).toBe(404);
  });

  it('when an entry is wrong, then each field is named with 400', async () => {
    const res = await post(owner, {
      collectedOn: '2025-02-30',
      volumeL: 0,
      sugarPct: 0.1,
      heldAtC: 60,
      collection: 'barrel',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual([
      'collectedOn',
      'collection',
      'heldAtC',
      'sugarPct',
      'volumeL',
    ]);
    const query = await owner.agent.get(
      `/api/sugarbushes/${team.standId}/sap?collection=barrel&colour=red`,
    );
    expect(query.status).toBe(400);
    expect(query.body.error.fields.collection).toBeTruthy();
  });
});
