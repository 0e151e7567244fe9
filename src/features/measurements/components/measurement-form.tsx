import { useId, useState, type FormEvent } from 'react';
import { crownDiebackClasses } from '@shared/schemas/measurement';
import { Field, controlClass } from '@/components/ui/field';
import { cn } from '@/components/ui/cn';
import { isApiError } from '@/lib/api-client';
import { formatDate, formatDbh, todayIso, useUnitSystem } from '@/lib/units';
import { useCreateMeasurement } from '../api/create-measurement';
import {
  isMeasurementField,
  toMeasurementInput,
  type MeasureMode,
  type MeasurementErrors,
  type MeasurementFormValues,
} from './measurement-form-values';
import { FormFooter } from '@/components/ui/form-footer';

const modeLabels: Record<MeasureMode, string> = {
  diameter: 'Diameter',
  circumference: 'Circumference',
};

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush does not record measurements.';
  if (error.status === 404) return 'This tree is no longer in the register.';
  return error.message;
}

/** Records DBH (measured across or around the trunk) and a crown dieback class for one tree. */
export function MeasurementForm({ treeId }: { treeId: number }) {
  const headingId = useId();
  const { unit: preferredUnit } = useUnitSystem();
  const [values, setValues] = useState<MeasurementFormValues>(() => ({
    measuredOn: todayIso(),
    mode: 'diameter',
    value: '',
    unit: preferredUnit,
    crownDieback: '',
    note: '',
  }));
  const [errors, setErrors] = useState<MeasurementErrors>({});
  const [formError, setFormError] = useState<string>();
  const [saved, setSaved] = useState<string>();
  const create = useCreateMeasurement(treeId);

  const set = <K extends keyof MeasurementFormValues>(key: K, value: MeasurementFormValues[K]) => {
    setValues((v) => ({ ...v, [key]: value }));
    setSaved(undefined);
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setFormError(undefined);
    setSaved(undefined);
    const result = toMeasurementInput(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    create.mutate(result.input, {
      onSuccess: (m) => {
        setSaved(`Saved: DBH ${formatDbh(m.dbhCm, values.unit)} on ${formatDate(m.measuredOn)}.`);
        setValues((v) => ({ ...v, value: '', crownDieback: '', note: '' }));
      },
      onError: (error) => {
        const fieldErrors: MeasurementErrors = {};
        const unplaced: string[] = [];
        for (const [key, message] of Object.entries(
          isApiError(error) ? (error.fields ?? {}) : {},
        )) {
          if (isMeasurementField(key)) fieldErrors[key] = message;
          else unplaced.push(message);
        }
        setErrors(fieldErrors);
        if (Object.keys(fieldErrors).length === 0 || unplaced.length > 0) {
          setFormError(unplaced.length > 0 ? unplaced.join(' ') : messageFor(error));
        }
      },
    });
  };

  const valueLabel = modeLabels[values.mode];
  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        Record measurement
      </h2>
      <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-4">
        <Field label="Date" error={errors.measuredOn} className="max-w-xs">
          {(control) => (
            <input
              {...control}
              type="date"
              value={values.measuredOn}
              onChange={(e) => set('measuredOn', e.target.value)}
              className={controlClass}
            />
          )}
        </Field>

        <fieldset>
          <legend className="text-sm font-bold">Measured as</legend>
          <div className="mt-1 flex gap-6">
            {(Object.keys(modeLabels) as MeasureMode[]).map((mode) => (
              <label key={mode} className="inline-flex min-h-11 items-center gap-2 md:min-h-8">
                <input
                  type="radio"
                  name="measure-mode"
                  value={mode}
                  checked={values.mode === mode}
                  onChange={() => set('mode', mode)}
                  className="h-5 w-5 accent-sap"
                />
                {modeLabels[mode]}
              </label>
            ))}
          </div>
        </fieldset>

        <div className="flex flex-wrap items-start gap-3">
          <Field
            label={valueLabel}
            error={errors.dbhCm}
            hint={
              values.mode === 'circumference'
                ? 'Measured round the trunk at breast height; DBH = C ÷ π.'
                : undefined
            }
            className="w-40 flex-1 md:flex-none"
          >
            {(control) => (
              <input
                {...control}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                value={values.value}
                onChange={(e) => set('value', e.target.value)}
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <Field label="Unit" className="w-24">
            {(control) => (
              <select
                {...control}
                value={values.unit}
                onChange={(e) => set('unit', e.target.value as MeasurementFormValues['unit'])}
                className={controlClass}
              >
                <option value="in">in</option>
                <option value="cm">cm</option>
              </select>
            )}
          </Field>
        </div>

        <Field label="Crown dieback" error={errors.crownDiebackPct} className="max-w-xs">
          {(control) => (
            <select
              {...control}
              value={values.crownDieback}
              onChange={(e) => set('crownDieback', e.target.value)}
              className={controlClass}
            >
              <option value="">Not rated</option>
              {crownDiebackClasses.map((pct) => (
                <option key={pct} value={String(pct)}>
                  {pct} %
                </option>
              ))}
            </select>
          )}
        </Field>

        <Field label="Note" error={errors.note}>
          {(control) => (
            <textarea
              {...control}
              rows={2}
              maxLength={1000}
              value={values.note}
              onChange={(e) => set('note', e.target.value)}
              className={cn(controlClass, 'py-2')}
            />
          )}
        </Field>

        <FormFooter
          error={formError}
          pending={create.isPending}
          label="Save measurement"
          notice={saved}
        />
      </form>
    </section>
  );
}
