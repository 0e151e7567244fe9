import type { SapListQuery } from '@shared/schemas/sap';
import { queryRoots } from '@/lib/query-roots';

/** `season` undefined asks the API for its default: the latest season holding sap or weather. */
export const seasonLogKeys = {
  all: queryRoots.seasonLog,
  stand: (sugarbushId: number) => [...seasonLogKeys.all, sugarbushId] as const,
  weather: (sugarbushId: number, season: number | undefined) =>
    [...seasonLogKeys.stand(sugarbushId), 'weather', season ?? 'latest'] as const,
  seasonSap: (sugarbushId: number, season: number) =>
    [...seasonLogKeys.stand(sugarbushId), 'sap', 'season', season] as const,
  sapLists: (sugarbushId: number) => [...seasonLogKeys.stand(sugarbushId), 'sap', 'list'] as const,
  sapList: (sugarbushId: number, query: SapEntriesQuery) =>
    [...seasonLogKeys.sapLists(sugarbushId), query] as const,
};

export type SapEntriesQuery = Pick<SapListQuery, 'season' | 'page' | 'pageSize' | 'sort'> & {
  collection?: SapListQuery['collection'];
};
