import { useId, useState } from 'react';
import type { Measurement } from '@shared/schemas/measurement';
import { cn } from '@/components/ui/cn';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton, TableSkeleton } from '@/components/ui/skeleton';
import { formatDate, formatDbh, formatPercent, useUnitSystem } from '@/lib/units';
import { useMeasurements } from '../api/get-measurements';
import { DiameterHistoryChart } from './diameter-history-chart';

function HistoryTable({ rows, unit }: { rows: Measurement[]; unit: 'in' | 'cm' }) {
  return (
    <div className="overflow-x-auto">
      <table
        aria-label="Diameter history"
        className="w-full border-collapse text-left tabular-nums"
      >
        <thead>
          <tr className="border-b-2 border-ink/70 text-sm">
            <th scope="col" className="px-3 py-2">
              Date
            </th>
            <th scope="col" className="px-3 py-2">
              Season
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              DBH ({unit})
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Crown dieback
            </th>
            <th scope="col" className="px-3 py-2">
              Note
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((m) => (
            <tr
              key={m.id}
              className={cn('border-b border-rule', m.superseded && 'text-bark line-through')}
            >
              <td className="whitespace-nowrap px-3 py-2">
                {formatDate(m.measuredOn)}
                {m.superseded && <span className="sr-only"> (corrected by a later entry)</span>}
              </td>
              <td className="px-3 py-2">{m.season}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right">{formatDbh(m.dbhCm, unit)}</td>
              <td className="whitespace-nowrap px-3 py-2 text-right">
                {formatPercent(m.crownDiebackPct)}
              </td>
              <td className="max-w-prose px-3 py-2">{m.note ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The tree's measured record: a chart of what stands, and the table with corrections on request. */
export function DiameterHistory({ treeId, canRecord }: { treeId: number; canRecord: boolean }) {
  const measurements = useMeasurements(treeId);
  const { unit } = useUnitSystem();
  const [showCorrected, setShowCorrected] = useState(false);
  const headingId = useId();

  let body;
  if (measurements.isPending) {
    body = (
      <>
        <Skeleton className="h-64 w-full" />
        <TableSkeleton rows={4} label="Loading measurements" />
      </>
    );
  } else if (measurements.isError) {
    body = (
      <ErrorState
        title="We couldn't load this tree's measurements."
        error={measurements.error}
        onRetry={() => void measurements.refetch()}
      />
    );
  } else if (measurements.data.items.length === 0) {
    body = (
      <EmptyState title="No measurements yet">
        {canRecord
          ? 'Record the first DBH with the form on this page.'
          : 'DBH and crown ratings appear here once recorded.'}
      </EmptyState>
    );
  } else {
    const all = measurements.data.items;
    const standing = all.filter((m) => !m.superseded);
    const corrected = all.length - standing.length;
    const tableRows = [...(showCorrected ? all : standing)].reverse();
    body = (
      <>
        <DiameterHistoryChart rows={standing} unit={unit} />
        {corrected > 0 && (
          <label className="mt-3 inline-flex min-h-11 items-center gap-2 md:min-h-8">
            <input
              type="checkbox"
              checked={showCorrected}
              onChange={(e) => setShowCorrected(e.target.checked)}
              className="h-5 w-5 accent-sap"
            />
            Show corrected entries ({corrected})
          </label>
        )}
        <HistoryTable rows={tableRows} unit={unit} />
      </>
    );
  }

  return (
    <section aria-labelledby={headingId}>
      <h2 id={headingId} className="text-lg font-bold">
        Diameter history
      </h2>
      {body}
    </section>
  );
}
