import { SeasonLogPage } from '@/features/season-log/components/season-log-page';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function SeasonLogRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Season log', name)}</title>
      {/* A new stand starts the log afresh: its own forms and list. */}
      <SeasonLogPage key={sugarbushId} sugarbushId={sugarbushId} standName={name} />
    </>
  );
}
