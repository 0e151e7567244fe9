import seedrandom from 'seedrandom';
import type { ForecastDay, ForecastProvider } from './forecast-provider';

/**
 * A made-up but plausible series standing in for a forecast service, so the season log works
 * with no network: a day's low and high are a function of the date and the place alone (a
 * seasonal curve, a few days' weather swings and a day-to-night range, each from a seeded hash),
 * cold in December and January, freezing nights and thawing days from February to April.
 */
export const STAND_IN_NAME = 'Clearwood’s stand-in series (made up on this server, not a forecast)';

const DAY_MS = 86_400_000;

/** A value in [−1, 1) fixed by its keys. */
const hashed = (...keys: (string | number)[]) =>
  seedrandom(['clearwood-forecast', ...keys].join('/'))() * 2 - 1;

const dayNumber = (date: string) => Math.round(Date.parse(`${date}T00:00:00Z`) / DAY_MS);
const dateOf = (n: number) => new Date(n * DAY_MS).toISOString().slice(0, 10);

/** Day of the year, 0 on 1 January. */
const dayOfYear = (date: string) => dayNumber(date) - dayNumber(`${date.slice(0, 4)}-01-01`);

const round1 = (x: number) => Math.round(x * 10) / 10;

/**
 * The day's mean: about −9 °C in mid-January and 21 °C in mid-July at 44° N, a little colder
 * further north (a rough shape for maple country, our own assumption).
 */
function seasonalMeanC(date: string, lat: number): number {
  const phase = (2 * Math.PI * (dayOfYear(date) - 20)) / 365.25;
  return 6 - 0.7 * (lat - 44) - 15 * Math.cos(phase);
}

/** The stand-in's low and high for one day at one place (positions rounded to about 1 km). */
export function standInDay(date: string, lat: number, lng: number): ForecastDay {
  const place = `${lat.toFixed(2)},${lng.toFixed(2)}`;
  const n = dayNumber(date);
  // Weather swings over a few days: a weighted mean of neighbouring days' draws.
  const weights = [1, 2, 3, 2, 1];
  let swing = 0;
  weights.forEach((w, i) => (swing += w * hashed(place, 'swing', n + i - 2)));
  swing = (swing / 9) * 8;
  const range = 7 + 3 * (hashed(place, 'range', n) + 1);
  const mean = seasonalMeanC(date, lat) + swing;
  return { date, minC: round1(mean - range / 2), maxC: round1(mean + range / 2) };
}

export function standInSeries(lat: number, lng: number, fromDate: string, days: number) {
  const start = dayNumber(fromDate);
  return Array.from({ length: days }, (_, i) => standInDay(dateOf(start + i), lat, lng));
}

export function standInForecast(): ForecastProvider {
  return {
    name: STAND_IN_NAME,
    daily: async (lat, lng, fromDate, days) => standInSeries(lat, lng, fromDate, days),
  };
}
