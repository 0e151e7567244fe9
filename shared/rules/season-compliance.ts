import { ASSUMED_RADIAL_GROWTH_CM } from './advise-tree';
import { seasonOf } from './dates';
import { WIDE_SPOUT_BIT_CM } from './drilling';
import { growth } from './growth';
import type { GuidelineProfile } from './profile-types';
import { resolveProfile } from './profiles';
import { keepsClear, type SpacingRules } from './spacing';
import { tapsForDbh } from './tap-table';
import { holesInReach } from './tapping-zone';
import { readRecord, type AdvisorMeasurement, type AdvisorTree } from './tree-record';

/**
 * What a season's tapping of one tree can be found to have done against a guideline:
 * - `over`: more holes than the table allows at the DBH measured before the season;
 * - `too-close`: a hole within the spacing of another hole of the season, or of an older hole
 *   still in reach, or in its stain column;
 * - `too-small`: tapped below the table's smallest tappable size;
 * - `declining`: tapped while the last crown rating before the season was over the
 *   guideline's limit for a stressed tree;
 * - `unmeasured`: tapped with no believable DBH on record before the season.
 */
export const complianceFindings = [
  'over',
  'too-close',
  'too-small',
  'declining',
  'unmeasured',
] as const;
export type ComplianceFinding = (typeof complianceFindings)[number];

export interface SeasonCompliance {
  season: number;
  /** Holes recorded for the season. */
  tapsSet: number;
  /** The latest believable DBH measured before 1 January of the season, and its date. */
  dbhBeforeCm: number | null;
  dbhMeasuredOn: string | null;
  /** The latest crown rating before the season, and its date. */
  diebackBeforePct: number | null;
  diebackRatedOn: string | null;
  /**
   * The table's taps at `dbhBeforeCm` (one at most where the season's holes were drilled for
   * 7/16 in spouts); null without a DBH before the season.
   */
  tapsAllowed: number | null;
  /** Holes beyond `tapsAllowed` (0 when it is null). */
  tapsOver: number;
  /** Holes of the season too close to another hole (see `too-close`). */
  holesTooClose: number;
  findings: ComplianceFinding[];
}

function lastBefore<T extends AdvisorMeasurement>(
  readings: readonly T[],
  season: number,
  has: (m: T) => boolean,
): T | null {
  let found: T | null = null;
  for (const m of readings)
    if (seasonOf(m.measuredOn) < season && has(m) && (!found || m.measuredOn >= found.measuredOn))
      found = m;
  return found;
}

/**
 * One tree's tapping in a past season held against a guideline: the holes recorded for the
 * season against what the table allowed at the DBH measured before it, their spacing, and the
 * tree's size and crown when it was drilled. Only what was on record before the season counts,
 * as it would have for the tapper.
 */
export function seasonCompliance(
  tree: AdvisorTree,
  season: number,
  profileOrKey: GuidelineProfile | string,
): SeasonCompliance {
  const profile = resolveProfile(profileOrKey);
  const record = readRecord(tree, season);
  const dbhReading = lastBefore(record.measurements, season, () => true);
  const dieback = lastBefore(
    tree.measurements,
    season,
    (m) => m.crownDiebackPct !== null && m.crownDiebackPct !== undefined,
  );
  const holes = tree.tapholes.filter((h) => h.season === season);
  const dbh = dbhReading?.dbhCm ?? null;
  const wide = holes.some((h) => h.bitCm >= WIDE_SPOUT_BIT_CM);
  const table = dbh === null ? null : tapsForDbh(dbh, profile);
  const tapsAllowed = table === null ? null : wide ? Math.min(table, 1) : table;
  const tapsOver = tapsAllowed === null ? 0 : Math.max(0, holes.length - tapsAllowed);

  let holesTooClose = 0;
  if (dbh !== null && holes.length > 0) {
    const fitted = growth(record.measurements.filter((m) => seasonOf(m.measuredOn) < season));
    const radial = fitted && !fitted.suspect ? fitted.radialCmPerYear : ASSUMED_RADIAL_GROWTH_CM;
    const older = record.priorHoles;
    const rules: SpacingRules = {
      spacing: profile.spacing,
      column: {
        stainLengthCm: profile.zone.stainLengthCm,
        stainMarginCm: profile.zone.stainMarginCm,
      },
    };
    const circumference = Math.PI * dbh;
    for (const hole of holes) {
      const inReach = holesInReach(older, {
        season,
        depthCm: hole.depthCm,
        radialGrowthCmPerYear: radial,
        zone: profile.zone,
      });
      const near = [...holes.filter((other) => other !== hole), ...inReach];
      if (near.some((other) => !keepsClear(hole, hole.bitCm, other, rules, circumference)))
        holesTooClose++;
    }
  }

  const findings: ComplianceFinding[] = [];
  const diebackPct = dieback?.crownDiebackPct ?? null;
  if (holes.length > 0) {
    if (tapsOver > 0) findings.push('over');
    if (holesTooClose > 0) findings.push('too-close');
    if (table === 0) findings.push('too-small');
    if (diebackPct !== null && diebackPct > profile.stressed.diebackPct) findings.push('declining');
    if (dbh === null) findings.push('unmeasured');
  }
  return {
    season,
    tapsSet: holes.length,
    dbhBeforeCm: dbh,
    dbhMeasuredOn: dbhReading?.measuredOn ?? null,
    diebackBeforePct: diebackPct,
    diebackRatedOn: dieback?.measuredOn ?? null,
    tapsAllowed,
    tapsOver,
    holesTooClose,
    findings,
  };
}
