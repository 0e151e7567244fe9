import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { MeasurementInput } from '@shared/schemas/measurement';
import { Field, controlClass } from '@/components/ui/field';
import { cn } from '@/components/ui/cn';
import {
  ConfirmReading,
  CrownDiebackSelect,
  LengthUnitSelect,
  ReadingNoteField,
} from '@/components/reading-fields';
import { FormFooter } from '@/components/ui/form-footer';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { formatDate, formatDbh, todayIso, useUnitSystem } from '@/lib/units';
import { useCreateMeasurement } from '../api/create-measurement';
import { useMeasurements } from '../api/get-measurements';
import {
  measurementFields,
  measurementFormSchema,
  outlierCheck,
  outlierQuestion,
  type MeasureMode,
  type MeasurementFormValues,
} from '@/lib/measurement-entry';

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
  const history = useMeasurements(treeId);
  // The standing record the advisor reads: rows no later row corrects.
  const record = useMemo(
    () => (history.data?.items ?? []).filter((m) => !m.superseded),
    [history.data],
  );
  const schema = useMemo(() => measurementFormSchema(record), [record]);
  const form = useForm<MeasurementFormValues, unknown, MeasurementInput>({
    resolver: zodResolver(schema),
    defaultValues: {
      measuredOn: todayIso(),
      mode: 'diameter',
      dbhCm: '',
      unit: preferredUnit,
      crownDiebackPct: '',
      note: '',
      confirmedOutlier: false,
    },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string>();
  const create = useCreateMeasurement(treeId);
  const values = useWatch({ control: form.control }) as MeasurementFormValues;
  const check = outlierCheck(values, record);

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setSaved(undefined);
    const unit = form.getValues('unit');
    create.mutate(input, {
      onSuccess: (m) => {
        setSaved(`Saved: DBH ${formatDbh(m.dbhCm, unit)} on ${formatDate(m.measuredOn)}.`);
        form.reset({
          ...form.getValues(),
          dbhCm: '',
          crownDiebackPct: '',
          note: '',
          confirmedOutlier: false,
        });
      },
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, measurementFields, messageFor)),
    });
  });

  const mode = values.mode;
  const confirmError = errors.confirmedOutlier?.message;
  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        Record measurement
      </h2>
      <form
        noValidate
        onSubmit={onSubmit}
        onChange={() => setSaved(undefined)}
        className="mt-3 flex flex-col gap-4"
      >
        <Field label="Date" error={errors.measuredOn?.message} className="max-w-xs">
          {(control) => (
            <input
              {...control}
              {...form.register('measuredOn')}
              type="date"
              className={controlClass}
            />
          )}
        </Field>

        <fieldset>
          <legend className="text-sm font-bold">Measured as</legend>
          <div className="mt-1 flex gap-6">
            {(Object.keys(modeLabels) as MeasureMode[]).map((m) => (
              <label key={m} className="inline-flex min-h-11 items-center gap-2 md:min-h-8">
                <input
                  {...form.register('mode')}
                  type="radio"
                  value={m}
                  className="h-5 w-5 accent-sap"
                />
                {modeLabels[m]}
              </label>
            ))}
          </div>
        </fieldset>

        <div className="flex flex-wrap items-start gap-3">
          <Field
            label={modeLabels[mode]}
            error={errors.dbhCm?.message}
            hint={
              mode === 'circumference'
                ? 'Measured round the trunk at breast height; DBH = C ÷ π.'
                : undefined
            }
            className="w-40 flex-1 md:flex-none"
          >
            {(control) => (
              <input
                {...control}
                {...form.register('dbhCm')}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <LengthUnitSelect registration={form.register('unit')} />
        </div>

        {(check || confirmError) && (
          <ConfirmReading
            question={check ? outlierQuestion(check, values) : confirmError}
            registration={form.register('confirmedOutlier')}
            invalid={Boolean(confirmError)}
            className="border-sap bg-sap/10 px-4 py-3"
            checkboxClassName="h-5 w-5 accent-sap"
            after={
              confirmError && (
                <p className="text-sm text-alert">Confirm it, or correct the value.</p>
              )
            }
          >
            <p className="mt-1 max-w-prose text-sm">
              A change this size is usually a slipped tape or a typing error. Until it is confirmed,
              the advice leaves it out.
            </p>
          </ConfirmReading>
        )}

        <CrownDiebackSelect
          registration={form.register('crownDiebackPct')}
          error={errors.crownDiebackPct?.message}
          className="max-w-xs"
        />

        <ReadingNoteField
          label="Note"
          registration={form.register('note')}
          error={errors.note?.message}
        />

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
