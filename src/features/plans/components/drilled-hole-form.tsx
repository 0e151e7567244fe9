import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { collections } from '@shared/schemas/enums';
import type { TreeAdvice } from '@shared/schemas/plan';
import type { Taphole, TapholeInput } from '@shared/schemas/taphole';
import { cn } from '@/components/ui/cn';
import { CautionBox } from '@/components/ui/caution-box';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { compassWord, formatBitSize, formatHeight } from '@/lib/advice-words';
import { isApiError } from '@/lib/api-client';
import { bitChoices } from '@/lib/bit-sizes';
import { collectionLabels } from '@/lib/collection-labels';
import { newClientId, useSendFieldEntry } from '@/lib/field-entries';
import { applyServerErrors } from '@/lib/form-errors';
import { checkDrilledHole, type SpacingRules } from '@/lib/spacing-check';
import { lengthUnitOf, parseDecimal, toCm, type UnitSystem } from '@/lib/units';
import {
  drilledHoleDefaults,
  drilledHoleFields,
  drilledHoleSchema,
  typedSpot,
  type DrilledHoleValues,
} from './drilled-hole-values';
import { DrilledHoleWarning } from './drilled-hole-warning';

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'The hole could not be sent. Check the connection and save again.';
  if (error.status === 403) return 'Your role in this sugarbush does not record tapholes.';
  if (error.status === 404) return 'This tree is no longer in the register.';
  return error.message;
}

const numberInput = { type: 'text', inputMode: 'decimal', autoComplete: 'off' } as const;

/**
 * Records the hole drilled at a tree from its plan card: filled in with the next advised spot
 * and the advised drill, checked by the advisor as it is edited, sent as a field entry.
 */
export function DrilledHoleForm({
  treeId,
  tag,
  season,
  advice,
  holes,
  rules,
  system,
}: {
  treeId: number;
  tag: string;
  season: number;
  advice: TreeAdvice;
  holes: readonly Taphole[];
  rules: SpacingRules;
  system: UnitSystem;
}) {
  const headingId = useId();
  const unit = lengthUnitOf(system);
  const seasonHoles = holes.filter((h) => h.season === season);
  const latest = [...holes].sort((a, b) => b.season - a.season || b.id - a.id)[0];
  const start = {
    season,
    spot: advice.placements[seasonHoles.length] ?? advice.placements[0],
    depthCm: advice.depthCm,
    bitCm: advice.bitCm,
    collection: latest?.collection ?? advice.collection,
  };
  const form = useForm<DrilledHoleValues, unknown, Omit<TapholeInput, 'clientId'>>({
    resolver: zodResolver(drilledHoleSchema(unit)),
    defaultValues: drilledHoleDefaults(start, unit),
  });
  const { errors } = form.formState;
  const values = useWatch({ control: form.control }) as DrilledHoleValues;
  const send = useSendFieldEntry();
  // One id per hole entered: a retry of the same hole is stored once.
  const [clientId, setClientId] = useState(newClientId);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string>();

  const spot = typedSpot(values, unit);
  const typedSeason = Number(values.season);
  const depth = parseDecimal(values.depthCm);
  const bit = Number(values.bitCm);
  const check =
    spot && advice.dbhCm && Number.isInteger(typedSeason)
      ? checkDrilledHole(spot, holes, {
          season: typedSeason,
          dbhCm: advice.dbhCm,
          depthCm: depth && depth > 0 ? toCm(depth, unit) : advice.depthCm,
          bitCm: bit > 0 ? bit : advice.bitCm,
          radialGrowthCmPerYear: advice.radialGrowthCmPerYear,
          rules,
          // The advice's count holds for its own season only.
          advisedTaps: typedSeason === season ? advice.taps : Infinity,
        })
      : null;

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setSaved(undefined);
    send.mutate(
      { kind: 'taphole', clientId, treeId, tag, input: { ...input, clientId } },
      {
        onSuccess: () => {
          setSaved(
            `Saved: the ${input.season} hole, ${compassWord(input.azimuthDeg)} at ${formatHeight(input.heightCm, system)}.`,
          );
          setClientId(newClientId());
          const next = advice.placements[seasonHoles.length + 1];
          form.reset(drilledHoleDefaults({ ...start, spot: next }, unit));
        },
        onError: (error) =>
          setFormError(applyServerErrors(error, form.setError, drilledHoleFields, messageFor)),
      },
    );
  });

  const bits = bitChoices(advice.bitCm);
  const azimuth = parseDecimal(values.azimuthDeg);
  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-3">
      <h4 id={headingId} className="font-bold">
        Record what was drilled at {tag}
      </h4>
      <form
        noValidate
        onSubmit={onSubmit}
        onChange={() => setSaved(undefined)}
        className="mt-3 flex flex-col gap-3"
      >
        <div className="grid grid-cols-2 gap-3">
          <Field label="Season" error={errors.season?.message}>
            {(control) => (
              <input
                {...control}
                {...form.register('season')}
                type="text"
                inputMode="numeric"
                autoComplete="off"
                className={cn(controlClass, 'w-full tabular-nums')}
              />
            )}
          </Field>
          <Field label={`Height (${unit})`} error={errors.heightCm?.message}>
            {(control) => (
              <input
                {...control}
                {...form.register('heightCm')}
                {...numberInput}
                className={cn(controlClass, 'w-full tabular-nums')}
              />
            )}
          </Field>
          <Field
            label="Side (degrees)"
            error={errors.azimuthDeg?.message}
            hint={
              azimuth !== undefined && azimuth >= 0 && azimuth < 360
                ? `${compassWord(azimuth)}; 0° is north`
                : '0° is north, 90° east'
            }
          >
            {(control) => (
              <input
                {...control}
                {...form.register('azimuthDeg')}
                {...numberInput}
                className={cn(controlClass, 'w-full tabular-nums')}
              />
            )}
          </Field>
          <Field label={`Depth (${unit})`} error={errors.depthCm?.message} hint="Bark included.">
            {(control) => (
              <input
                {...control}
                {...form.register('depthCm')}
                {...numberInput}
                className={cn(controlClass, 'w-full tabular-nums')}
              />
            )}
          </Field>
          <Field label="Bit" error={errors.bitCm?.message} className="col-span-2">
            {(control) => (
              <select {...control} {...form.register('bitCm')} className={controlClass}>
                {bits.map((cm) => (
                  <option key={cm} value={String(cm)}>
                    {formatBitSize(cm, system)}
                  </option>
                ))}
              </select>
            )}
          </Field>
          <Field label="Collection" error={errors.collection?.message} className="col-span-2">
            {(control) => (
              <select {...control} {...form.register('collection')} className={controlClass}>
                {collections.map((c) => (
                  <option key={c} value={c}>
                    {collectionLabels[c]}
                  </option>
                ))}
              </select>
            )}
          </Field>
        </div>

        <DrilledHoleWarning
          check={check}
          season={Number.isInteger(typedSeason) ? typedSeason : season}
          spacing={rules.spacing}
          system={system}
        />

        {advice.drillingNotes.length > 0 && (
          <CautionBox title="Before you drill">
            {advice.drillingNotes.map((note) => (
              <p key={note.text}>{note.text}</p>
            ))}
          </CautionBox>
        )}

        <FormFooter
          error={formError}
          pending={send.isPending && !send.isPaused}
          label="Save drilled hole"
          notice={
            send.isPaused ? 'Kept on this device: it is sent when the connection is back.' : saved
          }
        />
      </form>
    </section>
  );
}
