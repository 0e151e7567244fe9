import type { Collection, Species, TreeStatus } from '../schemas/enums';
import { seasonOf } from './dates';
import { screenReadings, type ReadingCheck } from './plausibility';
import type { GuidelineProfile } from './profile-types';
import { tapsForDbh } from './tap-table';
import { WIDE_SPOUT_BIT_CM } from './drilling';

export interface AdvisorMeasurement {
  measuredOn: string;
  dbhCm: number;
  crownDiebackPct?: number | null;
  /** A forester confirmed this DBH although it is far off the reading before it. */
  confirmedOutlier?: boolean | null;
}

export interface AdvisorTaphole {
  season: number;
  heightCm: number;
  azimuthDeg: number;
  depthCm: number;
  bitCm: number;
  collection: Collection;
}

/** A status the tree was given, and when: at its creation, or by a later change. */
export interface StatusChange {
  /** YYYY-MM-DD. */
  on: string;
  status: TreeStatus;
  /** The status the tree was created with (before it, the tree was not on record). */
  created?: boolean;
}

export interface AdvisorTree {
  species?: Species;
  /** The register's status now. */
  status?: TreeStatus;
  /** When the status was given, oldest first; without it, `status` has always held. */
  statusHistory?: readonly StatusChange[];
  /** Injury or disease noted by a forester: treated like heavy crown dieback. */
  stressed?: boolean;
  measurements: readonly AdvisorMeasurement[];
  tapholes: readonly AdvisorTaphole[];
}

/** What the advisor reads off a tree's record for one season: only what was known before it. */
export interface TreeRecord {
  /** Believable readings up to and including the season, by date. */
  measurements: AdvisorMeasurement[];
  /** Unconfirmed readings far off the one before: left out of everything the advice uses. */
  leftOut: { reading: AdvisorMeasurement; check: ReadingCheck }[];
  latest: AdvisorMeasurement | null;
  latestSeason: number | null;
  /** The latest crown rating and the season it was given in. */
  crown: { diebackPct: number; season: number } | null;
  priorHoles: AdvisorTaphole[];
  lastTappedSeason: number | null;
  lastSeasonHoles: AdvisorTaphole[];
  collection: Collection;
}

/**
 * Measurements up to and including the season (sorted by date, unconfirmed outliers set aside)
 * and tapholes of earlier seasons. Holes already recorded for the season itself are what the
 * plan is checked against, not input.
 */
export function readRecord(tree: AdvisorTree, season: number, collection?: Collection): TreeRecord {
  const known = tree.measurements.filter((m) => seasonOf(m.measuredOn) <= season);
  const { accepted, leftOut } = screenReadings(known);
  const latest = accepted.length > 0 ? accepted[accepted.length - 1] : null;
  let crown: TreeRecord['crown'] = null;
  for (const m of [...known].sort((a, b) => (a.measuredOn < b.measuredOn ? -1 : 1))) {
    const value = m.crownDiebackPct;
    if (value !== null && value !== undefined)
      crown = { diebackPct: value, season: seasonOf(m.measuredOn) };
  }
  const priorHoles: AdvisorTaphole[] = [];
  let lastTappedSeason: number | null = null;
  for (const hole of tree.tapholes) {
    if (hole.season >= season) continue;
    priorHoles.push(hole);
    if (lastTappedSeason === null || hole.season > lastTappedSeason) lastTappedSeason = hole.season;
  }
  const lastSeasonHoles = priorHoles.filter((h) => h.season === lastTappedSeason);
  const lastHole = lastSeasonHoles.length > 0 ? lastSeasonHoles[lastSeasonHoles.length - 1] : null;
  return {
    measurements: accepted,
    leftOut,
    latest,
    latestSeason: latest ? seasonOf(latest.measuredOn) : null,
    crown,
    priorHoles,
    lastTappedSeason,
    lastSeasonHoles,
    collection: collection ?? lastHole?.collection ?? 'vacuum',
  };
}

/**
 * The tree's status at the end of a season: the last one given by then. Before the first change
 * on record it is the status the tree was created with, or active where the first entry is a
 * change; a tree with no history has always had its status. The status is read like the rest of
 * the record: a tree removed in a later season was in production in this one.
 */
export function statusInSeason(
  tree: Pick<AdvisorTree, 'status' | 'statusHistory'>,
  season: number,
): TreeStatus | undefined {
  const history = tree.statusHistory;
  if (!history || history.length === 0) return tree.status;
  const end = `${season}-12-31`;
  let status: TreeStatus | null = null;
  for (const change of history) if (change.on <= end) status = change.status;
  return status ?? (history[0].created ? history[0].status : 'active');
}

/** The latest believable DBH measured before a season began (before 1 January of it). */
export function dbhBefore(record: TreeRecord, season: number): number | null {
  let dbh: number | null = null;
  for (const m of record.measurements) if (seasonOf(m.measuredOn) < season) dbh = m.dbhCm;
  return dbh;
}

/**
 * Taps the table allowed in the last tapped season, at the DBH measured before that season
 * (1 where its holes were drilled for 7/16 in spouts); null if never tapped or not measured
 * before it.
 */
export function allowedInLastSeason(record: TreeRecord, profile: GuidelineProfile): number | null {
  if (record.lastTappedSeason === null) return null;
  const dbhThen = dbhBefore(record, record.lastTappedSeason);
  if (dbhThen === null) return null;
  const table = tapsForDbh(dbhThen, profile);
  const wide = record.lastSeasonHoles.some((h) => h.bitCm >= WIDE_SPOUT_BIT_CM);
  return wide ? Math.min(table, 1) : table;
}
