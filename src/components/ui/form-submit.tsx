import { Button } from './button';

/** The end of a short form: its form-level error and one full-width primary button. */
export function FormSubmit({
  error,
  pending,
  label,
}: {
  error?: string | null;
  pending: boolean;
  label: string;
}) {
  return (
    <>
      {error && (
        <p role="alert" className="text-alert">
          {error}
        </p>
      )}
      <Button
        type="submit"
        variant="primary"
        className="w-full"
        disabled={pending}
        aria-busy={pending || undefined}
      >
        {label}
      </Button>
    </>
  );
}
