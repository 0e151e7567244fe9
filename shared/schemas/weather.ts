import { z } from 'zod';
import type { RunClass } from '../rules/season-log';
import { FIRST_RECORDED_DAY, isoDateSchema, isoDay } from './iso-date';
import { seasonSchema } from './plan';

/** The coldest and warmest daily readings the log takes, in °C (beyond any record in maple country). */
export const WEATHER_LIMITS_C = { min: -60, max: 45 } as const;

const celsius = (what: string) =>
  z
    .number({ error: `Give the ${what}` })
    .finite(`Give the ${what} as a number`)
    .min(
      WEATHER_LIMITS_C.min,
      `A ${what} below ${WEATHER_LIMITS_C.min} °C (−76 °F) is not a reading`,
    )
    .max(
      WEATHER_LIMITS_C.max,
      `A ${what} above ${WEATHER_LIMITS_C.max} °C (113 °F) is not a reading`,
    );

/** A day of weather as recorded: dated no later than tomorrow (the stand's day may run ahead of UTC). */
export const weatherDayInputSchema = z
  .object({
    date: isoDateSchema
      .refine((d) => d >= FIRST_RECORDED_DAY, 'Give a date from 1950 on')
      .refine(
        (d) => d <= isoDay(new Date(), 1),
        'A recorded day cannot be in the future; the forecast comes on its own',
      ),
    minC: celsius('night low'),
    maxC: celsius('day high'),
    /** The id the recording device gave the entry: a resend with it is answered, not written again. */
    clientId: z.string().uuid('A client id is a UUID').optional(),
  })
  .strict()
  .refine((v) => v.minC <= v.maxC, {
    message: 'The day high cannot be below the night low',
    path: ['maxC'],
  });
export type WeatherDayInput = z.infer<typeof weatherDayInputSchema>;

export const weatherSources = ['manual', 'station', 'forecast'] as const;
export type WeatherSource = (typeof weatherSources)[number];

export interface WeatherDay {
  date: string;
  minC: number;
  maxC: number;
  run: RunClass;
  /** "−4 °C night, 5 °C day: a run" */
  reason: string;
  source: WeatherSource;
  /** The station a day came from, for a station import. */
  station: string | null;
}

export const weatherQuerySchema = z.object({ season: seasonSchema.optional() });

/** `GET /api/sugarbushes/:id/weather?season=`: the season's days, oldest first, and the coming days. */
export interface WeatherSeason {
  season: number;
  items: WeatherDay[];
  /** The same days as `items`, under the name the season's days go by. */
  days: WeatherDay[];
  total: number;
  /** The forecast's coming days (empty for a past season), classified the same way. */
  forecast: WeatherDay[];
  /** Where the forecast came from, for the page's footnote; null when none was had. */
  forecastSource: string | null;
  /** Why there is no forecast, when the provider could not be reached. */
  forecastError: string | null;
}

/**
 * Form fields of `POST …/weather/imports` beside the file: the temperature unit, which a station's
 * daily summary does not always say; a file that names its unit must agree with it.
 */
export const weatherImportFieldsSchema = z.object({
  unit: z.enum(['F', 'C']).optional(),
  // A form field is text: "false" and "0" must not read as true.
  dryRun: z
    .union([
      z.boolean(),
      z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1'),
    ])
    .optional(),
});
export type WeatherImportFields = z.infer<typeof weatherImportFieldsSchema>;

export interface WeatherImportResult {
  station: string | null;
  unit: 'F' | 'C';
  added: number;
  replaced: number;
  unchanged: number;
  /** Rows skipped because TMAX or TMIN was missing, with their line numbers. */
  skipped: { row: number; reason: string }[];
  days: WeatherDay[];
  dryRun: boolean;
}
