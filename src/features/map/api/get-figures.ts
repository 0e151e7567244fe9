import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { mapKeys } from './map-keys';
import type { StandFigures } from '@shared/schemas/map';

export const getStandFigures = (sugarbushId: number, season?: number, signal?: AbortSignal) =>
  api.get<StandFigures>(`/sugarbushes/${sugarbushId}/figures`, { signal, query: { season } });

export const standFiguresQueryOptions = (sugarbushId: number, season?: number) =>
  queryOptions({
    queryKey: mapKeys.figures(sugarbushId, season),
    queryFn: ({ signal }) => getStandFigures(sugarbushId, season, signal),
    staleTime: 60_000,
  });

export const useStandFigures = (sugarbushId: number, season?: number) =>
  useQuery(standFiguresQueryOptions(sugarbushId, season));
