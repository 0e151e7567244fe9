import { weatherDayInputSchema, type WeatherDayInput } from '@shared/schemas/weather';
import { TextField } from '@/components/ui/text-field';
import type { RefusedEntry } from '@/lib/field-entries';
import { RefusedFormActions } from './refused-form-actions';
import { decimalInput, useRefusedForm } from './use-refused-form';

const fields = ['date', 'minC', 'maxC'] as const;

/**
 * Edits a refused day of weather before it is sent again, in °C as the API holds it. The
 * server's reason is put on the fields it names.
 */
export function RefusedWeatherForm({
  refused,
  onSend,
  onCancel,
}: {
  refused: RefusedEntry & { entry: { kind: 'weather' } };
  onSend: (input: WeatherDayInput) => void;
  onCancel: () => void;
}) {
  const { input } = refused.entry;
  const { form, formError } = useRefusedForm<WeatherDayInput>({
    schema: weatherDayInputSchema,
    defaults: { date: input.date, minC: input.minC, maxC: input.maxC },
    refused,
    fields,
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((values) => onSend(values));
  return (
    <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-3">
      <TextField label="Day" type="date" error={errors.date?.message} {...form.register('date')} />
      <TextField
        label="Night low (°C)"
        {...decimalInput}
        error={errors.minC?.message}
        {...form.register('minC', { valueAsNumber: true })}
      />
      <TextField
        label="Day high (°C)"
        {...decimalInput}
        error={errors.maxC?.message}
        {...form.register('maxC', { valueAsNumber: true })}
      />
      <RefusedFormActions formError={formError} onCancel={onCancel} />
    </form>
  );
}
