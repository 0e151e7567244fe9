import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DROUGHT_SEASON } from '../../seeds/demo/growth';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { warningCodes } from '../../shared/rules/index';
import {
  complianceCsvColumns,
  complianceCsvCompareColumns,
  type ComplianceItem,
  type ComplianceReport,
} from '../../shared/schemas/compliance';
import { upcomingSeason } from '../../shared/schemas/plan';
import type { TrendsResponse } from '../../shared/schemas/trends';
import {
  rawStand,
  recomputeCompliance,
  recomputeSeason,
  type RawStand,
} from './overview-recompute';
import { makeTestApp, signIn } from './test-app';

let t: Awaited<ReturnType<typeof makeTestApp>>;
let standId: number;
let owner: Awaited<ReturnType<typeof signIn>>;
let trends: TrendsResponse;
let raw: RawStand;

beforeAll(async () => {
  t = await makeTestApp();
  await seedDemoIfEmpty(t.db);
  standId = (await t.db('sugarbushes').where({ name: 'Owl Ledge' }).first('id')).id;
  owner = await signIn(t.app, 'owner@fernside.example', 'maple-demo-2027');
  const res = await owner.agent.get(`/api/sugarbushes/${standId}/trends`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  trends = res.body;
  raw = await rawStand(t.db, standId);
}, 120_000);
afterAll(() => t.close());

const close = (actual: number | null, expected: number | null) => {
  if (expected === null) expect(actual).toBeNull();
  else expect(actual).toBeCloseTo(expected, 6);
};

describe("the demo stand's trends", () => {
  it('has one item for every season with a measurement or taphole on record, then the planned one', async () => {
    const recorded = await t.db.raw(
      `select m.season from measurements m join trees t on t.id = m.tree_id where t.sugarbush_id = ?
       union select h.season from tapholes h join trees t on t.id = h.tree_id where t.sugarbush_id = ?
       order by 1`,
      [standId, standId],
    );
    const seasons = (recorded.rows ?? recorded).map((r: { season: number }) => Number(r.season));
    const upcoming = upcomingSeason();
    expect(trends.items.map((i) => i.season)).toEqual([
      ...seasons.filter((s: number) => s < upcoming),
      upcoming,
    ]);
    expect(trends.items[0].season).toBe(2018);
    expect(trends.items.at(-1)).toMatchObject({ season: upcoming, planned: true });
    expect(trends.items.filter((i) => i.planned)).toHaveLength(1);
    expect(trends.profile.key).toBe('conservative');
  });

  it('counts trees by status, taps set and the taps the advice allowed in every season, as the raw rows and the advisor give them', () => {
    for (const item of trends.items) {
      const expected = recomputeSeason(raw, item.season);
      const at = `season ${item.season}`;
      expect(item.trees, at).toBe(expected.trees);
      expect(item.byStatus, at).toEqual(expected.byStatus);
      expect(item.tapsSet, at).toBe(expected.tapsSet);
      expect(item.treesTapped, at).toBe(expected.treesTapped);
      expect(item.tapsAdvised, at).toBe(expected.tapsAdvised);
      expect(item.treesOverAdvice, at).toBe(expected.treesOverAdvice);
      expect(item.tapsOverAdvice, at).toBe(expected.tapsOverAdvice);
      for (const code of warningCodes)
        expect(item.warnings[code], `${at} ${code}`).toBe(expected.warnings[code] ?? 0);
      expect(Object.values(item.shareBands), at).toEqual(expected.bands);
      expect(item.sharedTrees, at).toBe(expected.bands.reduce((a, b) => a + b, 0));
      // Crown dieback in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992 — P).
      expect(Object.fromEntries(item.crownClasses.map((c) => [c.pct, c.trees])), at).toEqual(
        expected.crown,
      );
      expect(item.crownRated, at).toBe(Object.values(expected.crown).reduce((a, b) => a + b, 0));
    }
  });

  it('gives the median and quartiles of DBH and of basal-area growth in every season, as the raw rows give them', () => {
    for (const item of trends.items) {
      const expected = recomputeSeason(raw, item.season);
      for (const key of ['dbhCm', 'basalAreaGrowthCm2'] as const) {
        const want = expected[key];
        const got = item[key];
        if (want === null) {
          expect(got, `${item.season} ${key}`).toBeNull();
          continue;
        }
        expect(got!.trees, `${item.season} ${key}`).toBe(want.trees);
        close(got!.q1, want.q1);
        close(got!.median, want.median);
        close(got!.q3, want.q3);
      }
    }
    // Growth needs this season's and last season's readings: none for the first season on
    // record nor for the planned one.
    expect(trends.items[0].basalAreaGrowthCm2).toBeNull();
    expect(trends.items.at(-1)!.basalAreaGrowthCm2).toBeNull();
    // The demo's drought summer shows in the median.
    const median = (s: number) => trends.items.find((i) => i.season === s)!.basalAreaGrowthCm2!;
    expect(median(DROUGHT_SEASON).median).toBeLessThan(median(DROUGHT_SEASON - 1).median);
    expect(median(DROUGHT_SEASON).median).toBeLessThan(median(DROUGHT_SEASON + 1).median);
  });

  // BA(ft²) = π/576 · DBH(in)², BA(m²) = π/40000 · DBH(cm)² (DOMAIN §4 — P); 1 acre =
  // 4046.8564224 m² (the international acre).
  it('gives basal area, trees and taps per acre and hectare within the boundary in every season', () => {
    expect(trends.boundary).toBe(true);
    for (const item of trends.items) {
      const expected = recomputeSeason(raw, item.season);
      close(item.basalAreaFt2PerAcre, expected.basalAreaFt2PerAcre);
      close(item.basalAreaM2PerHa, expected.basalAreaM2PerHa);
      close(item.treesPerAcre, expected.treesPerAcre);
      close(item.treesPerHa, expected.treesPerHa);
      close(item.tapsSetPerAcre, expected.tapsSetPerAcre);
      close(item.tapsAdvisedPerAcre, expected.tapsAdvisedPerAcre);
    }
  });

  it('for the planned season, gives the same per-area figures as the stand figures do', async () => {
    const season = upcomingSeason();
    const figures = (await owner.agent.get(`/api/sugarbushes/${standId}/figures?season=${season}`))
      .body;
    const planned = trends.items.at(-1)!;
    close(planned.basalAreaFt2PerAcre, figures.basalAreaFt2PerAcre);
    close(planned.basalAreaM2PerHa, figures.basalAreaM2PerHa);
    close(planned.treesPerAcre, figures.treesPerAcre);
    close(planned.tapsAdvisedPerAcre, figures.tapsPerAcre);
    close(trends.areaAcres, figures.areaAcres);
  });

  it('links each conductive-share band to the plan: the plan filtered by a band lists the trees it counts', async () => {
    for (const item of [trends.items.at(-2)!, trends.items.at(-1)!]) {
      for (const [band, trees] of Object.entries(item.shareBands)) {
        const plan = await owner.agent.get(
          `/api/sugarbushes/${standId}/plan?season=${item.season}&share=${band}&pageSize=500`,
        );
        expect(plan.status).toBe(200);
        expect(plan.body.total, `${item.season} ${band}`).toBe(trees);
        for (const tree of plan.body.items)
          expect(['tap', 'tap-reduced', 'rest']).toContain(tree.verdict);
      }
    }
    expect((await owner.agent.get(`/api/sugarbushes/${standId}/plan?share=most`)).status).toBe(400);
  });

  // Crown dieback in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992 — P).
  it('links each crown-dieback class to the register: the register filtered by class and round lists the trees it counts', async () => {
    for (const item of trends.items.filter((i) => i.crownRated > 0).slice(-3)) {
      for (const { pct, trees } of item.crownClasses) {
        const list = await owner.agent.get(
          `/api/sugarbushes/${standId}/trees?dieback=${pct}&diebackSeason=${item.season}&pageSize=1`,
        );
        expect(list.status).toBe(200);
        expect(list.body.total, `${item.season} ${pct} %`).toBe(trees);
      }
    }
    const latest = await owner.agent.get(`/api/sugarbushes/${standId}/trees?dieback=0&pageSize=1`);
    const [{ n }] = await t
      .db('trees')
      .where({ sugarbush_id: standId })
      .where('latest_crown_dieback_pct', '>=', 0)
      .where('latest_crown_dieback_pct', '<', 5)
      .count({ n: '*' });
    expect(latest.body.total).toBe(Number(n));
    expect((await owner.agent.get(`/api/sugarbushes/${standId}/trees?dieback=12`)).status).toBe(
      400,
    );
  });

  it('keeps every season it reads current: a taphole recorded for 2026 shows in the very next answer and in each season’s stored advice', async () => {
    const seasons = await t.db('advice_state').where({ sugarbush_id: standId }).pluck('season');
    expect(seasons.map(Number).sort()).toEqual(trends.items.map((i) => i.season));

    const tapper = await signIn(t.app, 'tapper@fernside.example', 'maple-demo-2027');
    const tree = await t.db('trees').where({ sugarbush_id: standId, tag: 'OL-0023' }).first();
    const hole = await tapper.agent
      .post(`/api/trees/${tree.id}/tapholes`)
      .set('x-csrf-token', tapper.csrf)
      .send({
        season: 2026,
        heightCm: 95,
        azimuthDeg: 200,
        depthCm: 5.08,
        bitCm: 0.79,
        collection: 'vacuum',
      });
    expect(hole.status).toBe(201);
    const after: TrendsResponse = (await owner.agent.get(`/api/sugarbushes/${standId}/trends`))
      .body;
    const season2026 = (r: TrendsResponse) => r.items.find((i) => i.season === 2026)!;
    expect(season2026(after).tapsSet).toBe(season2026(trends).tapsSet + 1);
    expect(season2026(after).treesTapped).toBe(season2026(trends).treesTapped + 1);
    const version = (await t.db('trees').where({ id: tree.id }).first('record_version'))
      .record_version;
    const rows = await t
      .db('tree_advice')
      .where({ tree_id: tree.id })
      .select('season', 'tree_version');
    expect(rows.map((r) => Number(r.season)).sort()).toEqual(trends.items.map((i) => i.season));
    expect(new Set(rows.map((r) => Number(r.tree_version)))).toEqual(new Set([Number(version)]));
    trends = after;
    raw = await rawStand(t.db, standId);
  });
});

async function wholeReport(query: string): Promise<ComplianceReport> {
  const first = await owner.agent.get(
    `/api/sugarbushes/${standId}/compliance?${query}&pageSize=500`,
  );
  expect(first.status, JSON.stringify(first.body)).toBe(200);
  const report: ComplianceReport = first.body;
  for (let page = 2; (page - 1) * 500 < report.total; page++) {
    const next = await owner.agent.get(
      `/api/sugarbushes/${standId}/compliance?${query}&pageSize=500&page=${page}`,
    );
    report.items.push(...next.body.items);
  }
  return report;
}

const tappedIn = (season: number) =>
  raw.trees.filter((tree) => tree.tapholes.some((h) => h.season === season));

function expectReading(
  got: Pick<ComplianceItem, 'tapsAllowed' | 'tapsOver' | 'holesTooClose' | 'findings'>,
  want: ReturnType<typeof recomputeCompliance>,
  at: string,
) {
  expect(got.tapsAllowed, at).toBe(want.allowed);
  expect(got.tapsOver, at).toBe(want.over);
  expect(got.holesTooClose, at).toBe(want.tooClose);
  expect(got.findings, at).toEqual(want.findings);
}

describe('guideline compliance on the demo stand', () => {
  // Conservative: 12–<18 in one tap, 18 in and over two (NAMSPM 2006 via UVM Proctor — S);
  // spacing 4 in to the side or 12 in above/below (UVM Proctor sap-yield tips 2020 — S).
  it('reads every tree tapped in 2026 against the conservative table at the DBH measured before the season, as the raw rows give it', async () => {
    const report = await wholeReport('season=2026');
    expect(report).toMatchObject({
      season: 2026,
      sugarbush: { id: standId, name: 'Owl Ledge' },
      profile: { key: 'conservative' },
      compare: null,
      compareTotals: null,
    });
    expect(report.profile.source).toMatch(/North American Maple Syrup Producers Manual/);
    const tapped = tappedIn(2026);
    expect(report.total).toBe(tapped.length);
    expect(report.items.map((i) => i.tag)).toEqual(tapped.map((tree) => tree.tag));
    let tapsSet = 0;
    let tapsAllowed = 0;
    let tapsOver = 0;
    let withFindings = 0;
    const byFinding: Record<string, number> = {};
    report.items.forEach((item, n) => {
      const want = recomputeCompliance(tapped[n], 2026, 'conservative');
      expect(item.tapsSet, item.tag).toBe(want.tapsSet);
      expect(item.dbhBeforeCm, item.tag).toBe(want.dbh);
      expect(item.diebackBeforePct, item.tag).toBe(want.dieback);
      expectReading(item, want, item.tag);
      tapsSet += want.tapsSet;
      tapsAllowed += want.allowed ?? 0;
      tapsOver += want.over;
      if (want.findings.length > 0) withFindings++;
      for (const f of want.findings) byFinding[f] = (byFinding[f] ?? 0) + 1;
    });
    expect(report.totals).toMatchObject({
      treesTapped: tapped.length,
      tapsSet,
      tapsAllowed,
      tapsOver,
      treesOver: byFinding.over ?? 0,
      treesTooClose: byFinding['too-close'] ?? 0,
      treesTooSmall: byFinding['too-small'] ?? 0,
      treesDeclining: byFinding.declining ?? 0,
      treesUnmeasured: byFinding.unmeasured ?? 0,
      treesWithFindings: withFindings,
      treesCompliant: tapped.length - withFindings,
    });
    // The demo's overtapped, crowded and declining trees are found.
    expect(report.totals.treesOver).toBeGreaterThan(0);
    expect(report.totals.treesTooClose).toBeGreaterThan(0);
    expect(report.totals.treesDeclining).toBeGreaterThan(0);
    expect(report.items.find((i) => i.tag === 'OL-0064')?.findings).toContain('over');
  });

  // Traditional: one tap from 10 in, one more each 5 in, up to four (NAMSPM traditional set,
  // same summary — S); 3 in over and 6 in up or down, both (Ohio State — S).
  it('beside the traditional set, shows per tree and in totals what the other wording changes', async () => {
    const report = await wholeReport('season=2026&compare=traditional');
    expect(report.compare).toMatchObject({ key: 'traditional', spacingSource: 'Ohio State' });
    const tapped = tappedIn(2026);
    let changed = 0;
    let allowed = 0;
    report.items.forEach((item, n) => {
      const first = recomputeCompliance(tapped[n], 2026, 'conservative');
      const other = recomputeCompliance(tapped[n], 2026, 'traditional');
      expectReading(item, first, item.tag);
      expectReading(item.compare!, other, `${item.tag} traditional`);
      allowed += other.allowed ?? 0;
      if (first.allowed !== other.allowed || first.findings.join() !== other.findings.join())
        changed++;
    });
    expect(report.compareTotals!.tapsAllowed).toBe(allowed);
    expect(report.compareTotals!.tapsAllowed).toBeGreaterThan(report.totals.tapsAllowed);
    expect(report.treesChanged).toBe(changed);
    const onlyChanged = await owner.agent.get(
      `/api/sugarbushes/${standId}/compliance?season=2026&compare=traditional&changed=1&pageSize=1`,
    );
    expect(onlyChanged.body.total).toBe(changed);
  });

  it('filters by finding and tag, sorts by taps over, and pages', async () => {
    const base = `/api/sugarbushes/${standId}/compliance?season=2026`;
    const all: ComplianceReport = (await owner.agent.get(`${base}&pageSize=1`)).body;
    const over: ComplianceReport = (await owner.agent.get(`${base}&finding=over&sort=-over`)).body;
    expect(over.total).toBe(all.totals.treesOver);
    expect(over.items.every((i) => i.findings.includes('over'))).toBe(true);
    const overs = over.items.map((i) => i.tapsOver);
    expect(overs).toEqual([...overs].sort((a, b) => b - a));
    const none: ComplianceReport = (await owner.agent.get(`${base}&finding=none&pageSize=1`)).body;
    expect(none.total).toBe(all.totals.treesCompliant);
    const any: ComplianceReport = (await owner.agent.get(`${base}&finding=any&pageSize=1`)).body;
    expect(any.total).toBe(all.totals.treesWithFindings);
    const tag: ComplianceReport = (await owner.agent.get(`${base}&q=ol-0064`)).body;
    expect(tag.items.map((i) => i.tag)).toEqual(['OL-0064']);
    const page2: ComplianceReport = (await owner.agent.get(`${base}&page=2&pageSize=25`)).body;
    const page1: ComplianceReport = (await owner.agent.get(`${base}&page=1&pageSize=26`)).body;
    expect(page2.items[0].tag).toBe(page1.items[25].tag);
    expect(page2).toMatchObject({ page: 2, pageSize: 25, total: all.total });
  });

  it('downloads as CSV: a header row, one row a tapped tree, lengths in cm and the guidelines by key', async () => {
    const res = await owner.agent.get(
      `/api/sugarbushes/${standId}/compliance.csv?season=2026&compare=traditional`,
    );
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?owl-ledge-compliance-2026-conservative\.csv"?$/,
    );
    const lines = res.text.trimEnd().split('\n');
    expect(lines[0]).toBe([...complianceCsvColumns, ...complianceCsvCompareColumns].join(','));
    const rows: Record<string, string>[] = parse(res.text, { columns: true });
    const tapped = tappedIn(2026);
    expect(rows).toHaveLength(tapped.length);
    rows.forEach((row, n) => {
      const tree = tapped[n];
      const want = recomputeCompliance(tree, 2026, 'conservative');
      const other = recomputeCompliance(tree, 2026, 'traditional');
      expect(row).toEqual({
        tag: tree.tag,
        season: '2026',
        profile: 'conservative',
        dbhBeforeCm: want.dbh === null ? '' : want.dbh.toFixed(1),
        dbhMeasuredOn: row.dbhMeasuredOn,
        crownDiebackBeforePct: want.dieback === null ? '' : String(want.dieback),
        tapsSet: String(want.tapsSet),
        tapsAllowed: want.allowed === null ? '' : String(want.allowed),
        tapsOver: String(want.over),
        holesTooClose: String(want.tooClose),
        findings: want.findings.join(' '),
        compareProfile: 'traditional',
        compareTapsAllowed: other.allowed === null ? '' : String(other.allowed),
        compareTapsOver: String(other.over),
        compareHolesTooClose: String(other.tooClose),
        compareFindings: other.findings.join(' '),
      });
      expect(row.dbhMeasuredOn < '2026-01-01').toBe(true);
    });
  });

  it('reads 2018, the first season on record, as tapped with no DBH measured before it', async () => {
    const report = await wholeReport('season=2018');
    expect(report.total).toBe(tappedIn(2018).length);
    expect(report.totals.treesUnmeasured).toBe(report.total);
    expect(report.totals.tapsAllowed).toBe(0);
  });

  it.each([
    ['an unknown guideline', 'profile=lenient', 'profile'],
    ['a comparison with an unknown guideline', 'compare=lenient', 'compare'],
    ['the custom guideline of a stand that has none', 'profile=custom', 'profile'],
    ['a season that is not a year', 'season=last', 'season'],
  ])('refuses %s with 400 naming the field', async (_what, query, field) => {
    const res = await owner.agent.get(`/api/sugarbushes/${standId}/compliance?${query}`);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toBeTruthy();
  });
});

describe('without a boundary', () => {
  it('answers the per-area figures as null, and the rest as before', async () => {
    const cleared = await owner.agent
      .patch(`/api/sugarbushes/${standId}`)
      .set('x-csrf-token', owner.csrf)
      .send({ boundary: null });
    expect(cleared.status).toBe(200);
    const res: TrendsResponse = (await owner.agent.get(`/api/sugarbushes/${standId}/trends`)).body;
    expect(res).toMatchObject({ boundary: false, areaHa: null, areaAcres: null });
    for (const item of res.items) {
      expect(item.basalAreaFt2PerAcre).toBeNull();
      expect(item.tapsSetPerHa).toBeNull();
      expect(item.treesPerAcre).toBeNull();
    }
    expect(res.items.map((i) => i.tapsSet)).toEqual(trends.items.map((i) => i.tapsSet));
  });
});
