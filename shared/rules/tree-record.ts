import type { Collection, Species, TreeStatus } from '../schemas/enums';
import { seasonOf } from './dates';
import type { GuidelineProfile } from './profile-types';
import { tapsForDbh } from './tap-table';
import { WIDE_SPOUT_BIT_CM } from './drilling';

export interface AdvisorMeasurement {
  measuredOn: string;
  dbhCm: number;
  crownDiebackPct?: number | null;
}

export interface AdvisorTaphole {
  season: number;
  heightCm: number;
  azimuthDeg: number;
  depthCm: number;
  bitCm: number;
  collection: Collection;
}

export interface AdvisorTree {
  species?: Species;
  status?: TreeStatus;
  /** Injury or disease noted by a forester: treated like heavy crown dieback. */
  stressed?: boolean;
  measurements: readonly AdvisorMeasurement[];
  tapholes: readonly AdvisorTaphole[];
}

/** What the advisor reads off a tree's record for one season: only what was known before it. */
export interface TreeRecord {
  measurements: AdvisorMeasurement[];
  latest: AdvisorMeasurement | null;
  latestSeason: number | null;
  diebackPct: number | null;
  priorHoles: AdvisorTaphole[];
  lastTappedSeason: number | null;
  lastSeasonHoles: AdvisorTaphole[];
  collection: Collection;
  lastBitCm: number | null;
}

/**
 * Measurements up to and including the season (sorted by date) and tapholes of earlier seasons.
 * Holes already recorded for the season itself are what the plan is checked against, not input.
 */
export function readRecord(tree: AdvisorTree, season: number, collection?: Collection): TreeRecord {
  const measurements = tree.measurements
    .filter((m) => seasonOf(m.measuredOn) <= season)
    .sort((a, b) => (a.measuredOn < b.measuredOn ? -1 : a.measuredOn > b.measuredOn ? 1 : 0));
  const latest = measurements.length > 0 ? measurements[measurements.length - 1] : null;
  let diebackPct: number | null = null;
  for (let i = measurements.length - 1; i >= 0; i--) {
    const value = measurements[i].crownDiebackPct;
    if (value !== null && value !== undefined) {
      diebackPct = value;
      break;
    }
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
    measurements,
    latest,
    latestSeason: latest ? seasonOf(latest.measuredOn) : null,
    diebackPct,
    priorHoles,
    lastTappedSeason,
    lastSeasonHoles,
    collection: collection ?? lastHole?.collection ?? 'vacuum',
    lastBitCm: lastHole ? Math.max(...lastSeasonHoles.map((h) => h.bitCm)) : null,
  };
}

/** Taps the table allowed in the last tapped season, at the DBH known then; null if never tapped. */
export function allowedInLastSeason(record: TreeRecord, profile: GuidelineProfile): number | null {
  if (record.lastTappedSeason === null || record.measurements.length === 0) return null;
  let dbhThen = record.measurements[0].dbhCm;
  for (const m of record.measurements) {
    if (seasonOf(m.measuredOn) <= record.lastTappedSeason) dbhThen = m.dbhCm;
  }
  const table = tapsForDbh(dbhThen, profile);
  const wide = record.lastSeasonHoles.some((h) => h.bitCm >= WIDE_SPOUT_BIT_CM);
  return wide ? Math.min(table, 1) : table;
}
