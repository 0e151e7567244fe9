import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm } from 'react-hook-form';
import {
  crownDiebackClasses,
  measurementInputSchema,
  type MeasurementInput,
} from '@shared/schemas/measurement';
import { Button } from '@/components/ui/button';
import { controlClass, Field } from '@/components/ui/field';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import type { RefusedEntry } from '@/lib/field-entries';

const fields = ['measuredOn', 'dbhCm', 'crownDiebackPct', 'note', 'confirmedOutlier'] as const;

const optionalNumber = (v: unknown) => (v === '' || v === null ? null : Number(v));

/**
 * Edits a refused reading before it is sent again (in cm, as the API holds it). The server's
 * reason is put on the fields it names.
 */
export function RefusedMeasurementForm({
  refused,
  onSend,
  onCancel,
}: {
  refused: RefusedEntry & { entry: { kind: 'measurement' } };
  onSend: (input: MeasurementInput) => void;
  onCancel: () => void;
}) {
  const { input } = refused.entry;
  const form = useForm<MeasurementInput>({
    resolver: zodResolver(measurementInputSchema),
    defaultValues: {
      measuredOn: input.measuredOn,
      dbhCm: input.dbhCm,
      crownDiebackPct: input.crownDiebackPct ?? null,
      note: input.note ?? '',
      confirmedOutlier: input.confirmedOutlier ?? false,
    },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  // The server's reason, on the fields it names; the rest above the button.
  useEffect(() => {
    setFormError(
      applyServerErrors(
        new ApiError(409, refused.code, refused.message, refused.fields),
        form.setError,
        fields,
      ),
    );
  }, [refused, form.setError]);
  const onSubmit = form.handleSubmit((values) =>
    onSend({ ...values, note: values.note ? values.note : null }),
  );
  return (
    <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-3">
      <Field label="Date" error={errors.measuredOn?.message}>
        {(control) => (
          <input
            {...control}
            {...form.register('measuredOn')}
            type="date"
            className={controlClass}
          />
        )}
      </Field>
      <Field label="DBH (cm)" error={errors.dbhCm?.message}>
        {(control) => (
          <input
            {...control}
            {...form.register('dbhCm', { valueAsNumber: true })}
            type="number"
            step="0.1"
            inputMode="decimal"
            className={controlClass}
          />
        )}
      </Field>
      <Field label="Crown dieback" error={errors.crownDiebackPct?.message}>
        {(control) => (
          <select
            {...control}
            {...form.register('crownDiebackPct', { setValueAs: optionalNumber })}
            className={controlClass}
          >
            <option value="">Not rated</option>
            {crownDiebackClasses.map((pct) => (
              <option key={pct} value={pct}>
                {pct} %
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field label="Note" error={errors.note?.message}>
        {(control) => (
          <textarea {...control} {...form.register('note')} rows={2} className={controlClass} />
        )}
      </Field>
      {refused.code === 'unconfirmed-outlier' && (
        <label className="inline-flex min-h-11 items-center gap-2">
          <input {...form.register('confirmedOutlier')} type="checkbox" className="h-5 w-5" />I
          measured again: this reading is right
        </label>
      )}
      {formError && <p className="text-sm text-alert">{formError}</p>}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" field>
          Send again
        </Button>
        <Button onClick={onCancel} field>
          Cancel
        </Button>
      </div>
    </form>
  );
}
