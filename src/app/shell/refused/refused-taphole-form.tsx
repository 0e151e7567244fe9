import { tapholeInputSchema, type TapholeInput } from '@shared/schemas/taphole';
import { controlClass, Field } from '@/components/ui/field';
import { TextField } from '@/components/ui/text-field';
import type { RefusedEntry } from '@/lib/field-entries';
import { CollectionSelect } from './collection-select';
import { RefusedFormActions } from './refused-form-actions';
import { decimalInput, useRefusedForm } from './use-refused-form';

const fields = [
  'season',
  'heightCm',
  'azimuthDeg',
  'depthCm',
  'bitCm',
  'collection',
  'drilledOn',
  'stainHit',
] as const;

/** "yes" / "no" / "" (not noted) in the select; true / false / null in the entry. */
const stainFromSelect = (v: string) => (v === 'yes' ? true : v === 'no' ? false : null);
const stainToSelect = (v: boolean | null | undefined) =>
  v === true ? 'yes' : v === false ? 'no' : '';

/**
 * Edits a refused taphole before it is sent again, in cm and degrees as the API holds it. The
 * server's reason is put on the fields it names.
 */
export function RefusedTapholeForm({
  refused,
  onSend,
  onCancel,
}: {
  refused: RefusedEntry & { entry: { kind: 'taphole' } };
  onSend: (input: TapholeInput) => void;
  onCancel: () => void;
}) {
  const { input } = refused.entry;
  const { form, formError } = useRefusedForm<TapholeInput>({
    schema: tapholeInputSchema.omit({ clientId: true }),
    defaults: {
      season: input.season,
      heightCm: input.heightCm,
      azimuthDeg: input.azimuthDeg,
      depthCm: input.depthCm,
      bitCm: input.bitCm,
      collection: input.collection,
      drilledOn: input.drilledOn ?? null,
      stainHit: input.stainHit ?? null,
    },
    refused,
    fields,
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((values) => onSend(values));
  return (
    <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-3">
      <TextField
        label="Season"
        type="number"
        inputMode="numeric"
        error={errors.season?.message}
        {...form.register('season', { valueAsNumber: true })}
      />
      <TextField
        label="Height (cm)"
        {...decimalInput}
        error={errors.heightCm?.message}
        {...form.register('heightCm', { valueAsNumber: true })}
      />
      <TextField
        label="Azimuth (°)"
        {...decimalInput}
        error={errors.azimuthDeg?.message}
        {...form.register('azimuthDeg', { valueAsNumber: true })}
      />
      <TextField
        label="Depth (cm)"
        {...decimalInput}
        error={errors.depthCm?.message}
        {...form.register('depthCm', { valueAsNumber: true })}
      />
      <TextField
        label="Bit (cm)"
        {...decimalInput}
        error={errors.bitCm?.message}
        {...form.register('bitCm', { valueAsNumber: true })}
      />
      <CollectionSelect
        registration={form.register('collection')}
        error={errors.collection?.message}
      />
      <TextField
        label="Drilled on"
        type="date"
        error={errors.drilledOn?.message}
        {...form.register('drilledOn', { setValueAs: (v) => (v === '' ? null : v) })}
      />
      <Field label="Hit stained wood (brown or yellow shavings)" error={errors.stainHit?.message}>
        {(control) => (
          <select
            {...control}
            value={stainToSelect(form.watch('stainHit'))}
            onChange={(e) => form.setValue('stainHit', stainFromSelect(e.target.value))}
            className={controlClass}
          >
            <option value="">Not noted</option>
            <option value="yes">Yes</option>
            <option value="no">No</option>
          </select>
        )}
      </Field>
      <RefusedFormActions formError={formError} onCancel={onCancel} />
    </form>
  );
}
