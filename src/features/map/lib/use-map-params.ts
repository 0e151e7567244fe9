import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { filtersFromParams, withFilters, type MapFilters } from './map-filters';

const toId = (value: string | null) => {
  const n = Number(value);
  return value && Number.isInteger(n) && n > 0 ? n : undefined;
};

/** The map's filters and the chosen tree live in the URL, so a view can be shared or bookmarked. */
export function useMapParams() {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => filtersFromParams(params), [params]);
  const selectedId = toId(params.get('tree'));

  const setFilters = useCallback(
    (patch: Partial<MapFilters>) => setParams((prev) => withFilters(prev, patch)),
    [setParams],
  );

  /** Choosing trees replaces the history entry: Back leaves the map, not the last tree. */
  const select = useCallback(
    (treeId: number | undefined) =>
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          if (treeId === undefined) next.delete('tree');
          else next.set('tree', String(treeId));
          return next;
        },
        { replace: true },
      ),
    [setParams],
  );

  return { filters, setFilters, selectedId, select };
}
