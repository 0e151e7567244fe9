import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Measurement } from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

/** A tree's whole record, oldest first; corrected rows come back flagged `superseded`. */
export const getMeasurements = (treeId: number, signal?: AbortSignal) =>
  api.get<Page<Measurement>>(`/trees/${treeId}/measurements`, {
    signal,
    query: { pageSize: 500 },
  });

export const measurementsQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: measurementKeys.list(treeId),
    queryFn: ({ signal }) => getMeasurements(treeId, signal),
  });

export const useMeasurements = (treeId: number) => useQuery(measurementsQueryOptions(treeId));
