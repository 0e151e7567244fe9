import { classifyDay, expectedSyrup } from '../../shared/rules/index';
import type { Collection } from '../../shared/schemas/enums';
import { Rng, round } from './random';
import type { TreePlan } from './types';

/** The seasons the demo's log covers, each from 1 February to 20 April. */
export const LOG_SEASONS = [2025, 2026] as const;
export const LOG_FIRST_DAY = '02-01';
export const LOG_LAST_DAY = '04-20';

export interface WeatherDraft {
  date: string;
  minC: number;
  maxC: number;
  source: 'station' | 'manual';
  station: string | null;
}

export interface SapDraft {
  collectedOn: string;
  volumeL: number;
  sugarPct: number;
  heldAtC: number;
  collection: Collection;
  syrupMadeL: number | null;
  note: string | null;
}

export interface SeasonLogPlan {
  weather: WeatherDraft[];
  sap: SapDraft[];
}

const DAY_MS = 86_400_000;
const datesOf = (season: number) => {
  const first = Date.parse(`${season}-${LOG_FIRST_DAY}T00:00:00Z`);
  const last = Date.parse(`${season}-${LOG_LAST_DAY}T00:00:00Z`);
  const out: string[] = [];
  for (let t = first; t <= last; t += DAY_MS) out.push(new Date(t).toISOString().slice(0, 10));
  return out;
};

/**
 * Late winter into spring: the day's mean climbs from about −8 °C on 1 February to 5 °C by
 * 20 April, with spells of a few days warmer or colder and 6–14 °C between night and day; so
 * February mostly stays frozen, March freezes and thaws, and April's nights stop freezing.
 */
function seasonWeather(key: string, season: number, station: string | null): WeatherDraft[] {
  const rng = Rng.for(key, 'weather', season);
  const dates = datesOf(season);
  let spell = rng.normal(0, 3);
  return dates.map((date, i) => {
    spell = 0.7 * spell + rng.normal(0, 2.4);
    const mean = -8 + (13 * i) / (dates.length - 1) + spell;
    const range = rng.range(6, 14);
    return {
      date,
      minC: round(mean - range / 2, 1),
      maxC: round(mean + range / 2, 1),
      source: station ? 'station' : 'manual',
      station,
    };
  });
}

/** Litres a tap gives on a day of this run: vacuum two to three times buckets (UVM Extension — P). */
const perTap = (rng: Rng, run: string, collection: Collection) => {
  const vacuum =
    run === 'strong-run'
      ? rng.range(1.6, 3.0)
      : run === 'run'
        ? rng.range(0.7, 1.6)
        : rng.range(0.2, 0.6);
  return collection === 'vacuum' ? vacuum : vacuum * rng.range(0.35, 0.5);
};

const WARM_NOTES = [
  'Tank sat in the sun past noon before it was emptied.',
  'Buckets gathered late; the sap was lukewarm by the sugarhouse.',
  'Releaser tank warm: ice ran out, boil first thing.',
];

/** A season's sap: one entry per collection on each day the weather gives a run. */
function seasonSap(
  key: string,
  season: number,
  weather: WeatherDraft[],
  taps: Map<Collection, number>,
): SapDraft[] {
  const rng = Rng.for(key, 'sap', season);
  const out: SapDraft[] = [];
  const collections = [...taps.keys()].sort();
  let warm = 0;
  weather.forEach((day, i) => {
    const { run, outlook } = classifyDay(day.minC, day.maxC);
    if (run === 'none') return;
    // Sugar falls as the season goes on, from near 3 °Brix to under 2.
    const sugarBase = 2.9 - (1.1 * i) / (weather.length - 1);
    for (const collection of collections) {
      const volumeL = round(taps.get(collection)! * perTap(rng, outlook, collection), 0);
      if (volumeL <= 0) continue;
      const sugarPct = round(Math.min(3.5, Math.max(1.5, sugarBase + rng.normal(0, 0.2))), 1);
      const held = day.maxC >= 9 && warm < 3 && rng.chance(0.5);
      if (held) warm += 1;
      const boiled = rng.chance(0.3);
      out.push({
        collectedOn: day.date,
        volumeL,
        sugarPct,
        heldAtC: round(held ? rng.range(4.8, 8.5) : rng.range(0.5, 3.8), 1),
        collection,
        // Syrup made: a little short of what the Rule of 86 expects (losses in the pan and filter).
        syrupMadeL: boiled
          ? round(expectedSyrup(volumeL, sugarPct).jones86 * rng.range(0.9, 0.98), 1)
          : null,
        note: held ? rng.pick(WARM_NOTES) : null,
      });
    }
  });
  return out;
}

/**
 * The demo's season log, 2025 and 2026: the weather of every day from 1 February to 20 April
 * (from the invented station when one is named), and the sap of each collection the stand's
 * tapholes used that season on every day with a run. Once, on the first season's warmest run
 * day, sap stood above 50 °F.
 */
export function demoSeasonLog(
  key: string,
  trees: TreePlan[],
  station: string | null,
): SeasonLogPlan {
  const weather: WeatherDraft[] = [];
  const sap: SapDraft[] = [];
  for (const season of LOG_SEASONS) {
    const days = seasonWeather(key, season, station);
    const taps = new Map<Collection, number>();
    for (const t of trees)
      for (const h of t.tapholes)
        if (h.season === season) taps.set(h.collection, (taps.get(h.collection) ?? 0) + 1);
    const entries = seasonSap(key, season, days, taps);
    if (season === LOG_SEASONS[0] && entries.length > 0) {
      const maxOf = new Map(days.map((d) => [d.date, d.maxC]));
      const warmest = entries.reduce((a, b) =>
        maxOf.get(b.collectedOn)! > maxOf.get(a.collectedOn)! ? b : a,
      );
      warmest.heldAtC = 11.5;
      warmest.note = 'Sap turned cloudy in the tank over a warm afternoon; boiled at once.';
    }
    weather.push(...days);
    sap.push(...entries);
  }
  return { weather, sap };
}
