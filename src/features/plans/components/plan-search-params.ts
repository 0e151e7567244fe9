import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { verdicts, warningCodes, type VerdictKey, type WarningCode } from '@shared/rules/index';
import type { SortDirection, TableSort } from '@/components/ui/data-table';
import { parseSeason, seasonParam } from '@/features/advice/season';
import { PLAN_PAGE_SIZE } from '../api/get-season-plan';
import type { PlanFilters, PlanSort } from '../api/plan-keys';

const sorts: readonly PlanSort[] = [
  'tag',
  '-tag',
  'taps',
  '-taps',
  'dbh',
  '-dbh',
  'share',
  '-share',
  'verdict',
];
const DEFAULT_SORT: PlanSort = 'tag';
const verdictKeys = verdicts.map((v) => v.key);

const oneOf = <T extends string>(values: readonly T[], value: string | null): T | undefined =>
  value !== null && (values as readonly string[]).includes(value) ? (value as T) : undefined;

export const toTableSort = (sort: PlanSort): TableSort => ({
  field: sort.replace(/^-/, ''),
  direction: sort.startsWith('-') ? 'desc' : 'asc',
});

const fromTableSort = (field: string, direction: SortDirection) =>
  (direction === 'desc' ? `-${field}` : field) as PlanSort;

/** Clicking the sorted column flips its direction; clicking another sorts by it ascending. */
export function nextSort(current: PlanSort, field: string): PlanSort {
  const { field: currentField, direction } = toTableSort(current);
  if (currentField !== field) return fromTableSort(field, 'asc');
  return fromTableSort(field, direction === 'asc' ? 'desc' : 'asc');
}

type Patch = Partial<Omit<PlanFilters, 'pageSize'>>;

/** The plan's season, page, sort, search and filters, kept in the URL so a view can be shared. */
export function usePlanSearchParams() {
  const [params, setParams] = useSearchParams();

  const filters = useMemo<PlanFilters>(() => {
    const page = Number.parseInt(params.get('page') ?? '1', 10);
    return {
      season: parseSeason(params.get('season')),
      page: Number.isFinite(page) && page > 0 ? page : 1,
      pageSize: PLAN_PAGE_SIZE,
      sort: oneOf(sorts, params.get('sort')) ?? DEFAULT_SORT,
      q: params.get('q')?.trim() || undefined,
      verdict: oneOf<VerdictKey>(verdictKeys, params.get('verdict')),
      warning: oneOf<WarningCode>(warningCodes, params.get('warning')),
    };
  }, [params]);

  /** Any change other than the page itself starts again at page 1. */
  const update = useCallback(
    (patch: Patch, options?: { replace?: boolean }) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, raw] of Object.entries(patch)) {
            const value = key === 'season' ? seasonParam(raw as number) : raw;
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
