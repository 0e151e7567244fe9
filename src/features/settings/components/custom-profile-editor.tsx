import { useState } from 'react';
import { get, useFieldArray, type Path, type UseFormReturn } from 'react-hook-form';
import { CUSTOM_LIMITS, profileKeys, profiles } from '@shared/rules/index';
import { Button } from '@/components/ui/button';
import { Field, controlClass } from '@/components/ui/field';
import { TextField } from '@/components/ui/text-field';
import { roundTo, type LengthUnit } from '@/lib/units';
import {
  formPath,
  mainGroups,
  moreGroups,
  type CustomProfileForm,
  type CustomProfileFormOutput,
  type FieldGroupSpec,
} from '../lib/custom-profile-form';
import { NumberField } from './number-field';

type Form = UseFormReturn<CustomProfileForm, unknown, CustomProfileFormOutput>;

const tapsWord = (n: number) => `${n} ${n === 1 ? 'tap' : 'taps'}`;

function Group({ group, form, unit }: { group: FieldGroupSpec; form: Form; unit: LengthUnit }) {
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="text-sm font-bold">{group.legend}</legend>
      {group.hint && <p className="max-w-prose text-sm text-bark">{group.hint}</p>}
      <div className="grid gap-3 sm:grid-cols-2">
        {group.fields.map((f) => (
          <NumberField
            key={`${f.path}-${unit}`}
            control={form.control}
            name={formPath(f.path) as Path<CustomProfileForm>}
            label={f.label}
            kind={f.kind}
            unit={unit}
            hint={f.hint}
          />
        ))}
      </div>
    </fieldset>
  );
}

/**
 * The stand's own guideline: the DBH table (edges in the unit it is written in), then where
 * holes go and how they are drilled, in the user's units; the model's finer figures fold away.
 */
export function CustomProfileEditor({
  form,
  unit,
  onStartFrom,
}: {
  form: Form;
  unit: LengthUnit;
  onStartFrom: (key: (typeof profileKeys)[number]) => void;
}) {
  const { control, register, getValues, setValue, watch, formState } = form;
  const bands = useFieldArray({ control, name: 'customProfile.bands' });
  const tableUnit = watch('customProfile.unit');
  const error = (path: string) =>
    (get(formState.errors, path) as { message?: string } | undefined)?.message;
  const bandsError = error('customProfile.bands') ?? error('customProfile.bands.root');
  // Figures behind the fold open by themselves when one of them needs attention.
  const [moreOpen, setMoreOpen] = useState(false);
  const moreNeedsAttention = moreGroups.some((g) =>
    g.fields.some((f) => error(formPath(f.path)) !== undefined),
  );

  const changeTableUnit = (next: 'in' | 'cm') => {
    const from = getValues('customProfile.unit');
    if (next === from) return;
    const factor = next === 'cm' ? 2.54 : 1 / 2.54;
    getValues('customProfile.bands').forEach((b, i) =>
      setValue(`customProfile.bands.${i}.from`, roundTo(b.from * factor, 2), { shouldDirty: true }),
    );
    setValue('customProfile.unit', next, { shouldDirty: true });
  };

  const addBand = () => {
    const rows = getValues('customProfile.bands');
    const top = rows[rows.length - 1];
    setValue(`customProfile.bands.${rows.length - 1}.fullOnlyForHealthyFastGrowers`, undefined);
    bands.append({
      from: roundTo(top.from + (tableUnit === 'in' ? 5 : 13), 2),
      taps: rows.length + 1,
    });
  };

  return (
    <div className="flex flex-col gap-5 rounded border border-rule px-4 py-4">
      <div className="flex flex-wrap items-end gap-3">
        <Field
          label="Start from"
          hint="Fills every figure below from a published guideline."
          className="min-w-56 flex-1"
        >
          {(c) => (
            <select
              {...c}
              value=""
              onChange={(e) => {
                const key = profileKeys.find((k) => k === e.target.value);
                if (key) onStartFrom(key);
              }}
              className={controlClass}
            >
              <option value="" disabled>
                Choose a guideline
              </option>
              {profileKeys.map((k) => (
                <option key={k} value={k}>
                  {profiles[k].label}
                </option>
              ))}
            </select>
          )}
        </Field>
      </div>

      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Name of this guideline"
          error={error('customProfile.label')}
          {...register('customProfile.label')}
          type="text"
        />
        <TextField
          label="Where the figures come from"
          hint="Shown behind “Why?” with every piece of advice."
          error={error('customProfile.source')}
          {...register('customProfile.source')}
          type="text"
        />
      </div>

      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold">Taps by DBH</legend>
        <p className="max-w-prose text-sm text-bark">
          Each band adds one tap. Trees under the first band get none.
        </p>
        <Field label="Table written in" className="max-w-48" error={error('customProfile.unit')}>
          {(c) => (
            <select
              {...c}
              value={tableUnit}
              onChange={(e) => changeTableUnit(e.target.value === 'cm' ? 'cm' : 'in')}
              className={controlClass}
            >
              <option value="in">inches</option>
              <option value="cm">centimetres</option>
            </select>
          )}
        </Field>
        <ol className="flex flex-col gap-3">
          {bands.fields.map((row, i) => {
            const top = i === bands.fields.length - 1;
            return (
              <li key={row.id} className="flex flex-wrap items-end gap-3">
                <NumberField
                  key={`from-${tableUnit}`}
                  control={control}
                  name={`customProfile.bands.${i}.from`}
                  label={`${tapsWord(i + 1)} from DBH`}
                  kind="count"
                  suffix={tableUnit}
                  unit={unit}
                />
                {error(`customProfile.bands.${i}.taps`) && (
                  <p className="text-sm text-alert">{error(`customProfile.bands.${i}.taps`)}</p>
                )}
                {top && i > 0 && (
                  <div className="pb-1">
                    <label className="inline-flex min-h-11 items-center gap-3 text-sm md:min-h-8">
                      <input
                        type="checkbox"
                        {...register(`customProfile.bands.${i}.fullOnlyForHealthyFastGrowers`)}
                        className="h-5 w-5 shrink-0 accent-sap"
                      />
                      Only for healthy, fast-growing trees (else one fewer)
                    </label>
                    {error(`customProfile.bands.${i}.fullOnlyForHealthyFastGrowers`) && (
                      <p className="text-sm text-alert">
                        {error(`customProfile.bands.${i}.fullOnlyForHealthyFastGrowers`)}
                      </p>
                    )}
                  </div>
                )}
              </li>
            );
          })}
        </ol>
        {bandsError && <p className="text-sm text-alert">{bandsError}</p>}
        <div className="flex flex-wrap gap-3">
          <Button onClick={addBand} disabled={bands.fields.length >= CUSTOM_LIMITS.maxTaps}>
            Add a band
          </Button>
          <Button
            onClick={() => bands.remove(bands.fields.length - 1)}
            disabled={bands.fields.length <= 1}
          >
            Remove the top band
          </Button>
        </div>
      </fieldset>

      {mainGroups.map((g) => (
        <Group key={g.legend} group={g} form={form} unit={unit} />
      ))}

      <details
        open={moreOpen || moreNeedsAttention}
        onToggle={(e) => setMoreOpen(e.currentTarget.open)}
        className="rounded border border-rule px-4 py-3"
      >
        <summary className="min-h-11 cursor-pointer font-bold md:min-h-0">
          More figures: limits, stressed trees, the tapping zone
        </summary>
        <div className="mt-3 flex flex-col gap-5">
          {moreGroups.map((g) => (
            <Group key={g.legend} group={g} form={form} unit={unit} />
          ))}
        </div>
      </details>
    </div>
  );
}
