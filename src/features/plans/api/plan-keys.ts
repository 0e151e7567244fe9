import type { VerdictKey, WarningCode } from '@shared/rules/index';
import type { PlanQuery } from '@shared/schemas/plan';
import type { ShareBandKey } from '@shared/schemas/share-bands';
import { queryRoots } from '@/lib/query-roots';

export type PlanSort = NonNullable<PlanQuery['sort']>;

/** One page of a season plan as the API is asked for it. */
export interface PlanFilters {
  season: number;
  page: number;
  pageSize: number;
  sort: PlanSort;
  q?: string;
  verdict?: VerdictKey;
  warning?: WarningCode;
  /** A conductive-share band: trees big enough to tap whose share lies in it. */
  share?: ShareBandKey;
  /** Where a walking order (`sort: 'walk'`) starts: where the tapper stands. */
  fromLat?: number;
  fromLng?: number;
}

export const planKeys = {
  all: queryRoots.plans,
  lists: () => [...planKeys.all, 'list'] as const,
  list: (sugarbushId: number, filters: PlanFilters) =>
    [...planKeys.lists(), sugarbushId, filters] as const,
};
