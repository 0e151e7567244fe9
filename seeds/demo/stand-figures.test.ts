import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planStand } from '../../shared/rules/index';
import type { Collection, Species, TreeStatus } from '../../shared/schemas/enums';
import { insideRing, ringArea, toXY, type XY } from './geo';
import { DROUGHT_SEASON } from './growth';
import { OWL_LEDGE } from './owl-ledge';
import { seededDb, standRecords } from './testing';
import { THINNING } from './thinning';

/**
 * Owl Ledge's stand figures worked out here from the rows the seed writes, the way a forester
 * would with a tally sheet: the boundary's area, the trees mapped inside it, their DBH, the holes.
 */
const SEASONS = [2018, 2019, 2020, 2021, 2022, 2023, 2024, 2025, 2026];
const PLAN_SEASON = 2027;
const M2_PER_ACRE = 4046.8564224;
const M2_PER_HA = 10_000;
/** Basal area: ft² = π/576 · DBH in², m² = π/40000 · DBH cm² (DOMAIN §4 — P). */
const baFt2 = (dbhCm: number) => (Math.PI / 576) * (dbhCm / 2.54) ** 2;
const baM2 = (dbhCm: number) => (Math.PI / 40_000) * dbhCm ** 2;

/**
 * What a forester expects of a managed sugarbush: basal area about 70–120 ft²/acre
 * (16–28 m²/ha), some 60–90 taps per acre on tubing — from memory (DOMAIN §4, M).
 */
const EXPECTED = {
  ft2PerAcre: [70, 120],
  m2PerHa: [16, 28],
  tapsPerAcre: [60, 90],
} as const;

let demo: Awaited<ReturnType<typeof seededDb>>;
let owl: Awaited<ReturnType<typeof standRecords>>;
let acres: number;
let hectares: number;
let inside: ReturnType<typeof owl.tree>[];

beforeAll(async () => {
  demo = await seededDb();
  owl = await standRecords(demo.db, 'Owl Ledge');
  const { boundary } = await demo.db('sugarbushes').where({ id: owl.sugarbushId }).first();
  const ring: XY[] = JSON.parse(boundary)
    .coordinates[0].slice(0, -1)
    .map(([lng, lat]: number[]) => toXY(OWL_LEDGE.origin, lat, lng));
  acres = ringArea(ring) / M2_PER_ACRE;
  hectares = ringArea(ring) / M2_PER_HA;
  inside = owl.trees
    .filter((t) => t.lat !== null && t.lng !== null)
    .filter((t) => insideRing(ring, toXY(OWL_LEDGE.origin, t.lat!, t.lng!)))
    .map((t) => owl.tree(t.tag));
});
afterAll(async () => demo?.close());

type Tree = (typeof inside)[number];
const last = <T>(xs: T[]) => xs[xs.length - 1];

/**
 * A living tree's DBH for a season: its latest reading up to then. A felled tree counts up to
 * its last round, a dead one (100 % dieback) no longer.
 */
function livingDbh(t: Tree, season: number): number | null {
  const known = t.measurements.filter((m) => m.season <= season);
  if (known.length === 0) return null;
  const latest = last(known);
  if (t.status === 'removed' && season > last(t.measurements).season) return null;
  return latest.crown_dieback_pct === 100 ? null : latest.dbh_cm;
}

function basalArea(season: number) {
  const dbhs = inside.map((t) => livingDbh(t, season)).filter((d): d is number => d !== null);
  return {
    trees: dbhs.length,
    ft2PerAcre: dbhs.reduce((s, d) => s + baFt2(d), 0) / acres,
    m2PerHa: dbhs.reduce((s, d) => s + baM2(d), 0) / hectares,
  };
}

const holesPerAcre = (season: number) =>
  inside.reduce((s, t) => s + t.tapholes.filter((h) => h.season === season).length, 0) / acres;

/** The advisor's plan for 2027 over the same rows (the pure rules, no server). */
function plannedTapsPerAcre(): number {
  const plan = planStand(
    inside.map((t) => ({
      tag: t.tag,
      species: t.species as Species,
      status: t.status as TreeStatus,
      measurements: t.measurements.map((m) => ({
        measuredOn: m.measured_on,
        dbhCm: m.dbh_cm,
        crownDiebackPct: m.crown_dieback_pct,
        confirmedOutlier: Boolean(m.confirmed_outlier),
      })),
      tapholes: t.tapholes.map((h) => ({
        season: h.season,
        heightCm: h.height_cm,
        azimuthDeg: h.azimuth_deg,
        depthCm: h.depth_cm,
        bitCm: h.bit_cm,
        collection: h.collection as Collection,
      })),
    })),
    { season: PLAN_SEASON, profile: 'conservative', sunnyAzimuthDeg: 180 },
  );
  return plan.totals.taps / acres;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

/** DBH gained over one summer by every living tree read in both autumns (cm). */
function growthIn(season: number): number[] {
  return inside.flatMap((t) => {
    const before = t.measurements.find((m) => m.season === season - 1);
    const after = t.measurements.find((m) => m.season === season);
    if (!before || !after || after.crown_dieback_pct === 100) return [];
    return [after.dbh_cm - before.dbh_cm];
  });
}

describe("Owl Ledge's stand figures, from the seeded rows", () => {
  it('in the 2027 plan, basal area is 70–120 ft²/acre (16–28 m²/ha) and 60–90 taps are planned per acre (from memory)', () => {
    const ba = basalArea(PLAN_SEASON);
    expect(ba.ft2PerAcre).toBeGreaterThan(EXPECTED.ft2PerAcre[0]);
    expect(ba.ft2PerAcre).toBeLessThan(EXPECTED.ft2PerAcre[1]);
    expect(ba.m2PerHa).toBeGreaterThan(EXPECTED.m2PerHa[0]);
    expect(ba.m2PerHa).toBeLessThan(EXPECTED.m2PerHa[1]);
    const taps = plannedTapsPerAcre();
    expect(taps).toBeGreaterThan(EXPECTED.tapsPerAcre[0]);
    expect(taps).toBeLessThan(EXPECTED.tapsPerAcre[1]);
  });

  it('stays a managed sugarbush every season on record: 70–120 ft²/acre and 60–90 holes drilled per acre (from memory)', () => {
    for (const s of SEASONS) {
      const ba = basalArea(s);
      expect(ba.ft2PerAcre, String(s)).toBeGreaterThan(EXPECTED.ft2PerAcre[0]);
      expect(ba.ft2PerAcre, String(s)).toBeLessThan(EXPECTED.ft2PerAcre[1]);
      expect(holesPerAcre(s), String(s)).toBeGreaterThan(EXPECTED.tapsPerAcre[0]);
      expect(holesPerAcre(s), String(s)).toBeLessThan(EXPECTED.tapsPerAcre[1]);
    }
  });

  it('in the drought year the median tree grew less than in the seasons before and after', () => {
    const dry = median(growthIn(DROUGHT_SEASON));
    expect(dry).toBeLessThan(median(growthIn(DROUGHT_SEASON - 1)));
    expect(dry).toBeLessThan(median(growthIn(DROUGHT_SEASON + 1)));
    // Still a ring, if a thin one: about half an ordinary summer's.
    expect(dry).toBeGreaterThan(0);
  });

  it('the thinning after the 2021 round cut about one tree in seven and some 10–25 % of the basal area, all set to removed in January 2022', () => {
    const cut = owl.trees
      .map((t) => owl.tree(t.tag))
      .filter((t) => t.status === 'removed' && last(t.measurements)?.season === THINNING.lastRound);
    const tagged2018 = owl.trees.filter((t) => owl.tree(t.tag).measurements[0]?.season === 2018);
    expect(cut.length / tagged2018.length).toBeGreaterThan(0.08);
    expect(cut.length / tagged2018.length).toBeLessThan(0.2);
    for (const t of cut) {
      expect(Math.max(0, ...t.tapholes.map((h) => h.season)), t.tag).toBeLessThanOrEqual(
        THINNING.lastRound,
      );
      expect(String(t.updated_at), t.tag).toMatch(/^2022-01-/);
    }
    const before = basalArea(THINNING.lastRound);
    const after = basalArea(THINNING.firstSeason);
    const drop = 1 - after.ft2PerAcre / before.ft2PerAcre;
    expect(drop).toBeGreaterThan(0.1);
    expect(drop).toBeLessThan(0.25);
    expect(before.trees - after.trees).toBeGreaterThan(0.8 * cut.length);
    // The stand fills in again: basal area rises every season after the cut.
    for (let s = THINNING.firstSeason + 1; s <= last(SEASONS); s++)
      expect(basalArea(s).ft2PerAcre, String(s)).toBeGreaterThan(basalArea(s - 1).ft2PerAcre);
  });

  it('after the thinning the trees left standing grow faster than before it (the drought year left out)', () => {
    const residual = inside.filter((t) => t.status === 'active' && t.measurements.length === 9);
    const dbh = (t: Tree, season: number) =>
      t.measurements.find((m) => m.season === season)!.dbh_cm;
    // Before: the summers either side of the drought. After: every summer since the cut.
    const before = residual.map(
      (t) =>
        (dbh(t, DROUGHT_SEASON - 1) -
          dbh(t, DROUGHT_SEASON - 2) +
          dbh(t, DROUGHT_SEASON + 1) -
          dbh(t, DROUGHT_SEASON)) /
        2,
    );
    const end = last(SEASONS);
    const after = residual.map(
      (t) => (dbh(t, end) - dbh(t, THINNING.lastRound)) / (end - THINNING.lastRound),
    );
    expect(residual.length).toBeGreaterThan(700);
    expect(median(after)).toBeGreaterThan(median(before) * 1.05);
    // Most of all the trees whose crowns were freed: those within 9 m of a stump.
    const xy = (t: Tree) => toXY(OWL_LEDGE.origin, t.lat!, t.lng!);
    const stumps = inside
      .filter((t) => t.status === 'removed' && last(t.measurements).season === THINNING.lastRound)
      .map(xy);
    const freed = residual.map((t) => {
      const [x, y] = xy(t);
      return stumps.some(([sx, sy]) => Math.hypot(x - sx, y - sy) < 9);
    });
    const since = (wanted: boolean) => after.filter((_, i) => freed[i] === wanted);
    expect(median(since(true))).toBeGreaterThan(median(since(false)));
  });
});
