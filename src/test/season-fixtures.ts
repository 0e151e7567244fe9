import type { SapEntry, SapList, SapSeasonTotals } from '@shared/schemas/sap';
import type { WeatherDay, WeatherSeason } from '@shared/schemas/weather';
import { SUGARBUSH_ID } from './fixtures';

/** Test data for the season log: a few March days of 2026 as the API would answer them. */

export const weatherDay = (overrides: Partial<WeatherDay> = {}): WeatherDay => ({
  date: '2026-03-10',
  minC: -4,
  maxC: 5,
  run: 'strong',
  reason: '−4 °C night, 5 °C day: a strong run',
  source: 'manual',
  station: null,
  ...overrides,
});

export const weatherSeason = (overrides: Partial<WeatherSeason> = {}): WeatherSeason => {
  const season: Omit<WeatherSeason, 'days'> = {
    season: 2026,
    items: [
      weatherDay({
        date: '2026-03-09',
        minC: 2,
        maxC: 9,
        run: 'none',
        reason: '2 °C night, 9 °C day: no run, the night does not freeze',
      }),
      weatherDay({ date: '2026-03-10' }),
      weatherDay({
        date: '2026-03-11',
        minC: -2,
        maxC: 3,
        run: 'run',
        reason: '−2 °C night, 3 °C day: a run',
      }),
    ],
    total: 3,
    forecast: [],
    forecastSource: null,
    forecastError: null,
    ...overrides,
  };
  return { ...season, days: season.items };
};

export const sapEntry = (overrides: Partial<SapEntry> = {}): SapEntry => ({
  id: 41,
  sugarbushId: SUGARBUSH_ID,
  season: 2026,
  collectedOn: '2026-03-10',
  volumeL: 860,
  sugarPct: 2.5,
  heldAtC: 3,
  collection: 'vacuum',
  syrupMadeL: null,
  note: null,
  expectedSyrupL: 25,
  expectedSyrupLRevised: 24.78,
  cautions: [],
  taps: 400,
  yieldPerTapL: 2.15,
  recordedById: 12,
  recordedByName: 'Pat tapper',
  clientId: null,
  createdAt: '2026-03-10T18:00:00.000Z',
  ...overrides,
});

export const warmCaution = {
  code: 'warm-sap' as const,
  level: 'caution' as const,
  message:
    'Sap held at 7.2 °C: above 4.4 °C it spoils faster. Keep it shaded and cold, and boil it soon.',
  source: 'Ohio State University maple program: sap spoilage by temperature',
};

export const spoilingCaution = {
  code: 'spoiling-sap' as const,
  level: 'warning' as const,
  message:
    'Sap held at 12 °C: above 10 °C microbes grow fast and the sap spoils within hours. Boil it today, or cool it at once; sap that turns cloudy or sour makes dark, off-flavoured syrup.',
  source: 'Ohio State University maple program: sap spoilage by temperature',
};

export const sapTotals = (overrides: Partial<SapSeasonTotals> = {}): SapSeasonTotals => ({
  volumeL: 860,
  meanSugarPct: 2.5,
  expectedSyrupL: 25,
  expectedSyrupLRevised: 24.78,
  syrupMadeL: null,
  entriesWithSyrup: 0,
  expectedSyrupLWhereMade: null,
  taps: 400,
  yieldPerTapL: 2.15,
  days: 1,
  ...overrides,
});

export const sapList = (items: SapEntry[], overrides: Partial<SapList> = {}): SapList => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 500,
  season: 2026,
  totals: sapTotals(),
  ...overrides,
});
