import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let forester: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  forester = await signIn(t.app, team.users.forester);
});
afterAll(() => t.close());

async function treeMeasured(tag: string, readings: [string, number][]) {
  const treeId = await addTree(t.db, team.standId, tag);
  await t.db('measurements').insert(
    readings.map(([measuredOn, dbhCm]) => ({
      tree_id: treeId,
      measured_on: measuredOn,
      season: Number(measuredOn.slice(0, 4)),
      dbh_cm: dbhCm,
    })),
  );
  await recordsWritten(t.db, team.standId, [treeId]);
  return treeId;
}

const record = (treeId: number, body: object) =>
  forester.agent
    .post(`/api/trees/${treeId}/measurements`)
    .set('x-csrf-token', forester.csrf)
    .send(body);

// A DBH change of more than about 2.5 cm in a year, or a shrink beyond tape error (about
// 0.3 cm), is an entry error until confirmed — common practice.
describe('recording a reading far off the one before it (common practice)', () => {
  it('when a forester records 4.5 cm more than last season unconfirmed, then it is refused with the question', async () => {
    const treeId = await treeMeasured('O-001', [
      ['2024-10-01', 40],
      ['2025-10-01', 40.5],
    ]);
    const res = await record(treeId, { measuredOn: '2026-10-01', dbhCm: 45 });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unconfirmed-outlier');
    expect(res.body.error.fields.confirmedOutlier).toBe(
      '4.5 cm more than last season — re-measure or confirm',
    );
    expect(await t.db('measurements').where({ tree_id: treeId })).toHaveLength(2);
  });

  it('when the forester confirms it, then it is stored with the confirmation and the advice uses it', async () => {
    const treeId = await treeMeasured('O-002', [
      ['2024-10-01', 40],
      ['2025-10-01', 40.5],
    ]);
    const res = await record(treeId, {
      measuredOn: '2026-10-01',
      dbhCm: 45,
      confirmedOutlier: true,
    });
    expect(res.status).toBe(201);
    expect(res.body.confirmedOutlier).toBe(true);
    const advice = await forester.agent.get(`/api/trees/${treeId}/advice?season=2027`);
    expect(advice.body.dbhCm).toBe(45);
    expect(advice.body.warnings.map((w: { code: string }) => w.code)).not.toContain(
      'measurement-outlier',
    );
  });

  it('when a reading shrinks 0.5 cm, then it must be confirmed too; a 0.2 cm shrink is tape error', async () => {
    const treeId = await treeMeasured('O-003', [['2025-10-01', 40]]);
    const shrunk = await record(treeId, { measuredOn: '2026-10-01', dbhCm: 39.5 });
    expect(shrunk.status).toBe(400);
    expect(shrunk.body.error.fields.confirmedOutlier).toContain('less than last season');
    const wobble = await record(treeId, { measuredOn: '2026-10-01', dbhCm: 39.8 });
    expect(wobble.status).toBe(201);
    expect(wobble.body.confirmedOutlier).toBe(false);
  });

  it('when an ordinary reading is sent as confirmed, then it is stored as an ordinary reading', async () => {
    const treeId = await treeMeasured('O-004', [['2025-10-01', 40]]);
    const res = await record(treeId, {
      measuredOn: '2026-10-01',
      dbhCm: 40.6,
      confirmedOutlier: true,
    });
    expect(res.status).toBe(201);
    expect(res.body.confirmedOutlier).toBe(false);
  });

  it('when an old outlier sits unconfirmed in the record, then the advice leaves it out and says why', async () => {
    const treeId = await treeMeasured('O-005', [
      ['2023-10-01', 40],
      ['2024-10-01', 40.5],
      ['2025-10-01', 405],
    ]);
    const advice = await forester.agent.get(`/api/trees/${treeId}/advice?season=2027`);
    expect(advice.body.dbhCm).toBe(40.5);
    const why = advice.body.warnings.find(
      (w: { code: string }) => w.code === 'measurement-outlier',
    );
    expect(why.message).toContain('2025-10-01');
  });

  it('when a correction replaces the outlier, then it is checked against the reading before it', async () => {
    const treeId = await treeMeasured('O-006', [
      ['2024-10-01', 40],
      ['2025-10-01', 405],
    ]);
    const bad = await t.db('measurements').where({ tree_id: treeId, dbh_cm: 405 }).first('id');
    const res = await record(treeId, { measuredOn: '2025-10-01', dbhCm: 40.5, correctsId: bad.id });
    expect(res.status).toBe(201);
  });
});
