import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { TextField } from '@/components/ui/text-field';
import { compassChoiceLabel, compassPoints, exactPoint } from '@/lib/compass';
import { applyServerErrors } from '@/lib/form-errors';
import { useUnitSystem } from '@/lib/units';
import {
  standFormSchema,
  useUpdateStand,
  type StandFormInput,
  type StandPatch,
} from '../api/update-stand';
import { plainIssues } from '../lib/plain-issues';
import { messageFor } from '../lib/messages';

const fieldNames = ['name', 'sunnyAzimuthDeg'] as const;

/** The stand's name and its sunny side, the bearing the advisor sets the first tap on. */
export function StandForm({ stand }: { stand: Sugarbush }) {
  const { unit } = useUnitSystem();
  const update = useUpdateStand(stand.id);
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string>();
  const form = useForm<StandFormInput, unknown, StandPatch>({
    resolver: zodResolver(standFormSchema, { error: plainIssues(unit) }),
    defaultValues: { name: stand.name, sunnyAzimuthDeg: stand.sunnyAzimuthDeg },
  });
  const {
    register,
    setValue,
    watch,
    formState: { errors, isSubmitted },
  } = form;
  const azimuth = watch('sunnyAzimuthDeg');
  const point =
    typeof azimuth === 'number' && Number.isFinite(azimuth) ? exactPoint(azimuth) : undefined;

  const onSubmit = form.handleSubmit((patch) => {
    setFormError(null);
    setNotice(undefined);
    update.mutate(patch, {
      onSuccess: (saved) => {
        form.reset({ name: saved.name, sunnyAzimuthDeg: saved.sunnyAzimuthDeg });
        setNotice('Saved. The season plan follows the new sunny side.');
      },
      onError: (error) =>
        setFormError(applyServerErrors(error, form.setError, fieldNames, messageFor)),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-xl flex-col gap-4">
      <TextField
        label="Name"
        error={errors.name?.message}
        {...register('name')}
        type="text"
        autoComplete="off"
      />
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold">Sunny side</legend>
        <p className="max-w-prose text-sm text-bark">
          The side of the trunks that gets the most sun. The advisor puts each tree&apos;s first tap
          there.
        </p>
        <div className="flex flex-wrap items-start gap-3">
          <Field label="Compass point" className="min-w-40 flex-1">
            {(control) => (
              <select
                {...control}
                value={point?.key ?? ''}
                onChange={(e) => {
                  const chosen = compassPoints.find((p) => p.key === e.target.value);
                  if (chosen)
                    setValue('sunnyAzimuthDeg', chosen.deg, {
                      shouldDirty: true,
                      shouldValidate: isSubmitted,
                    });
                }}
                className={controlClass}
              >
                <option value="" disabled>
                  Between points (see degrees)
                </option>
                {compassPoints.map((p) => (
                  <option key={p.key} value={p.key}>
                    {compassChoiceLabel(p)}
                  </option>
                ))}
              </select>
            )}
          </Field>
          <Field
            label="Degrees"
            hint="0° is north, 90° east, 180° south."
            error={errors.sunnyAzimuthDeg?.message}
            className="min-w-32 flex-1"
          >
            {(control) => (
              <input
                {...control}
                {...register('sunnyAzimuthDeg', {
                  setValueAs: (v: unknown) =>
                    v === '' ? undefined : Number(String(v).replace(',', '.')),
                })}
                type="text"
                inputMode="decimal"
                autoComplete="off"
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
        </div>
      </fieldset>
      <FormFooter
        error={formError}
        pending={update.isPending}
        label="Save the stand"
        notice={notice}
      />
    </form>
  );
}
