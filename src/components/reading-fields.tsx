import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { crownDiebackClasses } from '@shared/schemas/measurement';
import { cn } from '@/components/ui/cn';
import { controlClass, Field } from '@/components/ui/field';

/**
 * The parts of a reading form that the tree page and the measuring round share: the length
 * unit, the crown dieback class, the confirmation of a reading far from the tree's trend, and a
 * note. Each takes what react-hook-form's `register` gives for its field.
 */

export function LengthUnitSelect({ registration }: { registration: UseFormRegisterReturn }) {
  return (
    <Field label="Unit" className="w-24">
      {(control) => (
        <select {...control} {...registration} className={controlClass}>
          <option value="in">in</option>
          <option value="cm">cm</option>
        </select>
      )}
    </Field>
  );
}

/** Crown dieback in the 5 % classes of the crown condition rating, or not rated. */
export function CrownDiebackSelect({
  registration,
  error,
  className,
}: {
  registration: UseFormRegisterReturn;
  error?: string;
  className?: string;
}) {
  return (
    <Field label="Crown dieback" error={error} className={className}>
      {(control) => (
        <select {...control} {...registration} className={controlClass}>
          <option value="">Not rated</option>
          {crownDiebackClasses.map((pct) => (
            <option key={pct} value={String(pct)}>
              {pct} %
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}

export function ReadingNoteField({
  label,
  registration,
  error,
}: {
  label: string;
  registration: UseFormRegisterReturn;
  error?: string;
}) {
  return (
    <Field label={label} error={error}>
      {(control) => (
        <textarea
          {...control}
          {...registration}
          rows={2}
          maxLength={1000}
          className={cn(controlClass, 'py-2')}
        />
      )}
    </Field>
  );
}

/**
 * The question a reading far off the tree's trend asks, with the box that confirms it. `children`
 * explains why it asks; `invalid` marks the box when the server refused the reading unconfirmed.
 */
export function ConfirmReading({
  question,
  registration,
  invalid,
  className,
  checkboxClassName,
  after,
  children,
}: {
  question: ReactNode;
  registration: UseFormRegisterReturn;
  invalid: boolean;
  className?: string;
  checkboxClassName?: string;
  /** Shown under the box, e.g. what to do when the server refused the reading. */
  after?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div
      role="group"
      aria-label="Confirm the reading"
      className={cn('rounded border-l-4', className)}
    >
      <p className="font-bold">{question}</p>
      {children}
      <label className="mt-1 inline-flex min-h-11 items-center gap-2">
        <input
          {...registration}
          type="checkbox"
          aria-invalid={invalid}
          className={checkboxClassName}
        />
        I measured again: this reading is right
      </label>
      {after}
    </div>
  );
}
