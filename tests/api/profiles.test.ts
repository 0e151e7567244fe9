import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let forester: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  forester = await signIn(t.app, team.users.forester);
  // T-001 at 40 cm (15.7 in): one tap in the conservative set, two in the traditional set.
  await t.db('measurements').insert([
    { tree_id: team.treeId, measured_on: '2024-10-01', season: 2024, dbh_cm: 39.2 },
    { tree_id: team.treeId, measured_on: '2025-10-01', season: 2025, dbh_cm: 40 },
  ]);
  await recordsWritten(t.db, team.standId, [team.treeId]);
});
afterAll(() => t.close());

const patch = (who: typeof owner, body: object) =>
  who.agent.patch(`/api/sugarbushes/${team.standId}`).set('x-csrf-token', who.csrf).send(body);
const tableTaps = async () =>
  (await owner.agent.get(`/api/trees/${team.treeId}/advice?season=2027`)).body;

describe('choosing the guideline profile', () => {
  it('when the owner picks the traditional set, then the advice follows its table', async () => {
    expect((await tableTaps()).tableTaps).toBe(1);
    const res = await patch(owner, { profile: 'traditional' });
    expect(res.status).toBe(200);
    expect(res.body.profile).toBe('traditional');
    const advice = await tableTaps();
    expect(advice.profile.key).toBe('traditional');
    expect(advice.tableTaps).toBe(2);
  });

  it('when a forester tries to change it, then 403', async () => {
    const res = await patch(forester, { profile: 'conservative' });
    expect(res.status).toBe(403);
  });

  it('when the key is unknown, then 400 names the profile field and nothing changes', async () => {
    const res = await patch(owner, { profile: 'generous' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.profile).toContain('conservative');
    expect((await t.db('sugarbushes').where({ id: team.standId }).first()).profile).toBe(
      'traditional',
    );
  });

  it('when a custom set has bands that do not rise, then each bad band is named', async () => {
    const res = await patch(owner, {
      profile: 'custom',
      customProfile: {
        label: 'Our own',
        unit: 'in',
        bands: [
          { from: 14, taps: 1 },
          { from: 12, taps: 2 },
        ],
        spacing: { sidewaysCm: 10, verticalCm: 30 },
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['customProfile.bands.1.from']).toMatch(/rise/);
  });

  it('when the owner saves a valid custom set, then the advice uses it', async () => {
    const res = await patch(owner, {
      profile: 'custom',
      customProfile: {
        label: 'Lease terms 2027',
        unit: 'in',
        bands: [
          { from: 15, taps: 1 },
          { from: 22, taps: 2 },
        ],
        spacing: { sidewaysCm: 10, verticalCm: 30 },
      },
    });
    expect(res.status).toBe(200);
    expect(res.body.customProfile.label).toBe('Lease terms 2027');
    const advice = await tableTaps();
    expect(advice.profile).toMatchObject({ key: 'custom', label: 'Lease terms 2027' });
    expect(advice.tableTaps).toBe(1);
  });

  it('when custom is chosen before any custom set was saved, then 400 asks for one', async () => {
    const other = await signIn(t.app, team.users.outsider);
    const res = await other.agent
      .patch(`/api/sugarbushes/${team.otherStandId}`)
      .set('x-csrf-token', other.csrf)
      .send({ profile: 'custom' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.customProfile).toBeTruthy();
  });
});
