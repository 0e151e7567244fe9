import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { WoodsMap } from '@/features/map/components/woods-map';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function WoodsMapRoute() {
  const { sugarbushId, name } = useSugarbushIdParam();
  if (sugarbushId === undefined) return <NotFoundRoute />;

  return (
    <>
      <title>{sugarbushTitle('Map', name)}</title>
      <PageHeader title="Map" subtitle={name ?? ' '} actions={<UnitToggle />} />
      {/* Another stand gets a fresh map, with its own view and background. */}
      <WoodsMap key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}
