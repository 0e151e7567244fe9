import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { addMember, addSugarbush, makeTestApp, signIn } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let demoId: number;
let emptyId: number;
let owner: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  demoId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  emptyId = await addSugarbush(t.db, 'Owl Ledge Copy');
  const ownerId = (await t.db('users').where({ email: 'owner@fernside.example' }).first('id')).id;
  await addMember(t.db, ownerId, emptyId, 'owner');
  owner = await signIn(t.app, 'owner@fernside.example', 'maple-demo-2027');
}, 120_000);
afterAll(() => t.close());

const paths = {
  trees: 'export.csv',
  measurements: 'export/measurements.csv',
  tapholes: 'export/tapholes.csv',
  geojson: 'export.geojson',
} as const;

async function exported(standId: number, what: keyof typeof paths) {
  const res = await owner.agent
    .get(`/api/sugarbushes/${standId}/${paths[what]}`)
    .buffer(true)
    .parse((r, done) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => done(null, Buffer.concat(parts).toString('utf8')));
    });
  expect(res.status).toBe(200);
  return { text: res.body as string, headers: res.headers };
}

const importFile = (standId: number, kind: string, text: string) =>
  owner.agent
    .post(`/api/sugarbushes/${standId}/imports/${kind}`)
    .set('x-csrf-token', owner.csrf)
    .attach('file', Buffer.from(text, 'utf8'), `${kind}.csv`);

/** The GeoJSON without the trees' ids, which differ between two stands. */
const withoutIds = (text: string) => {
  const fc = JSON.parse(text) as { features: { id?: number }[] };
  for (const f of fc.features) delete f.id;
  return fc;
};

describe('exporting a stand and importing it again', () => {
  it('when the demo register is exported, then each file is named for the stand and starts with its import header', async () => {
    const trees = await exported(demoId, 'trees');
    expect(trees.headers['content-disposition']).toMatch(
      /^attachment; filename="?owl-ledge-trees\.csv"?$/,
    );
    expect(trees.text.split('\n')[0]).toBe('tag,species,lat,lng,status');
    const rows = trees.text.trim().split('\n').length - 1;
    const count = await t.db('trees').where({ sugarbush_id: demoId }).count({ n: '*' });
    expect(rows).toBe(Number(count[0].n));
    const geo = await exported(demoId, 'geojson');
    expect(geo.headers['content-type']).toMatch(/application\/geo\+json/);
    const fc = JSON.parse(geo.text);
    expect(fc.type).toBe('FeatureCollection');
    expect(fc.features).toHaveLength(rows);
    expect(fc.features[0].properties).toEqual(
      expect.objectContaining({ tag: expect.any(String), latestDbhCm: expect.anything() }),
    );
    expect((await exported(demoId, 'measurements')).text.split('\n')[0]).toBe(
      'tag,measuredOn,dbhCm,crownDiebackPct,note',
    );
  });

  it('when the export is imported into an empty stand and exported again, then every file is the same apart from ids', async () => {
    const before = {
      trees: (await exported(demoId, 'trees')).text,
      measurements: (await exported(demoId, 'measurements')).text,
      tapholes: (await exported(demoId, 'tapholes')).text,
      geojson: (await exported(demoId, 'geojson')).text,
    };
    for (const kind of ['trees', 'measurements', 'tapholes'] as const) {
      const res = await importFile(emptyId, kind, before[kind]);
      expect({ kind, status: res.status, errors: res.body.errors?.slice(0, 3) }).toEqual({
        kind,
        status: 201,
        errors: [],
      });
      expect(res.body.created).toBe(res.body.rows);
    }
    for (const kind of ['trees', 'measurements', 'tapholes'] as const)
      expect((await exported(emptyId, kind)).text).toBe(before[kind]);
    // The imported trees are advised: the plan lists every one of them.
    const plan = await owner.agent.get(`/api/sugarbushes/${emptyId}/plan?season=2027&pageSize=1`);
    const count = await t.db('trees').where({ sugarbush_id: emptyId }).count({ n: '*' });
    expect(plan.status).toBe(200);
    expect(plan.body.total).toBe(Number(count[0].n));
    const after = (await exported(emptyId, 'geojson')).text;
    expect(withoutIds(after)).toEqual(withoutIds(before.geojson));
    expect(after.replace(/"id":\d+,/g, '')).toBe(before.geojson.replace(/"id":\d+,/g, ''));
  }, 120_000);

  it('when the same export is imported a second time, then nothing is added', async () => {
    const measurements = (await exported(demoId, 'measurements')).text;
    const res = await importFile(emptyId, 'measurements', measurements);
    expect(res.status).toBe(200);
    expect(res.body.created).toBe(0);
    expect(res.body.unchanged).toBe(res.body.rows);
  }, 60_000);

  it('when a member who is not on the stand asks for its export, then it is not found', async () => {
    const outsider = await signIn(t.app, 'outsider@elsewhere.example', 'maple-demo-2027');
    const res = await outsider.agent.get(`/api/sugarbushes/${demoId}/export.csv`);
    expect(res.status).toBe(404);
  });
});
