import { z } from 'zod';
import { weatherDayInputSchema, type WeatherDayInput } from '@shared/schemas/weather';
import { parseDecimal, todayIso } from '@/lib/units';
import { toCelsius, type SeasonUnits } from './season-units';

/** A day's low and high as typed, in the page's temperature unit; names follow the payload. */
export interface WeatherFormValues {
  date: string;
  minC: string;
  maxC: string;
}

export const weatherFields = ['date', 'minC', 'maxC'] as const;

export const blankWeatherForm = (): WeatherFormValues => ({ date: todayIso(), minC: '', maxC: '' });

const words = { minC: 'night low', maxC: 'day high' } as const;

/** Turns the typed °F or °C into the payload's °C and checks it with the API's own schema. */
export function weatherFormSchema(units: SeasonUnits) {
  return z
    .object({ date: z.string(), minC: z.string(), maxC: z.string() })
    .transform((values, ctx): WeatherDayInput => {
      const celsius = {} as Record<'minC' | 'maxC', number | undefined>;
      for (const field of ['minC', 'maxC'] as const) {
        // A pasted "−4" carries the typographic minus sign.
        const value = parseDecimal(values[field].replace('\u2212', '-'));
        if (value === undefined || Number.isNaN(value)) {
          ctx.addIssue({
            code: 'custom',
            path: [field],
            message:
              value === undefined
                ? `Enter the ${words[field]}`
                : `Enter the ${words[field]} as a number, like -4`,
          });
        } else celsius[field] = toCelsius(value, units.temperature);
      }
      if (celsius.minC === undefined || celsius.maxC === undefined) {
        const date = weatherDayInputSchema.shape.date.safeParse(values.date);
        if (!date.success)
          ctx.addIssue({ code: 'custom', path: ['date'], message: date.error.issues[0].message });
        return z.NEVER;
      }
      const result = weatherDayInputSchema.safeParse({ date: values.date, ...celsius });
      if (!result.success) {
        for (const issue of result.error.issues)
          ctx.addIssue({
            code: 'custom',
            path: [String(issue.path[0] ?? 'date')],
            message: issue.message,
          });
        return z.NEVER;
      }
      return result.data;
    });
}
