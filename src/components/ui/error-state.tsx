import { Button } from './button';

interface ErrorStateProps {
  /** What failed, in the user's terms: "We couldn't load the trees." */
  title: string;
  error?: unknown;
  onRetry?: () => void;
}

export function ErrorState({ title, error, onRetry }: ErrorStateProps) {
  const detail = error instanceof Error ? error.message : undefined;
  return (
    <div role="alert" className="rounded border border-alert/40 bg-paper px-6 py-6">
      <p className="text-lg font-bold text-alert">{title}</p>
      {detail && <p className="mt-1 max-w-prose text-bark">{detail}</p>}
      {onRetry && (
        <Button className="mt-4" onClick={onRetry}>
          Retry
        </Button>
      )}
    </div>
  );
}
