import { useCallback } from 'react';
import { Link } from 'react-router';
import { speciesLabels } from '@shared/schemas/enums';
import type { Tree } from '@shared/schemas/tree';
import { Button } from '@/components/ui/button';
import { DataTable, type Column } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TableSkeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import {
  formatDate,
  formatDbh,
  formatNumber,
  formatPercent,
  useUnitSystem,
  type LengthUnit,
} from '@/lib/units';
import { useTrees } from '../api/get-trees';
import { nextSort, toTableSort, useRegisterSearchParams } from './register-search-params';
import { TreeRegisterFilters } from './tree-register-filters';
import { TreeStatusLabel } from './tree-status';

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
  const onSearch = useCallback((q: string) => update({ q }, { replace: true }), [update]);
  const filtered = Boolean(filters.q || filters.status || filters.species);

  const filterBar = (
    <TreeRegisterFilters
      filters={filters}
      onSearch={onSearch}
      onStatus={(status) => update({ status })}
      onSpecies={(species) => update({ species })}
    />
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

  const { items, total, page, pageSize } = trees.data;
  if (total === 0) {
    return (
      <>
        {filterBar}
        {filtered ? (
          <EmptyState
            title={filters.q ? `No trees match '${filters.q}'` : 'No trees match these filters'}
          >
            <Button
              variant="quiet"
              onClick={() => update({ q: undefined, status: undefined, species: undefined })}
            >
              Clear search and filters
            </Button>
          </EmptyState>
        ) : (
          <EmptyState title="No trees yet — import a CSV or add the first tree on the map">
            <Link to={paths.map.href(sugarbushId)} className="underline underline-offset-4">
              Open the map
            </Link>
          </EmptyState>
        )}
      </>
    );
  }

  const first = (page - 1) * pageSize + 1;
  const last = Math.min(page * pageSize, total);
  const hasNext = page * pageSize < total;
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
      <nav
        aria-label="Register pages"
        className="mt-4 flex flex-wrap items-center justify-between gap-3"
      >
        <p className="tabular-nums" aria-live="polite">
          {formatNumber(first)}–{formatNumber(last)} of {formatNumber(total)}
        </p>
        <div className="flex gap-2">
          <Button disabled={page <= 1} onClick={() => update({ page: page - 1 })}>
            Previous
          </Button>
          <Button disabled={!hasNext} onClick={() => update({ page: page + 1 })}>
            Next
          </Button>
        </div>
      </nav>
    </>
  );
}
