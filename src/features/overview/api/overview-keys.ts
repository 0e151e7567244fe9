import type { ComplianceQuery } from '@shared/schemas/compliance';

/** The compliance report as the page asks for it. */
export type ComplianceFilters = Omit<ComplianceQuery, 'pageSize' | 'changed'> & {
  pageSize: number;
  changed?: boolean;
};

export interface AuditFilters {
  page: number;
  kind?: string;
  userId?: number;
}

export const overviewKeys = {
  all: ['overview'] as const,
  trends: (sugarbushId: number) => [...overviewKeys.all, 'trends', sugarbushId] as const,
  compliance: (sugarbushId: number, filters: ComplianceFilters) =>
    [...overviewKeys.all, 'compliance', sugarbushId, filters] as const,
  audit: (sugarbushId: number, filters: AuditFilters) =>
    [...overviewKeys.all, 'audit', sugarbushId, filters] as const,
};
