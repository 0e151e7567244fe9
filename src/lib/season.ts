import { upcomingSeason } from '@shared/schemas/plan';

/** The seasons the advisor will plan; the API takes 1990 on. */
export const FIRST_SEASON = 1990;
export const lastSeason = (today = new Date()) => upcomingSeason(today) + 10;

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
