import { z } from 'zod';
import {
  checkNewReading,
  readingQuestion,
  seasonOf,
  type DatedReading,
  type ReadingCheck,
} from '@shared/rules/index';
import { measurementInputSchema, type MeasurementInput } from '@shared/schemas/measurement';
import { dbhFromCircumference, parseDecimal, roundTo, toCm, type LengthUnit } from '@/lib/units';

export type MeasureMode = 'diameter' | 'circumference';

/**
 * The form as typed. Field names follow the payload (`dbhCm`, `crownDiebackPct`) so that the
 * server's field errors land on the control they concern.
 */
export interface MeasurementFormValues {
  measuredOn: string;
  mode: MeasureMode;
  /** As typed: "31.5" or "31,5", in `unit`, across or around the trunk as `mode` says. */
  dbhCm: string;
  unit: LengthUnit;
  /** '' when not rated, else a 5 % class. */
  crownDiebackPct: string;
  note: string;
  /** The forester confirms a reading far off the one before it. */
  confirmedOutlier: boolean;
}

export const measurementFields = [
  'measuredOn',
  'dbhCm',
  'crownDiebackPct',
  'note',
  'confirmedOutlier',
] as const satisfies readonly (keyof MeasurementFormValues)[];

/** DBH in cm from what was measured: a diameter as is, a circumference as C / π. */
export function dbhCmFrom(value: number, unit: LengthUnit, mode: MeasureMode): number {
  const cm = toCm(value, unit);
  return roundTo(mode === 'circumference' ? dbhFromCircumference(cm) : cm, 2);
}

/** The typed diameter in cm, or what is wrong with it. */
function typedDbh(values: MeasurementFormValues): { cm: number } | { error: string } {
  const typed = parseDecimal(values.dbhCm);
  const what = values.mode === 'diameter' ? 'diameter' : 'circumference';
  if (typed === undefined) return { error: `Enter the ${what}` };
  if (Number.isNaN(typed)) return { error: `Enter the ${what} as a number, like 31.5` };
  return { cm: dbhCmFrom(typed, values.unit, values.mode) };
}

/**
 * The advisor's check of the reading being typed against the tree's record: null when it is
 * believable, or not complete yet.
 */
export function outlierCheck(
  values: MeasurementFormValues,
  record: readonly DatedReading[],
): ReadingCheck | null {
  const dbh = typedDbh(values);
  if (!('cm' in dbh) || !(dbh.cm > 0) || !/^\d{4}-\d{2}-\d{2}$/.test(values.measuredOn))
    return null;
  return checkNewReading(record, { measuredOn: values.measuredOn, dbhCm: dbh.cm });
}

/** "4.5 cm more than last season — re-measure or confirm", in the form's unit. */
export function outlierQuestion(check: ReadingCheck, values: MeasurementFormValues): string {
  const question = readingQuestion(check, seasonOf(values.measuredOn), values.unit);
  return question[0].toUpperCase() + question.slice(1);
}

/**
 * The form's schema: turns what was typed into the API's payload and checks it with the same
 * schema the API uses. A reading far off the tree's record needs the forester's confirmation.
 */
export function measurementFormSchema(record: readonly DatedReading[]) {
  return z
    .object({
      measuredOn: z.string(),
      mode: z.enum(['diameter', 'circumference']),
      dbhCm: z.string(),
      unit: z.enum(['in', 'cm']),
      crownDiebackPct: z.string(),
      note: z.string(),
      confirmedOutlier: z.boolean(),
    })
    .transform((values, ctx): MeasurementInput => {
      const dbh = typedDbh(values);
      if ('error' in dbh) ctx.addIssue({ code: 'custom', path: ['dbhCm'], message: dbh.error });
      const check = outlierCheck(values, record);
      const result = measurementInputSchema.safeParse({
        measuredOn: values.measuredOn,
        dbhCm: 'cm' in dbh ? dbh.cm : undefined,
        crownDiebackPct: values.crownDiebackPct === '' ? undefined : Number(values.crownDiebackPct),
        note: values.note.trim() === '' ? undefined : values.note.trim(),
        ...(check ? { confirmedOutlier: values.confirmedOutlier } : {}),
      });
      if (!result.success) {
        for (const issue of result.error.issues) {
          const field = String(issue.path[0] ?? '');
          if (
            (measurementFields as readonly string[]).includes(field) &&
            !('error' in dbh && field === 'dbhCm')
          )
            ctx.addIssue({ code: 'custom', path: [field], message: issue.message });
        }
      }
      if (check && !values.confirmedOutlier)
        ctx.addIssue({
          code: 'custom',
          path: ['confirmedOutlier'],
          message: outlierQuestion(check, values),
        });
      return result.success ? result.data : z.NEVER;
    });
}
