import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let forester: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  forester = await signIn(t.app, team.users.forester);
  tapper = await signIn(t.app, team.users.tapper);
});
afterAll(() => t.close());

type Agent = Awaited<ReturnType<typeof signIn>>;

/** POST a CSV text as the multipart field `file`, with an optional mapping. */
function upload(
  who: Agent,
  standId: number,
  kind: string,
  text: string | Buffer,
  opts: { dryRun?: boolean; mapping?: unknown } = {},
) {
  const req = who.agent
    .post(`/api/sugarbushes/${standId}/imports/${kind}${opts.dryRun ? '?dryRun=1' : ''}`)
    .set('x-csrf-token', who.csrf);
  if (opts.mapping !== undefined) req.field('mapping', JSON.stringify(opts.mapping));
  return req.attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text, 'utf8'), 'file.csv');
}

/** Trees written straight into the register, their advice brought up to date. */
async function addTrees(...tags: string[]) {
  const ids = [];
  for (const tag of tags) ids.push(await addTree(t.db, team.standId, tag));
  await recordsWritten(t.db, team.standId, ids);
}

const treeCount = async (standId: number) =>
  Number((await t.db('trees').where({ sugarbush_id: standId }).count({ n: '*' }))[0].n);

/** A thousand trees, tags A-0001 …; `bad` puts an unknown species on that data row. */
function thousandTrees(bad?: number) {
  const lines = ['tag,species,lat,lng,status'];
  for (let i = 1; i <= 1000; i++)
    lines.push(
      `A-${String(i).padStart(4, '0')},${i === bad ? 'sugar-pine' : 'sugar-maple'},45.${String(i).padStart(4, '0')},-72.5,active`,
    );
  return `${lines.join('\n')}\n`;
}

describe('importing the register from CSV', () => {
  it('when one row of a thousand is wrong, then nothing is written and that row and column are reported', async () => {
    const before = await treeCount(team.standId);
    const res = await upload(owner, team.standId, 'trees', thousandTrees(500));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('rows-rejected');
    expect(res.body.rows).toBe(1000);
    // Data row 500 is the file's line 501: the header is row 1.
    expect(res.body.errors).toEqual([{ row: 501, column: 'species', message: expect.any(String) }]);
    expect(await treeCount(team.standId)).toBe(before);
  });

  it('when the corrected file is imported, then every row is written, and a second import adds nothing', async () => {
    const before = await treeCount(team.standId);
    const first = await upload(owner, team.standId, 'trees', thousandTrees());
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ rows: 1000, created: 1000, unchanged: 0, errors: [] });
    expect(await treeCount(team.standId)).toBe(before + 1000);
    const row = await t.db('trees').where({ sugarbush_id: team.standId, tag: 'A-0042' }).first();
    expect(row).toMatchObject({
      species: 'sugar-maple',
      lat: 45.0042,
      lng: -72.5,
      status: 'active',
    });

    const again = await upload(owner, team.standId, 'trees', thousandTrees());
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ created: 0, unchanged: 1000, errors: [] });
    expect(await treeCount(team.standId)).toBe(before + 1000);
  });

  it('when a dry run is sent, then it reports what it would do and writes nothing', async () => {
    const before = await treeCount(team.standId);
    const res = await upload(
      owner,
      team.standId,
      'trees',
      'tag,species\nD-1,red-maple\nD-2,Sugar maple\n',
      {
        dryRun: true,
      },
    );
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ dryRun: true, rows: 2, created: 2, errors: [] });
    expect(res.body.columns).toEqual([
      { header: 'tag', field: 'tag' },
      { header: 'species', field: 'species' },
    ]);
    expect(res.body.preview).toEqual([
      ['D-1', 'red-maple'],
      ['D-2', 'Sugar maple'],
    ]);
    expect(await treeCount(team.standId)).toBe(before);
  });

  it('when a tag on record comes with other data, then it is reported, or replaced when the mapping says so', async () => {
    await upload(owner, team.standId, 'trees', 'tag,species,status\nU-1,sugar-maple,active\n');
    const clash = await upload(
      owner,
      team.standId,
      'trees',
      'tag,species,status\nU-1,red-maple,active\n',
    );
    expect(clash.status).toBe(422);
    expect(clash.body.errors).toEqual([
      { row: 2, column: 'species', message: expect.stringMatching(/U-1/) },
    ]);
    const replaced = await upload(
      owner,
      team.standId,
      'trees',
      'tag,species,status\nU-1,red-maple,active\n',
      {
        mapping: { updateExisting: true },
      },
    );
    expect(replaced.status).toBe(200);
    expect(replaced.body).toMatchObject({ updated: 1, created: 0 });
    const row = await t.db('trees').where({ sugarbush_id: team.standId, tag: 'U-1' }).first();
    expect(row.species).toBe('red-maple');
  });
});

describe('reading spreadsheet files', () => {
  it('when a file has a byte-order mark, semicolons and decimal commas, then it is read', async () => {
    const text = '\uFEFFtag;species;lat;lng;status\r\nS-1;sugar-maple;45,1234;-72,5;active\r\n';
    const res = await upload(forester, team.standId, 'trees', text);
    expect(res.status).toBe(201);
    expect(res.body.columns[0]).toEqual({ header: 'tag', field: 'tag' });
    const row = await t.db('trees').where({ sugarbush_id: team.standId, tag: 'S-1' }).first();
    expect(row).toMatchObject({ lat: 45.1234, lng: -72.5 });
  });

  it('when a file is not UTF-8 but an older spreadsheet encoding, then its accented letters are kept', async () => {
    const text = Buffer.from('tag,species\nÉ-1,sugar-maple\n', 'latin1');
    const res = await upload(forester, team.standId, 'trees', text);
    expect(res.status).toBe(201);
    expect(
      await t.db('trees').where({ sugarbush_id: team.standId, tag: 'É-1' }).first(),
    ).toBeTruthy();
  });

  it('when a note holds a quoted newline, then it stays in one row and later rows keep their spreadsheet number', async () => {
    await addTrees('Q-1', 'Q-2');
    const text =
      'tag\tmeasuredOn\tdbhCm\tcrownDiebackPct\tnote\n' +
      'Q-1\t2025-10-01\t31,5\t10\t"split bark,\nlow on the north side"\n' +
      'Q-2\t2025-10-01\t-4\t\t\n';
    const bad = await upload(forester, team.standId, 'measurements', text);
    expect(bad.status).toBe(422);
    expect(bad.body.errors).toEqual([{ row: 3, column: 'dbhCm', message: expect.any(String) }]);
    const good = await upload(
      forester,
      team.standId,
      'measurements',
      text.replace('\t-4\t', '\t28\t'),
    );
    expect(good.status).toBe(201);
    const tree = await t.db('trees').where({ sugarbush_id: team.standId, tag: 'Q-1' }).first();
    const m = await t.db('measurements').where({ tree_id: tree.id }).first();
    expect(m).toMatchObject({
      dbh_cm: 31.5,
      crown_dieback_pct: 10,
      note: 'split bark,\nlow on the north side',
    });
    expect(tree.latest_dbh_cm).toBe(31.5);
  });

  it('when numbers carry unit suffixes, then the column unit is kept and a contradicting one is an error', async () => {
    await addTrees('N-1', 'N-2');
    const bad = await upload(
      forester,
      team.standId,
      'measurements',
      'tag,measuredOn,dbhIn\nN-1,2025-10-02,12 in\nN-2,2025-10-02,30 cm\n',
    );
    expect(bad.status).toBe(422);
    expect(bad.body.errors).toEqual([
      { row: 3, column: 'dbhIn', message: expect.stringMatching(/centimetres/) },
    ]);
    const good = await upload(
      forester,
      team.standId,
      'measurements',
      'tag,measuredOn,DBH (in)\nN-1,2025-10-02,12"\nN-2,2025-10-02,10\n',
    );
    expect(good.status).toBe(201);
    expect(good.body.columns[2]).toEqual({ header: 'DBH (in)', field: 'dbhIn' });
    const n1 = await t.db('trees').where({ sugarbush_id: team.standId, tag: 'N-1' }).first();
    expect(n1.latest_dbh_cm).toBeCloseTo(30.48, 6);
  });

  it('when a DBH column says no unit, then it is not guessed: the mapping must name one', async () => {
    const text = 'Tree,Date,DBH\nN-1,2025-10-03,31\n';
    const unmapped = await upload(forester, team.standId, 'measurements', text);
    expect(unmapped.status).toBe(422);
    expect(unmapped.body.errors).toContainEqual({
      row: 1,
      column: 'dbhCm',
      message: expect.stringMatching(/unit/),
    });
    const mapped = await upload(forester, team.standId, 'measurements', text, {
      dryRun: true,
      mapping: { columns: { Tree: 'tag', DBH: 'circumferenceCm' } },
    });
    expect(mapped.status).toBe(200);
    expect(mapped.body).toMatchObject({ created: 1, errors: [] });
    expect(mapped.body.columns).toEqual([
      { header: 'Tree', field: 'tag' },
      { header: 'Date', field: 'measuredOn' },
      { header: 'DBH', field: 'circumferenceCm' },
    ]);
  });
});

describe('text that a spreadsheet would run', () => {
  it('when a note starts like a formula, then the export marks it as text and the import takes it back unchanged', async () => {
    const id = await addTree(t.db, team.standId, 'F-1');
    await t.db('measurements').insert({
      tree_id: id,
      measured_on: '2025-10-05',
      season: 2025,
      dbh_cm: 40,
      note: '=HYPERLINK("x")',
    });
    await recordsWritten(t.db, team.standId, [id]);
    const res = await owner.agent.get(`/api/sugarbushes/${team.standId}/export/measurements.csv`);
    expect(res.status).toBe(200);
    const line = res.text.split('\n').find((l) => l.startsWith('F-1,'));
    expect(line).toBe(`F-1,2025-10-05,40,,"'=HYPERLINK(""x"")"`);
    const again = await upload(
      owner,
      team.standId,
      'measurements',
      `tag,measuredOn,dbhCm,crownDiebackPct,note\n${line}\n`,
    );
    expect(again.body).toMatchObject({ created: 0, unchanged: 1, errors: [] });
  });
});

describe('who may import', () => {
  it('when a tapper imports trees or measurements, then it is refused with 403', async () => {
    const trees = await upload(tapper, team.standId, 'trees', 'tag,species\nZ-1,sugar-maple\n');
    const readings = await upload(tapper, team.standId, 'measurements', 'tag,measuredOn,dbhCm\n');
    expect([trees.status, readings.status]).toEqual([403, 403]);
  });

  it('when a forester imports tapholes, then it is refused with 403; a tapper may', async () => {
    await addTrees('H-1');
    const text =
      'tag,season,heightCm,azimuthDeg,depthCm,bitCm,collection\nH-1,2025,90,180,5,0.8,vacuum\n';
    expect((await upload(forester, team.standId, 'tapholes', text)).status).toBe(403);
    const res = await upload(tapper, team.standId, 'tapholes', text);
    expect(res.status).toBe(201);
    expect((await upload(tapper, team.standId, 'tapholes', text)).body).toMatchObject({
      created: 0,
      unchanged: 1,
    });
  });

  it('when someone outside the stand imports, then the stand is not found (404)', async () => {
    const outsider = await signIn(t.app, team.users.outsider);
    const res = await upload(outsider, team.standId, 'trees', 'tag,species\nZ-1,sugar-maple\n');
    expect(res.status).toBe(404);
  });

  it('when the file is larger than allowed, then it is refused with 413', async () => {
    const small = await makeTestApp({ IMPORT_MAX_BYTES: '100' }, t.database);
    try {
      const who = await signIn(small.app, team.users.owner);
      const res = await upload(
        who,
        team.standId,
        'trees',
        `tag,species\n${'X-1,sugar-maple\n'.repeat(20)}`,
      );
      expect(res.status).toBe(413);
    } finally {
      await small.close();
    }
  });
});
