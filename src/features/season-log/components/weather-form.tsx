import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { WeatherDay, WeatherDayInput } from '@shared/schemas/weather';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { isApiError } from '@/lib/api-client';
import { newClientId, useFormFieldEntry } from '@/lib/field-entries';
import { applyServerErrors } from '@/lib/form-errors';
import { formatDate } from '@/lib/units';
import { dayReason } from '../lib/season-days';
import type { SeasonUnits } from '../lib/season-units';
import {
  blankWeatherForm,
  weatherFields,
  weatherFormSchema,
  type WeatherFormValues,
} from '../lib/weather-entry-form';

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush does not record weather.';
  return error.message;
}

/** A day's night low and day high by hand; a second reading for a date replaces the first. */
export function WeatherForm({ sugarbushId, units }: { sugarbushId: number; units: SeasonUnits }) {
  const headingId = useId();
  const schema = useMemo(() => weatherFormSchema(units), [units]);
  const form = useForm<WeatherFormValues, unknown, WeatherDayInput>({
    resolver: zodResolver(schema),
    defaultValues: blankWeatherForm(),
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string>();
  const t = units.temperature;
  const clearReadings = () => form.reset({ ...form.getValues(), minC: '', maxC: '' });
  // Sent through the device's queue: offline the day waits there and survives a reload.
  const record = useFormFieldEntry<WeatherDay>((waits) => {
    if (waits.kind !== 'weather') return;
    setNotice(
      `Kept on this device: the weather of ${formatDate(waits.input.date)} waits to send and goes out when the network is back.`,
    );
    clearReadings();
  });

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setNotice(undefined);
    record.send(
      { kind: 'weather', clientId: newClientId(), sugarbushId, input },
      {
        onStored: (day, late) => {
          setNotice(`Saved ${formatDate(day.date)}: ${dayReason(day, t)}.`);
          if (!late) clearReadings();
        },
        onRefused: (error) =>
          setFormError(applyServerErrors(error, form.setError, weatherFields, messageFor)),
      },
    );
  });

  const temperature = (name: 'minC' | 'maxC', label: string) => (
    <Field label={`${label} (°${t})`} error={errors[name]?.message} className="w-36">
      {(control) => (
        // No decimal keypad: a phone's has no minus sign, and nights go below zero.
        <input
          {...control}
          {...form.register(name)}
          type="text"
          autoComplete="off"
          className={cn(controlClass, 'tabular-nums')}
        />
      )}
    </Field>
  );

  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        Record a day&rsquo;s weather
      </h2>
      <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-4">
        <div className="flex flex-wrap items-start gap-3">
          <Field label="Date" error={errors.date?.message} className="w-48">
            {(control) => (
              <input {...control} {...form.register('date')} type="date" className={controlClass} />
            )}
          </Field>
          {temperature('minC', 'Night low')}
          {temperature('maxC', 'Day high')}
        </div>
        <FormFooter
          error={formError}
          pending={record.saving}
          label="Save weather"
          notice={notice}
        />
      </form>
    </section>
  );
}
