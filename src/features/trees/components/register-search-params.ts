import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import {
  species as speciesList,
  treeStatuses,
  type Species,
  type TreeStatus,
} from '@shared/schemas/enums';
import type { SortDirection, TableSort } from '@/components/ui/data-table';
import { TREE_PAGE_SIZE } from '../api/get-trees';
import type { TreeListFilters, TreeSort } from '../api/tree-keys';

const sorts: readonly TreeSort[] = [
  'tag',
  '-tag',
  'dbh',
  '-dbh',
  'status',
  '-status',
  'species',
  '-species',
];
const DEFAULT_SORT: TreeSort = 'tag';

const oneOf = <T extends string>(values: readonly T[], value: string | null): T | undefined =>
  value !== null && (values as readonly string[]).includes(value) ? (value as T) : undefined;

export const toTableSort = (sort: TreeSort): TableSort => ({
  field: sort.replace(/^-/, ''),
  direction: sort.startsWith('-') ? 'desc' : 'asc',
});

const fromTableSort = (field: string, direction: SortDirection): TreeSort =>
  (direction === 'desc' ? `-${field}` : field) as TreeSort;

/** Clicking the sorted column flips its direction; clicking another sorts by it ascending. */
export function nextSort(current: TreeSort, field: string): TreeSort {
  const { field: currentField, direction } = toTableSort(current);
  if (currentField !== field) return fromTableSort(field, 'asc');
  return fromTableSort(field, direction === 'asc' ? 'desc' : 'asc');
}

type Patch = Partial<Omit<TreeListFilters, 'pageSize'>>;

/** The register's page, sort, search and filters, kept in the URL so a view can be shared. */
export function useRegisterSearchParams() {
  const [params, setParams] = useSearchParams();

  const filters = useMemo<TreeListFilters>(() => {
    const page = Number.parseInt(params.get('page') ?? '1', 10);
    return {
      page: Number.isFinite(page) && page > 0 ? page : 1,
      pageSize: TREE_PAGE_SIZE,
      sort: oneOf(sorts, params.get('sort')) ?? DEFAULT_SORT,
      q: params.get('q')?.trim() || undefined,
      status: oneOf<TreeStatus>(treeStatuses, params.get('status')),
      species: oneOf<Species>(speciesList, params.get('species')),
    };
  }, [params]);

  /** Any change other than the page itself starts again at page 1. */
  const update = useCallback(
    (patch: Patch, options?: { replace?: boolean }) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, value] of Object.entries(patch)) {
            if (value === undefined || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          if (!('page' in patch)) next.delete('page');
          if (next.get('page') === '1') next.delete('page');
          return next;
        },
        { replace: options?.replace },
      );
    },
    [setParams],
  );

  return { filters, update };
}
