import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { solidPng, writeMbtiles } from './mbtiles-fixture';
import { makeTestApp, signIn, standWithTeam } from './test-app';

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-unsafe-mbtiles-'));
let count = 0;
const fresh = () => path.join(dir, `file-${++count}.mbtiles`);

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
});
afterAll(() => t.close());

const upload = (file: string) =>
  owner.agent
    .post(`/api/sugarbushes/${team.standId}/basemaps`)
    .set('x-csrf-token', owner.csrf)
    .attach('file', file);

/** An MBTiles whose `tiles` is a view that walks a recursive query of two million rows. */
function recursiveViewFile(): string {
  const file = fresh();
  const db = new Database(file);
  db.exec(`
    create table metadata (name text, value text);
    insert into metadata values ('name', 'Heavy'), ('format', 'png'), ('minzoom', '0'),
      ('maxzoom', '3'), ('bounds', '-10,-10,10,10');
    create table one (tile_data blob);
    insert into one values (x'89504e470d0a1a0a');
    create view tiles as
      with recursive n(i) as (select 0 union all select i + 1 from n where i < 2000000)
      select 3 as zoom_level, i % 8 as tile_column, i / 8 % 8 as tile_row,
        (select tile_data from one) as tile_data
      from n;`);
  db.close();
  return file;
}

describe('an MBTiles file that would make a tile lookup run a query of its own', () => {
  it('when the tiles are a view over a recursive query, then the upload is refused and nothing is kept', async () => {
    const t0 = performance.now();
    const res = await upload(recursiveViewFile());
    const ms = performance.now() - t0;
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not-mbtiles');
    expect(res.body.error.message).toMatch(/plain table|standard view/);
    expect(ms).toBeLessThan(5000); // it is refused from its schema, before any row is read
    expect(fs.readdirSync(t.config.BASEMAP_DIR).filter((f) => f.endsWith('.mbtiles'))).toEqual([]);
    expect(await t.db('basemaps').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('when the metadata is a view, or the tiles a virtual table, then it is refused', async () => {
    const viewMeta = fresh();
    const a = new Database(viewMeta);
    a.exec(`create table tiles (zoom_level integer, tile_column integer, tile_row integer, tile_data blob);
      create view metadata as select 'name' as name, 'x' as value;`);
    a.close();
    expect((await upload(viewMeta)).body.error.code).toBe('not-mbtiles');

    const virtual = fresh();
    const b = new Database(virtual);
    b.exec(`create table metadata (name text, value text);
      create virtual table tiles using fts5(zoom_level, tile_column, tile_row, tile_data);`);
    b.close();
    expect((await upload(virtual)).body.error.code).toBe('not-mbtiles');
  });

  it('when a plain tiles table has no index, then one is added and a tile answers at once while the server keeps answering', async () => {
    const tiles = Array.from({ length: 64 }, (_, i) => ({
      z: 3,
      x: i % 8,
      row: Math.floor(i / 8),
      data: solidPng([i * 3, 90, 40]),
    }));
    const res = await upload(writeMbtiles(fresh(), { tiles }));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const kept = path.join(t.config.BASEMAP_DIR, `${res.body.id}.mbtiles`);
    const check = new Database(kept, { readonly: true });
    const plan = check
      .prepare(
        'explain query plan select tile_data from tiles where zoom_level = 3 and tile_column = 2 and tile_row = 5',
      )
      .all() as { detail: string }[];
    check.close();
    expect(plan.map((p) => p.detail).join(' ')).toMatch(/USING INDEX/);

    const server = http.createServer(t.app).listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const { port } = server.address() as AddressInfo;
    const cookie = (await owner.agent.get('/api/auth/me')).request.cookies as unknown as string;
    try {
      const t0 = performance.now();
      const [tile, trivial] = await Promise.all([
        fetch(`http://127.0.0.1:${port}/api/basemaps/${res.body.id}/3/2/2`, {
          headers: { cookie },
        }),
        fetch(`http://127.0.0.1:${port}/api/auth/csrf`),
      ]);
      const ms = performance.now() - t0;
      expect(tile.status).toBe(200);
      expect(trivial.status).toBe(200);
      expect(ms).toBeLessThan(1000);
    } finally {
      await new Promise((r) => server.close(r));
    }
  });
});

describe('malformed multipart bodies', () => {
  const post = () =>
    owner.agent.post(`/api/sugarbushes/${team.standId}/basemaps`).set('x-csrf-token', owner.csrf);

  it('when the content type names no boundary, then 400 with the error shape', async () => {
    const res = await post().set('content-type', 'multipart/form-data').send('--x\r\n\r\n');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'bad-upload' });
    expect(typeof res.body.error.message).toBe('string');
  });

  it('when the form is cut off mid-part, then 400 and no partial file stays', async () => {
    const body =
      '--cut\r\nContent-Disposition: form-data; name="file"; filename="a.mbtiles"\r\n' +
      'Content-Type: application/octet-stream\r\n\r\nSQLite format 3\0 and then nothing';
    const res = await post().set('content-type', 'multipart/form-data; boundary=cut').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad-upload');
    expect(fs.readdirSync(t.config.BASEMAP_DIR).filter((f) => f.endsWith('.part'))).toEqual([]);
  });

  it('when a part header is malformed, then 400', async () => {
    const body = '--b\r\nthis is not a header\r\n\r\nvalue\r\n--b--\r\n';
    const res = await post().set('content-type', 'multipart/form-data; boundary=b').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error).toHaveProperty('code');
  });

  it('when the file name holds a NUL, then the answer is a 4xx with the error shape, never 500', async () => {
    const body =
      '--n\r\nContent-Disposition: form-data; name="file"; filename="bad\0name.mbtiles"\r\n' +
      'Content-Type: application/octet-stream\r\n\r\nnot a database\r\n--n--\r\n';
    const res = await post().set('content-type', 'multipart/form-data; boundary=n').send(body);
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error).toHaveProperty('code');
  });
});
