import {
  crownDiebackClasses,
  measurementInputSchema,
  type MeasurementInput,
} from '@shared/schemas/measurement';
import { controlClass, Field } from '@/components/ui/field';
import type { RefusedEntry } from '@/lib/field-entries';
import { RefusedFormActions } from './refused-form-actions';
import { noteOrNull, optionalNumber, useRefusedForm } from './use-refused-form';

const fields = ['measuredOn', 'dbhCm', 'crownDiebackPct', 'note', 'confirmedOutlier'] as const;

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
  const { form, formError } = useRefusedForm<MeasurementInput>({
    schema: measurementInputSchema,
    defaults: {
      measuredOn: input.measuredOn,
      dbhCm: input.dbhCm,
      crownDiebackPct: input.crownDiebackPct ?? null,
      note: input.note ?? '',
      confirmedOutlier: input.confirmedOutlier ?? false,
    },
    refused,
    fields,
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((values) =>
    onSend({ ...values, note: noteOrNull(values.note) }),
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
      <RefusedFormActions formError={formError} onCancel={onCancel} />
    </form>
  );
}
