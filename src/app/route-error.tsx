import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ErrorState } from '@/components/ui/error-state';
import { NotFoundRoute } from './routes/not-found';

/** What a page shows when it fails to load at all (a lost connection, a broken deploy). */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundRoute />;
  return (
    <div className="px-4 py-10">
      <ErrorState
        title="This page didn't load."
        error={error}
        onRetry={() => window.location.reload()}
      />
    </div>
  );
}
