import { useSearchParams } from 'react-router';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { TableSkeleton } from '@/components/ui/skeleton';
import { TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { formatDate, formatNumber, useUnitSystem } from '@/lib/units';
import { useCompliance } from '../api/get-compliance';
import type { ComplianceFilters } from '../api/overview-keys';
import { ComplianceTable } from './compliance-table';
import { ComplianceTotalsTable, complianceSentence } from './compliance-totals';
import { shortLabel } from './compliance-section';
import { ReportCautions } from './report-cautions';

/** The most trees a printed report lists; the CSV has them all. */
const LISTED = 500;

/**
 * A season's compliance as a page to print and attach to a lease review: the stand, the season,
 * the guideline with its source, the day it was made, the totals, every tree with a finding,
 * and the cautions.
 */
export function ComplianceReport({ sugarbushId }: { sugarbushId: number }) {
  const [params] = useSearchParams();
  const season = Number(params.get('season'));
  const filters: ComplianceFilters = {
    page: 1,
    pageSize: LISTED,
    season: Number.isInteger(season) && season > 0 ? season : undefined,
    profile: params.get('profile') ?? undefined,
    compare: params.get('compare') ?? undefined,
    finding: 'any',
  };
  const { unit } = useUnitSystem();
  const report = useCompliance(sugarbushId, filters);

  if (report.isPending) return <TableSkeleton label="Loading the report" />;
  if (report.isError)
    return (
      <ErrorState
        title="We couldn't make the report."
        error={report.error}
        onRetry={() => void report.refetch()}
      />
    );
  const r = report.data;
  const back = paths.overview.href(sugarbushId, {
    season: r.season,
    profile: filters.profile,
    compare: filters.compare,
  });
  return (
    <article aria-labelledby="report-title">
      <header className="mb-4 border-b border-rule pb-3">
        <h1 id="report-title" className="text-xl font-bold">
          Tapping against the guideline, season {r.season}
        </h1>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="font-bold">Stand</dt>
          <dd>{r.sugarbush.name}</dd>
          <dt className="font-bold">Season</dt>
          <dd>{r.season}</dd>
          <dt className="font-bold">Guideline</dt>
          <dd>
            {r.profile.label}. Tap table: {r.profile.source}. Spacing: {r.profile.spacingSource}.
          </dd>
          {r.compare && (
            <>
              <dt className="font-bold">Beside it</dt>
              <dd>
                {r.compare.label}. Tap table: {r.compare.source}. Spacing: {r.compare.spacingSource}
                .
              </dd>
            </>
          )}
          <dt className="font-bold">Made on</dt>
          <dd>{formatDate(r.madeOn)}</dd>
        </dl>
        <div className="mt-3 flex flex-wrap gap-3 print:hidden">
          <Button variant="primary" onClick={() => window.print()}>
            Print
          </Button>
          <TextLink to={back}>Back to the overview</TextLink>
        </div>
      </header>
      <p className="max-w-prose">{complianceSentence(r.season, r.totals)}.</p>
      <p className="mt-1 max-w-prose text-sm">
        Taps allowed are the table’s at the DBH measured before the season (one where the holes were
        drilled for 7/16 in spouts); a tree is declining when its last crown rating before the
        season was over {r.profile.diebackLimitPct} % dieback.
        {r.compare && r.treesChanged !== null
          ? ` Under ${r.compare.label}, ${formatNumber(r.treesChanged)} of the tapped trees read differently.`
          : ''}
      </p>
      <div className="mt-4">
        <ComplianceTotalsTable
          totals={r.totals}
          label={shortLabel(r.profile.label)}
          compare={
            r.compare && r.compareTotals
              ? { totals: r.compareTotals, label: shortLabel(r.compare.label) }
              : null
          }
        />
      </div>
      <h2 className="mt-6 font-bold">Trees with a finding</h2>
      {r.total === 0 ? (
        <p className="mt-1">No tapped tree has a finding.</p>
      ) : (
        <>
          {r.total > r.items.length && (
            <p className="mt-1 text-sm">
              The first {formatNumber(r.items.length)} of {formatNumber(r.total)}, by tag; the CSV
              lists them all.
            </p>
          )}
          <ComplianceTable
            items={r.items}
            unit={unit}
            compareLabel={r.compare ? shortLabel(r.compare.label) : null}
          />
        </>
      )}
      <div className="mt-6">
        <ReportCautions />
      </div>
    </article>
  );
}
