import { basalAreaPerArea } from '../../../shared/geo/stand-basal-area';
import { boundaryAreaM2, perArea } from '../../../shared/geo/area';
import type { Boundary } from '../../../shared/geo/boundary';
import { isOutside } from '../../../shared/geo/inside';
import {
  basalAreaCm2,
  screenReadings,
  seasonOf,
  statusInSeason,
  warningCodes,
  type AdvisorMeasurement,
  type StatusChange,
  type WarningCode,
} from '../../../shared/rules/index';
import { treeStatuses } from '../../../shared/schemas/enums';
import {
  shareBandOf,
  shareBands,
  sharedVerdicts,
  type ShareBandKey,
} from '../../../shared/schemas/share-bands';
import { diebackClassOf, type Spread, type TrendSeason } from '../../../shared/schemas/trends';
import type { TrendAdvice, TrendTreeRow } from './trends.repository';

/** One tree with what the trends read of its record. */
export interface TrendTree extends TrendTreeRow {
  measurements: readonly AdvisorMeasurement[];
  tapholes: readonly { season: number }[];
  statusHistory?: readonly StatusChange[];
}

export interface TrendInput {
  upcoming: number;
  /** Each season with its stored advice, oldest first. */
  seasons: { season: number; advice: Map<number, TrendAdvice> }[];
  trees: readonly TrendTree[];
  boundary: Boundary | null;
}

export interface TrendResult {
  items: TrendSeason[];
  /** Seasons where a tree had no stored advice made from its current record. */
  incomplete: number[];
  areaM2: number | null;
}

/** The value at quantile p of sorted values, interpolated between ranks (as R's type 7). */
export function quantile(sorted: readonly number[], p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

export function spread(values: number[]): Spread | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  return {
    trees: sorted.length,
    q1: quantile(sorted, 0.25),
    median: quantile(sorted, 0.5),
    q3: quantile(sorted, 0.75),
  };
}

interface TreeFacts {
  tree: TrendTree;
  firstSeason: number;
  inside: boolean;
  /** The latest believable DBH read in each season. */
  readBySeason: Map<number, number>;
  /** The latest crown rating recorded in each season. */
  crownBySeason: Map<number, number>;
  holesBySeason: Map<number, number>;
}

function factsOf(tree: TrendTree, boundary: Boundary | null): TreeFacts {
  const seasons = [
    ...tree.measurements.map((m) => seasonOf(m.measuredOn)),
    ...tree.tapholes.map((h) => h.season),
  ];
  const readBySeason = new Map<number, number>();
  for (const m of screenReadings(tree.measurements).accepted)
    readBySeason.set(seasonOf(m.measuredOn), m.dbhCm);
  const crownBySeason = new Map<number, number>();
  for (const m of [...tree.measurements].sort((a, b) => (a.measuredOn < b.measuredOn ? -1 : 1)))
    if (m.crownDiebackPct !== null && m.crownDiebackPct !== undefined)
      crownBySeason.set(seasonOf(m.measuredOn), m.crownDiebackPct);
  const holesBySeason = new Map<number, number>();
  for (const h of tree.tapholes)
    holesBySeason.set(h.season, (holesBySeason.get(h.season) ?? 0) + 1);
  const mapped = tree.lat !== null && tree.lng !== null;
  return {
    tree,
    firstSeason: seasons.length > 0 ? Math.min(...seasons) : Number(tree.createdOn.slice(0, 4)),
    inside: mapped && !isOutside(boundary, tree.lng, tree.lat),
    readBySeason,
    crownBySeason,
    holesBySeason,
  };
}

const zeroes = <K extends string>(keys: readonly K[]) =>
  Object.fromEntries(keys.map((k) => [k, 0])) as Record<K, number>;

function seasonFigures(
  season: number,
  planned: boolean,
  facts: readonly TreeFacts[],
  advice: Map<number, TrendAdvice>,
  areaM2: number | null,
): { item: TrendSeason; missing: number } {
  const byStatus = zeroes(treeStatuses);
  const warnings = zeroes<WarningCode>(warningCodes);
  const bands = zeroes<ShareBandKey>(shareBands.map((b) => b.key));
  const crown = new Map<number, number>();
  const dbhs: number[] = [];
  const growths: number[] = [];
  const insideDbhs: number[] = [];
  let trees = 0;
  let missing = 0;
  let tapsSet = 0;
  let treesTapped = 0;
  let tapsAdvised = 0;
  let treesAdvisedToTap = 0;
  let treesOverAdvice = 0;
  let tapsOverAdvice = 0;
  let sharedTrees = 0;
  let crownRated = 0;
  let insideStanding = 0;
  let insideTapsSet = 0;
  let insideTapsAdvised = 0;

  for (const f of facts) {
    if (f.firstSeason > season) continue;
    trees++;
    // The status the tree had then, by the audit trail: as the season's advice read it.
    const status = statusInSeason(f.tree, season) ?? f.tree.status;
    byStatus[status]++;
    const living = status === 'active' || status === 'held-out';
    const a = advice.get(f.tree.id);
    if (!a) missing++;
    const dbh = a?.dbhCm ?? null;
    if (living && dbh !== null) dbhs.push(dbh);
    const now = f.readBySeason.get(season);
    const before = f.readBySeason.get(season - 1);
    if (living && now !== undefined && before !== undefined)
      growths.push(basalAreaCm2(now) - basalAreaCm2(before));

    const set = f.holesBySeason.get(season) ?? 0;
    const advised = a?.taps ?? 0;
    tapsSet += set;
    if (set > 0) treesTapped++;
    tapsAdvised += advised;
    if (advised > 0) treesAdvisedToTap++;
    if (set > advised) {
      treesOverAdvice++;
      tapsOverAdvice += set - advised;
    }
    if (a) {
      warningCodes.forEach((code, bit) => {
        if ((a.warningMask & (1 << bit)) !== 0) warnings[code]++;
      });
      if ((sharedVerdicts as readonly string[]).includes(a.verdict)) {
        sharedTrees++;
        bands[shareBandOf(a.share)]++;
      }
    }
    const rating = f.crownBySeason.get(season);
    if (rating !== undefined) {
      crownRated++;
      const c = diebackClassOf(rating);
      crown.set(c, (crown.get(c) ?? 0) + 1);
    }
    if (f.inside) {
      if (status !== 'removed') {
        insideStanding++;
        insideTapsSet += set;
        insideTapsAdvised += advised;
      }
      if (living && dbh !== null) insideDbhs.push(dbh);
    }
  }

  const density = perArea(insideStanding, areaM2);
  const setDensity = perArea(insideTapsSet, areaM2);
  const advisedDensity = perArea(insideTapsAdvised, areaM2);
  const basal = basalAreaPerArea(insideDbhs, areaM2);
  return {
    missing,
    item: {
      season,
      planned,
      trees,
      byStatus,
      dbhCm: spread(dbhs),
      basalAreaGrowthCm2: spread(growths),
      basalAreaM2PerHa: basal?.m2PerHa ?? null,
      basalAreaFt2PerAcre: basal?.ft2PerAcre ?? null,
      treesPerHa: density?.perHa ?? null,
      treesPerAcre: density?.perAcre ?? null,
      tapsSetPerHa: setDensity?.perHa ?? null,
      tapsSetPerAcre: setDensity?.perAcre ?? null,
      tapsAdvisedPerHa: advisedDensity?.perHa ?? null,
      tapsAdvisedPerAcre: advisedDensity?.perAcre ?? null,
      tapsSet,
      treesTapped,
      tapsAdvised,
      treesAdvisedToTap,
      treesOverAdvice,
      tapsOverAdvice,
      warnings,
      sharedTrees,
      shareBands: bands,
      crownRated,
      crownClasses: [...crown.entries()]
        .sort((a, b) => a[0] - b[0])
        .map(([pct, n]) => ({ pct, trees: n })),
    },
  };
}

/** A stand's figures season by season, from its stored advice and its record. */
export function standTrends(input: TrendInput): TrendResult {
  const areaM2 = input.boundary ? boundaryAreaM2(input.boundary) : null;
  const facts = input.trees.map((t) => factsOf(t, input.boundary));
  const incomplete: number[] = [];
  const items = input.seasons.map(({ season, advice }) => {
    const { item, missing } = seasonFigures(
      season,
      season === input.upcoming,
      facts,
      advice,
      areaM2,
    );
    if (missing > 0) incomplete.push(season);
    return item;
  });
  return { items, incomplete, areaM2 };
}
