import { verdicts, warningCodes, type VerdictKey, type WarningCode } from '@shared/rules/index';
import { shareBandKeys, type ShareBandKey } from '@shared/schemas/share-bands';
import { bothWays, oneOf, parseListParams, useListSearchParams } from '@/lib/list-search-params';
import { parseSeason, seasonParam } from '@/lib/season';
import { PLAN_PAGE_SIZE } from '../api/get-season-plan';
import type { PlanFilters, PlanSort } from '../api/plan-keys';
import { walkStartParams } from './walk-start';

const sorts: readonly PlanSort[] = [
  ...bothWays(['tag', 'taps', 'dbh', 'share']),
  'verdict',
  'walk',
];
const verdictKeys = verdicts.map((v) => v.key);

const parsePlanParams = (params: URLSearchParams): PlanFilters => ({
  season: parseSeason(params.get('season')),
  ...parseListParams(params, { sorts, defaultSort: 'tag', pageSize: PLAN_PAGE_SIZE }),
  verdict: oneOf<VerdictKey>(verdictKeys, params.get('verdict')),
  warning: oneOf<WarningCode>(warningCodes, params.get('warning')),
  share: oneOf<ShareBandKey>(shareBandKeys, params.get('share')),
  ...walkStartParams(params),
});

/** The upcoming season is the default, so it stays out of the URL. */
const toPlanParam = (key: string, value: unknown) =>
  key === 'season' ? seasonParam(value as number) : value;

/** The plan's season, page, sort, search and filters, kept in the URL so a view can be shared. */
export const usePlanSearchParams = () => useListSearchParams(parsePlanParams, toPlanParam);
