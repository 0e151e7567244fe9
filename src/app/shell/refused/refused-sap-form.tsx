import { sapEntryInputSchema, type SapEntryInput } from '@shared/schemas/sap';
import { controlClass, Field } from '@/components/ui/field';
import { TextField } from '@/components/ui/text-field';
import type { RefusedEntry } from '@/lib/field-entries';
import { CollectionSelect } from './collection-select';
import { RefusedFormActions } from './refused-form-actions';
import { decimalInput, noteOrNull, optionalNumber, useRefusedForm } from './use-refused-form';

const fields = [
  'collectedOn',
  'volumeL',
  'sugarPct',
  'heldAtC',
  'collection',
  'syrupMadeL',
  'note',
] as const;

/**
 * Edits a refused day of sap before it is sent again, in litres and °C as the API holds it. The
 * server's reason is put on the fields it names.
 */
export function RefusedSapForm({
  refused,
  onSend,
  onCancel,
}: {
  refused: RefusedEntry & { entry: { kind: 'sap' } };
  onSend: (input: SapEntryInput) => void;
  onCancel: () => void;
}) {
  const { input } = refused.entry;
  const { form, formError } = useRefusedForm<SapEntryInput>({
    schema: sapEntryInputSchema.omit({ clientId: true }),
    defaults: {
      collectedOn: input.collectedOn,
      volumeL: input.volumeL,
      sugarPct: input.sugarPct,
      heldAtC: input.heldAtC ?? null,
      collection: input.collection ?? null,
      syrupMadeL: input.syrupMadeL ?? null,
      note: input.note ?? '',
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
        label="Collected on"
        type="date"
        error={errors.collectedOn?.message}
        {...form.register('collectedOn')}
      />
      <TextField
        label="Sap (L)"
        {...decimalInput}
        error={errors.volumeL?.message}
        {...form.register('volumeL', { valueAsNumber: true })}
      />
      <TextField
        label="Sugar (°Brix)"
        {...decimalInput}
        error={errors.sugarPct?.message}
        {...form.register('sugarPct', { valueAsNumber: true })}
      />
      <TextField
        label="Held at (°C)"
        {...decimalInput}
        error={errors.heldAtC?.message}
        {...form.register('heldAtC', { setValueAs: optionalNumber })}
      />
      <CollectionSelect
        registration={form.register('collection', { setValueAs: (v) => (v === '' ? null : v) })}
        error={errors.collection?.message}
        none="Not given"
      />
      <TextField
        label="Syrup made (L)"
        {...decimalInput}
        error={errors.syrupMadeL?.message}
        {...form.register('syrupMadeL', { setValueAs: optionalNumber })}
      />
      <Field label="Note" error={errors.note?.message}>
        {(control) => (
          <textarea {...control} {...form.register('note')} rows={2} className={controlClass} />
        )}
      </Field>
      <RefusedFormActions formError={formError} onCancel={onCancel} />
    </form>
  );
}
