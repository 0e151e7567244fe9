import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { collections, type Collection } from '@shared/schemas/enums';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { compassWord, formatHeight } from '@/lib/advice-words';
import { isApiError } from '@/lib/api-client';
import { collectionLabels } from '@/lib/collection-labels';
import { todayIso, useUnitSystem } from '@/lib/units';
import { useCreateTaphole } from '../api/create-taphole';
import { DrillInputs } from './drill-inputs';
import { HeightInput } from './height-input';
import { SideInput } from './side-input';
import { SpacingWarning } from './spacing-warning';
import {
  emptyTapholeForm,
  inSystem,
  isTapholeField,
  readSeason,
  toTapholeInput,
  withSpot,
  type TapholeErrors,
  type TapholeFormValues,
} from './taphole-form-values';
import { useDrillingContext } from './use-drilling-context';

/** An advised spot handed to the form; each new `seq` fills it in again. */
export interface SpotRequest {
  azimuthDeg: number;
  heightCm: number;
  season: number;
  seq: number;
}

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush does not record tapholes.';
  if (error.status === 404) return 'This tree is no longer in the register.';
  return error.message;
}

/** Records one hole as drilled: where on the trunk, how deep, with which bit, and what came out. */
export function TapholeForm({
  treeId,
  sugarbushId,
  spot,
}: {
  treeId: number;
  sugarbushId: number;
  spot?: SpotRequest;
}) {
  const headingId = useId();
  const headingRef = useRef<HTMLHeadingElement>(null);
  const { system } = useUnitSystem();
  const { adviceSeason, defaults, bitOptions, spacing, crowdedAt } = useDrillingContext(
    treeId,
    sugarbushId,
  );
  const create = useCreateTaphole(treeId);

  const [values, setValues] = useState<TapholeFormValues>(() =>
    emptyTapholeForm(system, todayIso()),
  );
  const [errors, setErrors] = useState<TapholeErrors>({});
  const [formError, setFormError] = useState<string>();
  const [notice, setNotice] = useState<string>();

  // Keep what was typed when the unit toggle flips, and fill in an advised spot when asked.
  if (values.system !== system) setValues(inSystem(values, system));
  const [filledSeq, setFilledSeq] = useState<number>();
  if (spot && spot.seq !== filledSeq) {
    setFilledSeq(spot.seq);
    setValues((v) => ({
      ...withSpot(v, spot),
      season: spot.season === adviceSeason ? undefined : String(spot.season),
    }));
    setErrors((e) => ({ ...e, heightCm: undefined, azimuthDeg: undefined }));
    setNotice(
      `Filled in from the advice: ${compassWord(spot.azimuthDeg)} at ${formatHeight(spot.heightCm, system)}.`,
    );
  }
  const spotSeq = spot?.seq;
  useEffect(() => {
    if (spotSeq !== undefined) headingRef.current?.focus();
  }, [spotSeq]);

  const set = (next: Partial<TapholeFormValues>) => {
    setValues((v) => ({ ...v, ...next }));
    setNotice(undefined);
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setFormError(undefined);
    setNotice(undefined);
    const result = toTapholeInput(values, defaults);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    create.mutate(result.input, {
      onSuccess: (hole) => {
        setNotice(
          `Saved the ${hole.season} hole: ${compassWord(hole.azimuthDeg)} at ${formatHeight(hole.heightCm, system)}.`,
        );
        setValues((v) => ({ ...emptyTapholeForm(v.system, v.drilledOn), ...keepForNextHole(v) }));
      },
      onError: (error) => {
        const fieldErrors: TapholeErrors = {};
        const unplaced: string[] = [];
        for (const [key, message] of Object.entries(
          isApiError(error) ? (error.fields ?? {}) : {},
        )) {
          if (isTapholeField(key)) fieldErrors[key] = message;
          else unplaced.push(message);
        }
        setErrors(fieldErrors);
        if (Object.keys(fieldErrors).length === 0 || unplaced.length > 0) {
          setFormError(unplaced.length > 0 ? unplaced.join(' ') : messageFor(error));
        }
      },
    });
  };

  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2
        id={headingId}
        ref={headingRef}
        tabIndex={-1}
        className="text-lg font-bold focus:outline-none"
      >
        Record taphole
      </h2>
      <form noValidate onSubmit={onSubmit} className="mt-3 flex flex-col gap-4">
        <div className="flex flex-wrap items-start gap-3">
          <Field label="Season" error={errors.season} className="w-28">
            {(control) => (
              <input
                {...control}
                type="text"
                inputMode="numeric"
                autoComplete="off"
                value={values.season ?? String(defaults.season)}
                onChange={(e) => set({ season: e.target.value })}
                className={cn(controlClass, 'tabular-nums')}
              />
            )}
          </Field>
          <Field label="Drilled on" error={errors.drilledOn} className="min-w-40 flex-1">
            {(control) => (
              <input
                {...control}
                type="date"
                value={values.drilledOn}
                onChange={(e) => set({ drilledOn: e.target.value })}
                className={controlClass}
              />
            )}
          </Field>
        </div>

        <HeightInput values={values} onChange={set} error={errors.heightCm} />

        <div>
          <SideInput values={values} onChange={set} error={errors.azimuthDeg} />
          <SpacingWarning
            crowded={crowdedAt(values)}
            season={readSeason(values, defaults) ?? defaults.season}
            spacing={spacing}
            system={system}
          />
        </div>

        <DrillInputs
          values={values}
          onChange={set}
          defaults={defaults}
          bitOptions={bitOptions}
          system={system}
          errors={errors}
        />

        <Field label="Collection" error={errors.collection} className="max-w-xs">
          {(control) => (
            <select
              {...control}
              value={values.collection ?? defaults.collection}
              onChange={(e) => set({ collection: e.target.value as Collection })}
              className={controlClass}
            >
              {collections.map((c) => (
                <option key={c} value={c}>
                  {collectionLabels[c]}
                </option>
              ))}
            </select>
          )}
        </Field>

        <div>
          <label className="inline-flex min-h-11 items-center gap-3 md:min-h-8">
            <input
              type="checkbox"
              checked={values.stainHit}
              onChange={(e) => set({ stainHit: e.target.checked })}
              aria-invalid={Boolean(errors.stainHit)}
              className="h-5 w-5 shrink-0 accent-sap"
            />
            Hit stained wood (brown or yellow shavings)
          </label>
          {errors.stainHit && <p className="text-sm text-alert">{errors.stainHit}</p>}
        </div>

        <FormFooter
          error={formError}
          pending={create.isPending}
          label="Save taphole"
          notice={notice}
        />
      </form>
    </section>
  );
}

/** A second hole in the same tree is usually drilled the same day, season, depth and bit. */
const keepForNextHole = (v: TapholeFormValues): Partial<TapholeFormValues> => ({
  season: v.season,
  depth: v.depth,
  bitCm: v.bitCm,
  collection: v.collection,
});
