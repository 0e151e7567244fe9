import { SeasonPlan } from '@/features/plans/components/season-plan';
import { TappingCaution } from '@/features/trees/components/tapping-caution';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function SeasonPlanRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;

  return (
    <>
      <title>{sugarbushTitle('Season plan', name)}</title>
      {/* A new stand starts the plan afresh: its own page, sort and filters. */}
      <SeasonPlan
        key={sugarbushId}
        sugarbushId={sugarbushId}
        standName={name}
        caution={<TappingCaution />}
      />
    </>
  );
}
