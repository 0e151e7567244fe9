import { Link, type LinkProps } from 'react-router';
import { cn } from './cn';

/** A link that stands on its own line: underlined, and a full 44 px target on phones. */
export function TextLink({ className, ...props }: LinkProps) {
  return (
    <Link
      className={cn(
        'inline-flex min-h-11 items-center self-start underline underline-offset-4 md:min-h-0',
        className,
      )}
      {...props}
    />
  );
}

/** A primary action that leads to another page, looking like the primary button. */
export function ActionLink({ className, ...props }: LinkProps) {
  return (
    <Link
      className={cn(
        'inline-flex min-h-11 w-full items-center justify-center rounded bg-sap px-4 font-bold text-ink',
        'hover:bg-sap/85',
        className,
      )}
      {...props}
    />
  );
}
