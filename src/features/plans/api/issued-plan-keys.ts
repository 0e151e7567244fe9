import { planKeys } from './plan-keys';

/**
 * The issued copy, the season's progress and the field sheet nest under the plan's keys, so
 * whatever refreshes the plan (a taphole, a new guideline) refreshes them too.
 */
export const issuedPlanKeys = {
  all: [...planKeys.all, 'issued'] as const,
  detail: (sugarbushId: number, season: number, page: number, changesPage: number) =>
    [...issuedPlanKeys.all, sugarbushId, season, { page, changesPage }] as const,
  progress: (sugarbushId: number, season: number) =>
    [...planKeys.all, 'progress', sugarbushId, season] as const,
  sheet: (sugarbushId: number, filters: object) =>
    [...planKeys.all, 'field-sheet', sugarbushId, filters] as const,
};
