import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Taphole } from '@shared/schemas/taphole';
import { api } from './api-client';
import { tapholeKeys } from './taphole-keys';

export const getTapholes = (treeId: number, signal?: AbortSignal) =>
  api.get<Page<Taphole>>(`/trees/${treeId}/tapholes`, { signal, query: { pageSize: 500 } });

export const tapholesQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: tapholeKeys.list(treeId),
    queryFn: ({ signal }) => getTapholes(treeId, signal),
  });

export const useTapholes = (treeId: number) => useQuery(tapholesQueryOptions(treeId));
