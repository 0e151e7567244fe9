import type { ReactNode } from 'react';
import { AdviceProgress } from '@/components/advice-progress';
import { SeasonStepper } from '@/components/season-stepper';
import { TreeListEmpty } from '@/components/tree-list-empty';
import { ErrorState } from '@/components/ui/error-state';
import { GuidelineNotice, RuleList } from '@/components/ui/guideline-rules';
import { PageHeader } from '@/components/ui/page-header';
import { Pager, pageRange } from '@/components/ui/pager';
import { Skeleton, TableSkeleton } from '@/components/ui/skeleton';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { can, useRole } from '@/lib/auth';
import { nextSort, toTableSort } from '@/lib/list-search-params';
import { formatNumber, useUnitSystem } from '@/lib/units';
import { useSeasonPlan } from '../api/get-season-plan';
import { FieldSheetLink } from './field-sheet-link';
import { IssuePanel } from './issue-panel';
import { PlanCards } from './plan-cards';
import { PlanFilterBar } from './plan-filters';
import { SeasonProgressBar } from './season-progress';
import { usePlanSearchParams } from './plan-search-params';
import { PlanTotalsStrip, PlanWarningSummary } from './plan-totals';
import { SeasonPlanTable } from './season-plan-table';
import { useWalkedPlan } from './walk-start';

/**
 * The season's plan for a whole stand: totals, then tree by tree how many taps and where.
 * Prints as a field sheet. `caution` is the safety box shown with the work.
 */
export function SeasonPlan({
  sugarbushId,
  standName,
  caution,
}: {
  sugarbushId: number;
  standName: string | undefined;
  caution?: ReactNode;
}) {
  const { filters: chosen, update } = usePlanSearchParams();
  // A phone shows cards, walked in order unless another order was picked.
  const { filters, cards } = useWalkedPlan(chosen);
  const { system } = useUnitSystem();
  const canRecord = can(useRole(sugarbushId), 'record-tapholes');
  const plan = useSeasonPlan(sugarbushId, filters);
  const filtered = Boolean(filters.q || filters.verdict || filters.warning || filters.share);
  const data = plan.data;

  const header = (
    <PageHeader
      title={`Season plan ${filters.season}`}
      subtitle={
        <div className="flex flex-col gap-0.5">
          <span>{standName ?? ' '}</span>
          {data && (
            <span className="text-sm">
              Guideline: {data.profile.label}
              <WhyDisclosure source={data.profile.source} label="Where this guideline comes from" />
            </span>
          )}
        </div>
      }
      actions={
        <div className="flex flex-wrap items-center gap-3">
          <SeasonStepper season={filters.season} onChange={(season) => update({ season })} />
          <UnitToggle />
          <FieldSheetLink sugarbushId={sugarbushId} filters={filters} />
        </div>
      }
    />
  );

  const filterBar = <PlanFilterBar filters={filters} onChange={update} />;

  if (plan.isPending) {
    return (
      <>
        {header}
        <AdviceProgress sugarbushId={sugarbushId} season={filters.season} waiting />
        <div role="status" aria-label="Loading the season plan">
          <Skeleton className="mb-4 h-20 w-full" />
          <TableSkeleton label="Loading plan rows" />
        </div>
      </>
    );
  }
  if (plan.isError || !data) {
    return (
      <>
        {header}
        <ErrorState
          title={`We couldn't load the plan for ${filters.season}.`}
          error={plan.error}
          onRetry={() => void plan.refetch()}
        />
      </>
    );
  }

  const { items, total, page, pageSize, totals } = data;
  const { first, last } = pageRange(page, pageSize, total);

  const list =
    total === 0 ? (
      <TreeListEmpty
        sugarbushId={sugarbushId}
        filtered={filtered}
        q={filters.q}
        onClear={() =>
          update({ q: undefined, verdict: undefined, warning: undefined, share: undefined })
        }
      />
    ) : (
      <>
        <p className="mb-2 hidden text-sm print:block">
          Field sheet · {standName} · season {filters.season} · rows {formatNumber(first)}–
          {formatNumber(last)} of {formatNumber(total)}
        </p>
        {cards ? (
          <PlanCards
            items={items}
            season={filters.season}
            system={system}
            sugarbushId={sugarbushId}
            canRecord={canRecord}
            filters={filters}
            onChange={update}
            stale={plan.isPlaceholderData}
          />
        ) : (
          <SeasonPlanTable
            items={items}
            season={filters.season}
            system={system}
            sort={toTableSort(filters.sort)}
            onSort={(field) => update({ sort: nextSort(filters.sort, field) })}
            stale={plan.isPlaceholderData}
          />
        )}
        <Pager label="Plan pages" list={data} onPage={(page) => update({ page })} />
      </>
    );

  return (
    <>
      {header}
      <SeasonProgressBar sugarbushId={sugarbushId} season={filters.season} />
      <IssuePanel key={filters.season} sugarbushId={sugarbushId} season={filters.season} />
      <GuidelineNotice notice={data.profile.notice} />
      {data.profile.seasonRules.length > 0 && (
        <section aria-labelledby="season-rules-heading" className="mb-4">
          <h2 id="season-rules-heading" className="font-bold">
            This season, by the guideline
          </h2>
          <RuleList rules={data.profile.seasonRules} label="Rules for the season" />
        </section>
      )}
      <PlanTotalsStrip totals={totals} />
      <PlanWarningSummary
        counts={totals.warningsByCode}
        active={filters.warning}
        onPick={(warning) => update({ warning })}
      />
      {filterBar}
      {list}
      {caution && <div className="mt-8">{caution}</div>}
    </>
  );
}
