import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ComplianceReport } from '@shared/schemas/compliance';
import { env } from '@/config/env';
import { api } from '@/lib/api-client';
import { overviewKeys, type ComplianceFilters } from './overview-keys';

export const COMPLIANCE_PAGE_SIZE = 50;

const query = (f: ComplianceFilters) => ({ ...f, changed: f.changed ? '1' : undefined });

export const getCompliance = (
  sugarbushId: number,
  filters: ComplianceFilters,
  signal?: AbortSignal,
) =>
  api.get<ComplianceReport>(`/sugarbushes/${sugarbushId}/compliance`, {
    signal,
    query: query(filters),
  });

export const complianceQueryOptions = (sugarbushId: number, filters: ComplianceFilters) =>
  queryOptions({
    queryKey: overviewKeys.compliance(sugarbushId, filters),
    queryFn: ({ signal }) => getCompliance(sugarbushId, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useCompliance = (sugarbushId: number, filters: ComplianceFilters, enabled = true) =>
  useQuery({ ...complianceQueryOptions(sugarbushId, filters), enabled });

/** The report's CSV, for a plain download link: every row the filters keep, not one page. */
export function complianceCsvUrl(sugarbushId: number, filters: ComplianceFilters): string {
  const params = new URLSearchParams();
  const { page: _page, pageSize: _size, ...rest } = query(filters);
  for (const [key, value] of Object.entries(rest))
    if (value !== undefined && value !== '') params.set(key, String(value));
  const search = params.toString();
  return `${env.apiBaseUrl}/sugarbushes/${sugarbushId}/compliance.csv${search ? `?${search}` : ''}`;
}
