import { Link } from 'react-router';
import { warningCodes } from '@shared/rules/index';
import type { AttentionReason } from '@shared/schemas/attention';
import { FOLLOW_UP_DUE_DAYS } from '@shared/schemas/note';
import { AdviceProgress } from '@/components/advice-progress';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { ListFilterBar } from '@/components/ui/list-filter-bar';
import type { FilterSelectSpec } from '@/components/ui/filter-selects';
import { Pager } from '@/components/ui/pager';
import { Skeleton } from '@/components/ui/skeleton';
import { TreeStatusLabel } from '@/components/tree-status-label';
import { VerdictBadge } from '@/components/verdict-badge';
import { paths } from '@/config/paths';
import { seasonParam } from '@/lib/season';
import { warningLabel } from '@/lib/warning-labels';
import { useAttention } from '../api/get-attention';
import type { AttentionFilters } from '../api/note-keys';
import { AttentionReasons } from './attention-reasons';
import { useAttentionSearchParams, type AttentionSort } from './attention-search-params';

const reasonLabels: Record<AttentionReason, string> = {
  hazard: 'Open hazard',
  overdue: 'Follow-up overdue',
  due: 'Follow-up due soon',
  warning: 'Advice warning',
};

const sortLabels: Record<Exclude<AttentionSort, 'priority'>, string> = {
  tag: 'Tag, A to Z',
  '-tag': 'Tag, Z to A',
  followUp: 'Follow-up soonest',
  '-followUp': 'Follow-up latest',
};

type Filters = Omit<AttentionFilters, 'page' | 'pageSize' | 'season'>;

const selects: FilterSelectSpec<Filters> = {
  reason: {
    label: 'Why',
    all: 'Every reason',
    options: (Object.keys(reasonLabels) as AttentionReason[]).map((r) => ({
      value: r,
      label: reasonLabels[r],
    })),
  },
  warning: {
    label: 'Warning',
    all: 'Any warning',
    options: warningCodes.map((c) => ({ value: c, label: warningLabel(c) })),
  },
  sort: {
    label: 'Order',
    all: 'Most pressing first',
    options: (Object.keys(sortLabels) as (keyof typeof sortLabels)[]).map((s) => ({
      value: s,
      label: sortLabels[s],
    })),
  },
};

/**
 * "Needs a look": the stand's trees with an open hazard, a follow-up overdue or coming due, or a
 * warning in this season's advice, most pressing first.
 */
export function AttentionQueue({ sugarbushId }: { sugarbushId: number }) {
  const { filters, update } = useAttentionSearchParams();
  const queue = useAttention(sugarbushId, filters);
  const shown = { ...filters, sort: filters.sort === 'priority' ? undefined : filters.sort };
  const filtered = Boolean(filters.q || filters.reason || filters.warning);

  let body;
  if (queue.isPending)
    body = (
      <>
        <AdviceProgress sugarbushId={sugarbushId} season={filters.season} waiting />
        <div role="status" aria-label="Loading the trees that need a look" className="space-y-3">
          <Skeleton className="h-16 w-full" />
          <Skeleton className="h-16 w-full" />
          <Skeleton className="h-16 w-full" />
        </div>
      </>
    );
  else if (queue.isError)
    body = (
      <ErrorState
        title="We couldn't load the trees that need a look."
        error={queue.error}
        onRetry={() => void queue.refetch()}
      />
    );
  else if (queue.data.total === 0)
    body = filtered ? (
      <EmptyState title="No trees match these filters">
        <Button
          variant="quiet"
          onClick={() => update({ q: undefined, reason: undefined, warning: undefined })}
        >
          Clear search and filters
        </Button>
      </EmptyState>
    ) : (
      <EmptyState title="Nothing needs a look">
        No open hazards, no follow-ups due and no warnings in the {queue.data.season} advice.
      </EmptyState>
    );
  else
    body = (
      <>
        <ul
          aria-label="Trees that need a look"
          aria-busy={queue.isPlaceholderData || undefined}
          className="divide-y divide-rule border-y border-rule"
        >
          {queue.data.items.map((item) => (
            <li key={item.treeId} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-start">
              <div className="flex min-w-40 items-center gap-3">
                <Link
                  to={paths.tree.href(item.treeId, { season: seasonParam(queue.data.season) })}
                  className="text-lg font-bold underline underline-offset-4"
                >
                  {item.tag}
                </Link>
                {item.verdict && <VerdictBadge verdict={item.verdict} letterOnlyOnPhone />}
              </div>
              <div className="flex flex-1 flex-col gap-1">
                <AttentionReasons item={item} />
                {item.status !== 'active' && (
                  <span className="text-sm">
                    <TreeStatusLabel status={item.status} />
                  </span>
                )}
              </div>
            </li>
          ))}
        </ul>
        <Pager label="Needs-a-look pages" list={queue.data} onPage={(page) => update({ page })} />
      </>
    );

  return (
    <section aria-labelledby="needs-a-look-heading" className="mb-10">
      <h2 id="needs-a-look-heading" className="mb-1 text-lg font-bold">
        Needs a look
      </h2>
      <p className="mb-3 max-w-prose text-sm text-bark">
        Trees with an open hazard, a follow-up overdue or due within {FOLLOW_UP_DUE_DAYS} days, or a
        warning in the advice for {filters.season}.
      </p>
      <ListFilterBar
        filters={shown}
        selects={selects}
        onChange={(patch, options) =>
          update(
            { ...patch, ...('sort' in patch ? { sort: patch.sort ?? 'priority' } : {}) },
            options,
          )
        }
        className="lg:grid-cols-4"
      />
      {body}
    </section>
  );
}
