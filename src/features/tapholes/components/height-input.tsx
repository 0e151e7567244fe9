import { useId } from 'react';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import type { TapholeFormValues } from './taphole-form-values';

type HeightValues = Pick<TapholeFormValues, 'system' | 'feet' | 'inches' | 'cm'>;

const numberInput = {
  type: 'text',
  inputMode: 'decimal',
  autoComplete: 'off',
} as const;

/** Height above the ground: feet and inches (or inches alone), or centimetres. */
export function HeightInput({
  values,
  onChange,
  error,
}: {
  values: HeightValues;
  onChange: (next: Partial<HeightValues>) => void;
  error?: string;
}) {
  const id = useId();
  if (values.system === 'metric') {
    return (
      <Field label="Height" error={error} hint="Centimetres above the ground.">
        {(control) => (
          <span className="flex items-center gap-2">
            <input
              {...control}
              {...numberInput}
              value={values.cm}
              onChange={(e) => onChange({ cm: e.target.value })}
              className={cn(controlClass, 'w-28 tabular-nums')}
            />
            <span aria-hidden="true">cm</span>
          </span>
        )}
      </Field>
    );
  }
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const control = {
    'aria-invalid': Boolean(error),
    'aria-describedby': [hintId, error && errorId].filter(Boolean).join(' '),
    className: cn(controlClass, 'w-20 tabular-nums'),
    ...numberInput,
  };
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-bold">Height</legend>
      <span className="flex flex-wrap items-center gap-2">
        <input
          {...control}
          aria-label="Height, feet"
          value={values.feet}
          onChange={(e) => onChange({ feet: e.target.value })}
        />
        <span aria-hidden="true" className="mr-2">
          ft
        </span>
        <input
          {...control}
          aria-label="Height, inches"
          value={values.inches}
          onChange={(e) => onChange({ inches: e.target.value })}
        />
        <span aria-hidden="true">in</span>
      </span>
      <p id={hintId} className="text-sm text-bark">
        Above the ground, in feet and inches or in inches alone.
      </p>
      {error && (
        <p id={errorId} className="text-sm text-alert">
          {error}
        </p>
      )}
    </fieldset>
  );
}
