import { z } from 'zod';

/** A calendar date as `YYYY-MM-DD` that exists (no 31 April). */
export const isoDateSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD')
  .refine(
    (s) =>
      !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) &&
      new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
    'Not a real date',
  );

/** Today's date in UTC as `YYYY-MM-DD`, or the date `days` after it. */
export function isoDay(today: Date = new Date(), days = 0): string {
  return new Date(today.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
