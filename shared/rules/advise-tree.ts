import type { Collection } from '../schemas/enums';
import { adviseDrilling, SMALL_TREE_CM } from './drilling';
import { growth as fitGrowth, type Growth } from './growth';
import { minimumGrowthLine } from './minimum-growth';
import type { GuidelineProfile } from './profile-types';
import { resolveProfile } from './profiles';
import { placeTapholes } from './placement';
import type { Spot } from './spacing';
import { crowdedPairs } from './spacing';
import { bandForDbh } from './tap-table';
import { countTaps } from './tap-count';
import {
  conductiveShare,
  maxSustainableTaps,
  stainVolumeCm3,
  steadyStateShare,
  woodDepthCm,
  zoneVolumeCm3,
} from './tapping-zone';
import { allowedInLastSeason, readRecord, type AdvisorTree } from './tree-record';
import { cm2ToIn2, cmToIn, inToCm } from './units';
import type { VerdictKey } from './verdicts';
import { warn, type AdvisorWarning } from './warnings';
import { projectConductiveShare, type ProjectedSeason } from './zone-projection';

/** A DBH older than this many seasons before the planned one is stale. */
export const STALE_AFTER_SEASONS = 3;
/** Radial growth assumed while growth is unknown: 1 in of DBH a decade, half the typical 2 in. */
export const ASSUMED_RADIAL_GROWTH_CM = inToCm(1) / 10 / 2;

export interface AdviseOptions {
  season: number;
  profile: GuidelineProfile | string;
  /** Azimuth of the sunny side of the stand, degrees from north; 180 (south) when omitted. */
  sunnyAzimuthDeg?: number;
  /** Collection method for the advice; otherwise that of the tree's latest hole, or vacuum. */
  collection?: Collection;
  /** Add a 20-season projection of the conductive share under the advised rate. */
  withProjection?: boolean;
}

export interface Advice {
  taps: number;
  verdict: VerdictKey;
  /** Drilled depth including bark, cm. */
  depthCm: number;
  bitCm: number;
  placements: Spot[];
  /** Share of the tapping zone still conductive before this season's drilling. */
  conductiveShare: number;
  warnings: AdvisorWarning[];
  /** Plain-words reasons for every cut below the table count. */
  reasons: string[];
  profileKey: string;
  tableTaps: number;
  dbhCm: number | null;
  collection: Collection;
  growth: Growth | null;
  /** Radial growth used for the zone (measured, or assumed when `growthAssumed`). */
  radialGrowthCmPerYear: number;
  growthAssumed: boolean;
  basalAreaGrowthIn2: number | null;
  minimumGrowthIn2: number | null;
  /** Share once the advised holes are drilled, and where the advised rate settles. */
  shareAfter: number;
  steadyStateShare: number;
  maxSustainableTaps: number;
  projection?: ProjectedSeason[];
}

export function adviseTree(tree: AdvisorTree, options: AdviseOptions): Advice {
  const profile = resolveProfile(options.profile);
  const { season } = options;
  const record = readRecord(tree, season, options.collection);
  const warnings: AdvisorWarning[] = [];
  const reasons: string[] = [];
  const base = profile.drill[record.collection];
  const advice: Advice = {
    taps: 0,
    verdict: 'unmeasured',
    depthCm: base.depthCm,
    bitCm: base.bitCm,
    placements: [],
    conductiveShare: 1,
    warnings,
    reasons,
    profileKey: profile.key,
    tableTaps: 0,
    dbhCm: record.latest?.dbhCm ?? null,
    collection: record.collection,
    growth: null,
    radialGrowthCmPerYear: ASSUMED_RADIAL_GROWTH_CM,
    growthAssumed: true,
    basalAreaGrowthIn2: null,
    minimumGrowthIn2: null,
    shareAfter: 1,
    steadyStateShare: 1,
    maxSustainableTaps: 0,
  };
  if (tree.status && tree.status !== 'active') {
    advice.verdict = 'retired';
    reasons.push('The tree is not in production.');
    return advice;
  }
  if (!record.latest) {
    warnings.push(warn.noMeasurement());
    return advice;
  }
  const dbh = record.latest.dbhCm;
  const dbhIn = cmToIn(dbh);
  if (season - (record.latestSeason ?? season) > STALE_AFTER_SEASONS)
    warnings.push(warn.stale(record.latestSeason!));

  const grown = fitGrowth(record.measurements);
  advice.growth = grown;
  if (grown?.dropped) warnings.push(warn.outlier(grown.dropped.measuredOn, grown.dropped.dbhCm));
  if (grown && !grown.suspect) {
    advice.radialGrowthCmPerYear = grown.radialCmPerYear;
    advice.growthAssumed = false;
    advice.basalAreaGrowthIn2 = cm2ToIn2(grown.basalAreaCm2PerYear);
  } else if (grown?.suspect) warnings.push(warn.growthSuspect());
  else warnings.push(warn.growthUnknown(ASSUMED_RADIAL_GROWTH_CM * 2 * 10));
  const radial = advice.radialGrowthCmPerYear;
  const line = minimumGrowthLine(dbhIn);
  advice.minimumGrowthIn2 = line.in2PerYear;
  const slow = advice.basalAreaGrowthIn2 !== null && advice.basalAreaGrowthIn2 < line.in2PerYear;

  const { stressed: rules } = profile;
  const dieback = record.diebackPct;
  const severe = dieback !== null && dieback >= rules.restAtDiebackPct;
  const stressed =
    severe || tree.stressed === true || (dieback !== null && dieback > rules.diebackPct);

  const drilling = adviseDrilling({
    profile,
    collection: record.collection,
    smallOrSlow: dbh < SMALL_TREE_CM - 1e-9 || slow || stressed,
    lastBitCm: record.lastBitCm,
  });
  advice.depthCm = drilling.depthCm;
  advice.bitCm = drilling.bitCm;
  const zone = profile.zone;
  const woodDepth = woodDepthCm(drilling.depthCm, zone);
  const shape = { dbhCm: dbh, depthCm: drilling.depthCm, zone, radialGrowthCmPerYear: radial };
  const shareNow = conductiveShare({ ...shape, season, holes: record.priorHoles });
  advice.conductiveShare = shareNow;
  const perNewHole =
    stainVolumeCm3(drilling.bitCm, woodDepth, zone) / zoneVolumeCm3(dbh, woodDepth, zone);
  const sustainable = maxSustainableTaps({ ...shape, bitCm: drilling.bitCm });
  advice.maxSustainableTaps = sustainable;

  const circumference = Math.PI * dbh;
  const reachSeasons = radial > 0 ? woodDepth / radial : Infinity;
  const allowedThen = allowedInLastSeason(record, profile);
  if (allowedThen !== null && record.lastSeasonHoles.length > allowedThen) {
    warnings.push(
      warn.overtapped(
        record.lastTappedSeason!,
        record.lastSeasonHoles.length,
        allowedThen,
        profile.source,
      ),
    );
  }
  if (
    record.lastTappedSeason !== null &&
    crowdedPairs(
      record.priorHoles,
      record.lastTappedSeason,
      reachSeasons,
      profile.spacing,
      circumference,
    ).length > 0
  ) {
    warnings.push(warn.crowdedRecord(record.lastTappedSeason, profile.spacingSource));
  }

  const band = bandForDbh(dbh, profile);
  const table = band ? Math.min(band.taps, profile.maxTaps) : 0;
  advice.tableTaps = table;
  if (table === 0) {
    advice.verdict = 'too-small';
    // Growth only matters once the tree is big enough to tap.
    const unknown = warnings.findIndex((w) => w.code === 'growth-unknown');
    if (unknown >= 0) warnings.splice(unknown, 1);
    warnings.push(warn.undersized(dbh, profile.minimumDbhCm, profile.source));
    return advice;
  }
  const counted = countTaps({
    profile,
    band: band!,
    dbhCm: dbh,
    dbhIn,
    diebackPct: dieback,
    severe,
    stressed,
    basalAreaGrowthIn2: advice.basalAreaGrowthIn2,
    growthAssumed: advice.growthAssumed,
    minimumLine: line,
    wideSpout: drilling.wideSpout,
    spoutTooWide: drilling.spoutTooWide,
    maxSustainableTaps: sustainable,
    shareNow,
    perNewHole,
  });
  warnings.push(...counted.warnings);
  reasons.push(...counted.reasons);
  let taps = Math.min(counted.taps, profile.maxTaps);

  const inReach = record.priorHoles.filter((h) => radial * (season - h.season) < woodDepth);
  const placed = placeTapholes({
    dbhCm: dbh,
    taps,
    holesInReach: inReach,
    spacing: profile.spacing,
    heightBand: profile.heightBand,
    sunnyAzimuthDeg: options.sunnyAzimuthDeg ?? 180,
  });
  if (placed.blocked) {
    warnings.push(warn.noSpot(placed.placements.length, taps, profile.spacingSource));
    reasons.push('No clear spot left for every hole.');
    taps = placed.placements.length;
  }
  advice.placements = placed.placements;
  advice.taps = taps;
  advice.verdict = taps === table ? 'tap' : taps > 0 ? 'tap-reduced' : 'rest';
  advice.shareAfter = Math.max(0, shareNow - taps * perNewHole);
  advice.steadyStateShare = steadyStateShare({
    ...shape,
    bitCm: drilling.bitCm,
    tapsPerYear: taps,
  });
  if (options.withProjection) {
    advice.projection = projectConductiveShare({
      ...shape,
      season,
      holes: record.priorHoles,
      tapsPerYear: taps,
      bitCm: drilling.bitCm,
    });
  }
  return advice;
}
