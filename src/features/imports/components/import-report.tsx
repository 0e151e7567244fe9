import { REPORTED_ROWS, type ImportResult, type ImportRowError } from '@shared/schemas/imports';
import { formatNumber } from '@/lib/units';

const problems = (n: number) => `${formatNumber(n)} ${n === 1 ? 'problem' : 'problems'}`;

/**
 * Where an entry is: a spreadsheet row's number; a waypoint's number in the file and its name;
 * for a GPX, "whole file" for a problem of no one waypoint.
 */
export function entryPlace(e: ImportRowError, gpx: boolean): string {
  if (!gpx) return String(e.row);
  if (e.row === 0) return 'whole file';
  return e.waypoint ? `${e.row} “${e.waypoint}”` : `${e.row} (no name)`;
}

/**
 * What a check found: how many rows are new or already on record, and the rows that are wrong —
 * the first `REPORTED_ROWS` of them, with the count of all when there are more.
 */
export function ImportReport({ report, stale }: { report: ImportResult; stale: boolean }) {
  const { errors, warnings } = report;
  const gpx = report.source === 'gpx';
  const rowWord = gpx ? 'Waypoint' : 'Row';
  const errorsCut = errors.length < report.totalErrors;
  const warningsCut = warnings.length < report.totalWarnings;
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
      {report.totalErrors === 0 ? (
        <p className="font-bold">
          {report.created + report.updated > 0
            ? 'Every row can be imported.'
            : 'Nothing to import: every row is already on record.'}
        </p>
      ) : (
        <>
          <p role="alert" className="font-bold text-alert">
            {problems(report.totalErrors)} to fix in the file or the mapping
            {report.rowsWithErrors > 1
              ? `, in ${formatNumber(report.rowsWithErrors)} ${gpx ? 'waypoints' : 'rows'}`
              : ''}
            . Nothing is imported until every row can be.
          </p>
          {errorsCut && (
            <p className="text-bark">
              Showing the first {formatNumber(errors.length)} of {problems(report.totalErrors)}{' '}
              (those of the first {formatNumber(REPORTED_ROWS)} {gpx ? 'waypoints' : 'rows'} with
              one). Fix these and check again to see the rest.
            </p>
          )}
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
                {errors.map((e, i) => (
                  <tr key={i} className="border-b border-rule/60 align-top">
                    <td className="p-2 tabular-nums">{entryPlace(e, gpx)}</td>
                    <td className="p-2">{e.column ?? '—'}</td>
                    <td className="p-2">{e.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      {warnings.length > 0 && (
        <div className="flex flex-col gap-2">
          <h3 className="font-bold">
            {formatNumber(report.totalWarnings)}{' '}
            {gpx
              ? report.totalWarnings === 1
                ? 'waypoint'
                : 'waypoints'
              : report.totalWarnings === 1
                ? 'row'
                : 'rows'}{' '}
            to look at (they can be imported)
          </h3>
          <ul className="flex flex-col gap-1 text-sm">
            {warnings.map((w, i) => (
              <li key={i}>
                {rowWord} {entryPlace(w, gpx)}: {w.message}
              </li>
            ))}
          </ul>
          {warningsCut && (
            <p className="text-bark">
              Showing the first {formatNumber(warnings.length)} of{' '}
              {formatNumber(report.totalWarnings)}.
            </p>
          )}
        </div>
      )}
    </section>
  );
}
