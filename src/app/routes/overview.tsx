import { OverviewPage } from '@/features/overview/components/overview-page';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function OverviewRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Overview', name)}</title>
      {/* A new stand starts the overview afresh: its own report and filters. */}
      <OverviewPage key={sugarbushId} sugarbushId={sugarbushId} standName={name} />
    </>
  );
}
