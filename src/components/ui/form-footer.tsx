import type { ReactNode } from 'react';
import { Button } from './button';

/** The end of a record form: a form-level error, the save button, and the calm confirmation. */
export function FormFooter({
  error,
  pending,
  label,
  notice,
}: {
  error?: string | null;
  pending: boolean;
  label: string;
  notice?: ReactNode;
}) {
  return (
    <>
      {error && (
        <p role="alert" className="text-alert">
          {error}
        </p>
      )}
      <div className="flex flex-wrap items-center gap-4">
        <Button
          type="submit"
          variant="primary"
          block
          disabled={pending}
          aria-busy={pending || undefined}
        >
          {label}
        </Button>
        <p role="status" className="text-moss">
          {notice}
        </p>
      </div>
    </>
  );
}
