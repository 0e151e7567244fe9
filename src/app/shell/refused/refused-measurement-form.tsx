import { measurementInputSchema, type MeasurementInput } from '@shared/schemas/measurement';
import { CrownDiebackSelect, ReadingNoteField } from '@/components/reading-fields';
import { TextField } from '@/components/ui/text-field';
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
      <TextField
        label="Date"
        type="date"
        error={errors.measuredOn?.message}
        {...form.register('measuredOn')}
      />
      <TextField
        label="DBH (cm)"
        type="number"
        step="0.1"
        inputMode="decimal"
        error={errors.dbhCm?.message}
        {...form.register('dbhCm', { valueAsNumber: true })}
      />
      <CrownDiebackSelect
        registration={form.register('crownDiebackPct', { setValueAs: optionalNumber })}
        error={errors.crownDiebackPct?.message}
      />
      <ReadingNoteField
        label="Note"
        registration={form.register('note')}
        error={errors.note?.message}
      />
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
