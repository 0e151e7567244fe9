import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;

const gpx = fs.readFileSync(
  path.join(import.meta.dirname, '../fixtures/gpx/owl-ledge-waypoints.gpx'),
);

/** The square the fixture's waypoints were marked in (see tests/fixtures/gpx/README.md). */
const boundary = {
  type: 'Polygon',
  coordinates: [
    [
      [-72.501, 45.0],
      [-72.499, 45.0],
      [-72.499, 45.002],
      [-72.501, 45.002],
      [-72.501, 45.0],
    ],
  ],
};

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  await t
    .db('sugarbushes')
    .where({ id: team.standId })
    .update({ boundary: JSON.stringify(boundary) });
});
afterAll(() => t.close());

/** POST bytes as the field `file` under a name that says nothing of what they are. */
function upload(bytes: Buffer, opts: { dryRun?: boolean; mapping?: unknown; kind?: string } = {}) {
  const req = owner.agent
    .post(
      `/api/sugarbushes/${team.standId}/imports/${opts.kind ?? 'trees'}${opts.dryRun ? '?dryRun=1' : ''}`,
    )
    .set('x-csrf-token', owner.csrf);
  if (opts.mapping !== undefined) req.field('mapping', JSON.stringify(opts.mapping));
  return req.attach('file', bytes, 'upload.dat');
}

const treesOf = () =>
  t.db('trees').where({ sugarbush_id: team.standId }).where('tag', 'like', 'GX-%').orderBy('tag');

const sugarMaples = { defaults: { species: 'sugar-maple' } };

describe('importing trees from a GPS file of waypoints', () => {
  it('when no species is stated, then the report asks for one of the whole file, not of waypoint 1, and nothing is guessed', async () => {
    const res = await upload(gpx, { dryRun: true });
    expect(res.status).toBe(200);
    expect(res.body.source).toBe('gpx');
    // A GPX has no header row: row 0 is the whole file, and no waypoint is named.
    expect(res.body.errors).toEqual([
      { row: 0, column: 'species', message: expect.stringMatching(/species/) },
    ]);
    expect(await treesOf()).toHaveLength(0);
  });

  it('when checked with a stated species, then the preview shows the descriptions and flags the one far outside', async () => {
    const res = await upload(gpx, { dryRun: true, mapping: sugarMaples });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ source: 'gpx', rows: 6, created: 6, errors: [] });
    expect(res.body.defaults).toEqual({ species: 'sugar-maple', status: 'active' });
    expect(res.body.columns).toContainEqual({ header: 'name', field: 'tag' });
    expect(res.body.columns).toContainEqual({ header: 'lon', field: 'lng' });
    const desc = res.body.columns.findIndex((c: { header: string }) => c.header === 'desc');
    expect(res.body.preview[0][desc]).toBe('Sugar maple by the brook');
    // GX-105 is ~22 m past the line (a GPS under a canopy strays so): only GX-106 is flagged.
    expect(res.body.warnings).toEqual([
      {
        row: 6,
        waypoint: 'GX-106',
        column: 'lat',
        message: expect.stringMatching(/GX-106 lies about \d+ m outside/),
      },
    ]);
    expect(await treesOf()).toHaveLength(0);
  });

  it('when imported, then each waypoint is a tree with its name as tag and its position, and a second import adds nothing', async () => {
    const res = await upload(gpx, {
      mapping: { ...sugarMaples, defaults: { species: 'red-maple', status: 'held-out' } },
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ created: 6, unchanged: 0 });
    const trees = await treesOf();
    expect(trees.map((r) => r.tag)).toEqual([
      'GX-101',
      'GX-102',
      'GX-103',
      'GX-104',
      'GX-105',
      'GX-106',
    ]);
    expect(trees[0]).toMatchObject({
      lat: 45.0005,
      lng: -72.5005,
      species: 'red-maple',
      status: 'held-out',
    });
    expect(trees[5]).toMatchObject({ lat: 45.006, lng: -72.495 });

    const again = await upload(gpx, {
      mapping: { defaults: { species: 'red-maple', status: 'held-out' } },
    });
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ created: 0, unchanged: 6, errors: [] });
    expect(await treesOf()).toHaveLength(6);
  });

  it('when waypoints are wrong, then each problem names the waypoint by its number in the file and its name', async () => {
    const wpt = (lat: string, name: string | null) =>
      `<wpt lat="${lat}" lon="-72.5">${name === null ? '' : `<name>${name}</name>`}</wpt>`;
    const file = Buffer.from(
      `<?xml version="1.0"?><gpx version="1.1">${[
        wpt('45.001', 'GW-1'),
        wpt('45.001', null),
        wpt('95.5', 'GW-3'),
        wpt('45.001', 'GW-1'),
      ].join('')}</gpx>`,
    );
    // GW-1 again with another position would be a repeat; here it is the same, so not a problem.
    const res = await upload(file, { dryRun: true, mapping: sugarMaples });
    expect(res.status).toBe(200);
    expect(res.body.errors).toEqual([
      { row: 2, waypoint: '', column: 'name', message: expect.any(String) },
      { row: 3, waypoint: 'GW-3', column: 'lat', message: expect.any(String) },
    ]);
    expect(res.body).toMatchObject({ totalErrors: 2, rowsWithErrors: 2, unchanged: 1 });
  });

  it('when the GPX is cut off mid-element, then 400 says it is not well-formed and where', async () => {
    const broken = gpx.subarray(0, gpx.indexOf('<name>GX-103') + 8);
    const res = await upload(broken, { mapping: sugarMaples });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/GPX file is not well-formed XML \(line \d+/);
    expect(res.body.error.fields.file).toBe(res.body.error.message);
  });

  it('when the XML is not GPX, or holds no waypoint, or is sent as readings, then 400 says why', async () => {
    const notGpx = await upload(Buffer.from('<?xml version="1.0"?><kml><Placemark/></kml>'));
    expect(notGpx.status).toBe(400);
    expect(notGpx.body.error.message).toMatch(/not GPX/);
    const track = await upload(
      Buffer.from(
        '<gpx version="1.1"><trk><trkseg><trkpt lat="45" lon="-72"/></trkseg></trk></gpx>',
      ),
    );
    expect(track.status).toBe(400);
    expect(track.body.error.message).toMatch(/no waypoints/);
    const asReadings = await upload(gpx, { kind: 'measurements' });
    expect(asReadings.status).toBe(400);
    expect(asReadings.body.error.message).toMatch(/import it as trees/);
  });
});
