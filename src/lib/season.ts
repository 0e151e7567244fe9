import { FIRST_SEASON, lastSeason, upcomingSeason } from '@shared/schemas/plan';

/** The seasons the API takes (`seasonSchema`): 1950 to next year. */
export { FIRST_SEASON, lastSeason };

/** A `?season=` value, or the upcoming season when it is missing or out of range. */
export function parseSeason(value: string | null, today = new Date()): number {
  const season = Number(value);
  if (value === null || !Number.isInteger(season)) return upcomingSeason(today);
  if (season < FIRST_SEASON || season > lastSeason(today)) return upcomingSeason(today);
  return season;
}

/** The value to keep in the URL: nothing when it is the season planned by default. */
export const seasonParam = (season: number, today = new Date()) =>
  season === upcomingSeason(today) ? undefined : season;
