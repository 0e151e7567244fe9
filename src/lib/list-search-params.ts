import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import type { SortDirection, TableSort } from '@/components/ui/data-table';

/** `value` when it is one of `values`; a hand-edited URL falls back to nothing, quietly. */
export const oneOf = <T extends string>(
  values: readonly T[],
  value: string | null,
): T | undefined =>
  value !== null && (values as readonly string[]).includes(value) ? (value as T) : undefined;

/** Each field sorted both ways, as kept in the URL: `tag`, `-tag`, `dbh`, `-dbh`, … */
export const bothWays = <F extends string>(fields: readonly F[]): (F | `-${F}`)[] =>
  fields.flatMap((field) => [field, `-${field}` as const]);

/** A sort kept in the URL as `field` or `-field`, read as the table's field and direction. */
export const toTableSort = (sort: string): TableSort => ({
  field: sort.replace(/^-/, ''),
  direction: sort.startsWith('-') ? 'desc' : 'asc',
});

const fromTableSort = <S extends string>(field: string, direction: SortDirection) =>
  (direction === 'desc' ? `-${field}` : field) as S;

/** Clicking the sorted column flips its direction; clicking another sorts by it ascending. */
export function nextSort<S extends string>(current: S, field: string): S {
  const { field: currentField, direction } = toTableSort(current);
  if (currentField !== field) return fromTableSort<S>(field, 'asc');
  return fromTableSort<S>(field, direction === 'asc' ? 'desc' : 'asc');
}

/** What every list keeps in the URL: the page, the sort and the tag search. */
export interface ListParams<S extends string> {
  page: number;
  pageSize: number;
  sort: S;
  q?: string;
}

/** Reads `?page=`, `?sort=` and `?q=`, falling back to page 1 and `defaultSort`. */
export function parseListParams<S extends string>(
  params: URLSearchParams,
  { sorts, defaultSort, pageSize }: { sorts: readonly S[]; defaultSort: S; pageSize: number },
): ListParams<S> {
  const page = Number.parseInt(params.get('page') ?? '1', 10);
  return {
    page: Number.isFinite(page) && page > 0 ? page : 1,
    pageSize,
    sort: oneOf(sorts, params.get('sort')) ?? defaultSort,
    q: params.get('q')?.trim() || undefined,
  };
}

export type ListPatch<F> = Partial<Omit<F, 'pageSize'>>;

/** How one value is written to the URL; `undefined` or `''` leaves the key out. */
type ToParam = (key: string, value: unknown) => unknown;

const asIs: ToParam = (_key, value) => value;

/**
 * A list's filters kept in the URL so a view can be shared. `parse` reads them (keep it a
 * module-level function, so the filters change only when the URL does); `update` writes a patch.
 */
export function useListSearchParams<F>(
  parse: (params: URLSearchParams) => F,
  toParam: ToParam = asIs,
) {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => parse(params), [parse, params]);

  /** Any change other than the page itself starts again at page 1. */
  const update = useCallback(
    (patch: ListPatch<F>, options?: { replace?: boolean }) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, raw] of Object.entries(patch)) {
            const value = toParam(key, raw);
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
    [setParams, toParam],
  );

  return { filters, update };
}
