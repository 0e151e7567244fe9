import { useCallback } from 'react';
import { profiles, isProfileKey } from '@shared/rules/index';
import { upcomingSeason } from '@shared/schemas/plan';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { SelectField } from '@/components/ui/select-field';
import { TableSkeleton } from '@/components/ui/skeleton';
import { TagSearch } from '@/components/ui/tag-search';
import { TextLink } from '@/components/ui/text-link';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { paths } from '@/config/paths';
import { useSugarbush } from '@/lib/get-sugarbush';
import { nextSort, toTableSort } from '@/lib/list-search-params';
import { useUnitSystem } from '@/lib/units';
import { complianceCsvUrl, useCompliance } from '../api/get-compliance';
import { useTrends } from '../api/get-trends';
import type { ComplianceFilters } from '../api/overview-keys';
import { findingFilter, guidelineOptions } from '../lib/finding-words';
import { useComplianceSearchParams } from './compliance-search-params';
import { ComplianceTable } from './compliance-table';
import { ComplianceTotalsTable, complianceSentence } from './compliance-totals';

/** "Conservative" from "Conservative (one tap from 12 in, two from 18 in)". */
export const shortLabel = (label: string) => label.replace(/\s*\(.*\)$/, '');

/** The seasons a report can be read for: those with taps recorded, newest first. */
function useTappedSeasons(sugarbushId: number) {
  const trends = useTrends(sugarbushId);
  const seasons = (trends.data?.items ?? [])
    .filter((i) => !i.planned && i.tapsSet > 0)
    .map((i) => i.season)
    .reverse();
  return { seasons, pending: trends.isPending };
}

/** Whether a past season's tapping kept to a guideline, tree by tree, and beside a second one. */
export function ComplianceSection({ sugarbushId }: { sugarbushId: number }) {
  const { filters: params, update } = useComplianceSearchParams();
  const { unit } = useUnitSystem();
  const stand = useSugarbush(sugarbushId);
  const tapped = useTappedSeasons(sugarbushId);
  const season = params.season ?? tapped.seasons[0] ?? upcomingSeason() - 1;
  // Left out, the guideline is the stand's own (the API's default too).
  const filters: ComplianceFilters = { ...params, season };
  const profile = params.profile ?? stand.data?.profile ?? 'conservative';
  const ready = !(params.season === undefined && tapped.pending);
  const report = useCompliance(sugarbushId, filters, ready);
  const onSearch = useCallback((q: string) => update({ q }, { replace: true }), [update]);
  const options = guidelineOptions(stand.data?.customProfile != null);
  const seasons = [...new Set([season, ...tapped.seasons])].sort((a, b) => b - a);
  const data = ready ? report.data : undefined;

  const controls = (
    <div className="grid grid-cols-1 gap-3 sm:grid-cols-3 print:hidden">
      <SelectField
        label="Season"
        value={String(season)}
        options={seasons.map((s) => ({ value: String(s), label: String(s) }))}
        onChange={(s) => update({ season: Number(s) })}
      />
      <SelectField
        label="Guideline"
        value={profile}
        options={options}
        onChange={(profile) => update({ profile })}
      />
      <SelectField
        label="Beside it"
        all="No second guideline"
        value={filters.compare}
        options={options.filter((o) => o.value !== profile)}
        onChange={(compare) => update({ compare, changed: undefined })}
      />
    </div>
  );

  let body;
  if (!data && (report.isPending || !ready)) body = <TableSkeleton label="Loading the report" />;
  else if (report.isError || !data)
    body = (
      <ErrorState
        title={`We couldn't load the report for ${season}.`}
        error={report.error}
        onRetry={() => void report.refetch()}
      />
    );
  else {
    const compareLabel = data.compare ? shortLabel(data.compare.label) : null;
    const report2 = {
      season: data.season,
      profile: filters.profile,
      compare: filters.compare,
    };
    body = (
      <>
        <p className="mt-3 max-w-prose">{complianceSentence(data.season, data.totals)}.</p>
        <div className="mt-1 flex flex-wrap items-center gap-x-4 text-sm">
          <span>Guideline: {data.profile.label}</span>
          <WhyDisclosure
            source={data.profile.source}
            notes={[`Spacing: ${data.profile.spacingSource}`]}
            label="Where it comes from"
          />
        </div>
        {data.compare && data.treesChanged !== null && (
          <p className="mt-1 max-w-prose text-sm">
            Under {data.compare.label}, {data.treesChanged} of the tapped trees read differently.
          </p>
        )}
        <div className="mt-3">
          <ComplianceTotalsTable
            totals={data.totals}
            label={shortLabel(data.profile.label)}
            compare={
              data.compare && data.compareTotals
                ? { totals: data.compareTotals, label: compareLabel! }
                : null
            }
          />
        </div>
        <div className="mt-4 flex flex-wrap gap-3 print:hidden">
          <a
            href={complianceCsvUrl(sugarbushId, filters)}
            download
            className="inline-flex min-h-11 items-center rounded border border-bark/40 px-4 hover:bg-frost md:min-h-9"
          >
            Download CSV
          </a>
          <TextLink to={paths.complianceReport.href(sugarbushId, report2)}>
            Printable report for a lease review
          </TextLink>
        </div>
        <div className="mt-4 grid grid-cols-1 gap-3 sm:grid-cols-3">
          <TagSearch value={filters.q ?? ''} onSearch={onSearch} />
          <SelectField
            {...findingFilter}
            value={filters.finding}
            onChange={(finding) => update({ finding })}
          />
          {data.compare && (
            <label className="inline-flex min-h-11 items-center gap-2 self-end md:min-h-9">
              <input
                type="checkbox"
                checked={filters.changed === true}
                onChange={(e) => update({ changed: e.target.checked || undefined })}
                className="h-5 w-5 accent-sap"
              />
              Only trees the two read differently
            </label>
          )}
        </div>
        {data.total === 0 ? (
          <EmptyState title="No tapped tree matches">
            <Button
              variant="quiet"
              onClick={() => update({ q: undefined, finding: undefined, changed: undefined })}
            >
              Show every tapped tree
            </Button>
          </EmptyState>
        ) : (
          <>
            <ComplianceTable
              items={data.items}
              unit={unit}
              compareLabel={compareLabel}
              sort={toTableSort(filters.sort ?? 'tag')}
              onSort={(field) => update({ sort: nextSort(filters.sort ?? 'tag', field) })}
              stale={report.isPlaceholderData}
            />
            <Pager label="Report pages" list={data} onPage={(page) => update({ page })} />
          </>
        )}
      </>
    );
  }

  const current =
    filters.profile && isProfileKey(filters.profile) ? profiles[filters.profile] : null;
  return (
    <section id="compliance" aria-labelledby="compliance-heading" className="scroll-mt-4">
      <h2 id="compliance-heading" className="mb-1 text-lg font-bold">
        Did the tapping keep to the guideline?
      </h2>
      <p className="mb-3 max-w-prose text-sm text-bark">
        Each tree tapped in a season, held against the taps the{' '}
        {current ? shortLabel(current.label).toLowerCase() : 'chosen'} table allowed at the DBH
        measured before that season, the spacing of its holes, and its size and crown then.
      </p>
      {controls}
      {body}
    </section>
  );
}
