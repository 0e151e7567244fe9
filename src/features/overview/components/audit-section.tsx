import { useState } from 'react';
import { auditKinds, type AuditItem } from '@shared/schemas/audit';
import { DataTable, type Column } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { SelectField } from '@/components/ui/select-field';
import { TableSkeleton } from '@/components/ui/skeleton';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { useUnitSystem, type LengthUnit } from '@/lib/units';
import { useAudit } from '../api/get-audit';
import type { AuditFilters } from '../api/overview-keys';
import { auditKindLabels, auditTime, auditWords } from '../lib/audit-words';

const columns = (unit: LengthUnit): Column<AuditItem>[] => [
  {
    key: 'at',
    header: 'When',
    cell: (i) => <span className="whitespace-nowrap">{auditTime(i.at)}</span>,
  },
  { key: 'who', header: 'Who', cell: (i) => i.userName ?? 'Someone no longer here' },
  { key: 'what', header: 'What', cell: (i) => auditWords(i, unit) },
  {
    key: 'tree',
    header: 'Tree',
    cell: (i) =>
      i.tree ? (
        <TextLink to={paths.tree.href(i.tree.id)} className="font-bold">
          {i.tree.tag}
        </TextLink>
      ) : (
        ''
      ),
  },
];

/** Who recorded, corrected or changed what in the stand, and when: for the owner. */
export function AuditSection({ sugarbushId }: { sugarbushId: number }) {
  const [filters, setFilters] = useState<AuditFilters>({ page: 1 });
  const { unit } = useUnitSystem();
  const audit = useAudit(sugarbushId, filters);
  const pick = (patch: Partial<AuditFilters>) => setFilters((f) => ({ ...f, ...patch, page: 1 }));
  const people = audit.data?.people ?? [];

  let body;
  if (audit.isPending) body = <TableSkeleton rows={5} label="Loading the record of changes" />;
  else if (audit.isError)
    body = (
      <ErrorState
        title="We couldn't load the record of changes."
        error={audit.error}
        onRetry={() => void audit.refetch()}
      />
    );
  else if (audit.data.total === 0)
    body = (
      <EmptyState title="Nothing recorded here yet">
        Each measurement, taphole, note and change to the stand shows here with who made it.
      </EmptyState>
    );
  else
    body = (
      <>
        <DataTable
          label="Record of changes"
          columns={columns(unit)}
          rows={audit.data.items}
          rowKey={(i) => i.id}
          stale={audit.isPlaceholderData}
        />
        <Pager
          label="Pages of the record"
          list={audit.data}
          onPage={(page) => setFilters((f) => ({ ...f, page }))}
        />
      </>
    );

  return (
    <section aria-labelledby="audit-heading" className="print:hidden">
      <h2 id="audit-heading" className="text-lg font-bold">
        Who changed what
      </h2>
      <p className="mb-3 max-w-prose text-sm text-bark">
        Every recording, correction and change in the stand, newest first. Only owners see this.
      </p>
      <div className="mb-3 grid grid-cols-2 gap-3 sm:grid-cols-3">
        <SelectField
          label="Kind"
          all="Everything"
          value={filters.kind}
          options={auditKinds.map((k) => ({ value: k, label: auditKindLabels[k] ?? k }))}
          onChange={(kind) => pick({ kind })}
        />
        <SelectField
          label="Person"
          all="Everyone"
          value={filters.userId === undefined ? undefined : String(filters.userId)}
          options={people.map((p) => ({ value: String(p.id), label: p.name }))}
          onChange={(id) => pick({ userId: id === undefined ? undefined : Number(id) })}
        />
      </div>
      {body}
    </section>
  );
}
