import type { ButtonHTMLAttributes, Ref } from 'react';
import { cn } from './cn';

type Variant = 'primary' | 'secondary' | 'quiet';

const variants: Record<Variant, string> = {
  primary: 'bg-sap text-ink font-bold hover:bg-sap/85 disabled:bg-sap/50',
  secondary: 'border border-bark/40 bg-paper text-ink hover:bg-frost disabled:text-ink/50',
  quiet: 'text-ink underline-offset-4 hover:underline disabled:text-ink/50',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  /** Full width on phones, natural width from the md breakpoint. */
  block?: boolean;
  /** 44 px tall at every width, not only on phones: for pages used in the field. */
  field?: boolean;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({
  variant = 'secondary',
  block = false,
  field = false,
  className,
  type = 'button',
  ...props
}: ButtonProps) {
  return (
    <button
      type={type}
      className={cn(
        'inline-flex min-h-11 items-center justify-center gap-2 rounded px-4 text-base',
        !field && 'md:min-h-9',
        'disabled:cursor-not-allowed',
        variants[variant],
        block && 'w-full md:w-auto',
        className,
      )}
      {...props}
    />
  );
}
