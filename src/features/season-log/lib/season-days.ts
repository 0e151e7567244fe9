import {
  classifyDay,
  sapHoldingCautions,
  type RunClass,
  type SapCaution,
  type TemperatureUnit,
} from '@shared/rules/index';
import type { SapEntry } from '@shared/schemas/sap';
import type { WeatherDay } from '@shared/schemas/weather';

/** The sap of one day, every collection added up. */
export interface DaySap {
  volumeL: number;
  /** Sugar weighted by volume. */
  meanSugarPct: number;
  expectedSyrupL: number;
  expectedSyrupLRevised: number;
  syrupMadeL: number | null;
  entries: number;
}

/** One day of the season log: its weather (if recorded), its sap (if any) and its cautions. */
export interface SeasonDay {
  date: string;
  minC: number | null;
  maxC: number | null;
  run: RunClass | null;
  /** The API's reason, reworded in the page's unit. */
  reason: string | null;
  sap: DaySap | null;
  /** The day's keep-it-cold cautions, warnings first, each code once. */
  cautions: SapCaution[];
}

/**
 * The API's cautions for an entry, in the page's temperature unit: which cautions and how strong
 * is the API's answer; the shared rule only words them again in °F.
 */
export function entryCautions(entry: SapEntry, unit: TemperatureUnit): SapCaution[] {
  if (unit === 'C' || entry.heldAtC === null) return entry.cautions;
  const worded = sapHoldingCautions(entry.heldAtC, unit);
  return entry.cautions.map((c) => worded.find((w) => w.code === c.code) ?? c);
}

/** A day's reason in the page's unit; the API gives it in °C. */
export const dayReason = (day: WeatherDay, unit: TemperatureUnit) =>
  unit === 'C' ? day.reason : classifyDay(day.minC, day.maxC, unit).reason;

const strongestFirst = (a: SapCaution, b: SapCaution) =>
  (a.level === 'warning' ? 0 : 1) - (b.level === 'warning' ? 0 : 1);

/** Every day that has weather or sap, oldest first. */
export function seasonDays(
  weather: readonly WeatherDay[],
  sap: readonly SapEntry[],
  unit: TemperatureUnit,
): SeasonDay[] {
  const days = new Map<string, SeasonDay>();
  const dayOf = (date: string) => {
    let day = days.get(date);
    if (!day) {
      day = { date, minC: null, maxC: null, run: null, reason: null, sap: null, cautions: [] };
      days.set(date, day);
    }
    return day;
  };
  for (const w of weather) {
    const day = dayOf(w.date);
    day.minC = w.minC;
    day.maxC = w.maxC;
    day.run = w.run;
    day.reason = dayReason(w, unit);
  }
  for (const entry of sap) {
    const day = dayOf(entry.collectedOn);
    const sum = (day.sap ??= {
      volumeL: 0,
      meanSugarPct: 0,
      expectedSyrupL: 0,
      expectedSyrupLRevised: 0,
      syrupMadeL: null,
      entries: 0,
    });
    // The mean is kept as sugar × volume until every entry is in.
    sum.meanSugarPct += entry.sugarPct * entry.volumeL;
    sum.volumeL += entry.volumeL;
    sum.expectedSyrupL += entry.expectedSyrupL;
    sum.expectedSyrupLRevised += entry.expectedSyrupLRevised;
    if (entry.syrupMadeL !== null) sum.syrupMadeL = (sum.syrupMadeL ?? 0) + entry.syrupMadeL;
    sum.entries += 1;
    for (const c of entryCautions(entry, unit))
      if (!day.cautions.some((k) => k.code === c.code)) day.cautions.push(c);
  }
  for (const day of days.values()) {
    if (day.sap)
      day.sap.meanSugarPct = day.sap.volumeL > 0 ? day.sap.meanSugarPct / day.sap.volumeL : 0;
    day.cautions.sort(strongestFirst);
  }
  return [...days.values()].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
}
