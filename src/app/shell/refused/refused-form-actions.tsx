import { Button } from '@/components/ui/button';

/** What is left of the server's reason, then the two choices of every refused-entry form. */
export function RefusedFormActions({
  formError,
  onCancel,
}: {
  formError: string | null;
  onCancel: () => void;
}) {
  return (
    <>
      {formError && <p className="text-sm text-alert">{formError}</p>}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" field>
          Send again
        </Button>
        <Button onClick={onCancel} field>
          Cancel
        </Button>
      </div>
    </>
  );
}
