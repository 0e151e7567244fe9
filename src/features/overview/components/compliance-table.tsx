import { Link } from 'react-router';
import type { ComplianceItem, ComplianceReading } from '@shared/schemas/compliance';
import { DataTable, type Column, type TableSort } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { formatDbh, formatPercent, type LengthUnit } from '@/lib/units';
import { findingLabels } from '../lib/finding-words';

function Findings({ reading }: { reading: ComplianceReading }) {
  if (reading.findings.length === 0) return <span className="text-bark">None</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {reading.findings.map((f) => (
        <li key={f}>
          <span aria-hidden="true" className="mr-1 font-bold text-alert">
            !
          </span>
          {findingLabels[f]}
        </li>
      ))}
    </ul>
  );
}

const allowed = (r: ComplianceReading) => (r.tapsAllowed === null ? '—' : String(r.tapsAllowed));

/** Tapped trees, what was set and what the guideline (and a second one) allowed. */
export function ComplianceTable({
  items,
  unit,
  compareLabel,
  sort,
  onSort,
  stale,
}: {
  items: ComplianceItem[];
  unit: LengthUnit;
  /** The second guideline's short name, when one is read beside the first. */
  compareLabel: string | null;
  sort?: TableSort;
  onSort?: (field: string) => void;
  stale?: boolean;
}) {
  const columns: Column<ComplianceItem>[] = [
    {
      key: 'tag',
      header: 'Tag',
      sortField: 'tag',
      className: 'whitespace-nowrap',
      cell: (i) => (
        <Link to={paths.tree.href(i.treeId)} className="font-bold underline underline-offset-4">
          {i.tag}
        </Link>
      ),
    },
    {
      key: 'dbh',
      header: `DBH before (${unit})`,
      sortField: 'dbh',
      align: 'right',
      cell: (i) => formatDbh(i.dbhBeforeCm, unit),
    },
    {
      key: 'crown',
      header: 'Crown before',
      align: 'right',
      className: 'hidden md:table-cell',
      cell: (i) => formatPercent(i.diebackBeforePct),
    },
    { key: 'set', header: 'Taps set', align: 'right', cell: (i) => String(i.tapsSet) },
    { key: 'allowed', header: 'Allowed', align: 'right', cell: allowed },
    {
      key: 'over',
      header: 'Over',
      sortField: 'over',
      align: 'right',
      cell: (i) => String(i.tapsOver),
    },
    {
      key: 'close',
      header: 'Too close',
      align: 'right',
      className: 'hidden sm:table-cell',
      cell: (i) => String(i.holesTooClose),
    },
    {
      key: 'findings',
      header: 'Findings',
      className: 'min-w-44',
      cell: (i) => <Findings reading={i} />,
    },
  ];
  if (compareLabel)
    columns.push(
      {
        key: 'compare-allowed',
        header: `Allowed, ${compareLabel}`,
        align: 'right',
        cell: (i) => (i.compare ? allowed(i.compare) : '—'),
      },
      {
        key: 'compare-findings',
        header: `Findings, ${compareLabel}`,
        className: 'min-w-44',
        cell: (i) => (i.compare ? <Findings reading={i.compare} /> : '—'),
      },
    );
  return (
    <DataTable
      label="Tapped trees against the guideline"
      columns={columns}
      rows={items}
      rowKey={(i) => i.treeId}
      sort={sort}
      onSort={onSort}
      stale={stale}
    />
  );
}
