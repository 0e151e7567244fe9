import { useParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { useSugarbush } from '@/features/sugarbushes/api/get-sugarbush';
import { WoodsMap } from '@/features/map/components/woods-map';
import { NotFoundRoute } from './not-found';

export function WoodsMapRoute() {
  const { id } = useParams();
  const sugarbushId = Number(id);
  const valid = Number.isInteger(sugarbushId) && sugarbushId > 0;
  const sugarbush = useSugarbush(valid ? sugarbushId : undefined);
  if (!valid) return <NotFoundRoute />;

  const name = sugarbush.data?.name;
  return (
    <>
      <title>{name ? `Map · ${name} · Clearwood` : 'Map · Clearwood'}</title>
      <PageHeader title="Map" subtitle={name ?? ' '} actions={<UnitToggle />} />
      {/* Another stand gets a fresh map, with its own view and background. */}
      <WoodsMap key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}
