import { Link } from 'react-router';
import { speciesLabels } from '@shared/schemas/enums';
import type { Tree } from '@shared/schemas/tree';
import { TreeListEmpty } from '@/components/tree-list-empty';
import { TreeStatusLabel } from '@/components/tree-status-label';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { TableSkeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { nextSort, toTableSort } from '@/lib/list-search-params';
import { formatDate, formatDbh, formatPercent, useUnitSystem, type LengthUnit } from '@/lib/units';
import { useTrees } from '../api/get-trees';
import { useRegisterSearchParams } from './register-search-params';
import { TreeRegisterFilters } from './tree-register-filters';

const columns = (unit: LengthUnit): Column<Tree>[] => [
  {
    key: 'tag',
    header: 'Tag',
    sortField: 'tag',
    cell: (tree) => (
      <Link to={paths.tree.href(tree.id)} className="font-bold underline underline-offset-4">
        {tree.tag}
      </Link>
    ),
  },
  {
    key: 'species',
    header: 'Species',
    sortField: 'species',
    cell: (t) => speciesLabels[t.species],
  },
  {
    key: 'status',
    header: 'Status',
    sortField: 'status',
    cell: (t) => <TreeStatusLabel status={t.status} />,
  },
  {
    key: 'dbh',
    header: `DBH (${unit})`,
    sortField: 'dbh',
    align: 'right',
    cell: (t) => formatDbh(t.latestDbhCm, unit),
  },
  {
    key: 'dieback',
    header: 'Crown dieback',
    align: 'right',
    cell: (t) => formatPercent(t.latestCrownDiebackPct),
  },
  {
    key: 'measured',
    header: 'Last measured',
    className: 'hidden md:table-cell',
    cell: (t) => formatDate(t.latestMeasuredOn),
  },
];

export function TreeRegister({ sugarbushId }: { sugarbushId: number }) {
  const { filters, update } = useRegisterSearchParams();
  const { unit } = useUnitSystem();
  const trees = useTrees(sugarbushId, filters);
  const filtered = Boolean(
    filters.q || filters.status || filters.species || filters.dieback !== undefined,
  );

  const filterBar = (
    <>
      <TreeRegisterFilters filters={filters} onChange={update} />
      {filters.dieback !== undefined && (
        <p className="mb-4 flex flex-wrap items-center gap-3 text-sm">
          <span>
            Crown rated {filters.dieback} % dieback
            {filters.diebackSeason === undefined
              ? ' at the latest rating'
              : ` in the ${filters.diebackSeason} round`}
          </span>
          <Button
            variant="quiet"
            onClick={() => update({ dieback: undefined, diebackSeason: undefined })}
          >
            Any crown
          </Button>
        </p>
      )}
    </>
  );

  if (trees.isPending) {
    return (
      <>
        {filterBar}
        <TableSkeleton label="Loading trees" />
      </>
    );
  }
  if (trees.isError) {
    return (
      <>
        {filterBar}
        <ErrorState
          title="We couldn't load the trees."
          error={trees.error}
          onRetry={() => void trees.refetch()}
        />
      </>
    );
  }

  const { items, total } = trees.data;
  if (total === 0) {
    return (
      <>
        {filterBar}
        <TreeListEmpty
          sugarbushId={sugarbushId}
          filtered={filtered}
          q={filters.q}
          onClear={() =>
            update({
              q: undefined,
              status: undefined,
              species: undefined,
              dieback: undefined,
              diebackSeason: undefined,
            })
          }
        />
      </>
    );
  }

  return (
    <>
      {filterBar}
      <DataTable
        label="Tree register"
        columns={columns(unit)}
        rows={items}
        rowKey={(t) => t.id}
        sort={toTableSort(filters.sort)}
        onSort={(field) => update({ sort: nextSort(filters.sort, field) })}
        stale={trees.isPlaceholderData}
        rowClassName={(t) => (t.status === 'removed' ? 'text-bark' : undefined)}
      />
      <Pager label="Register pages" list={trees.data} onPage={(page) => update({ page })} />
    </>
  );
}
