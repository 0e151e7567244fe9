import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  S3Client,
} from '@aws-sdk/client-s3';
import exifr from 'exifr';
import S3rver from 's3rver';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../server/config';
import { makeTestApp, signIn, standWithTeam } from './test-app';

describe('photo settings', () => {
  it('by default photos are kept in photos/ beside the database file', () => {
    expect(loadConfig({ DATABASE_FILE: 'var/cw/clearwood.sqlite' }).photos).toEqual({
      kind: 'disk',
      dir: path.join('var/cw', 'photos'),
    });
    expect(loadConfig({ PHOTO_DIR: '/srv/photos' }).photos).toEqual({
      kind: 'disk',
      dir: '/srv/photos',
    });
    expect(loadConfig({}).PHOTO_MAX_BYTES).toBe(10 * 1024 * 1024);
  });

  it('with PHOTO_STORAGE=s3 the bucket, region, endpoint, keys and prefix are read', () => {
    expect(
      loadConfig({
        PHOTO_STORAGE: 's3',
        PHOTO_S3_BUCKET: 'fernside-photos',
        PHOTO_S3_REGION: 'ca-central-1',
        PHOTO_S3_ENDPOINT: 'http://127.0.0.1:9000',
        PHOTO_S3_ACCESS_KEY_ID: 'key-id',
        PHOTO_S3_SECRET_ACCESS_KEY: 'key-secret',
        PHOTO_S3_FORCE_PATH_STYLE: 'true',
        PHOTO_S3_PREFIX: 'clearwood/',
      }).photos,
    ).toEqual({
      kind: 's3',
      bucket: 'fernside-photos',
      region: 'ca-central-1',
      endpoint: 'http://127.0.0.1:9000',
      credentials: { accessKeyId: 'key-id', secretAccessKey: 'key-secret' },
      forcePathStyle: true,
      prefix: 'clearwood/',
    });
  });

  it('when a photo setting is bad, then start-up stops naming the variable', () => {
    const s3 = { PHOTO_STORAGE: 's3', PHOTO_S3_BUCKET: 'photos', PHOTO_S3_REGION: 'us-east-1' };
    const cases: [Record<string, string>, RegExp][] = [
      [{ PHOTO_STORAGE: 'ftp' }, /PHOTO_STORAGE/],
      [{ PHOTO_MAX_BYTES: 'ten megabytes' }, /PHOTO_MAX_BYTES/],
      [{ PHOTO_MAX_BYTES: '0' }, /PHOTO_MAX_BYTES/],
      [{ PHOTO_STORAGE: 's3', PHOTO_S3_REGION: 'us-east-1' }, /PHOTO_S3_BUCKET/],
      [{ PHOTO_STORAGE: 's3', PHOTO_S3_BUCKET: 'photos' }, /PHOTO_S3_REGION/],
      [{ ...s3, PHOTO_S3_BUCKET: 'Photos_Of_Trees' }, /PHOTO_S3_BUCKET/],
      [{ ...s3, PHOTO_S3_REGION: 'Canada East' }, /PHOTO_S3_REGION/],
      [{ ...s3, PHOTO_S3_ENDPOINT: 'ftp://files.example' }, /PHOTO_S3_ENDPOINT/],
      [{ ...s3, PHOTO_S3_ACCESS_KEY_ID: 'only-the-id' }, /PHOTO_S3_SECRET_ACCESS_KEY/],
      [{ ...s3, PHOTO_S3_SECRET_ACCESS_KEY: 'only-the-secret' }, /PHOTO_S3_ACCESS_KEY_ID/],
      [{ ...s3, PHOTO_S3_FORCE_PATH_STYLE: 'sometimes' }, /PHOTO_S3_FORCE_PATH_STYLE/],
      [{ ...s3, PHOTO_S3_PREFIX: '../up' + '?' }, /PHOTO_S3_PREFIX/],
    ];
    for (const [env, variable] of cases) {
      expect(() => loadConfig(env), JSON.stringify(env)).toThrow(ConfigError);
      expect(() => loadConfig(env), JSON.stringify(env)).toThrow(variable);
    }
  });
});

/** A local S3 stand-in (s3rver) on 127.0.0.1, with an empty bucket. */
describe('photos kept in an S3 bucket', () => {
  const bucket = 'clearwood-test-photos';
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-s3-'));
  const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
  let server: S3rver;
  let endpoint: string;
  let s3: S3Client;
  let t: Awaited<ReturnType<typeof makeTestApp>>;
  let team: Awaited<ReturnType<typeof standWithTeam>>;
  let owner: Awaited<ReturnType<typeof signIn>>;

  beforeAll(async () => {
    server = new S3rver({
      address: '127.0.0.1',
      port: 0,
      silent: true,
      directory: dir,
      configureBuckets: [{ name: bucket, configs: [] }],
    });
    const { port } = await server.run();
    endpoint = `http://127.0.0.1:${port}`;
    s3 = new S3Client({ region: 'us-east-1', endpoint, forcePathStyle: true, credentials });
    t = await makeTestApp({
      PHOTO_STORAGE: 's3',
      PHOTO_S3_BUCKET: bucket,
      PHOTO_S3_REGION: 'us-east-1',
      PHOTO_S3_ENDPOINT: endpoint,
      PHOTO_S3_ACCESS_KEY_ID: credentials.accessKeyId,
      PHOTO_S3_SECRET_ACCESS_KEY: credentials.secretAccessKey,
      PHOTO_S3_FORCE_PATH_STYLE: 'true',
      PHOTO_S3_PREFIX: 'stands',
    });
    team = await standWithTeam(t.db);
    owner = await signIn(t.app, team.users.owner);
  });
  afterAll(async () => {
    await t?.close();
    s3?.destroy();
    await server?.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('when a photo is uploaded, then the image and its thumbnail are objects in the bucket, stripped, and served back from it', async () => {
    const jpeg = await sharp({ create: { width: 90, height: 60, channels: 3, background: '#963' } })
      .jpeg()
      .withExif({ IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '45/1 0/1 0/1' } })
      .toBuffer();
    const res = await owner.agent
      .post(`/api/trees/${team.treeId}/photos`)
      .set('x-csrf-token', owner.csrf)
      .attach('file', jpeg, { filename: 'trunk.jpg', contentType: 'image/jpeg' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);

    const row = await t.db('photos').where({ id: res.body.id }).first();
    const listed = await s3.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: 'stands/' }));
    expect((listed.Contents ?? []).map((o) => o.Key).sort()).toEqual(
      [`stands/${row.storage_key}`, `stands/${row.thumb_key}`].sort(),
    );
    const object = await s3.send(
      new GetObjectCommand({ Bucket: bucket, Key: `stands/${row.storage_key}` }),
    );
    expect(object.ContentType).toBe('image/jpeg');
    const bytes = Buffer.from(await object.Body!.transformToByteArray());
    expect(await exifr.gps(bytes)).toBeUndefined();

    const served = await owner.agent.get(`/api/photos/${res.body.id}`).buffer(true);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(Buffer.compare(served.body as Buffer, bytes)).toBe(0);
    const thumb = await owner.agent.get(`/api/photos/${res.body.id}?size=thumb`).buffer(true);
    expect(thumb.headers['content-type']).toBe('image/webp');
  });

  it('when the object is gone from the bucket, then the photo answers 404', async () => {
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } })
      .png()
      .toBuffer();
    const res = await owner.agent
      .post(`/api/trees/${team.treeId}/photos`)
      .set('x-csrf-token', owner.csrf)
      .attach('file', png, { filename: 'x.png', contentType: 'image/png' });
    const row = await t.db('photos').where({ id: res.body.id }).first();
    await s3.send(new DeleteObjectCommand({ Bucket: bucket, Key: `stands/${row.storage_key}` }));
    const served = await owner.agent.get(`/api/photos/${res.body.id}`);
    expect(served.status).toBe(404);
  });
});
