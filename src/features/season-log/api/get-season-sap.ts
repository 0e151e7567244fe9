import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SapEntry, SapList } from '@shared/schemas/sap';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

/** The most the list route gives in one page. */
const PAGE_SIZE = 500;

/**
 * Every sap entry of a season, oldest first, with the season's totals: the chart and the table of
 * days need them all. A season is a few hundred entries at most, so this is one page, rarely two.
 */
export async function getSeasonSap(
  sugarbushId: number,
  season: number,
  signal?: AbortSignal,
): Promise<SapList> {
  const get = (page: number) =>
    api.get<SapList>(`/sugarbushes/${sugarbushId}/sap`, {
      signal,
      query: { season, page, pageSize: PAGE_SIZE, sort: 'collectedOn' },
    });
  const first = await get(1);
  const items: SapEntry[] = [...first.items];
  for (let page = 2; items.length < first.total && page <= 20; page += 1) {
    const next = await get(page);
    if (next.items.length === 0) break;
    items.push(...next.items);
  }
  return { ...first, items, page: 1, pageSize: items.length };
}

export const seasonSapQueryOptions = (sugarbushId: number, season: number) =>
  queryOptions({
    queryKey: seasonLogKeys.seasonSap(sugarbushId, season),
    queryFn: ({ signal }) => getSeasonSap(sugarbushId, season, signal),
  });

export const useSeasonSap = (sugarbushId: number, season: number | undefined) =>
  useQuery({
    ...seasonSapQueryOptions(sugarbushId, season ?? 0),
    enabled: season !== undefined,
  });
