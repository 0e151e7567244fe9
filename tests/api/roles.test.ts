import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import type { Role } from '../../shared/schemas/enums';
import { addMember, addUser, makeTestApp, signIn, standWithTeam } from './test-app';

type Who = Role | 'outsider';
interface RouteCase {
  name: string;
  method: 'get' | 'post' | 'patch';
  path: (ids: Ids) => string;
  body?: () => Record<string, unknown>;
  /** A multipart upload of this file in the field `file`, instead of a JSON body. */
  upload?: () => { bytes: Buffer; filename: string };
  /** Who may; every other member gets 403, the outsider 404. */
  allowed: Role[];
  /** The status of an allowed request, when not 200 (GET, PATCH) or 201 (POST). */
  okStatus?: number;
}

interface Ids {
  standId: number;
  treeId: number;
  memberId: number;
  noteId: number;
  photoId: number;
  sapEntryId: number;
}

const everyone: Role[] = ['owner', 'forester', 'tapper', 'consultant'];
let photo: Buffer;
let n = 0;
const cases: RouteCase[] = [
  {
    name: 'read the stand',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    allowed: everyone,
  },
  {
    name: 'rename the stand',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    body: () => ({ name: 'Renamed Ridge' }),
    allowed: ['owner'],
  },
  {
    name: 'set the sunny side',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    body: () => ({ sunnyAzimuthDeg: 170 }),
    allowed: ['owner'],
  },
  {
    name: 'redraw the boundary',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    body: () => ({
      boundary: {
        type: 'Polygon',
        coordinates: [
          [
            [-72.5, 44.1],
            [-72.49, 44.1],
            [-72.49, 44.11],
            [-72.5, 44.11],
            [-72.5, 44.1],
          ],
        ],
      },
    }),
    allowed: ['owner', 'forester'],
  },
  {
    name: 'send an empty change of the stand',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    body: () => ({}),
    allowed: ['owner', 'forester'],
  },
  {
    name: 'preview a guideline',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/guideline-preview`,
    body: () => ({ profile: 'traditional' }),
    allowed: ['owner'],
    okStatus: 200,
  },
  {
    name: 'read whether the advice is current',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/advice-status`,
    allowed: everyone,
  },
  {
    name: 'read the stand’s trends',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/trends`,
    allowed: everyone,
  },
  {
    name: 'read the guideline compliance of a season',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/compliance?season=2026&compare=traditional`,
    allowed: everyone,
  },
  {
    name: 'download the guideline compliance as CSV',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/compliance.csv?season=2026`,
    allowed: everyone,
  },
  {
    name: 'issue the season’s plan to the crew',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/issued-plans`,
    body: () => ({ season: 2026 }),
    allowed: ['owner'],
  },
  {
    name: 'list the issued plans',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/issued-plans`,
    allowed: everyone,
  },
  {
    name: 'read an issued plan with its changes since',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/issued-plans/2026`,
    allowed: everyone,
  },
  {
    name: 'read the season’s progress',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/plan/progress?season=2026`,
    allowed: everyone,
  },
  {
    name: 'read a page of the field sheet',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/plan/field-sheet?season=2026`,
    allowed: everyone,
  },
  {
    name: 'read the audit trail',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/audit`,
    allowed: ['owner'],
  },
  {
    name: 'list the team',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/members`,
    allowed: everyone,
  },
  {
    name: 'change a member’s role',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}/members/${i.memberId}`,
    body: () => ({ role: 'tapper' }),
    allowed: ['owner'],
  },
  {
    name: 'list invitations',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/invitations`,
    allowed: ['owner'],
  },
  {
    name: 'invite someone',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/invitations`,
    body: () => ({ email: `invitee-${++n}@test.example`, role: 'tapper' }),
    allowed: ['owner'],
  },
  {
    name: 'change the guideline profile',
    method: 'patch',
    path: (i) => `/api/sugarbushes/${i.standId}`,
    body: () => ({ profile: 'traditional' }),
    allowed: ['owner'],
  },
  {
    name: 'list trees',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/trees`,
    allowed: everyone,
  },
  {
    name: 'add a tree',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/trees`,
    body: () => ({ tag: `N-${++n}`, species: 'red-maple' }),
    allowed: ['owner', 'forester'],
  },
  { name: 'read a tree', method: 'get', path: (i) => `/api/trees/${i.treeId}`, allowed: everyone },
  {
    name: 'edit a tree',
    method: 'patch',
    path: (i) => `/api/trees/${i.treeId}`,
    body: () => ({ species: 'sugar-maple' }),
    allowed: ['owner', 'forester'],
  },
  {
    name: 'list measurements',
    method: 'get',
    path: (i) => `/api/trees/${i.treeId}/measurements`,
    allowed: everyone,
  },
  {
    name: 'record a measurement',
    method: 'post',
    path: (i) => `/api/trees/${i.treeId}/measurements`,
    body: () => ({ measuredOn: '2026-10-02', dbhCm: 41.2, crownDiebackPct: 5 }),
    allowed: ['owner', 'forester'],
  },
  {
    name: 'read the measuring round',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/round`,
    allowed: everyone,
  },
  {
    name: "read a tree's record for the advisor",
    method: 'get',
    path: (i) => `/api/trees/${i.treeId}/record`,
    allowed: everyone,
  },
  {
    name: 'list tapholes',
    method: 'get',
    path: (i) => `/api/trees/${i.treeId}/tapholes`,
    allowed: everyone,
  },
  {
    name: 'record a taphole',
    method: 'post',
    path: (i) => `/api/trees/${i.treeId}/tapholes`,
    body: () => ({
      season: 2026,
      heightCm: 110,
      azimuthDeg: 180,
      depthCm: 5.08,
      bitCm: 0.79,
      collection: 'vacuum',
    }),
    allowed: ['owner', 'tapper'],
  },
  {
    name: 'list tree notes',
    method: 'get',
    path: (i) => `/api/trees/${i.treeId}/notes`,
    allowed: everyone,
  },
  {
    name: 'list stand notes',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/notes`,
    allowed: everyone,
  },
  {
    name: 'write a note',
    method: 'post',
    path: (i) => `/api/trees/${i.treeId}/notes`,
    body: () => ({ category: 'health', body: 'Frost crack on the north face.' }),
    allowed: ['owner', 'consultant'],
  },
  {
    name: 'write a note on the stand',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/notes`,
    body: () => ({ category: 'management', body: 'Thin the beech by the east lateral.' }),
    allowed: ['owner', 'consultant'],
  },
  {
    name: 'resolve or reopen a note',
    method: 'patch',
    path: (i) => `/api/notes/${i.noteId}`,
    body: () => ({ resolved: ++n % 2 === 0 }),
    allowed: ['owner', 'consultant'],
  },
  {
    name: 'read the needs-a-look queue',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/attention`,
    allowed: everyone,
  },
  {
    name: 'import trees from CSV',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/imports/trees`,
    upload: () => ({ bytes: Buffer.from(`tag,species\nI-${++n},red-maple\n`), filename: 't.csv' }),
    allowed: ['owner', 'forester'],
  },
  {
    name: 'check readings from CSV (dry run)',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/imports/measurements?dryRun=1`,
    upload: () => ({
      bytes: Buffer.from('tag,measuredOn,dbhCm\nT-001,2025-10-01,30\n'),
      filename: 'm.csv',
    }),
    allowed: ['owner', 'forester'],
    okStatus: 200,
  },
  {
    name: 'check tapholes from CSV (dry run)',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/imports/tapholes?dryRun=1`,
    upload: () => ({
      bytes: Buffer.from(
        'tag,season,heightCm,azimuthDeg,depthCm,bitCm,collection\nT-001,2025,90,10,5,0.8,bucket\n',
      ),
      filename: 'h.csv',
    }),
    allowed: ['owner', 'tapper'],
    okStatus: 200,
  },
  {
    name: 'export the register',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/export.csv`,
    allowed: everyone,
  },
  {
    name: 'add a photo to a tree',
    method: 'post',
    path: (i) => `/api/trees/${i.treeId}/photos`,
    upload: () => ({ bytes: photo, filename: 'trunk.png' }),
    allowed: ['owner', 'consultant'],
  },
  {
    name: 'add a photo to a note',
    method: 'post',
    path: (i) => `/api/notes/${i.noteId}/photos`,
    upload: () => ({ bytes: photo, filename: 'crack.png' }),
    allowed: ['owner', 'consultant'],
  },
  {
    name: 'list a tree’s photos',
    method: 'get',
    path: (i) => `/api/trees/${i.treeId}/photos`,
    allowed: everyone,
  },
  {
    name: 'see a photo',
    method: 'get',
    path: (i) => `/api/photos/${i.photoId}`,
    allowed: everyone,
  },
  {
    name: 'read the season’s weather',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/weather?season=2025`,
    allowed: everyone,
  },
  {
    name: 'record a day’s weather',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/weather`,
    body: () => ({ date: '2025-03-10', minC: -4, maxC: 5 }),
    allowed: ['owner', 'forester', 'tapper'],
  },
  {
    name: 'check a station’s daily summaries (dry run)',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/weather/imports?dryRun=1`,
    upload: () => ({
      bytes: Buffer.from('STATION,DATE,TMAX (°F),TMIN (°F)\nUSC00999999,2025-03-11,44,25\n'),
      filename: 'station.csv',
    }),
    allowed: ['owner', 'forester', 'tapper'],
    okStatus: 200,
  },
  {
    name: 'read the season’s sap',
    method: 'get',
    path: (i) => `/api/sugarbushes/${i.standId}/sap?season=2025`,
    allowed: everyone,
  },
  {
    name: 'record sap',
    method: 'post',
    path: (i) => `/api/sugarbushes/${i.standId}/sap`,
    body: () => ({ collectedOn: '2025-03-10', volumeL: 120, sugarPct: 2.4, collection: 'vacuum' }),
    allowed: ['owner', 'forester', 'tapper'],
  },
  {
    name: 'correct a sap entry',
    method: 'patch',
    path: (i) => `/api/sap/${i.sapEntryId}`,
    body: () => ({ volumeL: 100 + ++n }),
    allowed: ['owner', 'forester', 'tapper'],
  },
];

let t: Awaited<ReturnType<typeof makeTestApp>>;
let ids: Ids;
const agents = {} as Record<Who, Awaited<ReturnType<typeof signIn>>>;

beforeAll(async () => {
  t = await makeTestApp();
  const team = await standWithTeam(t.db);
  const memberId = await addUser(t.db, 'second-tapper@test.example');
  await addMember(t.db, memberId, team.standId, 'tapper');
  for (const who of [...everyone, 'outsider'] as Who[])
    agents[who] = await signIn(t.app, team.users[who]);
  photo = await sharp({ create: { width: 16, height: 16, channels: 3, background: '#3f6b4a' } })
    .png()
    .toBuffer();
  const { agent, csrf } = agents.consultant;
  const note = await agent
    .post(`/api/trees/${team.treeId}/notes`)
    .set('x-csrf-token', csrf)
    .send({ category: 'hazard', body: 'Hanger over the lateral.' });
  const stored = await agent
    .post(`/api/trees/${team.treeId}/photos`)
    .set('x-csrf-token', csrf)
    .attach('file', photo, 'first.png');
  // A plan issued before the matrix runs, so every reader has one to read.
  const issued = await agents.owner.agent
    .post(`/api/sugarbushes/${team.standId}/issued-plans`)
    .set('x-csrf-token', agents.owner.csrf)
    .send({ season: 2026 });
  if (issued.status !== 201) throw new Error(`issuing failed: ${JSON.stringify(issued.body)}`);
  const sap = await agents.tapper.agent
    .post(`/api/sugarbushes/${team.standId}/sap`)
    .set('x-csrf-token', agents.tapper.csrf)
    .send({ collectedOn: '2025-03-09', volumeL: 90, sugarPct: 2.1 });
  ids = {
    sapEntryId: sap.body.id,
    standId: team.standId,
    treeId: team.treeId,
    memberId,
    noteId: note.body.id,
    photoId: stored.body.id,
  };
});
afterAll(() => t.close());

describe.each(cases)('$name', (c) => {
  it.each([...everyone, 'outsider'] as Who[])('as %s', async (who) => {
    const { agent, csrf } = agents[who];
    let req = agent[c.method](c.path(ids));
    if (c.upload) {
      const { bytes, filename } = c.upload();
      req = req.set('x-csrf-token', csrf).attach('file', bytes, filename);
    } else if (c.method !== 'get') req = req.set('x-csrf-token', csrf).send(c.body!());
    const res = await req;
    const expected =
      who === 'outsider'
        ? 404
        : c.allowed.includes(who)
          ? (c.okStatus ?? (c.method === 'post' ? 201 : 200))
          : 403;
    expect(res.status, JSON.stringify(res.body)).toBe(expected);
    if (expected >= 400)
      expect(res.body.error.code).toBe(expected === 404 ? 'not-found' : 'forbidden');
  });
});

describe('what a member sees', () => {
  it('when the outsider lists sugarbushes, then only their own stand appears', async () => {
    const res = await agents.outsider.agent.get('/api/sugarbushes');
    expect(res.body.items.map((s: { name: string }) => s.name)).toEqual(['Other Hollow']);
    expect(res.body.total).toBe(1);
  });

  it('when the outsider asks for a stand that does not exist, then it looks the same as one they may not see', async () => {
    const hidden = await agents.outsider.agent.get(`/api/sugarbushes/${ids.standId}`);
    const missing = await agents.outsider.agent.get('/api/sugarbushes/999999');
    expect([hidden.status, missing.status]).toEqual([404, 404]);
    expect(hidden.body).toEqual({ error: { code: 'not-found', message: 'Sugarbush not found' } });
    expect(missing.body).toEqual(hidden.body);
  });
});
