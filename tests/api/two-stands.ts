import { randomBytes } from 'node:crypto';
import os from 'node:os';
import path from 'node:path';
import fs from 'node:fs';
import sharp from 'sharp';
import type { Knex } from 'knex';
import { roles, type Role } from '../../shared/schemas/enums';
import type { Client } from './http-client';
import { multipart, signedInClient, type Answer, type Served } from './http-client';
import { solidPng, writeMbtiles } from './mbtiles-fixture';
import { addMember, addSugarbush, addUser } from './test-app';

/** The season the fixtures record tapholes for and issue a plan of. */
export const FIXTURE_SEASON = 2026;

/** One of each resource of a stand, made through the API by its owner. */
export interface StandRows {
  id: number;
  treeId: number;
  noteId: number;
  standNoteId: number;
  photoId: number;
  basemapId: number;
  measurementId: number;
  tapholeId: number;
  invitationId: number;
  season: number;
  /** Rows of routes that may not exist in every build (the season log), by the parameter naming them. */
  extra: Record<string, number>;
}

export interface TwoStands {
  A: StandRows;
  B: StandRows;
  /** Members of stand A in every role, and `outsider`, who belongs to a third stand only. */
  clients: Record<Role | 'outsider', Client>;
  /** The owner of stand B. */
  ownerB: Client;
  /** A member (tapper) added for this one request, to be changed or removed. */
  freshMember: (standId: number) => Promise<number>;
  /** A pending invitation made for this one request, to be resent or revoked. */
  freshInvitation: (standId: number) => Promise<number>;
}

const ok = (res: Answer, what: string) => {
  if (res.status >= 300) throw new Error(`${what} failed: ${res.status} ${res.text}`);
  return res.json as { id: number };
};

async function standRows(
  owner: Client,
  id: number,
  label: string,
  has: (route: string) => boolean,
): Promise<StandRows> {
  const tree = ok(
    await owner.request('POST', `/api/sugarbushes/${id}/trees`, {
      json: { tag: `${label}-001`, species: 'sugar-maple', lat: 44.1, lng: -72.5 },
    }),
    'adding a tree',
  );
  const measurement = ok(
    await owner.request('POST', `/api/trees/${tree.id}/measurements`, {
      json: { measuredOn: `${FIXTURE_SEASON - 1}-10-01`, dbhCm: 41, crownDiebackPct: 5 },
    }),
    'measuring',
  );
  const taphole = ok(
    await owner.request('POST', `/api/trees/${tree.id}/tapholes`, {
      json: {
        season: FIXTURE_SEASON,
        heightCm: 100,
        azimuthDeg: 180,
        depthCm: 5,
        bitCm: 0.79,
        collection: 'vacuum',
      },
    }),
    'recording a taphole',
  );
  const note = ok(
    await owner.request('POST', `/api/trees/${tree.id}/notes`, {
      json: { category: 'hazard', body: 'Dead limb over the lateral line.' },
    }),
    'writing a tree note',
  );
  const standNote = ok(
    await owner.request('POST', `/api/sugarbushes/${id}/notes`, {
      json: { category: 'management', body: 'Thin the north block next winter.' },
    }),
    'writing a stand note',
  );
  const png = await sharp({ create: { width: 16, height: 16, channels: 3, background: '#3f6b4a' } })
    .png()
    .toBuffer();
  const photo = ok(
    await owner.request(
      'POST',
      `/api/trees/${tree.id}/photos`,
      multipart({}, { name: 'trunk.png', type: 'image/png', bytes: png }),
    ),
    'adding a photo',
  );
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-basemap-'));
  const file = writeMbtiles(path.join(dir, 'ledge.mbtiles'), {
    metadata: { bounds: '-72.6,44.0,-72.4,44.2', minzoom: '0', maxzoom: '1' },
    tiles: [{ z: 0, x: 0, row: 0, data: solidPng([40, 90, 60]) }],
  });
  const basemap = ok(
    await owner.request(
      'POST',
      `/api/sugarbushes/${id}/basemaps`,
      multipart(
        {},
        { name: 'ledge.mbtiles', type: 'application/octet-stream', bytes: fs.readFileSync(file) },
      ),
    ),
    'uploading a basemap',
  );
  fs.rmSync(dir, { recursive: true, force: true });
  const invitation = ok(
    await owner.request('POST', `/api/sugarbushes/${id}/invitations`, {
      json: { email: `invited-${label.toLowerCase()}@test.example`, role: 'tapper' },
    }),
    'inviting',
  );
  ok(
    await owner.request('POST', `/api/sugarbushes/${id}/issued-plans`, {
      json: { season: FIXTURE_SEASON },
    }),
    'issuing a plan',
  );
  // The season log, where this build has it: a day's sap and a day's weather.
  const extra: Record<string, number> = {};
  if (has('POST /api/sugarbushes/:id/sap')) {
    const sap = ok(
      await owner.request('POST', `/api/sugarbushes/${id}/sap`, {
        json: { collectedOn: `${FIXTURE_SEASON}-03-20`, volumeL: 400, sugarPct: 2.4 },
      }),
      'recording sap',
    );
    if (sap?.id) extra.entryId = sap.id;
  }
  if (has('POST /api/sugarbushes/:id/weather'))
    ok(
      await owner.request('POST', `/api/sugarbushes/${id}/weather`, {
        json: { date: `${FIXTURE_SEASON}-03-20`, minC: -4, maxC: 6 },
      }),
      'recording the weather',
    );
  return {
    extra,
    id,
    treeId: tree.id,
    noteId: note.id,
    standNoteId: standNote.id,
    photoId: photo.id,
    basemapId: basemap.id,
    measurementId: measurement.id,
    tapholeId: taphole.id,
    invitationId: invitation.id,
    season: FIXTURE_SEASON,
  };
}

/**
 * Stands A and B, each with a member of every role and one of each resource, and an outsider
 * who owns a third stand of their own.
 */
export async function twoStands(
  db: Knex,
  served: Served,
  routes: ReadonlySet<string> = new Set(),
): Promise<TwoStands> {
  const has = (route: string) => routes.has(route);
  const a = await addSugarbush(db, 'Ash Ridge');
  const b = await addSugarbush(db, 'Birch Hollow');
  const c = await addSugarbush(db, 'Cedar Flat');
  const emails = {} as Record<Role | 'outsider', string>;
  for (const role of roles) {
    emails[role] = `${role}-a@test.example`;
    await addMember(db, await addUser(db, emails[role]), a, role);
    await addMember(db, await addUser(db, `${role}-b@test.example`), b, role);
  }
  emails.outsider = 'outsider@test.example';
  await addMember(db, await addUser(db, emails.outsider), c, 'owner');
  const clients = {} as Record<Role | 'outsider', Client>;
  for (const who of Object.keys(emails) as (Role | 'outsider')[])
    clients[who] = await signedInClient(served, emails[who]);
  const ownerB = await signedInClient(served, 'owner-b@test.example');
  let n = 0;
  return {
    A: await standRows(clients.owner, a, 'A', has),
    B: await standRows(ownerB, b, 'B', has),
    clients,
    ownerB,
    freshMember: async (standId) => {
      const id = await addUser(db, `extra-${++n}@test.example`);
      await addMember(db, id, standId, 'tapper');
      return id;
    },
    freshInvitation: async (standId) => {
      const [row] = await db('invitations')
        .insert({
          sugarbush_id: standId,
          email: `invitee-${++n}@test.example`,
          role: 'tapper',
          token_hash: randomBytes(32).toString('hex'),
          expires_at: new Date(Date.now() + 7 * 86_400_000).toISOString(),
        })
        .returning('id');
      return Number(row.id);
    },
  };
}
