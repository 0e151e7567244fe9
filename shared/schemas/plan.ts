import { z } from 'zod';
import type { Advice, PlanTotals } from '../rules/index';
import { listQuerySchema } from './list-query';

/**
 * The season a plan is for: tapping runs late winter, so from June on the next season is the one
 * to plan; before June it is this year's.
 */
export function upcomingSeason(today: Date = new Date()): number {
  const year = today.getUTCFullYear();
  return today.getUTCMonth() >= 5 ? year + 1 : year;
}

const season = z.coerce.number().int().min(1990).max(2200);

export const adviceQuerySchema = z.object({ season: season.optional() });

export const planQuerySchema = listQuerySchema.extend({
  season: season.optional(),
  sort: z
    .enum(['tag', '-tag', 'taps', '-taps', 'dbh', '-dbh', 'share', '-share', 'verdict'])
    .optional(),
  verdict: z.string().max(20).optional(),
  warning: z.string().max(30).optional(),
});
export type PlanQuery = z.output<typeof planQuerySchema>;

export interface ProfileSummary {
  key: string;
  label: string;
  source: string;
  /** Height band tapholes go in, cm above ground. */
  heightBand: { minCm: number; maxCm: number };
  /** Conductive share below which the tapping zone counts as depleted. */
  floor: number;
}

export interface TreeAdvice extends Advice {
  treeId: number;
  tag: string;
  season: number;
  profile: ProfileSummary;
}

export interface PlanItem extends Omit<Advice, 'projection'> {
  treeId: number;
  tag: string;
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
