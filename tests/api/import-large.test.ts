import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { importPhases, REPORTED_ROWS, type ImportProgress } from '../../shared/schemas/imports';
import { makeTestApp, signIn, standWithTeam } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let forester: Awaited<ReturnType<typeof signIn>>;
let outsider: Awaited<ReturnType<typeof signIn>>;

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  owner = await signIn(t.app, team.users.owner);
  forester = await signIn(t.app, team.users.forester);
  outsider = await signIn(t.app, team.users.outsider);
});
afterAll(() => t.close());

type Agent = Awaited<ReturnType<typeof signIn>>;
const ROWS = 10_000;

/** `ROWS` trees, tags L-00001 …; `species` gives each row's species. */
function trees(species: (i: number) => string = () => 'sugar-maple') {
  const lines = ['tag,species,lat,lng,status'];
  for (let i = 1; i <= ROWS; i++)
    lines.push(`L-${String(i).padStart(5, '0')},${species(i)},45.001,-72.5,active`);
  return `${lines.join('\n')}\n`;
}

function post(who: Agent, csv: string, opts: { importId?: string; dryRun?: boolean } = {}) {
  const req = who.agent
    .post(`/api/sugarbushes/${team.standId}/imports/trees${opts.dryRun ? '?dryRun=1' : ''}`)
    .set('x-csrf-token', who.csrf);
  if (opts.importId) req.set('x-import-id', opts.importId);
  return req.attach('file', Buffer.from(csv, 'utf8'), 'trees.csv');
}

const progressOf = (who: Agent, importId: string, standId = team.standId) =>
  who.agent.get(`/api/sugarbushes/${standId}/imports/${importId}/progress`);

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('the progress of a large import', () => {
  it('when 10,000 trees are imported, then their steps are read while the POST is pending, never going back, and done at the end', async () => {
    const importId = randomUUID();
    let answered = false;
    const posting = post(owner, trees(), { importId }).then((res) => {
      answered = true;
      return res;
    });
    const seen: ImportProgress[] = [];
    const others: number[] = [];
    while (!answered) {
      const res = await progressOf(owner, importId);
      if (res.status === 200) seen.push(res.body as ImportProgress);
      if (seen.length === 1) {
        // Read by the one who started it only: another member, and a member of another stand,
        // get 404 as for an id never used.
        others.push((await progressOf(forester, importId)).status);
        others.push((await progressOf(outsider, importId)).status);
        others.push((await progressOf(outsider, importId, team.otherStandId)).status);
      }
      await sleep(10);
    }
    const res = await posting;
    expect(res.status).toBe(201);
    expect(res.body.created).toBe(ROWS);
    expect(others).toEqual([404, 404, 404]);

    const during = seen.filter((s) => s.phase !== 'done');
    expect(
      during.some((s) => ['reading', 'checking', 'writing', 'advising'].includes(s.phase)),
    ).toBe(true);
    const rank = (s: ImportProgress) => importPhases.indexOf(s.phase);
    for (const [i, s] of seen.entries()) {
      expect(s).toMatchObject({ importId, kind: 'trees', dryRun: false });
      expect(s.done).toBeLessThanOrEqual(s.total);
      if (i === 0) continue;
      const before = seen[i - 1];
      expect(rank(s)).toBeGreaterThanOrEqual(rank(before));
      if (s.phase === before.phase) expect(s.done).toBeGreaterThanOrEqual(before.done);
    }
    for (const s of seen.filter((x) => x.phase === 'checking' || x.phase === 'writing'))
      expect(s.total).toBe(ROWS);
    expect(seen.some((s) => s.phase === 'failed')).toBe(false);

    const last = await progressOf(owner, importId);
    expect(last.status).toBe(200);
    expect(last.body).toMatchObject({ phase: 'done' });
    expect(last.body.done).toBe(last.body.total);
  }, 120_000);

  it('when the import id is not a UUID, or one still running is sent again, then it is refused', async () => {
    const bad = await post(owner, 'tag,species\nQ-1,sugar-maple\n', { importId: 'not-a-uuid' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('importId');
    expect((await progressOf(owner, 'not-a-uuid')).status).toBe(400);
    expect((await progressOf(owner, randomUUID())).status).toBe(404);
  });
});

describe('the report of a file full of wrong rows', () => {
  it('when 10,000 rows are wrong, then the first 200 rows are reported with the count of every problem and row', async () => {
    // Every row names a species the register does not know; every third one a bad latitude too.
    const csv = trees().replace(/sugar-maple,45\.001/g, 'sugar-pine,45.001');
    const withBadLat = csv
      .split('\n')
      .map((line, i) => (i > 0 && i % 3 === 0 ? line.replace(',45.001,', ',north,') : line))
      .join('\n');
    const res = await post(owner, withBadLat, { dryRun: true });
    expect(res.status).toBe(200);
    const thirds = Math.floor(ROWS / 3);
    expect(res.body.totalErrors).toBe(ROWS + thirds);
    expect(res.body.rowsWithErrors).toBe(ROWS);
    expect(res.body.truncated).toBe(true);
    const rows = new Set<number>(res.body.errors.map((e: { row: number }) => e.row));
    expect(rows.size).toBe(REPORTED_ROWS);
    // The first rows, in order: data rows 2 … 201 of the spreadsheet.
    expect(Math.min(...rows)).toBe(2);
    expect(Math.max(...rows)).toBe(REPORTED_ROWS + 1);
    expect(res.body.errors).toHaveLength(REPORTED_ROWS + Math.floor(REPORTED_ROWS / 3));

    const real = await post(owner, withBadLat);
    expect(real.status).toBe(422);
    expect(real.body.error.message).toBe('10,000 rows need attention: nothing was imported');
    expect(real.body.errors.length).toBeLessThan(REPORTED_ROWS * 2);
    expect(real.body.totalErrors).toBe(ROWS + thirds);
  }, 60_000);

  it('when a few rows are wrong, then every one is reported and nothing is cut', async () => {
    const csv = 'tag,species\nF-1,sugar-pine\nF-2,sugar-maple\nF-3,oak\n';
    const res = await post(owner, csv, { dryRun: true });
    expect(res.body).toMatchObject({ totalErrors: 2, rowsWithErrors: 2, truncated: false });
    expect(res.body.errors.map((e: { row: number }) => e.row)).toEqual([2, 4]);
  });
});
