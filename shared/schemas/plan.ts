import { z } from 'zod';
import type { Advice, GuidelineRule, PlanTotals, ProfileSpacing } from '../rules/index';
import { verdicts } from '../rules/verdicts';
import { warningCodes } from '../rules/warnings';
import { listQuerySchema } from './list-query';
import type { Hazard } from './note';
import { shareBandKeys } from './share-bands';

/**
 * The season a plan is for: tapping runs late winter, so from June on the next season is the one
 * to plan; before June it is this year's.
 */
export function upcomingSeason(today: Date = new Date()): number {
  const year = today.getUTCFullYear();
  return today.getUTCMonth() >= 5 ? year + 1 : year;
}

/** The first season a record or a plan may name. */
export const FIRST_SEASON = 1950;

/**
 * The last: next year's. From June the plan is for next season (`upcomingSeason`), so next year
 * is the furthest anything is planned; nothing is recorded for a season beyond it.
 */
export const lastSeason = (today: Date = new Date()): number => today.getUTCFullYear() + 1;

const seasonWords = () => `Give a season from ${FIRST_SEASON} to ${lastSeason()}`;

/** A season in a JSON body: a whole year from 1950 to next year (checked on the day). */
export const seasonNumberSchema = z
  .number({ error: 'Give the season as a year' })
  .int({ error: seasonWords })
  .refine((s) => s >= FIRST_SEASON && s <= lastSeason(), { error: seasonWords });

/** `?season=` (and a season in a path) as every route takes it: the same years, from text. */
export const seasonSchema = z.coerce.number().pipe(seasonNumberSchema);
const season = seasonSchema;

export const adviceQuerySchema = z.object({ season: season.optional() });

export const planQuerySchema = listQuerySchema.extend({
  season: season.optional(),
  sort: z
    .enum(['tag', '-tag', 'taps', '-taps', 'dbh', '-dbh', 'share', '-share', 'verdict', 'walk'])
    .optional(),
  /**
   * Where a walking order (`sort=walk`) starts: where the tapper stands. Without both, the walk
   * starts at the stand's first tree by tag.
   */
  fromLat: z.coerce.number().min(-90).max(90).optional(),
  fromLng: z.coerce.number().min(-180).max(180).optional(),
  verdict: z.enum(verdicts.map((v) => v.key) as [string, ...string[]]).optional(),
  warning: z.enum(warningCodes).optional(),
  /** Trees big enough to tap whose conductive share lies in one band (`shareBands`). */
  share: z.enum(shareBandKeys).optional(),
});
export type PlanQuery = z.output<typeof planQuerySchema>;

export interface ProfileSummary {
  key: string;
  label: string;
  source: string;
  /** Height band tapholes go in, cm above ground. */
  heightBand: { minCm: number; maxCm: number };
  /** Conductive share below which the tapping zone counts as depleted (a calibrated value). */
  floor: number;
  /** The unit the guideline's table is written in: bits and sizes are worded in it. */
  unit: 'in' | 'cm';
  spacing: ProfileSpacing;
  /** The stain column each hole leaves, as the tapping-zone model draws it. */
  stainLengthCm: number;
  stainMarginCm: number;
  /** Rules for the season as a whole (Quebec: 1 January – 30 April, spouts out by 1 June). */
  seasonRules: GuidelineRule[];
  /** Something the owner must know about the stand's guideline (it was moved to the rule in force). */
  notice: string | null;
}

export interface TreeAdvice extends Advice {
  treeId: number;
  tag: string;
  season: number;
  profile: ProfileSummary;
  /** The tree's unresolved hazard notes: whoever works at the tree reads them first. */
  hazards: Hazard[];
}

export interface PlanItem extends Omit<Advice, 'projection' | 'holesInReach'> {
  treeId: number;
  tag: string;
  /** The tree's unresolved hazard notes, oldest first. */
  hazards: Hazard[];
}

export interface StandPlanResponse {
  season: number;
  profile: ProfileSummary;
  totals: PlanTotals;
  items: PlanItem[];
  total: number;
  page: number;
  pageSize: number;
}
