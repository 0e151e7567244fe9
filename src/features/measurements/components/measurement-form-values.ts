import { measurementInputSchema, type MeasurementInput } from '@shared/schemas/measurement';
import { dbhFromCircumference, parseDecimal, roundTo, toCm, type LengthUnit } from '@/lib/units';

export type MeasureMode = 'diameter' | 'circumference';

export interface MeasurementFormValues {
  measuredOn: string;
  mode: MeasureMode;
  /** As typed: "31.5" or "31,5". */
  value: string;
  unit: LengthUnit;
  /** '' when not rated, else a 5 % class. */
  crownDieback: string;
  note: string;
}

export type MeasurementField = 'measuredOn' | 'dbhCm' | 'crownDiebackPct' | 'note';
export type MeasurementErrors = Partial<Record<MeasurementField, string>>;

const knownFields: readonly MeasurementField[] = ['measuredOn', 'dbhCm', 'crownDiebackPct', 'note'];
export const isMeasurementField = (key: string): key is MeasurementField =>
  (knownFields as readonly string[]).includes(key);

/** DBH in cm from what was measured: a diameter as is, a circumference as C / π. */
export function dbhCmFrom(value: number, unit: LengthUnit, mode: MeasureMode): number {
  const cm = toCm(value, unit);
  return roundTo(mode === 'circumference' ? dbhFromCircumference(cm) : cm, 2);
}

/** Turns the form into the API's payload, checked by the same schema the API uses. */
export function toMeasurementInput(
  values: MeasurementFormValues,
): { ok: true; input: MeasurementInput } | { ok: false; errors: MeasurementErrors } {
  const errors: MeasurementErrors = {};
  const typed = parseDecimal(values.value);
  const what = values.mode === 'diameter' ? 'diameter' : 'circumference';
  if (typed === undefined) errors.dbhCm = `Enter the ${what}`;
  else if (Number.isNaN(typed)) errors.dbhCm = `Enter the ${what} as a number, like 31.5`;

  const candidate = {
    measuredOn: values.measuredOn,
    dbhCm:
      typed === undefined || Number.isNaN(typed)
        ? undefined
        : dbhCmFrom(typed, values.unit, values.mode),
    crownDiebackPct: values.crownDieback === '' ? undefined : Number(values.crownDieback),
    note: values.note.trim() === '' ? undefined : values.note.trim(),
  };
  const result = measurementInputSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '');
      if (isMeasurementField(key)) errors[key] ??= issue.message;
    }
  }
  if (!result.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, input: result.data };
}
