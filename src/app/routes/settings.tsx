import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton } from '@/components/ui/skeleton';
import { SettingsPage } from '@/features/settings/components/settings-page';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function SettingsRoute() {
  const { sugarbushId, sugarbush, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;

  return (
    <>
      <title>{sugarbushTitle('Settings', name)}</title>
      {sugarbush.isPending ? (
        <>
          <PageHeader title="Settings" />
          <div role="status" aria-label="Loading the settings" className="flex flex-col gap-4">
            <Skeleton className="h-24 w-full max-w-xl" />
            <Skeleton className="h-64 w-full max-w-4xl" />
          </div>
        </>
      ) : sugarbush.isError ? (
        <>
          <PageHeader title="Settings" />
          <ErrorState
            title="We couldn't load this sugarbush's settings."
            error={sugarbush.error}
            onRetry={() => void sugarbush.refetch()}
          />
        </>
      ) : (
        // Another stand starts the forms afresh.
        <SettingsPage key={sugarbushId} stand={sugarbush.data} />
      )}
    </>
  );
}
