import type { Taphole } from '@shared/schemas/taphole';
import { DataTable, type Column } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { TableSkeleton } from '@/components/ui/skeleton';
import { formatBit, formatDate, formatLength, useUnitSystem, type LengthUnit } from '@/lib/units';
import { useTapholes } from '@/lib/get-tapholes';
import { collectionLabels } from '@/lib/collection-labels';

const compass = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'];
/** 200 → "200° SW". */
export const formatAzimuth = (deg: number) =>
  `${Math.round(deg)}° ${compass[Math.round(deg / 45) % compass.length]}`;

/** "Mar 5" when drilled in the season's own year, else the whole date. */
const drillDate = (iso: string, season: number) => {
  const full = formatDate(iso);
  return iso.startsWith(`${season}-`) ? full.replace(/, \d{4}$/, '') : full;
};

const columns = (unit: LengthUnit): Column<Taphole>[] => [
  {
    key: 'season',
    header: 'Season',
    cell: (t) => (
      <>
        {t.season}
        {t.drilledOn && (
          <span className="block text-sm text-bark">
            <span className="sr-only">drilled </span>
            {drillDate(t.drilledOn, t.season)}
          </span>
        )}
      </>
    ),
  },
  {
    key: 'height',
    header: 'Height',
    align: 'right',
    cell: (t) => formatLength(t.heightCm, unit, 0),
  },
  { key: 'azimuth', header: 'Azimuth', align: 'right', cell: (t) => formatAzimuth(t.azimuthDeg) },
  {
    key: 'depth',
    header: 'Depth',
    align: 'right',
    cell: (t) => formatLength(t.depthCm, unit, unit === 'in' ? 2 : 1),
  },
  { key: 'bit', header: 'Bit', align: 'right', cell: (t) => formatBit(t.bitCm, unit) },
  { key: 'collection', header: 'Collection', cell: (t) => collectionLabels[t.collection] },
  {
    key: 'stain',
    header: 'Stain',
    cell: (t) => (t.stainHit === true ? 'Hit' : t.stainHit === false ? 'No' : '—'),
  },
];

/** Every hole drilled in this tree, newest season first. */
export function TapholeList({ treeId }: { treeId: number }) {
  const tapholes = useTapholes(treeId);
  const { unit } = useUnitSystem();

  let body;
  if (tapholes.isPending) body = <TableSkeleton rows={3} label="Loading tapholes" />;
  else if (tapholes.isError)
    body = (
      <ErrorState
        title="We couldn't load this tree's tapholes."
        error={tapholes.error}
        onRetry={() => void tapholes.refetch()}
      />
    );
  else if (tapholes.data.items.length === 0)
    body = <EmptyState title="No tapholes recorded for this tree yet" />;
  else {
    const rows = [...tapholes.data.items].sort((a, b) => b.season - a.season || a.id - b.id);
    body = <DataTable label="Tapholes" columns={columns(unit)} rows={rows} rowKey={(t) => t.id} />;
  }

  return (
    <section aria-labelledby="tapholes-heading">
      <h2 id="tapholes-heading" className="mb-2 text-lg font-bold">
        Tapholes
      </h2>
      {body}
    </section>
  );
}
