import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../seeds/01_demo';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { mapRepository } from '../../server/modules/map/map.repository';
import type { MapColumns } from '../../shared/schemas/map';
import type { PlanItem, StandPlanResponse } from '../../shared/schemas/plan';
import { makeTestApp, signIn } from './test-app';
import { onPostgres } from './test-database';

const SEASON = 2027;

let t: Awaited<ReturnType<typeof makeTestApp>>;
let standId: number;
let owner: Awaited<ReturnType<typeof signIn>>;
let forester: Awaited<ReturnType<typeof signIn>>;
const mapUrl = () => `/api/sugarbushes/${standId}/map?season=${SEASON}`;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  standId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  owner = await signIn(t.app, 'owner@fernside.example', DEMO_PASSWORD);
  forester = await signIn(t.app, 'forester@fernside.example', DEMO_PASSWORD);
});
afterAll(() => t.close());

const getMap = async (etag?: string) => {
  const req = forester.agent.get(mapUrl());
  return etag ? req.set('if-none-match', etag) : req;
};

/** Every item of the season's plan, page by page. */
async function planOf(): Promise<StandPlanResponse & { all: PlanItem[] }> {
  const all: PlanItem[] = [];
  let first: StandPlanResponse | undefined;
  for (let page = 1; !first || all.length < first.total; page++) {
    const res = await forester.agent.get(
      `/api/sugarbushes/${standId}/plan?season=${SEASON}&pageSize=500&page=${page}`,
    );
    expect(res.status).toBe(200);
    first ??= res.body as StandPlanResponse;
    all.push(...(res.body as StandPlanResponse).items);
  }
  return { ...first, all };
}

const decodeWarnings = (body: MapColumns, i: number) =>
  body.codes.warning.filter((_, bit) => (body.warnings[i] & (1 << bit)) !== 0);

describe('the map of the demo stand, column by column', () => {
  it('when the forester opens it, then every column has one entry per tree and the i-th entry of each is the same tree', async () => {
    const res = await getMap();
    expect(res.status).toBe(200);
    const body = res.body as MapColumns;
    const trees = await t
      .db('trees')
      .where({ sugarbush_id: standId })
      .select('id', 'tag', 'lat', 'lng', 'species', 'status');
    expect(body.count).toBe(trees.length);
    for (const column of [
      'ids',
      'tags',
      'lat',
      'lng',
      'verdict',
      'taps',
      'warnings',
      'status',
      'species',
      'outside',
    ] as const)
      expect(body[column], column).toHaveLength(body.count);

    const byId = new Map(trees.map((tree) => [tree.id, tree]));
    const round = (v: number | null) => (v === null ? null : Math.round(v * 1e6) / 1e6);
    body.ids.forEach((id, i) => {
      const tree = byId.get(id)!;
      expect(tree, `tree ${id}`).toBeDefined();
      expect({
        tag: body.tags[i],
        lat: body.lat[i],
        lng: body.lng[i],
        species: body.codes.species[body.species[i]],
        status: body.codes.status[body.status[i]],
      }).toEqual({
        tag: tree.tag,
        lat: round(tree.lat),
        lng: round(tree.lng),
        species: tree.species,
        status: tree.status,
      });
    });
    expect(new Set(body.ids).size).toBe(body.count);
    expect([...body.tags].sort()).toEqual(body.tags); // tag order
  });

  it('gives each tree the verdict, taps and warnings its plan item has', async () => {
    const body = (await getMap()).body as MapColumns;
    const plan = await planOf();
    const items = new Map(plan.all.map((item) => [item.treeId, item]));
    expect(items.size).toBe(body.count);
    body.ids.forEach((id, i) => {
      const item = items.get(id)!;
      expect(
        {
          tag: body.tags[i],
          verdict: body.codes.verdict[body.verdict[i]],
          taps: body.taps[i],
          warnings: decodeWarnings(body, i).sort(),
        },
        item.tag,
      ).toEqual({
        tag: item.tag,
        verdict: item.verdict,
        taps: item.taps,
        warnings: [...new Set(item.warnings.map((w) => w.code))].sort(),
      });
    });
  });

  it("counts, per verdict and per warning, what the plan's totals count", async () => {
    const body = (await getMap()).body as MapColumns;
    const { totals } = await planOf();
    const count = (verdict: string) =>
      body.verdict.filter((v) => body.codes.verdict[v] === verdict).length;
    expect({
      trees: body.count,
      treesToTap: body.taps.filter((n) => n > 0).length,
      taps: body.taps.reduce((s, n) => s + n, 0),
      reduced: count('tap-reduced'),
      rested: count('rest'),
      tooSmall: count('too-small'),
      retired: count('retired'),
      unmeasured: count('unmeasured'),
      warningsByCode: Object.fromEntries(
        body.codes.warning.map((code, bit) => [
          code,
          body.warnings.filter((mask) => (mask & (1 << bit)) !== 0).length,
        ]),
      ),
    }).toEqual(totals);
    expect(totals.taps).toBeGreaterThan(1000);
    expect(count('tap')).toBeGreaterThan(0);
  });
});

describe('the map answer cached by the browser', () => {
  it('when nothing changed, then the tag it was sent with is answered with an empty 304', async () => {
    const first = await getMap();
    expect(first.headers.etag).toMatch(/^W\/"map-/);
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const again = await getMap(first.headers.etag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
    expect(again.headers.etag).toBe(first.headers.etag);
    const other = await forester.agent.get(`/api/sugarbushes/${standId}/map?season=2026`);
    expect(other.headers.etag).not.toBe(first.headers.etag);
  });

  it('when a measurement is recorded, then the map is sent again under a new tag', async () => {
    const before = await getMap();
    const tree = await t.db('trees').where({ sugarbush_id: standId, tag: 'OL-1181' }).first('id');
    const recorded = await forester.agent
      .post(`/api/trees/${tree.id}/measurements`)
      .set('x-csrf-token', forester.csrf)
      .send({ measuredOn: '2026-11-30', dbhCm: 36.5 });
    expect(recorded.status).toBe(201);
    const after = await getMap(before.headers.etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(before.headers.etag);
    const i = (after.body as MapColumns).ids.indexOf(tree.id);
    const j = (before.body as MapColumns).ids.indexOf(tree.id);
    expect(before.body.codes.verdict[before.body.verdict[j]]).toBe('unmeasured');
    expect(after.body.codes.verdict[after.body.verdict[i]]).not.toBe('unmeasured');
    expect((await getMap(after.headers.etag)).status).toBe(304);
  });

  it('when the guideline changes, then the map is sent again under a new tag', async () => {
    const before = await getMap();
    const changed = await owner.agent
      .patch(`/api/sugarbushes/${standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ profile: 'traditional' });
    expect(changed.status).toBe(200);
    const after = await getMap(before.headers.etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(before.headers.etag);
    const taps = (body: MapColumns) => body.taps.reduce((s, n) => s + n, 0);
    expect(taps(after.body)).not.toBe(taps(before.body)); // the traditional set taps more
  });

  it('when the boundary changes, then the map is sent again under a new tag', async () => {
    const before = await getMap();
    const stand = await owner.agent.get(`/api/sugarbushes/${standId}`);
    const ring = stand.body.boundary.coordinates[0] as [number, number][];
    // The same outline drawn from its next vertex: a new shape as far as the record goes.
    const moved = { type: 'Polygon', coordinates: [[...ring.slice(1), ring[1]]] };
    const changed = await owner.agent
      .patch(`/api/sugarbushes/${standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ boundary: moved });
    expect(changed.status, JSON.stringify(changed.body)).toBe(200);
    const after = await getMap(before.headers.etag);
    expect(after.status).toBe(200);
    expect(after.headers.etag).not.toBe(before.headers.etag);
  });

  it('when the outsider sends a tag the stand answered, then the stand is still not found', async () => {
    const { etag } = (await getMap()).headers;
    const outsider = await signIn(t.app, 'outsider@elsewhere.example', DEMO_PASSWORD);
    const res = await outsider.agent.get(mapUrl()).set('if-none-match', etag);
    expect(res.status).toBe(404);
  });
});

describe('the map query', () => {
  // SQLite's own plan format; PostgreSQL picks by cost, and on a small table may rightly scan.
  it.skipIf(onPostgres)(
    'reaches each tree by the stand index and its stored advice by the primary key, without a sort',
    async () => {
      const version = Number(
        (await t.db('sugarbushes').where({ id: standId }).first('advice_version')).advice_version,
      );
      const { sql, bindings } = mapRepository(t.db)
        .standRows(standId, SEASON, version)
        .toSQL()
        .toNative();
      const plan: { detail: string }[] = await t.db.raw(`explain query plan ${sql}`, [...bindings]);
      const steps = plan.map((p) => p.detail);
      expect(steps).toContainEqual(
        expect.stringMatching(/^SEARCH t USING (COVERING )?INDEX trees_sugarbush_id_tag_unique/),
      );
      expect(steps).toContainEqual(
        expect.stringMatching(
          /^SEARCH a USING INDEX sqlite_autoindex_tree_advice_1 \(tree_id=\? AND season=\?\)/,
        ),
      );
      expect(steps.filter((s) => /^SCAN|TEMP B-TREE/.test(s))).toEqual([]);
    },
  );

  it('reads stored columns only: with every stored advice text unreadable, the map and figures answer as before', async () => {
    const [map, figures] = await Promise.all([
      getMap(),
      forester.agent.get(`/api/sugarbushes/${standId}/figures?season=${SEASON}`),
    ]);
    await t.db('tree_advice').where({ sugarbush_id: standId }).update({ payload: 'not json' });
    const [mapAfter, figuresAfter] = await Promise.all([
      forester.agent.get(mapUrl()),
      forester.agent.get(`/api/sugarbushes/${standId}/figures?season=${SEASON}`),
    ]);
    expect(mapAfter.status).toBe(200);
    expect(mapAfter.body).toEqual(map.body);
    expect(figuresAfter.status).toBe(200);
    expect(figuresAfter.body).toEqual(figures.body);
  });
});
