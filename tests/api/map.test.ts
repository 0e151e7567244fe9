import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PROBLEM_TAGS } from '../../seeds/01_demo';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { upcomingSeason } from '../../shared/schemas/plan';
import type { MapColumns } from '../../shared/schemas/map';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

/** Degrees of arc for metres on turf's sphere (R = 6 371 008.8 m). */
const deg = (m: number) => m / ((6_371_008.8 * Math.PI) / 180);
/** A 100 m × 100 m square on the equator: one hectare, 2.4710538 acres. */
const side = deg(100);
const hectare = {
  type: 'Polygon',
  coordinates: [
    [
      [0, 0],
      [side, 0],
      [side, side],
      [0, side],
      [0, 0],
    ],
  ],
};
const at = (xM: number, yM: number) => ({ lng: deg(xM), lat: deg(yM) });

/** The map's columns read back as one object per tree, by the codes the answer carries. */
function treesOf(body: MapColumns) {
  return body.ids.map((id, i) => ({
    id,
    tag: body.tags[i],
    lat: body.lat[i],
    lng: body.lng[i],
    verdict: body.codes.verdict[body.verdict[i]],
    taps: body.taps[i],
    warnings: body.codes.warning.filter((_, bit) => (body.warnings[i] & (1 << bit)) !== 0),
    status: body.codes.status[body.status[i]],
    species: body.codes.species[body.species[i]],
    outside: body.outside[i] === 1,
  }));
}

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;
let outsider: Awaited<ReturnType<typeof signIn>>;
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db); // T-001, never mapped, never measured
  // Inside: M-1…M-4, 36 cm, 3 m apart on a row; M-5 dead; outside: M-6, 20 m east of the line.
  const rows: [string, number, number, string][] = [
    ['M-1', 10, 50, 'active'],
    ['M-2', 13, 50, 'active'],
    ['M-3', 16, 50, 'active'],
    ['M-4', 19, 50, 'active'],
    ['M-5', 22, 50, 'dead'],
    ['M-6', 120, 50, 'active'],
  ];
  for (const [tag, x, y, status] of rows) {
    ids[tag] = await addTree(t.db, team.standId, tag, { ...at(x, y), status });
    await t.db('measurements').insert([
      { tree_id: ids[tag], measured_on: '2025-10-01', season: 2025, dbh_cm: 35.2 },
      { tree_id: ids[tag], measured_on: '2026-10-01', season: 2026, dbh_cm: 36 },
    ]);
    await recordsWritten(t.db, team.standId, [ids[tag]]);
  }
  owner = await signIn(t.app, team.users.owner);
  tapper = await signIn(t.app, team.users.tapper);
  outsider = await signIn(t.app, team.users.outsider);
});
afterAll(() => t.close());

const setBoundary = (boundary: unknown) =>
  owner.agent
    .patch(`/api/sugarbushes/${team.standId}`)
    .set('x-csrf-token', owner.csrf)
    .send({ boundary });

describe('the map of a stand without a boundary', () => {
  it('when a tapper opens it, then every tree comes back and none is outside', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/map`);
    expect(res.status).toBe(200);
    expect(res.body.season).toBe(upcomingSeason());
    expect(res.body.count).toBe(7);
    expect(treesOf(res.body)).toHaveLength(7);
    expect(res.body.outside).toEqual([0, 0, 0, 0, 0, 0, 0]);
  });

  it('when the figures are asked for, then the area and per-area figures are null', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/figures`);
    expect(res.body).toMatchObject({
      boundary: false,
      areaHa: null,
      areaAcres: null,
      trees: 7,
      mappedTrees: 6,
      treesInside: 6,
      treesOutside: [],
      treesPerHa: null,
      basalAreaFt2PerAcre: null,
    });
  });
});

describe('drawing the boundary', () => {
  it('when the ring is not closed, then 400 says so under fields.boundary', async () => {
    const open = { type: 'Polygon', coordinates: [hectare.coordinates[0].slice(0, 4)] };
    const res = await setBoundary(open);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      boundary: 'The outer ring is not closed: its last position must repeat the first',
    });
  });

  it('when the outline crosses itself, then 400 says where under fields.boundary', async () => {
    const [a, b, c, d] = hectare.coordinates[0];
    const res = await setBoundary({ type: 'Polygon', coordinates: [[a, c, b, d, a]] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.boundary).toMatch(/^The boundary crosses itself near/);
  });

  it('when a ring has too few positions, then 400 counts them under fields.boundary', async () => {
    const [a, b] = hectare.coordinates[0];
    const res = await setBoundary({ type: 'Polygon', coordinates: [[a, b, a]] });
    expect(res.body.error.fields.boundary).toMatch(
      /has 3 positions; a closed ring needs at least 4/,
    );
  });

  it('when a new stand is created with a bad boundary, then it is refused the same way', async () => {
    const res = await owner.agent
      .post('/api/sugarbushes')
      .set('x-csrf-token', owner.csrf)
      .send({ name: 'Crooked Lot', boundary: { type: 'Feature', geometry: hectare } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.boundary).toMatch(/not a Feature/);
  });

  it('when the boundary is valid, then it is saved', async () => {
    const res = await setBoundary(hectare);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.boundary).toEqual(hectare);
  });
});

describe('the map and figures of a stand with a boundary', () => {
  beforeAll(async () => {
    expect((await setBoundary(hectare)).status).toBe(200);
  });

  it('when the map is asked for a season, then each tree carries its advice and the one beyond the line is outside', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/map?season=2027`);
    expect(res.body.season).toBe(2027);
    const byTag = Object.fromEntries(treesOf(res.body).map((x) => [x.tag, x]));
    expect(res.body.tags).toEqual(['M-1', 'M-2', 'M-3', 'M-4', 'M-5', 'M-6', 'T-001']);
    expect(byTag['M-6'].outside).toBe(true);
    expect(['M-1', 'M-5', 'T-001'].map((tag) => byTag[tag].outside)).toEqual([false, false, false]);
    expect(byTag['M-1']).toMatchObject({
      id: ids['M-1'],
      lat: Math.round(at(10, 50).lat * 1e6) / 1e6,
      lng: Math.round(at(10, 50).lng * 1e6) / 1e6,
      species: 'sugar-maple',
      status: 'active',
      verdict: 'tap',
    });
    expect(byTag['T-001']).toMatchObject({
      lat: null,
      lng: null,
      verdict: 'unmeasured',
      taps: 0,
      warnings: ['no-measurement'],
    });
    expect(byTag['M-5']).toMatchObject({ verdict: 'retired', taps: 0, status: 'dead' });
    expect(byTag['M-1'].taps).toBeGreaterThan(0);
    // What the card shows on demand is not sent for every tree.
    expect(Object.keys(res.body).sort()).toEqual(
      [
        'codes',
        'count',
        'ids',
        'lat',
        'lng',
        'outside',
        'season',
        'species',
        'status',
        'tags',
        'taps',
        'verdict',
        'warnings',
      ].sort(),
    );
  });

  it('when the figures are asked for, then they count the trees inside one hectare', async () => {
    const map = await tapper.agent.get(`/api/sugarbushes/${team.standId}/map?season=2027`);
    const taps = Object.fromEntries(treesOf(map.body).map((x) => [x.tag, x.taps]));
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/figures?season=2027`);
    expect(res.status).toBe(200);
    const f = res.body;
    expect(f).toMatchObject({ boundary: true, trees: 7, mappedTrees: 6, treesInside: 5 });
    expect(f.treesOutside).toEqual([{ id: ids['M-6'], tag: 'M-6' }]);
    expect(f.areaHa).toBeCloseTo(1, 6);
    expect(f.areaAcres).toBeCloseTo(2.4710538, 6);
    expect(f.tapsPlanned).toBe(Object.values(taps).reduce((s: number, n) => s + (n as number), 0));
    expect(f.treesPerHa).toBeCloseTo(5, 6);
    expect(f.treesPerAcre).toBeCloseTo(5 / 2.4710538, 6);
    const insideTaps = ['M-1', 'M-2', 'M-3', 'M-4', 'M-5'].reduce((s, tag) => s + taps[tag], 0);
    expect(f.tapsPerHa).toBeCloseTo(insideTaps, 6);
    // Four living trees of 36 cm: 4 · π/40000 · 36² = 0.407150 m² on one hectare; M-5 is dead.
    expect(f.basalAreaM2PerHa).toBeCloseTo(0.40715, 5);
    // In ft²/acre: 4 · π/576 · (36/2.54)² = 4.382531 ft² on 2.4710538 acres = 1.773547.
    expect(f.basalAreaFt2PerAcre).toBeCloseTo(1.773547, 5);
    // Five standing trees inside, 3 m apart in a row.
    for (const k of ['mean', 'median', 'min', 'max'])
      expect(f.nearestNeighbourM[k]).toBeCloseTo(3, 5);
  });

  it('when the season is not a year, then 400 names it', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/figures?season=soon`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.season).toBeTruthy();
  });

  it('when the outsider asks for the map or the figures, then the stand is not found', async () => {
    for (const what of ['map', 'figures']) {
      const res = await outsider.agent.get(`/api/sugarbushes/${team.standId}/${what}`);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not-found');
    }
  });
});

describe('the demo stand on the map', () => {
  let demo: Awaited<ReturnType<typeof makeTestApp>>;
  let standId: number;
  let forester: Awaited<ReturnType<typeof signIn>>;
  beforeAll(async () => {
    demo = await makeTestApp();
    await seedDemoIfEmpty(demo.db);
    standId = (await demo.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
    forester = await signIn(demo.app, 'forester@fernside.example', 'maple-demo-2027');
  });
  afterAll(() => demo.close());

  it('shows every tree of the register and flags exactly the trees mapped outside the boundary', async () => {
    const res = await forester.agent.get(`/api/sugarbushes/${standId}/map?season=2027`);
    const [{ n }] = await demo.db('trees').where({ sugarbush_id: standId }).count({ n: '*' });
    expect(res.body.count).toBe(Number(n));
    const outside = treesOf(res.body)
      .filter((x) => x.outside)
      .map((x) => x.tag);
    expect(outside).toEqual(DEMO_PROBLEM_TAGS['outside-boundary']);
  });

  it('gives figures whose counts agree with the map', async () => {
    const res = await forester.agent.get(`/api/sugarbushes/${standId}/figures?season=2027`);
    const f = res.body;
    expect(f.treesOutside.map((x: { tag: string }) => x.tag)).toEqual(
      DEMO_PROBLEM_TAGS['outside-boundary'],
    );
    expect(f.treesInside + f.treesOutside.length).toBe(f.mappedTrees);
    expect(f.mappedTrees).toBeLessThan(f.trees); // some positions were never taken
    expect(f.areaHa).toBeGreaterThan(5);
    expect(f.nearestNeighbourM.min).toBeGreaterThanOrEqual(3.4); // trees are placed ≥ 3.5 m apart
  });
});
