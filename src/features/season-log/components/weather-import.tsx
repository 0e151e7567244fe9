import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { TemperatureUnit } from '@shared/rules/index';
import { weatherImportFieldsSchema, type WeatherImportResult } from '@shared/schemas/weather';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { formatDate, formatNumber } from '@/lib/units';
import { useImportWeather } from '../api/import-weather';
import { dayReason } from '../lib/season-days';
import { runLabels, runSymbols } from '../lib/season-words';

const formSchema = weatherImportFieldsSchema.pick({ unit: true }).required();
type ImportFields = { unit: TemperatureUnit };

const daysLabel = (n: number) => `${formatNumber(n)} ${n === 1 ? 'day' : 'days'}`;

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 413) return 'The file is too large for one import.';
  return error.message;
}

/** The days a check found, each classified, as they would be kept. */
function Preview({ result, unit }: { result: WeatherImportResult; unit: TemperatureUnit }) {
  return (
    <div className="flex flex-col gap-2">
      <p>
        {result.station ? `Station ${result.station}, ` : ''}temperatures in °{result.unit}:{' '}
        {daysLabel(result.added)} new, {daysLabel(result.replaced)} replacing a reading,{' '}
        {daysLabel(result.unchanged)} unchanged.
      </p>
      {result.skipped.length > 0 && (
        <ul aria-label="Rows left out" className="text-sm text-bark">
          {result.skipped.map((s) => (
            <li key={s.row}>
              Row {s.row}: {s.reason}
            </li>
          ))}
        </ul>
      )}
      <div
        role="group"
        aria-label="The file's days, scrolls"
        tabIndex={0}
        className="relative max-h-80 overflow-auto"
      >
        <table
          aria-label={result.dryRun ? 'Days in the file' : 'Days imported'}
          className="w-full border-collapse text-left text-sm tabular-nums"
        >
          <thead>
            <tr className="border-b-2 border-ink/70">
              <th scope="col" className="px-2 py-1">
                Date
              </th>
              <th scope="col" className="px-2 py-1">
                Run
              </th>
              <th scope="col" className="px-2 py-1">
                Why
              </th>
            </tr>
          </thead>
          <tbody>
            {result.days.map((d) => (
              <tr key={d.date} className="border-b border-rule">
                <th scope="row" className="whitespace-nowrap px-2 py-1 font-normal">
                  {formatDate(d.date)}
                </th>
                <td className="whitespace-nowrap px-2 py-1">
                  <span aria-hidden="true">{runSymbols[d.run]} </span>
                  {runLabels[d.run]}
                </td>
                <td className="px-2 py-1">{dayReason(d, unit)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/**
 * A weather station's daily summary (STATION, DATE, TMAX, TMIN columns, as published): checked
 * first, each day shown with its classification; then imported.
 */
export function WeatherImport({
  sugarbushId,
  unit,
}: {
  sugarbushId: number;
  /** The page's unit, the file's default. */
  unit: TemperatureUnit;
}) {
  const headingId = useId();
  const fileId = useId();
  const form = useForm<ImportFields>({
    resolver: zodResolver(formSchema),
    defaultValues: { unit },
  });
  const [file, setFile] = useState<File | null>(null);
  const [fileKey, setFileKey] = useState(0);
  const [result, setResult] = useState<WeatherImportResult | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const send = useImportWeather(sugarbushId);

  const run = (dryRun: boolean) =>
    form.handleSubmit((values) => {
      if (!file) {
        setFormError('Choose a station CSV file first.');
        return;
      }
      setFormError(null);
      send.mutate(
        { file, unit: values.unit, dryRun },
        {
          onSuccess: (r) => {
            setResult(r);
            if (!r.dryRun) {
              setFile(null);
              setFileKey((k) => k + 1);
            }
          },
          onError: (error) => {
            setResult(null);
            setFormError(applyServerErrors(error, form.setError, ['unit'], messageFor));
          },
        },
      );
    });

  const checked = result?.dryRun ? result : null;
  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        Import a weather station&rsquo;s days
      </h2>
      <p className="mt-1 max-w-prose text-sm text-bark">
        A daily summary as a station publishes it: columns STATION, DATE, TMAX and TMIN (others are
        ignored). It is checked first and nothing is kept until you import it.
      </p>
      <form noValidate onSubmit={run(true)} className="mt-3 flex flex-col gap-4">
        <div className="flex flex-wrap items-start gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor={fileId} className="text-sm font-bold">
              Station CSV
            </label>
            <input
              key={fileKey}
              id={fileId}
              type="file"
              accept=".csv,text/csv"
              onChange={(e) => {
                setFile(e.target.files?.[0] ?? null);
                setResult(null);
              }}
              className="min-h-11 text-sm file:mr-3 file:min-h-11 file:rounded file:border file:border-bark/40 file:bg-paper file:px-3 md:min-h-9 md:file:min-h-9"
            />
          </div>
          <Field
            label="Temperatures in"
            error={form.formState.errors.unit?.message}
            className="w-40"
          >
            {(control) => (
              <select
                {...control}
                {...form.register('unit', { onChange: () => setResult(null) })}
                className={controlClass}
              >
                <option value="F">°F</option>
                <option value="C">°C</option>
              </select>
            )}
          </Field>
        </div>
        {formError && (
          <p role="alert" className="text-alert">
            {formError}
          </p>
        )}
        <div className="flex flex-wrap gap-3">
          <Button type="submit" block disabled={send.isPending || !file}>
            Check the file
          </Button>
          {checked && checked.days.length > 0 && (
            <Button variant="primary" block disabled={send.isPending} onClick={run(false)}>
              Import {daysLabel(checked.days.length)}
            </Button>
          )}
        </div>
      </form>
      <div aria-live="polite" className="mt-3">
        {result && !result.dryRun && (
          <p role="status" className="text-moss">
            Imported: {daysLabel(result.added)} new, {daysLabel(result.replaced)} replaced.
          </p>
        )}
        {result && <Preview result={result} unit={unit} />}
      </div>
    </section>
  );
}
