import { Link } from 'react-router';
import type { PlanItem } from '@shared/schemas/plan';
import { HazardNotice } from '@/components/hazard-notice';
import { DataTable, type Column, type TableSort } from '@/components/ui/data-table';
import { VerdictBadge } from '@/components/verdict-badge';
import { WarningChip } from '@/components/warning-chip';
import { paths } from '@/config/paths';
import { shortPlacements, formatShare } from '@/lib/advice-words';
import { seasonParam } from '@/lib/season';
import { formatDbh, lengthUnitOf, type UnitSystem } from '@/lib/units';

/** A warning that says no more than the verdict beside it is left out of the row. */
const repeatsVerdict: Partial<Record<PlanItem['verdict'], string>> = {
  'too-small': 'undersized',
  unmeasured: 'no-measurement',
};

const columns = (season: number, system: UnitSystem): Column<PlanItem>[] => {
  const unit = lengthUnitOf(system);
  return [
    {
      key: 'tag',
      header: 'Tag',
      sortField: 'tag',
      cell: (item) => (
        <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
          <Link
            to={paths.tree.href(item.treeId, { season: seasonParam(season) })}
            className="font-bold underline underline-offset-4"
          >
            {item.tag}
          </Link>
          {(item.hazards?.length ?? 0) > 0 && (
            <span className="rounded bg-alert px-1 text-xs font-bold text-paper print:border print:border-ink print:bg-transparent print:text-ink">
              Hazard
            </span>
          )}
        </span>
      ),
    },
    {
      key: 'dbh',
      header: `DBH (${unit})`,
      sortField: 'dbh',
      align: 'right',
      cell: (item) => formatDbh(item.dbhCm, unit),
    },
    {
      key: 'verdict',
      header: 'Verdict',
      cell: (item) => <VerdictBadge verdict={item.verdict} letterOnlyOnPhone />,
    },
    { key: 'taps', header: 'Taps', sortField: 'taps', align: 'right', cell: (item) => item.taps },
    {
      key: 'where',
      header: 'Where to drill',
      className: 'whitespace-nowrap',
      cell: (item) => (item.placements.length ? shortPlacements(item.placements, system) : '—'),
    },
    {
      key: 'share',
      header: 'Clear share',
      sortField: 'share',
      align: 'right',
      // Only a tree the guideline taps has a tapping zone worth a figure.
      cell: (item) => (item.tableTaps > 0 ? formatShare(item.conductiveShare) : '—'),
    },
    {
      key: 'warnings',
      header: 'Warnings',
      className: 'min-w-48',
      cell: (item) => {
        const codes = [...new Set(item.warnings.map((w) => w.code))].filter(
          (code) => code !== repeatsVerdict[item.verdict],
        );
        return codes.length === 0 ? null : (
          <ul className="flex flex-wrap gap-1">
            {codes.map((code) => (
              <li key={code}>
                <WarningChip code={code} />
              </li>
            ))}
          </ul>
        );
      },
    },
  ];
};

export function SeasonPlanTable({
  items,
  season,
  system,
  sort,
  onSort,
  stale,
}: {
  items: PlanItem[];
  season: number;
  system: UnitSystem;
  sort: TableSort;
  onSort: (field: string) => void;
  stale: boolean;
}) {
  return (
    <DataTable
      label="Season plan"
      columns={columns(season, system)}
      rows={items}
      rowKey={(item) => item.treeId}
      sort={sort}
      onSort={onSort}
      stale={stale}
      // A hazard at the tree is read before its drilling advice.
      rowLead={(item) =>
        item.hazards?.length ? <HazardNotice hazards={item.hazards} tag={item.tag} /> : null
      }
      rowClassName={(item) =>
        item.verdict === 'retired'
          ? 'text-bark print:break-inside-avoid'
          : 'print:break-inside-avoid'
      }
    />
  );
}
