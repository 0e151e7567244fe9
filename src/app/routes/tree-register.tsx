import { useParams } from 'react-router';
import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { useSugarbush } from '@/features/sugarbushes/api/get-sugarbush';
import { TreeRegister } from '@/features/trees/components/tree-register';
import { formatNumber } from '@/lib/units';
import { NotFoundRoute } from './not-found';

export function TreeRegisterRoute() {
  const { id } = useParams();
  const sugarbushId = Number(id);
  const valid = Number.isInteger(sugarbushId) && sugarbushId > 0;
  const sugarbush = useSugarbush(valid ? sugarbushId : undefined);
  if (!valid) return <NotFoundRoute />;

  const name = sugarbush.data?.name;
  return (
    <>
      <title>{name ? `Trees · ${name} · Clearwood` : 'Trees · Clearwood'}</title>
      <PageHeader
        title="Trees"
        subtitle={
          sugarbush.data
            ? `${sugarbush.data.name} · ${formatNumber(sugarbush.data.treeCount)} trees`
            : ' '
        }
        actions={<UnitToggle />}
      />
      {/* A new stand starts the register afresh: its own page, sort and search. */}
      <TreeRegister key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}
