/**
 * The woods map's answer as it goes out: serialised and gzipped once in an advice worker, sent
 * as it was made (the compression middleware leaves it alone), kept by its tag, one build shared
 * by the requests that ask for the same version, and built again after a write.
 */
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { MapColumns } from '../../shared/schemas/map';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let server: http.Server;
let base: string;
let cookie: string;
const treeIds: number[] = [];
const mapPath = () => `/api/sugarbushes/${team.standId}/map`;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  for (let i = 1; i <= 40; i++) {
    const tag = `B-${String(i).padStart(2, '0')}`;
    treeIds.push(await addTree(t.db, team.standId, tag, { lat: 44.3 + i / 1e4, lng: -72.6 }));
  }
  await recordsWritten(t.db, team.standId);
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  owner = await signIn(base, team.users.owner);
  // The agent's session cookie, for requests that must see the bytes as they came.
  cookie = (owner.agent.get('/') as unknown as { cookies: string }).cookies;
});
afterAll(async () => {
  await new Promise((resolve) => server?.close(resolve));
  await t?.close();
});

/** A request straight over HTTP: the body as it came on the wire, not decompressed. */
function raw(path: string, headers: Record<string, string>) {
  return new Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }>(
    (resolve, reject) => {
      http
        .get(`${base}${path}`, { headers: { cookie, ...headers } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () =>
            resolve({
              status: res.statusCode ?? 0,
              headers: res.headers,
              body: Buffer.concat(chunks),
            }),
          );
        })
        .on('error', reject);
    },
  );
}

/** Builds of the map answer from here on, counted at the worker pool's door. */
const countBuilds = () => vi.spyOn(t.ctx.advice, 'mapBytes');

describe('the map answer as bytes', () => {
  it('when gzip is accepted, then it comes gzipped once; when not, the same JSON as it is', async () => {
    const zipped = await raw(mapPath(), { 'accept-encoding': 'gzip, deflate, br' });
    expect(zipped.status).toBe(200);
    expect(zipped.headers['content-encoding']).toBe('gzip');
    expect(zipped.headers['content-type']).toMatch(/^application\/json/);
    expect(zipped.headers.vary).toMatch(/Accept-Encoding/i);
    // Sent whole, with its length: the compression middleware (which streams) did not touch it.
    expect(Number(zipped.headers['content-length'])).toBe(zipped.body.length);

    const plain = await raw(mapPath(), { 'accept-encoding': 'identity' });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers.vary).toMatch(/Accept-Encoding/i);
    expect(plain.headers.etag).toBe(zipped.headers.etag);
    expect(gunzipSync(zipped.body).equals(plain.body)).toBe(true);

    const body = JSON.parse(plain.body.toString('utf8')) as MapColumns;
    expect(body.count).toBe(41); // T-001 of the team's stand and the forty above
    expect(body.tags.slice(-2)).toEqual(['B-40', 'T-001']);
  });

  it('when no encoding is named, or only one the worker does not make, then the JSON comes as it is', async () => {
    const asked: Record<string, string>[] = [
      {},
      { 'accept-encoding': 'deflate' },
      { 'accept-encoding': 'br' },
    ];
    for (const headers of asked) {
      const res = await raw(mapPath(), headers);
      expect(res.status).toBe(200);
      // Not compressed on the request thread by the middleware either.
      expect({ headers, encoding: res.headers['content-encoding'] }).toEqual({
        headers,
        encoding: undefined,
      });
      expect((JSON.parse(res.body.toString('utf8')) as MapColumns).count).toBe(41);
    }
  });

  it('when its tag is sent back, then the answer is an empty 304 whatever the encoding', async () => {
    const first = await raw(mapPath(), { 'accept-encoding': 'gzip' });
    for (const encoding of ['gzip', 'identity']) {
      const again = await raw(mapPath(), {
        'accept-encoding': encoding,
        'if-none-match': String(first.headers.etag),
      });
      expect(again.status).toBe(304);
      expect(again.body.length).toBe(0);
      expect(again.headers.etag).toBe(first.headers.etag);
    }
  });

  it('when several ask at once for the same version, then one build serves them all, and the next reads are kept bytes', async () => {
    // A write first, so this version has never been built.
    await owner.agent
      .patch(`/api/trees/${treeIds[0]}`)
      .set('x-csrf-token', owner.csrf)
      .send({ species: 'red-maple' })
      .expect(200);
    const builds = countBuilds();
    try {
      const answers = await Promise.all(
        Array.from({ length: 6 }, () => raw(mapPath(), { 'accept-encoding': 'gzip' })),
      );
      expect(answers.map((a) => a.status)).toEqual(Array(6).fill(200));
      expect(new Set(answers.map((a) => a.headers.etag)).size).toBe(1);
      expect(answers.every((a) => a.body.equals(answers[0].body))).toBe(true);
      // Later, plain and gzipped: the kept bytes serve both.
      const plain = await raw(mapPath(), { 'accept-encoding': 'identity' });
      expect(gunzipSync(answers[0].body).equals(plain.body)).toBe(true);
      expect(builds).toHaveBeenCalledTimes(1);
      expect(builds.mock.calls[0][3]).toBe(true); // built with its gzip
    } finally {
      builds.mockRestore();
    }
  });

  it('when a tree is written, then the next read is built again under a new tag and shows it', async () => {
    const before = await owner.agent.get(mapPath()).expect(200);
    const builds = countBuilds();
    try {
      await owner.agent
        .patch(`/api/trees/${treeIds[1]}`)
        .set('x-csrf-token', owner.csrf)
        .send({ status: 'dead' })
        .expect(200);
      const after = await owner.agent
        .get(mapPath())
        .set('if-none-match', before.headers.etag)
        .expect(200);
      expect(after.headers.etag).not.toBe(before.headers.etag);
      expect(builds).toHaveBeenCalledTimes(1);
      const b = before.body as MapColumns;
      const a = after.body as MapColumns;
      const i = a.ids.indexOf(treeIds[1]);
      expect(b.codes.status[b.status[i]]).toBe('active');
      expect(a.codes.status[a.status[i]]).toBe('dead');
    } finally {
      builds.mockRestore();
    }
  });
});
