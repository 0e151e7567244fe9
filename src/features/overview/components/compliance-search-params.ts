import { complianceFilterKeys, complianceSorts } from '@shared/schemas/compliance';
import type { ComplianceFilter, ComplianceSort } from '@shared/schemas/compliance';
import { oneOf, parseListParams, useListSearchParams } from '@/lib/list-search-params';
import { FIRST_SEASON, lastSeason } from '@/lib/season';
import { COMPLIANCE_PAGE_SIZE } from '../api/get-compliance';
import type { ComplianceFilters } from '../api/overview-keys';

const guideline = (value: string | null) =>
  value && /^[a-z][a-z-]{0,39}$/.test(value) ? value : undefined;

/** The report's season and guidelines may be left out: the page fills in the stand's own. */
export type ComplianceParams = Omit<ComplianceFilters, 'season'> & { season?: number };

const parseComplianceParams = (params: URLSearchParams): ComplianceParams => {
  const season = Number(params.get('season'));
  return {
    ...parseListParams<ComplianceSort>(params, {
      sorts: complianceSorts,
      defaultSort: 'tag',
      pageSize: COMPLIANCE_PAGE_SIZE,
    }),
    season:
      Number.isInteger(season) && season >= FIRST_SEASON && season <= lastSeason()
        ? season
        : undefined,
    profile: guideline(params.get('profile')),
    compare: guideline(params.get('compare')),
    finding: oneOf<ComplianceFilter>(complianceFilterKeys, params.get('finding')),
    changed: params.get('changed') === '1' || undefined,
  };
};

const toParam = (key: string, value: unknown) =>
  key === 'changed' ? (value ? '1' : undefined) : value;

/** The compliance report's season, guidelines, filters and page, kept in the URL to share. */
export const useComplianceSearchParams = () => useListSearchParams(parseComplianceParams, toParam);
