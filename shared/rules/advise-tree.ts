import type { Collection } from '../schemas/enums';
import { basalAreaGrowthCm2 } from './basal-area';
import { adviseDrilling, FROZEN_TRUNK_C, SMALL_TREE_CM, WIDE_SPOUT_BIT_CM } from './drilling';
import { growth as fitGrowth, type Growth } from './growth';
import type { GuidelineProfile, GuidelineRule } from './profile-types';
import { resolveProfile } from './profiles';
import { placeTapholes } from './placement';
import type { Spot } from './spacing';
import { crowdedPairs } from './spacing';
import { sources } from './sources';
import { bandForDbh } from './tap-table';
import { countTaps } from './tap-count';
import {
  conductiveShare,
  holesInReach,
  maxSustainableTaps,
  minimumSustainableGrowth,
  stainVolumeCm3,
  steadyStateShare,
  woodDepthCm,
  zoneVolumeCm3,
} from './tapping-zone';
import {
  allowedInLastSeason,
  dbhBefore,
  readRecord,
  statusInSeason,
  type AdvisorTaphole,
  type AdvisorTree,
} from './tree-record';
import { cm2ToIn2, inToCm } from './units';
import type { VerdictKey } from './verdicts';
import { warn, type AdvisorWarning } from './warnings';
import { projectConductiveShare, type ProjectedSeason } from './zone-projection';

/** A DBH or crown rating older than this many seasons before the planned one is stale. */
export const STALE_AFTER_SEASONS = 3;
/** Radial growth assumed while growth is unknown: 1 in of DBH a decade, half the typical 2 in. */
export const ASSUMED_RADIAL_GROWTH_CM = inToCm(1) / 10 / 2;
/**
 * A healthy fast grower grows at least the typical 2 in of DBH a decade of second-growth sugar
 * maple (USFS Silvics of North America — S); below that, a fast-growers-only top band is not kept.
 */
export const FAST_GROWER_DBH_CM_PER_YEAR = inToCm(2) / 10;
/** Stain that stays within reach of new holes this long is "decades": say so beside the projection. */
export const LONG_REACH_SEASONS = 20;

export interface AdviseOptions {
  season: number;
  profile: GuidelineProfile | string;
  /** Azimuth of the sunny side of the stand, degrees from north; 180 (south) when omitted. */
  sunnyAzimuthDeg?: number;
  /** Collection method for the advice; otherwise that of the tree's latest hole, or vacuum. */
  collection?: Collection;
  /** Add a 20-season projection of the conductive share and the holes still in reach. */
  withProjection?: boolean;
  /** Temperature at the tree now (°C), where the season log knows it. */
  temperatureC?: number | null;
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
  /** Plain-words reasons for every cut below the guideline's count. */
  reasons: string[];
  profileKey: string;
  /** The table lookup alone (`tapsForDbh`). */
  tableTaps: number;
  /** What the guideline gives a healthy tree of this size (one less in a fast-growers-only band). */
  guidelineTaps: number;
  dbhCm: number | null;
  collection: Collection;
  growth: Growth | null;
  /** Radial growth used for the zone (measured, or assumed when `growthAssumed`). */
  radialGrowthCmPerYear: number;
  growthAssumed: boolean;
  /** Measured basal-area growth at the DBH used (π · DBH · radial growth), in²/yr. */
  basalAreaGrowthIn2: number | null;
  /** Growth (in²/yr) that the taps the tree would carry need at the advised bit and depth. */
  minimumGrowthIn2: number | null;
  /** The tap count behind `minimumGrowthIn2`. */
  minimumGrowthTaps: number;
  /** Share once the advised holes are drilled, and where the advised rate settles. */
  shareAfter: number;
  steadyStateShare: number;
  maxSustainableTaps: number;
  /** Seasons a hole's stain stays within reach of new holes at this growth; null when it never grows out. */
  stainReachSeasons: number | null;
  /** Rules of the guideline and cautions that go with the drilling. */
  drillingNotes: GuidelineRule[];
  /** True when the season log says the trunk is frozen now; null when the temperature is not known. */
  frozen: boolean | null;
  projection?: ProjectedSeason[];
  /** Earlier holes whose stain a new hole can still reach (with the projection). */
  holesInReach?: AdvisorTaphole[];
}

function drillingNotes(profile: GuidelineProfile, temperatureC: number | null | undefined) {
  const frozen =
    temperatureC === null || temperatureC === undefined ? null : temperatureC < FROZEN_TRUNK_C;
  const cold: GuidelineRule = {
    text:
      frozen === true
        ? `It is ${temperatureC!.toFixed(0)} °C: the trunk is frozen. Wait to drill until it is no colder than about −5 °C.`
        : 'Do not drill a frozen trunk: wait until it is no colder than about −5 °C.',
    source: sources.omafra,
  };
  return { frozen, notes: [...profile.drillingRules, cold] };
}

export function adviseTree(tree: AdvisorTree, options: AdviseOptions): Advice {
  const profile = resolveProfile(options.profile);
  const { season } = options;
  const record = readRecord(tree, season, options.collection);
  const warnings: AdvisorWarning[] = [];
  const reasons: string[] = [];
  const base = profile.drill[record.collection];
  const { frozen, notes } = drillingNotes(profile, options.temperatureC);
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
    guidelineTaps: 0,
    dbhCm: record.latest?.dbhCm ?? null,
    collection: record.collection,
    growth: null,
    radialGrowthCmPerYear: ASSUMED_RADIAL_GROWTH_CM,
    growthAssumed: true,
    basalAreaGrowthIn2: null,
    minimumGrowthIn2: null,
    minimumGrowthTaps: 0,
    shareAfter: 1,
    steadyStateShare: 1,
    maxSustainableTaps: 0,
    stainReachSeasons: null,
    drillingNotes: notes,
    frozen,
  };
  const status = statusInSeason(tree, season);
  if (status && status !== 'active') {
    advice.verdict = 'retired';
    reasons.push('The tree is not in production.');
    return advice;
  }
  for (const { reading, check } of record.leftOut) warnings.push(warn.unconfirmed(reading, check));
  if (!record.latest) {
    warnings.push(warn.noMeasurement());
    return advice;
  }
  const dbh = record.latest.dbhCm;
  if (season - (record.latestSeason ?? season) > STALE_AFTER_SEASONS)
    warnings.push(warn.stale(record.latestSeason!));

  const grown = fitGrowth(record.measurements);
  advice.growth = grown;
  if (grown?.dropped) warnings.push(warn.outlier(grown.dropped.measuredOn, grown.dropped.dbhCm));
  if (grown && !grown.suspect) {
    advice.radialGrowthCmPerYear = grown.radialCmPerYear;
    advice.growthAssumed = false;
    advice.basalAreaGrowthIn2 = cm2ToIn2(basalAreaGrowthCm2(dbh, grown.radialCmPerYear));
  } else if (grown?.suspect) warnings.push(warn.growthSuspect());
  else warnings.push(warn.growthUnknown(ASSUMED_RADIAL_GROWTH_CM * 2 * 10));
  const radial = advice.radialGrowthCmPerYear;
  const grew = advice.basalAreaGrowthIn2;

  // The crown rating counts only while it is recent; an old one is flagged like an old DBH.
  const { stressed: rules } = profile;
  let dieback: number | null = null;
  const dbhStale = warnings.some((w) => w.code === 'stale-measurement');
  if (record.crown) {
    if (season - record.crown.season <= STALE_AFTER_SEASONS) dieback = record.crown.diebackPct;
    // A stale DBH already asks for the crown to be rated again.
    else if (!dbhStale)
      warnings.push(warn.staleCrown(record.crown.season, record.crown.diebackPct));
  }
  const severe = dieback !== null && dieback >= rules.restAtDiebackPct;
  const stressed =
    severe || tree.stressed === true || (dieback !== null && dieback > rules.diebackPct);

  // The slow-growth test: one tap at the depth the tree would otherwise be drilled.
  const small = dbh < SMALL_TREE_CM - 1e-9;
  const normal = adviseDrilling({
    profile,
    collection: record.collection,
    shallow: small || stressed,
  });
  const zone = profile.zone;
  const needsAt = (taps: number, depthCm: number) =>
    minimumSustainableGrowth({ dbhCm: dbh, tapsPerYear: taps, bitCm: normal.bitCm, depthCm, zone });
  const oneTapNeeds = needsAt(1, normal.depthCm);
  const slow = grew !== null && grew < oneTapNeeds;
  const drilling = slow
    ? adviseDrilling({ profile, collection: record.collection, shallow: true })
    : normal;
  advice.depthCm = drilling.depthCm;
  advice.bitCm = drilling.bitCm;

  const woodDepth = woodDepthCm(drilling.depthCm, zone);
  const shape = { dbhCm: dbh, depthCm: drilling.depthCm, zone, radialGrowthCmPerYear: radial };
  const shareNow = conductiveShare({ ...shape, season, holes: record.priorHoles });
  advice.conductiveShare = shareNow;
  const perNewHole =
    stainVolumeCm3(drilling.bitCm, woodDepth, zone) / zoneVolumeCm3(dbh, woodDepth, zone);
  const carried = maxSustainableTaps({ ...shape, bitCm: drilling.bitCm });
  advice.maxSustainableTaps = carried;
  const reachSeasons = radial > 0 ? woodDepth / radial : Infinity;
  advice.stainReachSeasons = Number.isFinite(reachSeasons) ? reachSeasons : null;
  const inReach = holesInReach(record.priorHoles, {
    season,
    depthCm: drilling.depthCm,
    radialGrowthCmPerYear: radial,
    zone,
  });
  const column = { stainLengthCm: zone.stainLengthCm, stainMarginCm: zone.stainMarginCm };

  const allowedThen = allowedInLastSeason(record, profile);
  if (allowedThen !== null && record.lastSeasonHoles.length > allowedThen) {
    warnings.push(
      warn.overtapped(
        record.lastTappedSeason!,
        record.lastSeasonHoles.length,
        allowedThen,
        dbhBefore(record, record.lastTappedSeason!)!,
        profile.source,
      ),
    );
  }
  const circumference = Math.PI * dbh;
  if (
    record.lastTappedSeason !== null &&
    crowdedPairs(
      record.priorHoles,
      record.lastTappedSeason,
      reachSeasons,
      { spacing: profile.spacing, column },
      circumference,
    ).length > 0
  ) {
    warnings.push(warn.crowdedRecord(record.lastTappedSeason, profile.spacingSource));
  }
  // Old holes drilled for 7/16 in spouts: new holes take the profile's own bit, with a note.
  const wideOld = [...inReach, ...record.lastSeasonHoles].filter(
    (h) => h.bitCm >= WIDE_SPOUT_BIT_CM,
  );
  if (wideOld.length > 0) {
    const widest = Math.max(...wideOld.map((h) => h.bitCm));
    warnings.push(
      widest > profile.limits.maxBitCm + 1e-9
        ? warn.wideBeyondLimit(
            widest,
            profile.limits.maxBitCm,
            drilling.bitCm,
            profile.unit,
            profile.depthSource,
          )
        : warn.wideHistory(widest, drilling.bitCm, profile.unit),
    );
  }

  const band = bandForDbh(dbh, profile);
  const table = band ? Math.min(band.taps, profile.maxTaps) : 0;
  advice.tableTaps = table;
  if (!band || table === 0) {
    advice.verdict = 'too-small';
    // Growth only matters once the tree is big enough to tap.
    const unknown = warnings.findIndex((w) => w.code === 'growth-unknown');
    if (unknown >= 0) warnings.splice(unknown, 1);
    warnings.push(warn.undersized(dbh, profile.minimumDbhCm, profile.source));
    return advice;
  }
  const counted = countTaps({
    profile,
    band,
    dbhCm: dbh,
    diebackPct: dieback,
    severe,
    stressed,
    basalAreaGrowthIn2: grew,
    growthAssumed: advice.growthAssumed,
    fastGrower:
      !advice.growthAssumed && 2 * radial >= FAST_GROWER_DBH_CM_PER_YEAR - 1e-9 && !stressed,
    wideBit: drilling.wideBit,
    slow,
    needs: (taps) => needsAt(taps, drilling.depthCm),
    oneTapNeedsIn2: oneTapNeeds,
    carried,
    shareNow,
    perNewHole,
  });
  warnings.push(...counted.warnings);
  reasons.push(...counted.reasons);
  advice.guidelineTaps = counted.guidelineTaps;
  advice.minimumGrowthTaps = Math.max(1, counted.wanted);
  advice.minimumGrowthIn2 = needsAt(advice.minimumGrowthTaps, drilling.depthCm);
  let taps = Math.min(counted.taps, profile.maxTaps);

  const placed = placeTapholes({
    dbhCm: dbh,
    taps,
    holesInReach: inReach,
    spacing: profile.spacing,
    column,
    bitCm: drilling.bitCm,
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
  advice.verdict = taps >= counted.guidelineTaps ? 'tap' : taps > 0 ? 'tap-reduced' : 'rest';
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
    advice.holesInReach = inReach;
  }
  return advice;
}
