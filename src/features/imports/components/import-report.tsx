import type { ImportResult } from '@shared/schemas/imports';
import { formatNumber } from '@/lib/units';

/** Rows of the error list shown at once; the count says how many more there are. */
const SHOWN = 200;

/** What a check found: how many rows are new or already on record, and every row that is wrong. */
export function ImportReport({ report, stale }: { report: ImportResult; stale: boolean }) {
  const { errors, warnings } = report;
  const rowWord = report.source === 'gpx' ? 'Waypoint' : 'Row';
  return (
    <section aria-labelledby="import-report" className="flex flex-col gap-3">
      <h2 id="import-report" className="text-lg font-bold">
        What the check found
      </h2>
      {stale && (
        <p role="status" className="text-bark">
          The mapping changed since this check: check the file again before importing.
        </p>
      )}
      <p>
        {formatNumber(report.rows)}{' '}
        {report.source === 'gpx'
          ? report.rows === 1
            ? 'waypoint'
            : 'waypoints'
          : report.rows === 1
            ? 'row'
            : 'rows'}{' '}
        read: {formatNumber(report.created)} new
        {report.updated > 0 ? `, ${formatNumber(report.updated)} to update` : ''},{' '}
        {formatNumber(report.unchanged)} already on record.
      </p>
      {errors.length === 0 ? (
        <p className="font-bold">
          {report.created + report.updated > 0
            ? 'Every row can be imported.'
            : 'Nothing to import: every row is already on record.'}
        </p>
      ) : (
        <>
          <p role="alert" className="font-bold text-alert">
            {formatNumber(errors.length)} {errors.length === 1 ? 'problem' : 'problems'} to fix in
            the file or the mapping. Nothing is imported until every row can be.
          </p>
          <div className="overflow-x-auto">
            <table className="min-w-full border-collapse text-sm">
              <caption className="sr-only">Rows that cannot be imported</caption>
              <thead>
                <tr className="border-b border-rule text-left">
                  <th scope="col" className="p-2">
                    {rowWord}
                  </th>
                  <th scope="col" className="p-2">
                    Column
                  </th>
                  <th scope="col" className="p-2">
                    What is wrong
                  </th>
                </tr>
              </thead>
              <tbody>
                {errors.slice(0, SHOWN).map((e, i) => (
                  <tr key={i} className="border-b border-rule/60 align-top">
                    <td className="p-2 tabular-nums">{e.row}</td>
                    <td className="p-2">{e.column ?? '—'}</td>
                    <td className="p-2">{e.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {errors.length > SHOWN && (
            <p className="text-bark">…and {formatNumber(errors.length - SHOWN)} more.</p>
          )}
        </>
      )}
      {warnings.length > 0 && (
        <div className="flex flex-col gap-2">
          <h3 className="font-bold">
            {formatNumber(warnings.length)} {warnings.length === 1 ? 'row' : 'rows'} to look at
            (they can be imported)
          </h3>
          <ul className="flex flex-col gap-1 text-sm">
            {warnings.slice(0, SHOWN).map((w, i) => (
              <li key={i}>
                {rowWord} {w.row}: {w.message}
              </li>
            ))}
          </ul>
          {warnings.length > SHOWN && (
            <p className="text-bark">…and {formatNumber(warnings.length - SHOWN)} more.</p>
          )}
        </div>
      )}
    </section>
  );
}
