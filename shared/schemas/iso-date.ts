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

/** The first day a record may be dated: the first season's (see `FIRST_SEASON`). */
export const FIRST_RECORDED_DAY = '1950-01-01';

/**
 * A day something was measured, drilled or seen: a real date from 1950 to today. Tomorrow is
 * allowed, since the stand's day may already have begun while UTC's has not.
 */
export const recordedDaySchema = isoDateSchema
  .refine((d) => d >= FIRST_RECORDED_DAY, 'Give a date from 1950 on')
  .refine((d) => d <= isoDay(new Date(), 1), 'A date cannot be in the future');

/** How far ahead a follow-up may be set. */
export const FOLLOW_UP_MAX_YEARS = 10;

/** A day planned ahead (a follow-up): a real date from 1950 to ten years from today. */
export const plannedDaySchema = isoDateSchema
  .refine((d) => d >= FIRST_RECORDED_DAY, 'Give a date from 1950 on')
  .refine(
    (d) => d <= isoDay(new Date(), Math.round(FOLLOW_UP_MAX_YEARS * 365.25)),
    `Give a date within ${FOLLOW_UP_MAX_YEARS} years`,
  );
