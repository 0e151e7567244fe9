import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { MeasurementInput } from '@shared/schemas/measurement';
import { Button } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { controlClass, Field } from '@/components/ui/field';
import {
  ConfirmReading,
  CrownDiebackSelect,
  LengthUnitSelect,
  ReadingNoteField,
} from '@/components/reading-fields';
import {
  dbhCmFrom,
  measurementFormSchema,
  outlierCheck,
  outlierQuestion,
  type MeasureMode,
  type MeasurementFormValues,
} from '@/lib/measurement-entry';
import { formatLength, parseDecimal, todayIso, useUnitSystem } from '@/lib/units';
import type { Round, RoundTree } from '../api/get-round';
import { useTreeRecord } from '../api/get-tree-record';
import { LiveAdvice } from './live-advice';

const modes: { key: MeasureMode; label: string }[] = [
  { key: 'diameter', label: 'Diameter' },
  { key: 'circumference', label: 'Circumference' },
];

/** The reading as typed, in cm of DBH, or null while it is not a number yet. */
function typedReading(values: MeasurementFormValues) {
  const typed = parseDecimal(values.dbhCm ?? '');
  if (typed === undefined || Number.isNaN(typed) || !(typed > 0)) return null;
  return {
    measuredOn: values.measuredOn,
    dbhCm: dbhCmFrom(typed, values.unit, values.mode),
    crownDiebackPct: values.crownDiebackPct === '' ? null : Number(values.crownDiebackPct),
    // Once confirmed, a reading far off the trend counts in the advice, as it will on the server.
    confirmedOutlier: values.confirmedOutlier,
  };
}

/**
 * Quick entry for one tree: DBH or circumference, in in or cm (shown converted), crown dieback in
 * 5 % classes and a note; the tree's advice follows the typing, and a reading far off its trend
 * asks to be confirmed before it is queued.
 */
export function RoundEntryForm({
  tree,
  round,
  onRecord,
}: {
  tree: RoundTree;
  round: Round;
  onRecord: (input: MeasurementInput) => void;
}) {
  const { unit: preferredUnit } = useUnitSystem();
  const record = useTreeRecord(tree.id);
  const readings = useMemo(() => record.data?.measurements ?? [], [record.data]);
  const schema = useMemo(() => measurementFormSchema(readings), [readings]);
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
  const values = useWatch({ control: form.control }) as MeasurementFormValues;
  const reading = typedReading(values);
  const check = outlierCheck(values, readings);
  const confirmError = errors.confirmedOutlier?.message;
  const otherUnit = values.unit === 'in' ? 'cm' : 'in';
  const modeName = useId();

  return (
    <form
      noValidate
      onSubmit={form.handleSubmit(onRecord)}
      className="flex flex-col gap-4"
      aria-label={`Reading for tree ${tree.tag}`}
    >
      <fieldset>
        <legend className="text-sm font-bold">Measured as</legend>
        <div className="mt-1 grid grid-cols-2 gap-2">
          {modes.map((m) => (
            <label
              key={m.key}
              className={cn(
                'flex min-h-11 items-center justify-center gap-2 rounded border px-3',
                values.mode === m.key ? 'border-ink bg-frost font-bold' : 'border-bark/40',
              )}
            >
              <input
                {...form.register('mode')}
                id={`${modeName}-${m.key}`}
                type="radio"
                value={m.key}
                className="h-5 w-5 accent-moss"
              />
              {m.label}
            </label>
          ))}
        </div>
      </fieldset>

      <div className="flex items-start gap-2">
        <Field
          label={values.mode === 'diameter' ? 'DBH' : 'Circumference'}
          error={errors.dbhCm?.message}
          className="min-w-0 flex-1"
          hint={
            reading
              ? `DBH ${formatLength(reading.dbhCm, values.unit)} = ${formatLength(reading.dbhCm, otherUnit)}`
              : values.mode === 'circumference'
                ? 'Round the trunk at breast height; DBH = C ÷ π.'
                : 'Across the trunk at breast height (4.5 ft, 1.37 m).'
          }
        >
          {(control) => (
            <input
              {...control}
              {...form.register('dbhCm')}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              className={cn(controlClass, 'w-full text-lg tabular-nums')}
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
          className="border-alert bg-alert/5 px-3 py-2"
          checkboxClassName="h-6 w-6 accent-moss"
        >
          <p className="mt-1 text-sm">
            Far from this tree&apos;s trend: usually a slipped tape or a typing error.
          </p>
        </ConfirmReading>
      )}

      <CrownDiebackSelect
        registration={form.register('crownDiebackPct')}
        error={errors.crownDiebackPct?.message}
      />

      <ReadingNoteField
        label="Condition note"
        registration={form.register('note')}
        error={errors.note?.message}
      />

      <LiveAdvice record={record.data} round={round} reading={reading} />

      <Button type="submit" variant="primary" block field className="min-h-12 text-lg">
        Record and next tree
      </Button>
    </form>
  );
}
