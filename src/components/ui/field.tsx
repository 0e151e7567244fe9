import { useId, type ReactNode } from 'react';
import { cn } from './cn';

export interface FieldControlProps {
  id: string;
  'aria-invalid': boolean;
  'aria-describedby'?: string;
}

interface FieldProps {
  label: string;
  /** Shown under the control in alert colour, and announced with it. */
  error?: string;
  hint?: string;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
}

/** A label, one control, an optional hint and error, wired together for assistive tech. */
export function Field({ label, error, hint, className, children }: FieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint && hintId, error && errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-bold">
        {label}
      </label>
      {children({ id, 'aria-invalid': Boolean(error), 'aria-describedby': describedBy })}
      {hint && (
        <p id={hintId} className="text-sm text-bark">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-sm text-alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** The look shared by text inputs, selects and text areas. */
export const controlClass = cn(
  'min-h-11 rounded border border-bark/40 bg-paper px-3 text-base text-ink md:min-h-9',
  'aria-[invalid=true]:border-alert',
);
