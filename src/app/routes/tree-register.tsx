import { PageHeader } from '@/components/ui/page-header';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { RecordsLinks } from '@/features/imports/components/records-links';
import { TreeRegister } from '@/features/trees/components/tree-register';
import { useRole } from '@/lib/auth';
import { formatNumber } from '@/lib/units';
import { NotFoundRoute } from './not-found';
import { sugarbushTitle, useSugarbushIdParam } from './sugarbush-param';

export function TreeRegisterRoute() {
  const { sugarbushId, sugarbush, name } = useSugarbushIdParam();
  const role = useRole(sugarbushId);
  if (sugarbushId === undefined) return <NotFoundRoute />;

  return (
    <>
      <title>{sugarbushTitle('Trees', name)}</title>
      <PageHeader
        title="Trees"
        subtitle={
          sugarbush.data
            ? `${sugarbush.data.name} · ${formatNumber(sugarbush.data.treeCount)} trees`
            : ' '
        }
        actions={
          <>
            <RecordsLinks sugarbushId={sugarbushId} role={role} />
            <UnitToggle />
          </>
        }
      />
      {/* A new stand starts the register afresh: its own page, sort and search. */}
      <TreeRegister key={sugarbushId} sugarbushId={sugarbushId} />
    </>
  );
}
