import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { collections } from '@shared/schemas/enums';
import type { SapEntry, SapEntryInput } from '@shared/schemas/sap';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { isApiError } from '@/lib/api-client';
import { collectionLabels } from '@/lib/collection-labels';
import { newClientId, useFormFieldEntry } from '@/lib/field-entries';
import { applyServerErrors } from '@/lib/form-errors';
import { formatDate } from '@/lib/units';
import { useCorrectSap } from '../api/correct-sap';
import {
  blankSapForm,
  sapFields,
  sapFormFrom,
  sapFormSchema,
  type SapFormValues,
} from '../lib/sap-entry-form';
import { entryCautions } from '../lib/season-days';
import { formatBrix, formatVolume, type SeasonUnits } from '../lib/season-units';
import { SapCautions } from './sap-cautions';

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush does not record sap.';
  if (error.status === 404) return 'This entry or stand is no longer there for you.';
  return error.message;
}

/** What the saved entry should make, by both rules, and how it was kept. */
function SavedEntry({ entry, units }: { entry: SapEntry; units: SeasonUnits }) {
  const cautions = entryCautions(entry, units.temperature);
  return (
    <div aria-label="Saved entry" role="group" className="flex flex-col gap-2">
      <p>
        Recorded {formatVolume(entry.volumeL, units.volume)} of sap at {formatBrix(entry.sugarPct)}{' '}
        on {formatDate(entry.collectedOn)}
        {entry.collection ? ` (${collectionLabels[entry.collection].toLowerCase()})` : ''}.
      </p>
      <p data-expected-syrup>
        Expected syrup: <strong>{formatVolume(entry.expectedSyrupL, units.volume)}</strong> by the
        Rule of 86, <strong>{formatVolume(entry.expectedSyrupLRevised, units.volume)}</strong> by
        the rule revised for 66.0 °Brix syrup.
      </p>
      {cautions.length > 0 && <SapCautions cautions={cautions} />}
    </div>
  );
}

/**
 * Records a day's sap, or corrects an entry: typed in the page's units, sent in litres and °C.
 * After saving it says what the sap should make and whether it was kept cold enough.
 */
export function SapForm({
  sugarbushId,
  units,
  entry,
  onCorrected,
}: {
  sugarbushId: number;
  units: SeasonUnits;
  /** The entry to correct; without one the form records a new entry. */
  entry?: SapEntry;
  onCorrected?: (entry: SapEntry) => void;
}) {
  const headingId = useId();
  const schema = useMemo(() => sapFormSchema(units), [units]);
  const defaults = entry ? sapFormFrom(entry, units) : blankSapForm();
  const form = useForm<SapFormValues, unknown, SapEntryInput>({
    resolver: zodResolver(schema),
    defaultValues: defaults,
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<SapEntry>();
  const [waiting, setWaiting] = useState<string>();
  const clearAmounts = () =>
    form.reset({
      ...form.getValues(),
      volumeL: '',
      sugarPct: '',
      heldAtC: '',
      syrupMadeL: '',
      note: '',
    });
  // A new entry goes through the device's queue: offline it waits there and survives a reload.
  const record = useFormFieldEntry<SapEntry>((waits) => {
    if (waits.kind !== 'sap') return;
    setWaiting(
      `Kept on this device: the sap of ${formatDate(waits.input.collectedOn)} waits to send and goes out when the network is back.`,
    );
    clearAmounts();
  });
  const correct = useCorrectSap(sugarbushId);
  const pending = record.saving || correct.isPending;

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setSaved(undefined);
    setWaiting(undefined);
    const onError = (error: unknown) =>
      setFormError(applyServerErrors(error, form.setError, sapFields, messageFor));
    if (entry)
      correct.mutate(
        { entryId: entry.id, change: input },
        { onSuccess: (e) => onCorrected?.(e), onError },
      );
    else
      record.send(
        { kind: 'sap', clientId: newClientId(), sugarbushId, input },
        {
          onStored: (e, late) => {
            setWaiting(undefined);
            setSaved(e);
            if (!late) clearAmounts();
          },
          onRefused: onError,
        },
      );
  });

  const title = entry
    ? `Correct the entry of ${formatDate(entry.collectedOn)}`
    : "Record a day's sap";
  const vol = units.volume;
  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        {title}
      </h2>
      {entry && (
        <p className="mt-1 text-sm text-bark">
          The earlier values stay in the record of changes; entries are never deleted.
        </p>
      )}
      <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-4">
        <div className="flex flex-wrap gap-3">
          <Field label="Date" error={errors.collectedOn?.message} className="w-48">
            {(control) => (
              <input
                {...control}
                {...form.register('collectedOn')}
                type="date"
                className={controlClass}
              />
            )}
          </Field>
          <Field label="Collection" error={errors.collection?.message} className="w-56">
            {(control) => (
              <select {...control} {...form.register('collection')} className={controlClass}>
                <option value="">Whole stand</option>
                {collections.map((c) => (
                  <option key={c} value={c}>
                    {collectionLabels[c]}
                  </option>
                ))}
              </select>
            )}
          </Field>
        </div>
        <div className="flex flex-wrap items-start gap-3">
          <Field label={`Sap volume (${vol})`} error={errors.volumeL?.message} className="w-40">
            {(control) => (
              <input
                {...control}
                {...form.register('volumeL')}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <Field
            label="Sugar (°Brix)"
            error={errors.sugarPct?.message}
            hint="From the refractometer."
            className="w-40"
          >
            {(control) => (
              <input
                {...control}
                {...form.register('sugarPct')}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <Field
            label={`Held at (°${units.temperature})`}
            error={errors.heldAtC?.message}
            hint="Optional: the sap's temperature in the tank."
            className="w-48"
          >
            {(control) => (
              // No decimal keypad: a phone's has no minus sign, and sap can be held below 0 °C.
              <input
                {...control}
                {...form.register('heldAtC')}
                type="text"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <Field
            label={`Syrup made (${vol})`}
            error={errors.syrupMadeL?.message}
            hint="Optional."
            className="w-40"
          >
            {(control) => (
              <input
                {...control}
                {...form.register('syrupMadeL')}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
        </div>
        <Field label="Note" error={errors.note?.message} hint="Optional.">
          {(control) => (
            <textarea
              {...control}
              {...form.register('note')}
              rows={2}
              maxLength={2000}
              className={cn(controlClass, 'py-2')}
            />
          )}
        </Field>
        <FormFooter
          error={formError}
          pending={pending}
          label={entry ? 'Save correction' : 'Save sap'}
          notice={saved ? 'Sap saved.' : waiting}
        />
      </form>
      <div aria-live="polite" className="mt-3 empty:hidden">
        {saved && <SavedEntry entry={saved} units={units} />}
      </div>
    </section>
  );
}
