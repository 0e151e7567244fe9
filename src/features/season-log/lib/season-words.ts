import { formatTemperature, type RunClass, type TemperatureUnit } from '@shared/rules/index';
import type { WeatherDay } from '@shared/schemas/weather';
import { formatDate, formatNumber, todayIso } from '@/lib/units';
import type { SeasonDay } from './season-days';
import { formatBrix, formatVolume, type SeasonUnits } from './season-units';

export const runLabels: Record<RunClass, string> = {
  strong: 'Strong run',
  run: 'Run',
  none: 'No run',
};

/** A second cue beside colour, in the chart's marks and the table: ▲ strong, ● run. */
export const runSymbols: Record<RunClass, string> = { strong: '▲', run: '●', none: '–' };

const weekday = new Intl.DateTimeFormat('en-US', { weekday: 'long', timeZone: 'UTC' });
const shortDay = new Intl.DateTimeFormat('en-US', {
  weekday: 'short',
  month: 'short',
  day: 'numeric',
  timeZone: 'UTC',
});
const tickDay = new Intl.DateTimeFormat('en-US', {
  month: 'short',
  day: 'numeric',
  timeZone: 'UTC',
});
const atNoon = (iso: string) => new Date(`${iso}T12:00:00Z`);

/** "Thursday" */
export const weekdayOf = (iso: string) => weekday.format(atNoon(iso));
/** "Thu, Mar 5" */
export const shortDayOf = (iso: string) => shortDay.format(atNoon(iso));
/** "Mar 5", for the chart's axis. */
export const tickDayOf = (iso: string) => tickDay.format(atNoon(iso));

const nightAndDay = (d: { minC: number; maxC: number }, unit: TemperatureUnit) =>
  `${formatTemperature(d.minC, unit)} night, ${formatTemperature(d.maxC, unit)} day`;

const dayAfter = (iso: string, days: number) =>
  new Date(Date.parse(`${iso}T12:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/** "today", "tomorrow", else the weekday: the forecast covers one week. */
export function whenWords(iso: string, today: string): string {
  if (iso === today) return 'today';
  if (iso === dayAfter(today, 1)) return 'tomorrow';
  return weekdayOf(iso);
}

/** "Expect a run Thursday: −5 °C night, 6 °C day", for a coming day that should run. */
export function forecastRunSentence(
  day: WeatherDay,
  unit: TemperatureUnit,
  today = todayIso(),
): string {
  const run = day.run === 'strong' ? 'a strong run' : 'a run';
  return `Expect ${run} ${whenWords(day.date, today)}: ${nightAndDay(day, unit)}`;
}

/** The forecast's headline: the first run it expects, or that it expects none. */
export function forecastHeadline(
  forecast: readonly WeatherDay[],
  unit: TemperatureUnit,
  today = todayIso(),
): string {
  const first = forecast.find((d) => d.run !== 'none');
  if (first) return forecastRunSentence(first, unit, today);
  const freezes = forecast.some((d) => d.minC < 0);
  const coming = forecast.length === 1 ? 'day' : `${formatNumber(forecast.length)} days`;
  return `No run expected in the coming ${coming}: ${
    freezes ? 'the days stay frozen' : 'the nights do not freeze'
  }`;
}

/** The chart's name and caption: the season's runs and sap in one sentence. */
export function seasonSentence(season: number, days: readonly SeasonDay[], units: SeasonUnits) {
  const runs = days.filter((d) => d.run === 'run' || d.run === 'strong');
  const strong = runs.filter((d) => d.run === 'strong').length;
  const sapDays = days.filter((d) => d.sap);
  const volume = sapDays.reduce((s, d) => s + (d.sap?.volumeL ?? 0), 0);
  const sugar =
    volume > 0
      ? sapDays.reduce((s, d) => s + d.sap!.meanSugarPct * d.sap!.volumeL, 0) / volume
      : null;
  const runWords =
    runs.length === 0
      ? 'no run days recorded'
      : runs.length === 1
        ? `1 run day (${formatNumber(strong)} strong) on ${formatDate(runs[0].date)}`
        : `${formatNumber(runs.length)} run days (${formatNumber(strong)} strong) between ${formatDate(runs[0].date)} and ${formatDate(runs.at(-1)!.date)}`;
  const sapWords =
    sapDays.length === 0
      ? 'no sap recorded'
      : `${formatVolume(volume, units.volume)} of sap on ${formatNumber(sapDays.length)} ${sapDays.length === 1 ? 'day' : 'days'} at ${formatBrix(sugar)} on average`;
  return `Season ${season}: ${runWords}; ${sapWords}`;
}
