import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
});
afterAll(() => t.close());

const sane = {
  label: 'Lease terms 2027',
  unit: 'in',
  bands: [
    { from: 12, taps: 1 },
    { from: 18, taps: 2 },
  ],
  spacing: { sidewaysCm: 10, verticalCm: 30 },
};
const zone = { barkCm: 0.6, stainLengthCm: 30, stainMarginCm: 1, zoneHeightCm: 90 };
const drillAll = (d: { depthCm: number; bitCm: number }) => ({ bucket: d, gravity: d, vacuum: d });

const save = (customProfile: object) =>
  owner.agent
    .patch(`/api/sugarbushes/${team.standId}`)
    .set('x-csrf-token', owner.csrf)
    .send({ profile: 'custom', customProfile });

const stored = async () =>
  (await t.db('sugarbushes').where({ id: team.standId }).first('profile', 'custom_profile')) as {
    profile: string;
    custom_profile: string | null;
  };

describe('saving a custom guideline profile', () => {
  it.each([
    [
      '0.01 cm to the side',
      { spacing: { sidewaysCm: 0.01, verticalCm: 30 } },
      'spacing.sidewaysCm',
    ],
    ['0.01 cm up or down', { spacing: { sidewaysCm: 10, verticalCm: 0.01 } }, 'spacing.verticalCm'],
    ['a 0–400 cm height band', { heightBand: { minCm: 0, maxCm: 400 } }, 'heightBand.minCm'],
    ['a 0–400 cm height band', { heightBand: { minCm: 0, maxCm: 400 } }, 'heightBand.maxCm'],
    ['a 300–400 cm height band', { heightBand: { minCm: 300, maxCm: 400 } }, 'heightBand.minCm'],
    ['a 300–400 cm height band', { heightBand: { minCm: 300, maxCm: 400 } }, 'heightBand.maxCm'],
    ['a 20 cm tall height band', { heightBand: { minCm: 80, maxCm: 100 } }, 'heightBand.maxCm'],
    ['a 10 cm deep hole', { drill: drillAll({ depthCm: 10, bitCm: 0.8 }) }, 'drill.vacuum.depthCm'],
    ['a 2 cm bit', { drill: drillAll({ depthCm: 5, bitCm: 2 }) }, 'drill.vacuum.bitCm'],
    ['a floor of 0.01', { zone: { ...zone, floor: 0.01 } }, 'zone.floor'],
    [
      'rest from 0 % dieback',
      { stressed: { maxTaps: 1, noneBelowCm: 30.48, diebackPct: 15, restAtDiebackPct: 0 } },
      'stressed.restAtDiebackPct',
    ],
    [
      'band edges 1 cm apart',
      {
        unit: 'cm',
        bands: [
          { from: 30, taps: 1 },
          { from: 31, taps: 2 },
        ],
      },
      'bands.1.from',
    ],
    [
      'five taps',
      { bands: [12, 15, 18, 21, 24].map((from, i) => ({ from, taps: i + 1 })) },
      'bands',
    ],
  ])(
    'when an owner saves %s, then it is refused with 400 naming customProfile.%s',
    async (_, patch, field) => {
      const before = await stored();
      const res = await save({ ...sane, ...patch });
      expect(res.status).toBe(400);
      expect(res.body.error.fields[`customProfile.${field}`]).toEqual(expect.any(String));
      expect(await stored()).toEqual(before);
    },
  );

  it('when an owner saves a sane set with a 900 KB unknown field, then only the checked set is stored and served', async () => {
    const res = await save({ ...sane, padding: 'x'.repeat(900_000) });
    expect(res.status).toBe(200);
    const row = await stored();
    expect(row.profile).toBe('custom');
    expect(row.custom_profile!.length).toBeLessThan(5000);
    expect(JSON.parse(row.custom_profile!)).not.toHaveProperty('padding');
    // Defaults are filled in: what is stored is the advisor's checked profile.
    expect(JSON.parse(row.custom_profile!)).toMatchObject({
      zone: { floor: 0.82 },
      spacing: { rule: 'either' },
    });
    const forester = await signIn(t.app, team.users.forester);
    const served = await forester.agent.get(`/api/sugarbushes/${team.standId}`);
    expect(JSON.stringify(served.body).length).toBeLessThan(10_000);
    expect(served.body.customProfile).not.toHaveProperty('padding');
  });

  it('when the saved set is in use, then the advice keeps to its height band and spacing', async () => {
    await t.db('measurements').insert([
      { tree_id: team.treeId, measured_on: '2024-10-01', season: 2024, dbh_cm: 50 },
      { tree_id: team.treeId, measured_on: '2025-10-01', season: 2025, dbh_cm: 50.6 },
    ]);
    await recordsWritten(t.db, team.standId, [team.treeId]);
    const res = await save({ ...sane, heightBand: { minCm: 40, maxCm: 120 } });
    expect(res.status).toBe(200);
    const advice = await owner.agent.get(`/api/trees/${team.treeId}/advice?season=2027`);
    expect(advice.status).toBe(200);
    expect(advice.body.profile.heightBand).toEqual({ minCm: 40, maxCm: 120 });
    for (const p of advice.body.placements) {
      expect(p.heightCm).toBeGreaterThanOrEqual(40);
      expect(p.heightCm).toBeLessThanOrEqual(120);
    }
  });
});
