import { queryRoots } from '@/lib/query-roots';

/** Everything the map reads, under one prefix so an edit can refresh it all at once. */
export const mapKeys = {
  all: queryRoots.map,
  trees: (sugarbushId: number, season?: number) =>
    [...mapKeys.all, 'trees', sugarbushId, season ?? 'upcoming'] as const,
  figures: (sugarbushId: number, season?: number) =>
    [...mapKeys.all, 'figures', sugarbushId, season ?? 'upcoming'] as const,
  basemaps: (sugarbushId: number) => [...mapKeys.all, 'basemaps', sugarbushId] as const,
  demoTiles: () => [...mapKeys.all, 'demo-tiles'] as const,
};
