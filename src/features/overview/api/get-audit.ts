import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditPage } from '@shared/schemas/audit';
import { api } from '@/lib/api-client';
import { overviewKeys, type AuditFilters } from './overview-keys';

export const AUDIT_PAGE_SIZE = 25;

export const getAudit = (sugarbushId: number, filters: AuditFilters, signal?: AbortSignal) =>
  api.get<AuditPage>(`/sugarbushes/${sugarbushId}/audit`, {
    signal,
    query: { ...filters, pageSize: AUDIT_PAGE_SIZE },
  });

export const auditQueryOptions = (sugarbushId: number, filters: AuditFilters) =>
  queryOptions({
    queryKey: overviewKeys.audit(sugarbushId, filters),
    queryFn: ({ signal }) => getAudit(sugarbushId, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useAudit = (sugarbushId: number, filters: AuditFilters, enabled = true) =>
  useQuery({ ...auditQueryOptions(sugarbushId, filters), enabled });
