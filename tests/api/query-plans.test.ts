/**
 * The hot reads stay on their indexes: every statement a page sends is explained by SQLite
 * (`EXPLAIN QUERY PLAN`) and none may walk a whole table or need an index SQLite builds for
 * itself. With no `ANALYZE` statistics the planner chooses the same way on a small test stand as
 * on one of 100,000 trees, so a plan that scans here scans there. SQLite only: PostgreSQL's
 * planner goes by table statistics, and on a test stand of a dozen trees it rightly reads whole
 * tables, so its plans here say nothing about a large stand.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adviceRepository } from '../../server/modules/advice/advice.repository';
import { adviseAndStore } from '../../server/modules/advice/advise-and-store';
import { inspectMbtiles } from '../../server/modules/basemaps/mbtiles';
import { buildMapBytes } from '../../server/modules/map/map-task';
import { TILE_LOOKUP_SQL } from '../../server/modules/basemaps/tile-store';
import { solidPng, writeMbtiles } from './mbtiles-fixture';
import {
  cteNames,
  explain,
  explainRaw,
  offIndexSteps,
  queriesDuring,
  type CapturedQuery,
} from './query-plan';
import { upcomingSeason } from '../../shared/schemas/plan';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';
import { onPostgres } from './test-database';

const describeOnSqlite = describe.skipIf(onPostgres);

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let treeId: number;

beforeAll(async () => {
  if (onPostgres) return;
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  for (let i = 1; i <= 12; i++) {
    const id = await addTree(t.db, team.standId, `Q-${String(i).padStart(2, '0')}`, {
      lat: 44.3 + i / 1e4,
      lng: -72.6,
    });
    const [first] = await t
      .db('measurements')
      .insert([
        { tree_id: id, measured_on: '2024-10-01', season: 2024, dbh_cm: 30 + i },
        { tree_id: id, measured_on: '2025-10-01', season: 2025, dbh_cm: 31 + i },
      ])
      .returning('id');
    // A corrected reading, so the plans see the "no later row corrects it" test at work.
    if (i % 4 === 0)
      await t.db('measurements').insert({
        tree_id: id,
        measured_on: '2024-10-01',
        season: 2024,
        dbh_cm: 30.5 + i,
        corrects_id: first.id,
      });
    await t.db('tapholes').insert({
      tree_id: id,
      season: 2025,
      height_cm: 90,
      azimuth_deg: 180,
      depth_cm: 5,
      bit_cm: 0.8,
      collection: 'vacuum',
    });
    treeId = id;
  }
  await recordsWritten(t.db, team.standId);
  owner = await signIn(t.app, team.users.owner);
  // The season's advice stored once, so the reads below are the steady state's.
  expect((await owner.agent.get(`/api/sugarbushes/${team.standId}/plan`)).status).toBe(200);
});
afterAll(() => t?.close());

/** The statements `work` sends, each with the plan steps that leave the indexes. */
async function offIndexDuring(work: () => Promise<unknown>) {
  const queries = await queriesDuring(t.db, work);
  expect(queries.length).toBeGreaterThan(0);
  const report: { sql: string; steps: string[] }[] = [];
  for (const q of queries as CapturedQuery[]) {
    const steps = offIndexSteps(q.sql, await explain(t.db, q), cteNames(q.sql));
    if (steps.length) report.push({ sql: q.sql, steps });
  }
  return report;
}

const offIndex = (url: string) =>
  offIndexDuring(async () => {
    const res = await owner.agent.get(url);
    expect(res.status).toBe(200);
  });

describeOnSqlite('query plans of the hot reads', () => {
  it('when a page of the tree register is read, in each order and filter, then no statement walks a whole table', async () => {
    for (const query of ['', '&sort=-dbh', '&sort=species', '&status=dead', '&q=Q-0']) {
      const url = `/api/sugarbushes/${team.standId}/trees?page=1&pageSize=50${query}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when one tree is read, then no statement walks a whole table', async () => {
    expect(await offIndex(`/api/trees/${treeId}`)).toEqual([]);
  });

  it('when a plan page is read, in each order and filter, then no statement walks a whole table', async () => {
    for (const query of [
      '',
      '&sort=-taps',
      '&sort=share',
      '&sort=dbh',
      '&sort=verdict',
      '&sort=walk',
      '&sort=walk&fromLat=45.5&fromLng=-72.1',
      '&verdict=tap',
      '&warning=slow-growth',
      '&share=90-95',
      '&q=Q-0',
    ]) {
      const url = `/api/sugarbushes/${team.standId}/plan?page=1&pageSize=50${query}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when the notes lists and the needs-a-look queue are read, in each order and filter, then no statement walks a whole table', async () => {
    const consultantId = (await t.db('users').where({ email: team.users.consultant }).first()).id;
    await t.db('notes').insert([
      {
        sugarbush_id: team.standId,
        tree_id: treeId,
        author_id: consultantId,
        category: 'hazard',
        body: 'Hanger',
      },
      {
        sugarbush_id: team.standId,
        tree_id: treeId,
        author_id: consultantId,
        category: 'follow-up',
        body: 'Tape it',
        follow_up_on: '2026-01-10',
      },
      {
        sugarbush_id: team.standId,
        tree_id: null,
        author_id: consultantId,
        category: 'management',
        body: 'Thin',
      },
    ]);
    const urls = [
      ...[
        '',
        '&sort=followUp',
        '&category=hazard',
        '&followUp=due',
        '&status=open',
        '&scope=stand',
        '&q=tape',
      ].map((query) => `/api/sugarbushes/${team.standId}/notes?page=1&pageSize=50${query}`),
      `/api/trees/${treeId}/notes`,
      ...[
        '',
        '&sort=tag',
        '&sort=followUp',
        '&reason=hazard',
        '&reason=due',
        '&warning=slow-growth',
        '&q=Q-0',
      ].map((query) => `/api/sugarbushes/${team.standId}/attention?page=1&pageSize=50${query}`),
    ];
    for (const url of urls)
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
  });

  it('when the woods map, the stand figures or the advice status are read, then no statement walks a whole table', async () => {
    for (const path of ['map', 'figures', 'advice-status']) {
      const url = `/api/sugarbushes/${team.standId}/${path}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when the trends or the compliance report are read, then no statement of the request walks a whole table', async () => {
    for (const path of [
      'trends',
      'compliance?season=2025',
      'compliance?season=2025&finding=over',
    ]) {
      const url = `/api/sugarbushes/${team.standId}/${path}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when the issued plan, the season’s progress or a page of the field sheet is read, then no statement of the request walks a whole table', async () => {
    const season = upcomingSeason();
    const issued = await owner.agent
      .post(`/api/sugarbushes/${team.standId}/issued-plans`)
      .set('x-csrf-token', owner.csrf)
      .send({ season });
    expect(issued.status).toBe(201);
    for (const path of [
      `issued-plans/${season}?page=1&pageSize=5`,
      `issued-plans/${season}?page=2&pageSize=5&changesPage=2`,
      'issued-plans',
      `plan/progress?season=${season}`,
      `plan/field-sheet?season=${season}&page=2&pageSize=5`,
      `plan/field-sheet?season=${season}&verdict=tap`,
    ]) {
      const url = `/api/sugarbushes/${team.standId}/${path}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when a page of the audit trail is read, by kind and by person, then no statement walks a whole table', async () => {
    const ownerId = (await t.db('users').where({ email: team.users.owner }).first('id')).id;
    await owner.agent
      .patch(`/api/sugarbushes/${team.standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ name: 'Test Ridge' });
    for (const query of ['', '&kind=measurement', `&userId=${ownerId}`]) {
      const url = `/api/sugarbushes/${team.standId}/audit?page=1&pageSize=50${query}`;
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
    }
  });

  it('when the season log’s weather and sap are read, in each season, order and collection, then no statement walks a whole table', async () => {
    const send = (url: string, body: object) =>
      owner.agent.post(url).set('x-csrf-token', owner.csrf).send(body);
    for (const [date, collection] of [
      ['2025-03-10', 'vacuum'],
      ['2025-03-11', 'bucket'],
      ['2025-03-12', null],
    ] as const) {
      expect(
        (await send(`/api/sugarbushes/${team.standId}/weather`, { date, minC: -4, maxC: 6 }))
          .status,
      ).toBe(201);
      const sap = { collectedOn: date, volumeL: 80, sugarPct: 2.2, heldAtC: 3, collection };
      expect((await send(`/api/sugarbushes/${team.standId}/sap`, sap)).status).toBe(201);
    }
    const urls = [
      ...['', '?season=2025', `?season=${new Date().getUTCFullYear()}`].map(
        (q) => `/api/sugarbushes/${team.standId}/weather${q}`,
      ),
      ...[
        '',
        '?season=2025',
        '?season=2025&sort=-collectedOn&page=1&pageSize=2',
        '?season=2025&collection=vacuum',
        '?season=2025&collection=stand',
      ].map((q) => `/api/sugarbushes/${team.standId}/sap${q}`),
    ];
    for (const url of urls)
      expect({ url, offIndex: await offIndex(url) }).toEqual({ url, offIndex: [] });
  });

  it("when the measuring round or a tree's record is read, then no statement walks a whole table", async () => {
    expect(await offIndex(`/api/sugarbushes/${team.standId}/round`)).toEqual([]);
    expect(await offIndex(`/api/trees/${treeId}/record`)).toEqual([]);
  });

  it('when a reading is sent again with its client id, then the look-up stays on its index', async () => {
    const body = {
      measuredOn: '2025-11-21',
      dbhCm: 43.3,
      clientId: '5a8f2c1e-7d4b-4e6a-9c3f-2b1d0e9a8c7f',
    };
    const send = () =>
      owner.agent
        .post(`/api/trees/${treeId}/measurements`)
        .set('x-csrf-token', owner.csrf)
        .send(body);
    expect((await send()).status).toBe(201);
    const steps = await offIndexDuring(async () => expect((await send()).status).toBe(200));
    expect(steps).toEqual([]);
  });

  it("when a tree's advice page is read, then no statement walks a whole table", async () => {
    expect(await offIndex(`/api/trees/${treeId}/advice`)).toEqual([]);
  });

  it('when a measurement is recorded and its tree re-advised, then no statement walks a whole table', async () => {
    const steps = await offIndexDuring(async () => {
      const res = await owner.agent
        .post(`/api/trees/${treeId}/measurements`)
        .set('x-csrf-token', owner.csrf)
        .send({ measuredOn: '2025-11-20', dbhCm: 43.2, crownDiebackPct: 0 });
      expect(res.status).toBe(201);
    });
    expect(steps).toEqual([]);
  });

  it("when the stand's advice is recomputed, then a worker's statements stay on their indexes", async () => {
    const season = upcomingSeason();
    const ids = (await t.db('trees').where({ sugarbush_id: team.standId }).pluck('id')).map(Number);
    const steps = await offIndexDuring(async () => {
      await adviceRepository(t.db).staleTreeIds(team.standId, season, 0);
      await adviseAndStore(t.db, team.standId, season, ids.slice(0, 5));
    });
    expect(steps).toEqual([]);
  });

  it("when the woods map's answer is built (in a worker, on its own connection), then its statements stay on their indexes", async () => {
    const season = upcomingSeason();
    const { advice_version } = await t
      .db('sugarbushes')
      .where({ id: team.standId })
      .first('advice_version');
    const steps = await offIndexDuring(async () => {
      const built = await buildMapBytes(t.db, {
        sugarbushId: team.standId,
        season,
        standVersion: Number(advice_version),
        gzip: false,
      });
      expect(built.complete).toBe(true);
    });
    expect(steps).toEqual([]);
  });

  it('when a tile is looked up in an uploaded basemap, then it is found through the lookup index', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-plan-'));
    for (const asViews of [false, true]) {
      const file = writeMbtiles(path.join(dir, `tiles-${asViews ? 'view' : 'table'}.mbtiles`), {
        asViews,
        tiles: [{ z: 3, x: 2, row: 5, data: solidPng([10, 120, 60]) }],
      });
      inspectMbtiles(file); // what an upload goes through: adds the lookup indexes
      const db = new Database(file, { readonly: true });
      try {
        const plan = explainRaw(db, TILE_LOOKUP_SQL, [3, 2, 5]);
        expect(offIndexSteps(TILE_LOOKUP_SQL, plan)).toEqual([]);
        expect(plan.join('\n')).toMatch(
          /SEARCH (tiles|map) USING (COVERING )?INDEX \w+ \(zoom_level=\? AND tile_column=\? AND tile_row=\?\)/,
        );
      } finally {
        db.close();
      }
    }
  });
});
