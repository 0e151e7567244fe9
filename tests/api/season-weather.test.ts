import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  addMember,
  addSugarbush,
  addUser,
  csrfAgent,
  makeTestApp,
  signIn,
  standWithTeam,
} from './test-app';

const fixture = (name: string) =>
  fs.readFileSync(path.join(import.meta.dirname, '../fixtures/weather', name));

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let forester: Agent;
let tapper: Agent;
let consultant: Agent;
let outsider: Agent;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  forester = await signIn(t.app, team.users.forester);
  tapper = await signIn(t.app, team.users.tapper);
  consultant = await signIn(t.app, team.users.consultant);
  outsider = await signIn(t.app, team.users.outsider);
});
afterAll(() => t.close());

/** POST a station file as the multipart field `file`, with the form fields given. */
function importFile(
  who: Agent,
  standId: number,
  bytes: Buffer | string,
  fields: Record<string, string> = {},
  query = '',
) {
  let req = who.agent
    .post(`/api/sugarbushes/${standId}/weather/imports${query}`)
    .set('x-csrf-token', who.csrf);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', Buffer.isBuffer(bytes) ? bytes : Buffer.from(bytes), 'station.csv');
}

const weatherOf = async (standId: number, season: number) => {
  const res = await owner.agent.get(`/api/sugarbushes/${standId}/weather?season=${season}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  // The season's days, under both names a reader may look for.
  expect(res.body.days).toEqual(res.body.items);
  return res.body;
};

const auditCount = async (standId: number) =>
  Number(
    (
      await t
        .db('audit_events')
        .where({ sugarbush_id: standId, entity: 'weather-day' })
        .count({ n: '*' })
    )[0].n,
  );

/**
 * The °F fixture worked by hand with the freeze–thaw rule (DOMAIN §5: a night below 32 °F and a
 * day above it make a run; a night at or below 28 °F before a day in the 40s °F a strong one —
 * common practice): date, low °F, high °F, the run.
 */
const standardByHand: [string, number, number, 'none' | 'run' | 'strong'][] = [
  ['2025-03-01', 22, 38, 'run'], // hard frost, but the day stays under 40 °F
  ['2025-03-02', 25, 44, 'strong'],
  ['2025-03-03', 18, 30, 'none'], // the day stays frozen
  ['2025-03-04', 33, 47, 'none'], // the night does not freeze
  ['2025-03-05', 31, 35, 'run'], // a light run
  ['2025-03-07', 28, 40, 'strong'], // both on the line of a strong run
  ['2025-03-08', 27, 52, 'run'], // too warm for a strong run
  ['2025-03-09', 32, 41, 'none'], // a night at 32 °F does not freeze
  ['2025-03-10', 20, 33, 'run'], // a light run
];
const fToC = (f: number) => ((f - 32) * 5) / 9;

/** The °C fixture by hand: date, low °C, high °C, the run (same rule, in °F: 4.4 °C = 39.92 °F). */
const metricByHand: [string, number, number, 'none' | 'run' | 'strong'][] = [
  ['2026-02-20', -3.9, 4.4, 'run'], // 39.92 °F: just short of the 40s
  ['2026-02-21', -4.0, 5.0, 'strong'], // 24.8 °F night, 41 °F day
  ['2026-02-22', -9.5, -1.0, 'none'],
  ['2026-02-23', 1.0, 8.0, 'none'],
  ['2026-02-24', -2.0, 10.0, 'run'], // 50 °F is past the 40s
  ['2026-02-25', -0.5, 1.5, 'run'], // a light run: 31.1 °F night, 34.7 °F day
  ['2026-02-27', -6.0, 0.0, 'none'], // 32 °F: the day does not thaw
];

describe('importing a station’s daily summaries', () => {
  it('when the owner imports a file in °F, then every day is kept in °C and classified as worked by hand, and the day without TMAX is skipped', async () => {
    const res = await importFile(owner, team.standId, fixture('station-standard-f.csv'), {
      unit: 'F',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      station: 'USC00999999',
      unit: 'F',
      added: 9,
      replaced: 0,
      unchanged: 0,
      dryRun: false,
    });
    expect(res.body.skipped).toEqual([{ row: 7, reason: expect.stringContaining('2025-03-06') }]);
    const season = await weatherOf(team.standId, 2025);
    expect(season.season).toBe(2025);
    expect(season.total).toBe(9);
    expect(
      season.items.map((d: { date: string; minC: number; maxC: number; run: string }) => [
        d.date,
        d.minC,
        d.maxC,
        d.run,
      ]),
    ).toEqual(
      standardByHand.map(([date, low, high, run]) => [
        date,
        expect.closeTo(fToC(low), 9),
        expect.closeTo(fToC(high), 9),
        run,
      ]),
    );
    expect(season.items[1]).toMatchObject({
      source: 'station',
      station: 'USC00999999',
      // 25 °F = −3.89 °C, 44 °F = 6.67 °C
      reason: '\u22123.9 °C night, 6.7 °C day: a strong run',
    });
    // A season before this year has no forecast, and no error for it.
    expect(season).toMatchObject({ forecast: [], forecastSource: null, forecastError: null });
  });

  it('when the same file is imported again, then nothing changes and every day is counted unchanged', async () => {
    const before = await auditCount(team.standId);
    const res = await importFile(forester, team.standId, fixture('station-standard-f.csv'), {
      unit: 'F',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ added: 0, replaced: 0, unchanged: 9 });
    expect(await auditCount(team.standId)).toBe(before);
  });

  it('when a tapper checks the °C file with dryRun, then it reports the days and writes nothing; with dryRun=false it writes them, classified as worked by hand', async () => {
    const dry = await importFile(tapper, team.standId, fixture('station-metric-c.csv'), {
      unit: 'C',
      dryRun: 'true',
    });
    expect(dry.status, JSON.stringify(dry.body)).toBe(200);
    expect(dry.body).toMatchObject({ station: 'USC00999998', unit: 'C', added: 7, dryRun: true });
    expect((await weatherOf(team.standId, 2026)).total).toBe(0);

    const res = await importFile(tapper, team.standId, fixture('station-metric-c.csv'), {
      unit: 'C',
      dryRun: 'false',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ added: 7, dryRun: false });
    expect(res.body.skipped).toEqual([{ row: 8, reason: expect.stringContaining('TMIN') }]);
    const season = await weatherOf(team.standId, 2026);
    expect(
      season.items.map((d: { date: string; minC: number; maxC: number; run: string }) => [
        d.date,
        d.minC,
        d.maxC,
        d.run,
      ]),
    ).toEqual(metricByHand);
  });

  it('when the file does not say its unit and none is chosen, then it is refused with unit-required and nothing is guessed', async () => {
    const res = await importFile(owner, team.standId, fixture('station-standard-f.csv'));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unit-required');
    expect(res.body.error.message).toMatch(/°F or °C/);
    expect(res.body.error.fields.unit).toMatch(/°F/);
  });

  it('when the header names °F, then it is read as °F without a choice, and a choice of °C is refused on the unit field', async () => {
    const file = 'STATION,DATE,TMAX (°F),TMIN (°F)\nUSC00999997,2024-03-03,41,24\n';
    const refused = await importFile(owner, team.standId, file, { unit: 'C' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.unit).toMatch(/°F/);
    const taken = await importFile(owner, team.standId, file.replace(/ \(°F\)/g, '_F'), {
      dryRun: '1',
    });
    expect(taken.status, JSON.stringify(taken.body)).toBe(200);
    expect(taken.body.unit).toBe('F');
    expect(taken.body.days[0]).toMatchObject({ date: '2024-03-03', run: 'strong' });
    expect(taken.body.days[0].minC).toBeCloseTo(fToC(24), 9);
  });

  it('when a file holds two stations, then it is refused, asking for one station', async () => {
    const file =
      '"STATION","DATE","TMAX","TMIN"\n"USC00999999","2024-03-01","40","25"\n"USC00999996","2024-03-01","41","24"\n';
    const res = await importFile(owner, team.standId, file, { unit: 'F' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/one station/);
    expect(res.body.error.fields.file).toBeTruthy();
  });

  it('when the file lacks TMIN, or is in the element-per-row layout, then it is refused naming what is wrong', async () => {
    const noTmin = await importFile(
      owner,
      team.standId,
      'STATION,DATE,TMAX\nUSC00999999,2024-03-01,40\n',
      { unit: 'F' },
    );
    expect(noTmin.status).toBe(400);
    expect(noTmin.body.error.fields.file).toMatch(/TMIN/);
    const long = await importFile(
      owner,
      team.standId,
      'ID,DATE,ELEMENT,DATA_VALUE\nUSC00999999,20240301,TMAX,44\n',
      { unit: 'C' },
    );
    expect(long.status).toBe(400);
    expect(long.body.error.fields.file).toMatch(/daily summaries/);
  });

  it('when a unit other than F or C is sent, or no file, then it is refused with the field named', async () => {
    const unit = await importFile(owner, team.standId, fixture('station-standard-f.csv'), {
      unit: 'K',
    });
    expect(unit.status).toBe(400);
    expect(unit.body.error.fields.unit).toBeTruthy();
    const none = await owner.agent
      .post(`/api/sugarbushes/${team.standId}/weather/imports`)
      .set('x-csrf-token', owner.csrf)
      .field('unit', 'F');
    expect(none.status).toBe(400);
    expect(none.body.error.fields.file).toBeTruthy();
  });

  it('when the consultant imports, then it is refused with 403; an outsider gets 404', async () => {
    const res = await importFile(consultant, team.standId, fixture('station-standard-f.csv'), {
      unit: 'F',
    });
    expect(res.status).toBe(403);
    const hidden = await importFile(outsider, team.standId, fixture('station-standard-f.csv'), {
      unit: 'F',
    });
    expect(hidden.status).toBe(404);
  });
});

describe('recording a day by hand', () => {
  it('when the forester records a day, then it answers 201 with its run and reason; a second entry replaces it and the audit trail keeps the first', async () => {
    const first = await forester.agent
      .post(`/api/sugarbushes/${team.standId}/weather`)
      .set('x-csrf-token', forester.csrf)
      .send({ date: '2024-03-12', minC: -4, maxC: 5 });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.body).toEqual({
      date: '2024-03-12',
      minC: -4,
      maxC: 5,
      run: 'strong',
      reason: '\u22124 °C night, 5 °C day: a strong run',
      source: 'manual',
      station: null,
    });
    const second = await tapper.agent
      .post(`/api/sugarbushes/${team.standId}/weather`)
      .set('x-csrf-token', tapper.csrf)
      .send({ date: '2024-03-12', minC: 1, maxC: 7 });
    expect(second.status).toBe(201);
    expect(second.body.run).toBe('none');
    const season = await weatherOf(team.standId, 2024);
    expect(season.items.filter((d: { date: string }) => d.date === '2024-03-12')).toEqual([
      second.body,
    ]);
    const trail = await owner.agent.get(`/api/sugarbushes/${team.standId}/audit?kind=weather-day`);
    expect(trail.status).toBe(200);
    const replaced = trail.body.items.find(
      (e: { action: string; detail: { date: string } }) =>
        e.action === 'replace' && e.detail.date === '2024-03-12',
    );
    expect(replaced.detail).toMatchObject({
      minC: 1,
      maxC: 7,
      earlier: { minC: -4, maxC: 5, source: 'manual' },
    });
  });

  it('when a day has its high below its low, a date to come, or no low, then it is refused with 400 naming each field', async () => {
    const post = (body: object) =>
      owner.agent
        .post(`/api/sugarbushes/${team.standId}/weather`)
        .set('x-csrf-token', owner.csrf)
        .send(body);
    const upside = await post({ date: '2024-03-13', minC: 4, maxC: -2 });
    expect(upside.status).toBe(400);
    expect(upside.body.error.fields.maxC).toBeTruthy();
    const future = await post({ date: '2199-03-01', minC: -4, maxC: 4 });
    expect(future.status).toBe(400);
    expect(future.body.error.fields.date).toBeTruthy();
    const missing = await post({ date: '2024-03-13', maxC: 4 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields.minC).toBeTruthy();
    const extra = await post({ date: '2024-03-13', minC: -4, maxC: 4, source: 'station' });
    expect(extra.status).toBe(400);
  });

  it('when the consultant records a day, then it is refused with 403 but they read the log; signed out gets 401', async () => {
    const res = await consultant.agent
      .post(`/api/sugarbushes/${team.standId}/weather`)
      .set('x-csrf-token', consultant.csrf)
      .send({ date: '2024-03-14', minC: -4, maxC: 5 });
    expect(res.status).toBe(403);
    expect(
      (await consultant.agent.get(`/api/sugarbushes/${team.standId}/weather?season=2025`)).status,
    ).toBe(200);
    expect((await outsider.agent.get(`/api/sugarbushes/${team.standId}/weather`)).status).toBe(404);
    expect((await request(t.app).get(`/api/sugarbushes/${team.standId}/weather`)).status).toBe(401);
    const anon = await csrfAgent(t.app);
    const write = await anon.agent
      .post(`/api/sugarbushes/${team.standId}/weather`)
      .set('x-csrf-token', anon.csrf)
      .send({ date: '2024-03-14', minC: -4, maxC: 5 });
    expect(write.status).toBe(401);
  });

  it('when the query names something the log does not take, then it is refused with 400', async () => {
    const res = await owner.agent.get(
      `/api/sugarbushes/${team.standId}/weather?season=2025&page=2`,
    );
    expect(res.status).toBe(400);
    const season = await owner.agent.get(`/api/sugarbushes/${team.standId}/weather?season=twenty`);
    expect(season.status).toBe(400);
    expect(season.body.error.fields.season).toBeTruthy();
  });
});

describe('which season the log opens on', () => {
  it('when no season is asked, then it is the latest holding sap or weather, else this year; this year asks for a forecast', async () => {
    const standId = await addSugarbush(t.db, 'Empty Knoll');
    const ownerId = (await t.db('users').where({ email: team.users.owner }).first('id')).id;
    await addMember(t.db, ownerId, standId, 'owner');
    const empty = await owner.agent.get(`/api/sugarbushes/${standId}/weather`);
    expect(empty.status).toBe(200);
    const thisYear = new Date().getUTCFullYear();
    expect(empty.body).toMatchObject({ season: thisYear, items: [], total: 0, forecast: [] });
    // Neither a boundary nor a mapped tree: no place to forecast for, and the page says so.
    expect(empty.body.forecastError).toMatch(/boundary/);

    await owner.agent
      .post(`/api/sugarbushes/${standId}/weather`)
      .set('x-csrf-token', owner.csrf)
      .send({ date: '2023-03-02', minC: -3, maxC: 6 });
    expect((await owner.agent.get(`/api/sugarbushes/${standId}/weather`)).body.season).toBe(2023);
    await owner.agent
      .post(`/api/sugarbushes/${standId}/sap`)
      .set('x-csrf-token', owner.csrf)
      .send({ collectedOn: '2024-03-20', volumeL: 40, sugarPct: 2.2 });
    const latest = await owner.agent.get(`/api/sugarbushes/${standId}/weather`);
    expect(latest.body).toMatchObject({ season: 2024, items: [] });
    expect((await owner.agent.get(`/api/sugarbushes/${standId}/sap`)).body.season).toBe(2024);
  });

  it('when a second member is added, they read the same days', async () => {
    const id = await addUser(t.db, 'second-forester@test.example');
    await addMember(t.db, id, team.standId, 'forester');
    const second = await signIn(t.app, 'second-forester@test.example');
    const res = await second.agent.get(`/api/sugarbushes/${team.standId}/weather?season=2025`);
    expect(res.body.total).toBe(9);
  });
});

describe('the size of a station file', () => {
  it('when a file is larger than IMPORT_MAX_BYTES, then it is refused with 413 and nothing is written', async () => {
    const small = await makeTestApp({ IMPORT_MAX_BYTES: '300' });
    try {
      const t2 = await standWithTeam(small.db);
      const who = await signIn(small.app, t2.users.owner);
      const res = await importFile(who, t2.standId, fixture('station-standard-f.csv'), {
        unit: 'F',
      });
      expect(res.status).toBe(413);
      expect(res.body.error.code).toBe('file-too-large');
      expect(await small.db('weather_days').count({ n: '*' })).toEqual([{ n: 0 }]);
    } finally {
      await small.close();
    }
  });
});
