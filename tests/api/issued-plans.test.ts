import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type {
  FieldSheetPage,
  IssuedItem,
  IssuedPlanHeader,
  IssuedPlanResponse,
  IssuedPlanVersions,
  SeasonProgress,
} from '../../shared/schemas/issued-plan';
import { upcomingSeason, type StandPlanResponse } from '../../shared/schemas/plan';
import { isoDay } from '../../shared/schemas/iso-date';
import { addTree, makeTestApp, recordsWritten, signIn, standWithTeam } from './test-app';

const season = upcomingSeason();
/** A reading is never dated ahead of today: from June on, `season - 1` is this year. */
const notAfterToday = (day: string) => (day > isoDay() ? isoDay() : day);
let t: Awaited<ReturnType<typeof makeTestApp>>;
let team: Awaited<ReturnType<typeof standWithTeam>>;
let owner: Awaited<ReturnType<typeof signIn>>;
let forester: Awaited<ReturnType<typeof signIn>>;
let tapper: Awaited<ReturnType<typeof signIn>>;
const trees: Record<string, number> = {};
/** Tag, DBH (cm) and where each tree stands: about ten metres apart along a line. */
const stand: [string, number, number][] = [
  ['P-01', 40, 0],
  ['P-02', 52, 3],
  ['P-03', 41, 2],
  ['P-04', 22, 4],
  ['P-05', 47, 1],
];

beforeAll(async () => {
  t = await makeTestApp();
  team = await standWithTeam(t.db);
  [owner, forester, tapper] = await Promise.all(
    [team.users.owner, team.users.forester, team.users.tapper].map((u) => signIn(t.app, u)),
  );
  await t.db('users').where({ email: team.users.owner }).update({ name: 'Ada Fernwood' });
  for (const [tag, dbhCm, step] of stand) {
    trees[tag] = await addTree(t.db, team.standId, tag, { lat: 45 + step * 0.0001, lng: -72 });
    await t.db('measurements').insert({
      tree_id: trees[tag],
      measured_on: `${season - 1}-01-10`,
      season: season - 1,
      dbh_cm: dbhCm,
    });
  }
  // P-03's growth is known (two seasons measured), so a table that allows more taps gives them.
  await t.db('measurements').insert({
    tree_id: trees['P-03'],
    measured_on: `${season - 3}-10-01`,
    season: season - 3,
    dbh_cm: 38,
  });
  await recordsWritten(t.db, team.standId);
});
afterAll(() => t.close());

const post = (who: Awaited<ReturnType<typeof signIn>>, url: string, body: object) =>
  who.agent.post(url).set('x-csrf-token', who.csrf).send(body);
const patch = (who: Awaited<ReturnType<typeof signIn>>, url: string, body: object) =>
  who.agent.patch(url).set('x-csrf-token', who.csrf).send(body);

async function issue(): Promise<IssuedPlanHeader> {
  const res = await post(owner, `/api/sugarbushes/${team.standId}/issued-plans`, { season });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

async function readIssued(query: Record<string, number> = {}): Promise<IssuedPlanResponse> {
  const search = new URLSearchParams(
    Object.entries({ pageSize: 500, changesPageSize: 500, ...query }).map(([k, v]) => [k, `${v}`]),
  );
  const res = await tapper.agent.get(
    `/api/sugarbushes/${team.standId}/issued-plans/${season}?${search}`,
  );
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

async function todaysPlan(): Promise<StandPlanResponse> {
  const res = await tapper.agent.get(
    `/api/sugarbushes/${team.standId}/plan?season=${season}&pageSize=500`,
  );
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

let first: IssuedPlanHeader;
let frozen: IssuedItem[];

describe('issuing a season’s plan', () => {
  it('when nothing was issued for the season, then reading it answers 404', async () => {
    const res = await tapper.agent.get(`/api/sugarbushes/${team.standId}/issued-plans/${season}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });

  it('when the owner issues the plan without a CSRF token, then it is refused and nothing is stored', async () => {
    const res = await owner.agent
      .post(`/api/sugarbushes/${team.standId}/issued-plans`)
      .send({ season });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf-invalid');
    expect(Number((await t.db('issued_plans').count({ n: '*' }).first())!.n)).toBe(0);
  });

  it('when the season is not a year, then the answer names the field', async () => {
    const res = await post(owner, `/api/sugarbushes/${team.standId}/issued-plans`, {
      season: 'soon',
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['season']);
  });

  it('when the owner issues the plan, then version 1 holds every tree as today’s advice tells it, with who issued it and the totals', async () => {
    const plan = await todaysPlan();
    first = await issue();
    expect(first).toMatchObject({
      season,
      version: 1,
      issuedBy: { name: 'Ada Fernwood' },
      profile: { key: 'conservative', label: plan.profile.label },
      totals: plan.totals,
    });
    const read = await readIssued();
    expect(read.plan).toEqual(first);
    expect(read.latestVersion).toBe(1);
    expect(read.items.total).toBe(stand.length + 1); // the team's own tree, T-001, is one more
    expect(read.changes).toMatchObject({ total: 0, items: [] });
    frozen = read.items.items;
    for (const item of plan.items) {
      expect(frozen.find((f) => f.treeId === item.treeId)).toEqual({
        treeId: item.treeId,
        tag: item.tag,
        verdict: item.verdict,
        taps: item.taps,
        placements: item.placements.map((p) => ({
          azimuthDeg: p.azimuthDeg,
          heightCm: p.heightCm,
        })),
        bitCm: item.taps > 0 ? item.bitCm : null,
        depthCm: item.taps > 0 ? item.depthCm : null,
        hazards: [],
      });
    }
    expect(frozen.filter((f) => f.taps > 0).length).toBeGreaterThan(2);
  });

  it('when the items are paged, then each page is a slice of the tag order and the total stays', async () => {
    const one = await readIssued({ pageSize: 2, page: 1 });
    const two = await readIssued({ pageSize: 2, page: 2 });
    expect(one.items).toMatchObject({ total: 6, page: 1, pageSize: 2 });
    expect(two.items).toMatchObject({ total: 6, page: 2, pageSize: 2 });
    expect([...one.items.items, ...two.items.items].map((i) => i.tag)).toEqual(
      frozen.slice(0, 4).map((i) => i.tag),
    );
  });

  it('when the record, a tree’s status and the guideline change afterwards, then the issued copy stays as it was and every difference is listed with both values', async () => {
    const drilled = await post(tapper, `/api/trees/${trees['P-01']}/tapholes`, {
      season,
      heightCm: 105,
      azimuthDeg: 200,
      depthCm: 5.08,
      bitCm: 0.79,
      collection: 'vacuum',
    });
    expect(drilled.status, JSON.stringify(drilled.body)).toBe(201);
    const measured = await post(forester, `/api/trees/${trees['P-05']}/measurements`, {
      measuredOn: notAfterToday(`${season - 1}-11-02`),
      dbhCm: 47.2,
    });
    expect(measured.status, JSON.stringify(measured.body)).toBe(201);
    const retired = await patch(owner, `/api/trees/${trees['P-02']}`, { status: 'held-out' });
    expect(retired.status, JSON.stringify(retired.body)).toBe(200);
    const added = await post(owner, `/api/sugarbushes/${team.standId}/trees`, {
      tag: 'P-06',
      species: 'sugar-maple',
    });
    expect(added.status, JSON.stringify(added.body)).toBe(201);
    expect(
      (
        await post(owner, `/api/trees/${added.body.id}/measurements`, {
          measuredOn: notAfterToday(`${season - 1}-10-03`),
          dbhCm: 44,
        })
      ).status,
    ).toBe(201);
    // 40 cm is 15.7 in: one tap in the conservative table, two in the traditional one.
    const guideline = await patch(owner, `/api/sugarbushes/${team.standId}`, {
      profile: 'traditional',
    });
    expect(guideline.status, JSON.stringify(guideline.body)).toBe(200);

    const read = await readIssued();
    expect(read.plan).toEqual(first);
    expect(read.items.items).toEqual(frozen);

    const now = new Map((await todaysPlan()).items.map((i) => [i.tag, i]));
    const change = (tag: string) => read.changes.items.find((c) => c.tag === tag);
    const wasRetired = frozen.find((f) => f.tag === 'P-02')!;
    expect(wasRetired.taps).toBeGreaterThan(0);
    expect(change('P-02')).toMatchObject({
      kinds: ['removed', 'verdict'],
      issued: { verdict: wasRetired.verdict, taps: wasRetired.taps },
      current: { verdict: 'retired', taps: 0 },
    });
    expect(change('P-06')).toMatchObject({
      kinds: ['added'],
      issued: null,
      current: { taps: now.get('P-06')!.taps },
    });
    const p03 = frozen.find((f) => f.tag === 'P-03')!;
    expect(now.get('P-03')!.taps).not.toBe(p03.taps);
    expect(change('P-03')).toMatchObject({
      issued: { taps: p03.taps, placements: p03.placements },
      current: { taps: now.get('P-03')!.taps },
    });
    expect(change('P-03')!.kinds).toEqual(['taps']);
    // P-01's growth is not known: the traditional table's second tap is held back.
    expect(change('P-01')).toMatchObject({
      kinds: ['verdict'],
      issued: { verdict: 'tap', taps: 1 },
      current: { verdict: 'tap-reduced', taps: 1 },
    });
    // Every tree whose taps, placements or verdict differ is listed, and no other.
    const differs = frozen.filter((f) => {
      const n = now.get(f.tag)!;
      return (
        n.taps !== f.taps ||
        n.verdict !== f.verdict ||
        JSON.stringify(n.placements.map((p) => [p.azimuthDeg, p.heightCm])) !==
          JSON.stringify(f.placements.map((p) => [p.azimuthDeg, p.heightCm]))
      );
    });
    expect(read.changes.items.map((c) => c.tag).sort()).toEqual(
      [...differs.map((d) => d.tag), 'P-06'].sort(),
    );
    expect(read.changes.byKind.removed).toBe(1);
    expect(read.changes.byKind.added).toBe(1);
  });

  it('when the owner issues again, then it is version 2, version 1 is kept unchanged, and the list names both', async () => {
    const second = await issue();
    expect(second.version).toBe(2);
    expect(second.profile.key).toBe('traditional');
    const latest = await readIssued();
    expect(latest.plan.version).toBe(2);
    expect(latest.changes.total).toBe(0);
    const old = await readIssued({ version: 1 });
    expect(old.plan).toEqual(first);
    expect(old.latestVersion).toBe(2);
    expect(old.items.items).toEqual(frozen);
    const list = await tapper.agent.get(`/api/sugarbushes/${team.standId}/issued-plans`);
    expect(list.status).toBe(200);
    expect((list.body as IssuedPlanVersions).items.map((v) => [v.season, v.version])).toEqual([
      [season, 2],
      [season, 1],
    ]);
  });

  it('when a tree has an open hazard note at issue, then its text is frozen in the copy', async () => {
    const consultant = await signIn(t.app, team.users.consultant);
    const note = await post(consultant, `/api/trees/${trees['P-05']}/notes`, {
      category: 'hazard',
      body: 'Dead limb over the <b>spout</b> side.',
    });
    expect(note.status).toBe(201);
    await issue();
    const read = await readIssued();
    expect(read.plan.version).toBe(3);
    expect(read.items.items.find((i) => i.tag === 'P-05')!.hazards).toEqual([
      'Dead limb over the <b>spout</b> side.',
    ]);
    expect(read.items.items.find((i) => i.tag === 'P-01')!.hazards).toEqual([]);
  });
});

describe('season progress and the field sheet', () => {
  it('when tapholes are recorded, then drilled, planned and trees done match the rows counted here', async () => {
    for (const [tag, n] of [
      ['P-03', 1],
      ['P-05', 2],
    ] as const)
      for (let i = 0; i < n; i++)
        expect(
          (
            await post(tapper, `/api/trees/${trees[tag]}/tapholes`, {
              season,
              heightCm: 90 + i * 20,
              azimuthDeg: 90 + i * 120,
              depthCm: 5.08,
              bitCm: 0.79,
              collection: 'vacuum',
            })
          ).status,
        ).toBe(201);
    const res = await tapper.agent.get(
      `/api/sugarbushes/${team.standId}/plan/progress?season=${season}`,
    );
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const progress = res.body as SeasonProgress;

    const issuedItems = (await readIssued()).items.items.filter((i) => i.taps > 0);
    const holes = await t
      .db('tapholes as h')
      .join('trees as t', 't.id', 'h.tree_id')
      .where({ 't.sugarbush_id': team.standId, 'h.season': season })
      .select('h.tree_id');
    const perTree = new Map<number, number>();
    for (const h of holes) perTree.set(h.tree_id, (perTree.get(h.tree_id) ?? 0) + 1);
    expect(holes.length).toBe(4);
    expect(progress).toEqual({
      season,
      plannedFrom: 'issued',
      issuedVersion: 3,
      plannedTaps: issuedItems.reduce((n, i) => n + i.taps, 0),
      drilledTaps: holes.length,
      treesToTap: issuedItems.length,
      treesDone: issuedItems.filter((i) => (perTree.get(i.treeId) ?? 0) >= i.taps).length,
    });
    expect(progress.treesDone).toBeGreaterThan(0);
  });

  it('when a season was never issued, then progress plans from today’s advice', async () => {
    const other = season - 1;
    const res = await tapper.agent.get(
      `/api/sugarbushes/${team.standId}/plan/progress?season=${other}`,
    );
    expect(res.status).toBe(200);
    const plan = await tapper.agent.get(
      `/api/sugarbushes/${team.standId}/plan?season=${other}&pageSize=500`,
    );
    const items = (plan.body as StandPlanResponse).items.filter((i) => i.taps > 0);
    expect(res.body).toEqual({
      season: other,
      plannedFrom: 'advice',
      issuedVersion: null,
      plannedTaps: items.reduce((n, i) => n + i.taps, 0),
      drilledTaps: 0,
      treesToTap: items.length,
      treesDone: 0,
    });
  });

  it('when the field sheet is paged through, then it lists every tree of the issued copy with taps once, in walking order, with hazards', async () => {
    const lines: FieldSheetPage['items'] = [];
    let sheet: FieldSheetPage;
    let page = 1;
    do {
      const res = await tapper.agent.get(
        `/api/sugarbushes/${team.standId}/plan/field-sheet?season=${season}&pageSize=2&page=${page++}`,
      );
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      sheet = res.body;
      lines.push(...sheet.items);
    } while (lines.length < sheet.total && page < 10);
    expect(sheet.printing).toBe('issued');
    expect(sheet.issued).toMatchObject({ version: 3, issuedBy: 'Ada Fernwood' });
    expect(sheet.standName).toBe('Test Ridge');
    const toTap = (await readIssued()).items.items.filter((i) => i.taps > 0);
    expect(lines.map((l) => l.tag).sort()).toEqual(toTap.map((i) => i.tag).sort());
    expect(lines.map((l) => l.position)).toEqual(lines.map((_, n) => n + 1));
    expect(sheet.taps).toBe(toTap.reduce((n, i) => n + i.taps, 0));
    // From the first tree on, the nearest not yet visited; P-06 has no position and comes last.
    expect(lines.map((l) => l.tag)).toEqual(['P-01', 'P-05', 'P-03', 'P-06']);
    expect(lines.find((l) => l.tag === 'P-05')?.hazards).toEqual([
      'Dead limb over the <b>spout</b> side.',
    ]);
  });

  it('when the field sheet is filtered by tag, then only those trees are listed', async () => {
    const res = await tapper.agent.get(
      `/api/sugarbushes/${team.standId}/plan/field-sheet?season=${season}&q=p-05`,
    );
    expect(res.status).toBe(200);
    expect((res.body as FieldSheetPage).items.map((i) => i.tag)).toEqual(['P-05']);
  });
});
