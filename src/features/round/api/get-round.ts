import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RoundColumns } from '@shared/schemas/round';
import { api } from '@/lib/api-client';
import { roundKeys } from './round-keys';

/** One tree of the round, decoded from the answer's columns. */
export interface RoundTree {
  id: number;
  tag: string;
  lat: number | null;
  lng: number | null;
  status: RoundColumns['status'][number];
  latestDbhCm: number | null;
  latestMeasuredOn: string | null;
  /** Has a reading dated in the round's season on the server. */
  measured: boolean;
}

export interface Round {
  season: number;
  adviceSeason: number;
  trees: RoundTree[];
  guideline: RoundColumns['guideline'];
}

export function decodeRound(c: RoundColumns): Round {
  const trees: RoundTree[] = new Array(c.count);
  for (let i = 0; i < c.count; i++)
    trees[i] = {
      id: c.ids[i],
      tag: c.tags[i],
      lat: c.lat[i],
      lng: c.lng[i],
      status: c.status[i],
      latestDbhCm: c.latestDbhCm[i],
      latestMeasuredOn: c.latestMeasuredOn[i],
      measured: c.measured[i] === 1,
    };
  return { season: c.season, adviceSeason: c.adviceSeason, trees, guideline: c.guideline };
}

export const getRound = (sugarbushId: number, signal?: AbortSignal) =>
  api.get<RoundColumns>(`/sugarbushes/${sugarbushId}/round`, { signal });

export const roundQueryOptions = (sugarbushId: number) =>
  queryOptions({
    queryKey: roundKeys.stand(sugarbushId),
    queryFn: ({ signal }) => getRound(sugarbushId, signal),
    select: decodeRound,
  });

export const useRound = (sugarbushId: number) => useQuery(roundQueryOptions(sugarbushId));
