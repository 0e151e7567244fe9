import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import type { LengthUnit } from '@/lib/units';
import type { NumberKind } from '../lib/custom-profile-form';
import { fromShown, toShown, unitWord } from '../lib/number-text';

/**
 * A number typed in the units it is shown in (inches or centimetres, a share as %) and kept in
 * the form as the schema holds it (cm, a 0–1 share). Remount it (a `key`) when the unit flips.
 */
export function NumberField<T extends FieldValues>({
  control,
  name,
  label,
  kind,
  unit,
  suffix,
  hint,
  className,
}: {
  control: Control<T>;
  name: Path<T>;
  label: string;
  kind: NumberKind;
  unit: LengthUnit;
  /** Shown after the label instead of the kind's own unit word. */
  suffix?: string;
  hint?: string;
  className?: string;
}) {
  const { field, fieldState } = useController({ control, name });
  const [draft, setDraft] = useState<string | null>(null);
  const value: unknown = field.value;
  const shown =
    draft ??
    (typeof value === 'number' && Number.isFinite(value) ? toShown(value, kind, unit) : '');
  const word = suffix ?? unitWord(kind, unit);
  return (
    <Field
      label={word ? `${label} (${word})` : label}
      error={fieldState.error?.message}
      hint={hint}
      className={className}
    >
      {(controlProps) => (
        <input
          {...controlProps}
          ref={field.ref}
          name={field.name}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={shown}
          onChange={(e) => {
            setDraft(e.target.value);
            field.onChange(fromShown(e.target.value, kind, unit));
          }}
          onBlur={() => {
            // A number typed stays as the field would show it; anything else stays as typed.
            const typed = draft === null ? undefined : fromShown(draft, kind, unit);
            if (typed !== undefined && !Number.isNaN(typed)) setDraft(null);
            field.onBlur();
          }}
          className={cn(controlClass, 'w-full max-w-40 tabular-nums')}
        />
      )}
    </Field>
  );
}
