import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { profileKeys, profiles } from '@shared/rules/index';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { compassChoiceLabel, compassPoints } from '@/lib/compass';
import { applyServerErrors } from '@/lib/form-errors';
import { sugarbushInputSchema, useCreateSugarbush } from '../api/create-sugarbush';

const fallback = () => "We couldn't start the sugarbush just now. Try again in a moment.";

/** A stand's name, its sunny side and its tapping guideline: enough to start its register. */
export function NewSugarbushForm({ onCreated }: { onCreated: (created: Sugarbush) => void }) {
  const form = useForm({
    resolver: zodResolver(sugarbushInputSchema),
    defaultValues: { name: '', sunnyAzimuthDeg: 180, profile: 'conservative' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const create = useCreateSugarbush();

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    create.mutate(values, {
      onSuccess: onCreated,
      onError: (error) =>
        setFormError(
          applyServerErrors(error, form.setError, ['name', 'sunnyAzimuthDeg', 'profile'], fallback),
        ),
    });
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex max-w-prose flex-col gap-6">
      <Field
        label="Name of the sugarbush"
        hint="As you and your crew call it, for example after the road or the hill."
        error={errors.name?.message}
      >
        {(control) => (
          <input
            {...control}
            {...form.register('name')}
            type="text"
            autoComplete="off"
            className={controlClass}
          />
        )}
      </Field>
      <Field
        label="Sunny side"
        hint="The side of the trunks that gets the most sun. The first taphole of each tree goes there when it can."
        error={errors.sunnyAzimuthDeg?.message}
      >
        {(control) => (
          <select
            {...control}
            {...form.register('sunnyAzimuthDeg', { setValueAs: Number })}
            className={controlClass}
          >
            {compassPoints.map((point) => (
              <option key={point.key} value={point.deg}>
                {compassChoiceLabel(point)}
              </option>
            ))}
          </select>
        )}
      </Field>
      <fieldset aria-describedby="guideline-hint" className="flex flex-col gap-2">
        <legend className="text-sm font-bold">Tapping guideline</legend>
        <p id="guideline-hint" className="text-sm text-bark">
          How many taps a tree of each size takes. The advice for every tree follows it.
        </p>
        {profileKeys.map((key) => {
          const profile = profiles[key];
          return (
            <label
              key={key}
              className="flex min-h-11 cursor-pointer gap-3 rounded border border-rule px-3 py-2 has-[:checked]:border-sap has-[:checked]:bg-frost/60"
            >
              <input
                {...form.register('profile')}
                type="radio"
                value={key}
                className="mt-1 size-4 shrink-0 accent-sap"
              />
              <span>
                <span className="block font-bold">{profile.label}</span>
                <span className="block text-sm text-bark">Source: {profile.source}</span>
              </span>
            </label>
          );
        })}
        {errors.profile?.message && <p className="text-sm text-alert">{errors.profile.message}</p>}
      </fieldset>
      <FormFooter error={formError} pending={create.isPending} label="Start the sugarbush" />
    </form>
  );
}
