import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { can, useRole } from '@/lib/auth';
import { formatDate, formatNumber, useUnitSystem } from '@/lib/units';
import { useIssuedPlan } from '../api/get-issued-plan';
import { useIssuePlan } from '../api/issue-plan';
import { PlanChangeList } from './plan-change-list';

/** What issuing does, said before the owner does it. */
function IssueConfirm({
  season,
  version,
  busy,
  error,
  onConfirm,
  onCancel,
}: {
  season: number;
  version: number;
  busy: boolean;
  error: Error | null;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  return (
    <div
      role="group"
      aria-labelledby="issue-confirm-heading"
      className="mt-3 rounded border border-bark/40 bg-paper px-4 py-3"
    >
      <p id="issue-confirm-heading" className="font-bold">
        Issue the {season} plan to the crew as version {version}?
      </p>
      <p className="mt-1 max-w-prose text-sm">
        This keeps a copy of the plan exactly as it reads now: every tree’s taps, where to drill,
        bit and depth, and the open hazard notes. The crew prints and works from that copy. Later
        measurements, tapholes or a new guideline never change it: they show here as changes since
        it was issued, until you issue again.
        {version > 1 ? ' Earlier versions are kept.' : ''}
      </p>
      {error && (
        <p role="alert" className="mt-2 text-sm font-bold text-alert">
          The plan was not issued: {error.message}
        </p>
      )}
      <div className="mt-3 flex flex-wrap gap-3">
        <Button variant="primary" block disabled={busy} onClick={onConfirm}>
          {busy ? 'Issuing…' : `Issue version ${version}`}
        </Button>
        <Button block disabled={busy} onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </div>
  );
}

/**
 * Whether the season's plan was issued to the crew, when, by whom and which version, and what
 * changed since; the owner issues it (again) from here.
 */
export function IssuePanel({ sugarbushId, season }: { sugarbushId: number; season: number }) {
  const [changesPage, setChangesPage] = useState(1);
  const [confirming, setConfirming] = useState(false);
  const issued = useIssuedPlan(sugarbushId, season, changesPage);
  const issue = useIssuePlan(sugarbushId);
  const mayIssue = can(useRole(sugarbushId), 'issue-plan');
  const { system } = useUnitSystem();

  const body = () => {
    if (issued.isPending)
      return (
        <div role="status" aria-label="Loading the issued plan">
          <Skeleton className="h-12 w-full" />
        </div>
      );
    if (issued.isError)
      return (
        <ErrorState
          title="We couldn't load the issued plan."
          error={issued.error}
          onRetry={() => void issued.refetch()}
        />
      );
    const data = issued.data;
    if (!data)
      return (
        <p className="text-sm">
          Not issued yet: the crew sees today’s advice, which moves with every new reading.
          {mayIssue ? ' Issue it when the plan is ready, so everyone works from one copy.' : ''}
        </p>
      );
    const { plan, changes } = data;
    return (
      <>
        <p>
          Issued to the crew on {formatDate(plan.issuedAt)} by{' '}
          {plan.issuedBy.name || 'a former member'} — version {plan.version},{' '}
          {formatNumber(plan.totals.taps)} taps on {formatNumber(plan.totals.treesToTap)} trees,
          guideline {plan.profile.label}.
        </p>
        <h3 className="mt-3 font-bold">Changes since it was issued</h3>
        <PlanChangeList changes={changes} season={season} system={system} onPage={setChangesPage} />
      </>
    );
  };

  const nextVersion = (issued.data?.latestVersion ?? 0) + 1;
  return (
    <section
      aria-labelledby="issued-plan-heading"
      className="mb-4 rounded border border-rule px-4 py-3 print:hidden"
    >
      <h2 id="issued-plan-heading" className="font-bold">
        The crew’s copy
      </h2>
      {body()}
      {mayIssue && issued.isSuccess && !confirming && (
        <div className="mt-3">
          <Button block onClick={() => (issue.reset(), setConfirming(true))}>
            {issued.data ? 'Issue again' : 'Issue this plan to the crew'}
          </Button>
        </div>
      )}
      {mayIssue && confirming && (
        <IssueConfirm
          season={season}
          version={nextVersion}
          busy={issue.isPending}
          error={issue.error}
          onCancel={() => setConfirming(false)}
          onConfirm={() =>
            issue.mutate(
              { season },
              {
                onSuccess: () => {
                  setConfirming(false);
                  setChangesPage(1);
                },
              },
            )
          }
        />
      )}
      {issue.isSuccess && !confirming && (
        <p role="status" className="mt-2 text-sm">
          Version {issue.data.version} is issued.
        </p>
      )}
    </section>
  );
}
