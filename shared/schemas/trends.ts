import type { WarningCode } from '../rules/index';
import type { TreeStatus } from './enums';
import type { ShareBandKey } from './share-bands';

/** How a figure spreads over the trees: quartiles by linear interpolation between ranks. */
export interface Spread {
  trees: number;
  q1: number;
  median: number;
  q3: number;
}

/**
 * Crown dieback is rated in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992);
 * up to 10 % does not indicate decline, over 15 % is cause for concern (UVM Forest Ecosystem
 * Monitoring Cooperative). The overview's chart groups the classes so; its table lists each.
 */
export const diebackGroups = [
  { key: 'healthy', label: '0–10 %', fromPct: 0, toPct: 10 },
  { key: 'watch', label: '15 %', fromPct: 15, toPct: 15 },
  { key: 'concern', label: '20–45 %', fromPct: 20, toPct: 45 },
  { key: 'severe', label: '50 % and more', fromPct: 50, toPct: 100 },
] as const;
export type DiebackGroupKey = (typeof diebackGroups)[number]['key'];

/** The 5 % class a rating falls in. */
export const diebackClassOf = (pct: number) => Math.min(100, Math.max(0, Math.floor(pct / 5) * 5));

/**
 * One season of a stand in figures. A tree counts from the first season it has a measurement or
 * a taphole on record (with neither, from the year it was added); its status is the one the
 * audit trail gives it at the end of the season. Per-area figures count trees inside the
 * boundary as the stand figures do: densities every tree still standing, basal area the living
 * ones (active or held out) with a DBH, taken from the season's stored advice.
 */
export interface TrendSeason {
  season: number;
  /** The season the advisor plans next: advice only, nothing drilled or measured yet. */
  planned: boolean;
  /** Trees in the record this season. */
  trees: number;
  byStatus: Record<TreeStatus, number>;
  /** DBH of the living trees as the season's advice read it (cm). */
  dbhCm: Spread | null;
  /**
   * Basal-area growth of the season (cm² a year): the basal area at the tree's reading of this
   * season less that at its reading of the season before, for living trees read in both.
   */
  basalAreaGrowthCm2: Spread | null;
  basalAreaM2PerHa: number | null;
  basalAreaFt2PerAcre: number | null;
  treesPerHa: number | null;
  treesPerAcre: number | null;
  /** Tapholes recorded for the season, per area. */
  tapsSetPerHa: number | null;
  tapsSetPerAcre: number | null;
  /** Taps the season's stored advice allows, per area. */
  tapsAdvisedPerHa: number | null;
  tapsAdvisedPerAcre: number | null;
  /** Tapholes recorded for the season, and on how many trees. */
  tapsSet: number;
  treesTapped: number;
  /** Taps the season's stored advice allows, and on how many trees. */
  tapsAdvised: number;
  treesAdvisedToTap: number;
  /** Trees that carry more holes than the advice allowed, and the holes beyond it. */
  treesOverAdvice: number;
  tapsOverAdvice: number;
  /** Trees whose stored advice carries each warning (a share of `trees`). */
  warnings: Record<WarningCode, number>;
  /** Trees big enough to tap (tap, tap fewer, rest), and how many fall in each share band. */
  sharedTrees: number;
  shareBands: Record<ShareBandKey, number>;
  /** Crown ratings recorded in the season (one a tree, its latest), by 5 % class. */
  crownRated: number;
  crownClasses: { pct: number; trees: number }[];
}

export interface TrendsResponse {
  sugarbushId: number;
  profile: { key: string; label: string; source: string };
  /** The season the advisor plans next (the last item). */
  upcoming: number;
  boundary: boolean;
  areaHa: number | null;
  areaAcres: number | null;
  /** Seasons with a measurement or a taphole on record, oldest first, then the planned one. */
  items: TrendSeason[];
}
