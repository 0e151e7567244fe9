import fs from 'node:fs';
import path from 'node:path';
import exifr from 'exifr';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let consultant: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  consultant = await signIn(t.app, team.users.consultant);
});
afterAll(() => t.close());

const photoDir = (app: typeof t) => {
  if (app.config.photos.kind !== 'disk') throw new Error('these tests read the photo folder');
  return app.config.photos.dir;
};

/** Every file under the photo folder, as paths inside it. */
const storedFiles = (app: typeof t): string[] => {
  const dir = photoDir(app);
  return fs.existsSync(dir)
    ? fs
        .readdirSync(dir, { recursive: true, encoding: 'utf8' })
        .filter((f) => fs.statSync(path.join(dir, f)).isFile())
    : [];
};

const storedBytes = async (app: typeof t, photoId: number) => {
  const row = await app.db('photos').where({ id: photoId }).first();
  return fs.readFileSync(path.join(photoDir(app), row.storage_key));
};

const upload = (
  who: typeof consultant,
  url: string,
  bytes: Buffer,
  filename: string,
  contentType: string,
) =>
  who.agent
    .post(url)
    .set('x-csrf-token', who.csrf)
    .attach('file', bytes, { filename, contentType });

describe('photos', () => {
  it('when a PNG named .jpg is uploaded on a tree, then it is stored and served as a PNG', async () => {
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#5a7' } })
      .png()
      .toBuffer();
    const res = await upload(
      consultant,
      `/api/trees/${team.treeId}/photos`,
      png,
      'bark.jpg',
      'image/jpeg',
    );
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({
      treeId: team.treeId,
      noteId: null,
      contentType: 'image/png',
      width: 64,
      height: 48,
    });
    expect((await fileTypeFromBuffer(await storedBytes(t, res.body.id)))?.mime).toBe('image/png');

    const full = await consultant.agent.get(`/api/photos/${res.body.id}`).buffer(true);
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/png');
    expect((await fileTypeFromBuffer(full.body as Buffer))?.mime).toBe('image/png');
    const thumb = await consultant.agent.get(`/api/photos/${res.body.id}?size=thumb`).buffer(true);
    expect(thumb.headers['content-type']).toBe('image/webp');
    expect((await sharp(thumb.body as Buffer).metadata()).format).toBe('webp');
  });

  it('when a text file named .png is uploaded, then it is refused with 415 and nothing is kept', async () => {
    const before = storedFiles(t).length;
    const rows = Number((await t.db('photos').count({ n: '*' }))[0].n);
    const text = Buffer.from('Tag OL-0412: frost crack, north face.\n'.repeat(20));
    const res = await upload(
      consultant,
      `/api/trees/${team.treeId}/photos`,
      text,
      'crack.png',
      'image/png',
    );
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported-photo-type');
    expect(storedFiles(t)).toHaveLength(before);
    expect(Number((await t.db('photos').count({ n: '*' }))[0].n)).toBe(rows);
  });

  it('when a photo is larger than PHOTO_MAX_BYTES, then it is refused with 413', async () => {
    const small = await makeTestApp({ PHOTO_MAX_BYTES: '4096' });
    try {
      const smallTeam = await standWithTeam(small.db);
      const owner = await signIn(small.app, smallTeam.users.owner);
      const noisy = await sharp({
        create: {
          width: 120,
          height: 120,
          channels: 3,
          background: '#808080',
          noise: { type: 'gaussian', mean: 128, sigma: 40 },
        },
      })
        .png()
        .toBuffer();
      expect(noisy.length).toBeGreaterThan(4096);
      const res = await upload(
        owner,
        `/api/trees/${smallTeam.treeId}/photos`,
        noisy,
        'n.png',
        'image/png',
      );
      expect(res.status).toBe(413);
      expect(res.body.error).toEqual({
        code: 'file-too-large',
        message: 'The photo is larger than the 4 KB allowed',
      });
      expect(storedFiles(small)).toEqual([]);
    } finally {
      await small.close();
    }
  });

  it('when someone outside the stand asks for a photo, then 404, as for a photo that does not exist', async () => {
    const jpeg = await sharp({ create: { width: 32, height: 32, channels: 3, background: '#345' } })
      .jpeg()
      .toBuffer();
    const { body: photo } = await upload(
      consultant,
      `/api/trees/${team.treeId}/photos`,
      jpeg,
      'a.jpg',
      'image/jpeg',
    );
    const outsider = await signIn(t.app, team.users.outsider);
    const hidden = await outsider.agent.get(`/api/photos/${photo.id}`);
    const thumb = await outsider.agent.get(`/api/photos/${photo.id}?size=thumb`);
    const missing = await outsider.agent.get(`/api/photos/${photo.id + 1000}`);
    expect([hidden.status, thumb.status, missing.status]).toEqual([404, 404, 404]);
    expect(hidden.body).toEqual({ error: { code: 'not-found', message: 'Photo not found' } });
    expect(missing.body).toEqual(hidden.body);
    const member = await consultant.agent.get(`/api/photos/${photo.id}`);
    expect(member.status).toBe(200);
  });

  it('when a JPEG with a GPS position in its EXIF is uploaded on a note, then the stored file has no GPS', async () => {
    const withGps = await sharp({
      create: { width: 80, height: 60, channels: 3, background: '#8a6' },
    })
      .jpeg()
      .withExif({
        IFD0: { Make: 'Fieldcam', Model: 'FC-1' },
        IFD3: {
          GPSLatitudeRef: 'N',
          GPSLatitude: '45/1 30/1 1234/100',
          GPSLongitudeRef: 'W',
          GPSLongitude: '72/1 15/1 0/1',
        },
      })
      .toBuffer();
    // The file sent carries the position, as a phone's camera writes it.
    expect(await exifr.gps(withGps)).toMatchObject({ latitude: expect.closeTo(45.5034, 3) });

    const note = await consultant.agent
      .post(`/api/trees/${team.treeId}/notes`)
      .set('x-csrf-token', consultant.csrf)
      .send({ category: 'hazard', body: 'Cracked fork above the drop line.' });
    const res = await upload(
      consultant,
      `/api/notes/${note.body.id}/photos`,
      withGps,
      'fork.jpg',
      'image/jpeg',
    );
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ noteId: note.body.id, treeId: team.treeId });

    const stored = await storedBytes(t, res.body.id);
    expect((await fileTypeFromBuffer(stored))?.mime).toBe('image/jpeg');
    expect(await exifr.gps(stored)).toBeUndefined();
    const tags = (await exifr.parse(stored, { gps: true, tiff: true, exif: true })) ?? {};
    expect(Object.keys(tags).filter((k) => k.startsWith('GPS') || k === 'Make')).toEqual([]);
    const served = await consultant.agent.get(`/api/photos/${res.body.id}`).buffer(true);
    expect(await exifr.gps(served.body as Buffer)).toBeUndefined();
  });
});
