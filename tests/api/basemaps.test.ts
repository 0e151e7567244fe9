import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solidPng, writeMbtiles, type FixtureTile } from './mbtiles-fixture';
import { makeTestApp, signIn, standWithTeam } from './test-app';

type Signed = Awaited<ReturnType<typeof signIn>>;

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-mbtiles-'));
let fixtureCount = 0;
const fixturePath = (ext = 'mbtiles') => path.join(dir, `fixture-${++fixtureCount}.${ext}`);

/** Zoom 3, column 2: eight tiles, one per TMS row, each its own colour. */
const column: FixtureTile[] = Array.from({ length: 8 }, (_, row) => ({
  z: 3,
  x: 2,
  row,
  data: solidPng([row * 30, 120, 60]),
}));
const tileAtRow = (row: number) => column.find((t) => t.row === row)!.data;

const goodMetadata = {
  name: 'Ridge orthophoto',
  format: 'png',
  minzoom: '3',
  maxzoom: '3',
  bounds: '-90,-66.5,0,66.5',
  center: '-45,20,3',
};

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
const as = {} as Record<'owner' | 'forester' | 'tapper' | 'outsider', Signed>;
let basemapId: number;

const upload = (who: Signed, file: string, name?: string) => {
  let req = who.agent
    .post(`/api/sugarbushes/${team.standId}/basemaps`)
    .set('x-csrf-token', who.csrf);
  if (name) req = req.field('name', name);
  return req.attach('file', file);
};
const filesKept = () => fs.readdirSync(t.config.BASEMAP_DIR).sort();

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  for (const who of ['owner', 'forester', 'tapper', 'outsider'] as const)
    as[who] = await signIn(t.app, team.users[who]);
  const res = await upload(
    as.owner,
    writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column }),
  );
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  basemapId = res.body.id;
});
afterAll(() => t.close());

describe('uploading a basemap', () => {
  it('when the owner uploads a raster MBTiles, then it is kept with the metadata the file declares', async () => {
    const file = writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column });
    const res = await upload(as.owner, file);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      sugarbushId: team.standId,
      name: 'Ridge orthophoto',
      format: 'png',
      minZoom: 3,
      maxZoom: 3,
      bounds: [-90, -66.5, 0, 66.5],
      center: [-45, 20, 3],
      sizeBytes: fs.statSync(file).size,
    });
    expect(filesKept()).toContain(`${res.body.id}.mbtiles`);
    expect(filesKept().filter((f) => !f.endsWith('.mbtiles'))).toEqual([]);
  });

  it('when a forester names the upload, then the name given wins over the metadata', async () => {
    const file = writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column });
    const res = await upload(as.forester, file, 'Spring flight');
    expect(res.status).toBe(201);
    expect(res.body.name).toBe('Spring flight');
  });

  it('when the metadata names no format, zooms or bounds, then they are read from the tiles', async () => {
    // Two JPEG tiles at zoom 16, columns 19 and 20, XYZ rows 23 and 24 (TMS 65512 and 65511).
    const jpeg = Buffer.from('ffd8ffe000104a46494600', 'hex');
    const file = writeMbtiles(fixturePath(), {
      metadata: { format: null, name: 'Bare file' },
      tiles: [
        { z: 16, x: 19, row: 65512, data: jpeg },
        { z: 16, x: 20, row: 65511, data: jpeg },
        { z: 15, x: 9, row: 32756, data: jpeg },
      ],
    });
    const res = await upload(as.owner, file);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // Tile edges: lng = x / 2^z · 360 − 180; lat = atan(sinh(π (1 − 2y / 2^z))), y counted from the north.
    const lat = (y: number) =>
      (Math.atan(Math.sinh(Math.PI * (1 - (2 * y) / 2 ** 16))) * 180) / Math.PI;
    const [w, s, e, n] = res.body.bounds;
    expect(w).toBeCloseTo((19 / 65536) * 360 - 180, 9);
    expect(e).toBeCloseTo((21 / 65536) * 360 - 180, 9);
    expect(n).toBeCloseTo(lat(23), 9);
    expect(s).toBeCloseTo(lat(25), 9);
    expect(res.body).toMatchObject({ format: 'jpg', minZoom: 15, maxZoom: 16, center: null });
  });

  it('when the tiles sit behind views, then the file is accepted all the same', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: goodMetadata,
      tiles: column,
      asViews: true,
    });
    const res = await upload(as.owner, file);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  });

  it('when the file was saved in WAL mode, then it is accepted and leaves no journal files', async () => {
    const file = writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column, wal: true });
    const res = await upload(as.owner, file);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const tileRes = await as.owner.agent.get(`/api/basemaps/${res.body.id}/3/2/0`).buffer(true);
    expect(Buffer.compare(tileRes.body, tileAtRow(7))).toBe(0);
    expect(filesKept().filter((f) => !f.endsWith('.mbtiles'))).toEqual([]);
  });
});

describe('refusing a file that is not a raster basemap', () => {
  const refused = async (file: string, status: number, code: string, message: RegExp) => {
    const before = filesKept();
    const res = await upload(as.owner, file);
    expect(res.status, JSON.stringify(res.body)).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message).toMatch(message);
    expect(filesKept()).toEqual(before);
  };

  it('when the file is text, then it is refused as not an MBTiles and nothing is kept', async () => {
    const file = fixturePath('txt');
    fs.writeFileSync(file, 'tag,species\nT-1,sugar-maple\n');
    await refused(file, 400, 'not-mbtiles', /not an SQLite database/);
  });

  it('when the database has no tiles table, then it is refused as not an MBTiles', async () => {
    const file = fixturePath();
    const db = new Database(file);
    db.exec('create table metadata (name text, value text); create table trees (tag text)');
    db.close();
    await refused(file, 400, 'not-mbtiles', /no tiles table/);
  });

  it('when the tiles table is empty, then it is refused as holding no tiles', async () => {
    await refused(
      writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: [] }),
      400,
      'not-mbtiles',
      /no tiles/,
    );
  });

  it('when the file holds vector tiles, then it is refused as not raster', async () => {
    const pbf = Buffer.from('1f8b0800000000000003', 'hex');
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, format: 'pbf' },
      tiles: [{ z: 3, x: 2, row: 1, data: pbf }],
    });
    await refused(file, 400, 'not-raster', /vector tiles \(pbf\)/);
  });

  it('when vector tiles carry no format, then the gzip bytes give them away', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, format: null },
      tiles: [{ z: 3, x: 2, row: 1, data: Buffer.from('1f8b0800000000000003', 'hex') }],
    });
    await refused(file, 400, 'not-raster', /vector tiles/);
  });

  it('when the bounds run past the poles of a web map, then it is refused with bad-bounds', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, bounds: '-10,-89,10,89' },
      tiles: column,
    });
    await refused(file, 400, 'bad-bounds', /latitude/);
  });

  it('when west is not less than east, then it is refused with bad-bounds', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, bounds: '10,0,-10,20' },
      tiles: column,
    });
    await refused(file, 400, 'bad-bounds', /west \(10\) not less than east \(-10\)/);
  });

  it('when the minimum zoom is above the maximum, then it is refused with bad-zoom', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, minzoom: '12', maxzoom: '10' },
      tiles: column,
    });
    await refused(file, 400, 'bad-zoom', /minimum zoom \(12\) is above the maximum zoom \(10\)/);
  });

  it('when a zoom is not a whole number 0–24, then it is refused with bad-zoom', async () => {
    const file = writeMbtiles(fixturePath(), {
      metadata: { ...goodMetadata, maxzoom: '30' },
      tiles: column,
    });
    await refused(file, 400, 'bad-zoom', /0–24/);
  });

  it('when no file is attached, then 400 names the file field', async () => {
    const res = await as.owner.agent
      .post(`/api/sugarbushes/${team.standId}/basemaps`)
      .set('x-csrf-token', as.owner.csrf)
      .field('name', 'Nothing');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toMatch(/Choose an MBTiles file/);
  });
});

describe('who may upload', () => {
  it('when a tapper uploads, then it is refused with 403 and nothing is kept', async () => {
    const before = filesKept();
    const res = await upload(
      as.tapper,
      writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column }),
    );
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(filesKept()).toEqual(before);
  });

  it('when someone outside the stand uploads, then the stand is not found', async () => {
    const res = await upload(
      as.outsider,
      writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column }),
    );
    expect(res.status).toBe(404);
  });
});

describe('a file over the size limit', () => {
  let small: Awaited<ReturnType<typeof makeTestApp>>;
  afterAll(() => small.close());

  it('when the upload is larger than BASEMAP_MAX_BYTES, then 413 says so and no partial file stays', async () => {
    small = await makeTestApp({ BASEMAP_MAX_BYTES: '4096' });
    const smallTeam = await standWithTeam(small.db);
    const owner = await signIn(small.app, smallTeam.users.owner);
    const file = writeMbtiles(fixturePath(), { metadata: goodMetadata, tiles: column });
    expect(fs.statSync(file).size).toBeGreaterThan(4096);
    const res = await owner.agent
      .post(`/api/sugarbushes/${smallTeam.standId}/basemaps`)
      .set('x-csrf-token', owner.csrf)
      .attach('file', file);
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({
      code: 'file-too-large',
      message: 'The file is larger than the 4 KB allowed for a basemap',
    });
    expect(fs.readdirSync(small.config.BASEMAP_DIR)).toEqual([]);
  });
});

describe('listing basemaps', () => {
  it('when a tapper lists the stand basemaps, then every upload is there, newest first', async () => {
    const res = await as.tapper.agent.get(`/api/sugarbushes/${team.standId}/basemaps?pageSize=100`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ page: 1, pageSize: 100 });
    expect(res.body.total).toBe(res.body.items.length);
    expect(res.body.items.at(-1)).toMatchObject({ id: basemapId, name: 'Ridge orthophoto' });
  });

  it('when the outsider lists them, then the stand is not found', async () => {
    const res = await as.outsider.agent.get(`/api/sugarbushes/${team.standId}/basemaps`);
    expect(res.status).toBe(404);
  });
});

describe('serving tiles', () => {
  const tile = (who: Signed, z: number | string, x: number | string, y: number | string) =>
    who.agent.get(`/api/basemaps/${basemapId}/${z}/${x}/${y}`).buffer(true);

  it('when a tile is asked for in XYZ numbering, then the one stored at TMS row 2^z − 1 − y comes back', async () => {
    for (const y of [0, 1, 6]) {
      const res = await tile(as.tapper, 3, 2, y);
      expect(res.status).toBe(200);
      expect(Buffer.compare(res.body, tileAtRow(7 - y)), `y=${y}`).toBe(0);
    }
  });

  it('when asked for with an extension, then it is the same tile as a PNG, cacheable with an ETag', async () => {
    const res = await tile(as.tapper, 3, 2, '1.png');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/png');
    expect(res.headers['cache-control']).toBe('private, max-age=86400');
    expect(res.headers.etag).toMatch(/^"[\w-]+"$/);
    expect(Buffer.compare(res.body, tileAtRow(6))).toBe(0);
  });

  it('when the browser sends back the ETag, then the answer is 304 with no body', async () => {
    const first = await tile(as.tapper, 3, 2, 4);
    const again = await as.tapper.agent
      .get(`/api/basemaps/${basemapId}/3/2/4`)
      .set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);
    expect(again.headers.etag).toBe(first.headers.etag);
    const other = await tile(as.tapper, 3, 2, 5);
    expect(other.headers.etag).not.toBe(first.headers.etag);
  });

  it('when the file lacks the tile, then the answer is 204', async () => {
    const res = await tile(as.tapper, 3, 5, 1);
    expect(res.status).toBe(204);
  });

  it.each([
    ['a zoom that is not a number', 'three', 2, 1, 'z'],
    ['a zoom beyond 24', 25, 2, 1, 'z'],
    ['a column beyond the zoom level', 3, 8, 1, 'x'],
    ['a row that is a fraction', 3, 2, '1.5', 'y'],
    ['a negative row', 3, 2, -1, 'y'],
  ])('when the address has %s, then 400 names the part', async (_what, z, x, y, part) => {
    const res = await tile(as.tapper, z, x, y);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual([part]);
  });

  it('when the outsider asks for a tile, then the basemap looks the same as one that does not exist', async () => {
    const hidden = await tile(as.outsider, 3, 2, 1);
    const missing = await as.outsider.agent.get('/api/basemaps/999999/3/2/1');
    expect([hidden.status, missing.status]).toEqual([404, 404]);
    expect(hidden.body).toEqual({ error: { code: 'not-found', message: 'Basemap not found' } });
    expect(missing.body).toEqual(hidden.body);
  });
});
