import { useParams } from 'react-router';
import { SeasonPlan } from '@/features/plans/components/season-plan';
import { useSugarbush } from '@/features/sugarbushes/api/get-sugarbush';
import { TappingCaution } from '@/features/trees/components/tapping-caution';
import { NotFoundRoute } from './not-found';

export function SeasonPlanRoute() {
  const { id } = useParams();
  const sugarbushId = Number(id);
  const valid = Number.isInteger(sugarbushId) && sugarbushId > 0;
  const sugarbush = useSugarbush(valid ? sugarbushId : undefined);
  if (!valid) return <NotFoundRoute />;

  const name = sugarbush.data?.name;
  return (
    <>
      <title>{name ? `Season plan · ${name} · Clearwood` : 'Season plan · Clearwood'}</title>
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
