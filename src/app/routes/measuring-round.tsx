import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { MeasuringRound } from '@/features/round/components/measuring-round';
import { can, useRole } from '@/lib/auth';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function MeasuringRoundRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  const role = useRole(sugarbushId);
  if (sugarbushId === undefined) return <NotFoundRoute />;
  return (
    <>
      <title>{sugarbushTitle('Measuring round', name)}</title>
      <PageHeader title="Measuring round" subtitle={name ?? ' '} actions={<UnitToggle />} />
      {role && !can(role, 'record-measurements') ? (
        <p className="max-w-prose">
          Your role in this sugarbush does not record measurements. The owner and the forester walk
          the round.
        </p>
      ) : (
        <MeasuringRound key={sugarbushId} sugarbushId={sugarbushId} />
      )}
    </>
  );
}
