import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router';
import { HazardNotice } from '@/components/hazard-notice';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { AdviceCard, type AdvisedSpot } from '@/features/advice/components/advice-card';
import { DiameterHistory } from '@/features/measurements/components/diameter-history';
import { MeasurementForm } from '@/features/measurements/components/measurement-form';
import { TreeNoteForm, TreeNotes } from '@/features/notes/components/tree-notes';
import { TapholeForm, type SpotRequest } from '@/features/tapholes/components/taphole-form';
import { TapholeList } from '@/features/tapholes/components/taphole-list';
import { TappingCaution } from '@/features/trees/components/tapping-caution';
import { TreeHeader } from '@/features/trees/components/tree-header';
import { isApiError } from '@/lib/api-client';
import { can, useRole } from '@/lib/auth';
import { useTree } from '@/lib/get-tree';
import { treeAdviceQueryOptions } from '@/lib/get-tree-advice';
import { parseSeason } from '@/lib/season';

export function TreeRoute() {
  const { treeId: param } = useParams();
  const treeId = Number(param);
  const valid = Number.isInteger(treeId) && treeId > 0;
  const tree = useTree(valid ? treeId : undefined);
  const role = useRole(tree.data?.sugarbushId);
  const [search] = useSearchParams();
  // The advice card's own query: its hazards are the tree's open hazard notes.
  const advice = useQuery({
    ...treeAdviceQueryOptions(treeId, parseSeason(search.get('season'))),
    enabled: valid,
  });
  // "Use this spot" on the advice card fills the taphole form; each click counts as a new request.
  const [spot, setSpot] = useState<SpotRequest>();
  const fillSpot = (next: AdvisedSpot) =>
    setSpot((prev) => ({ ...next, seq: (prev?.seq ?? 0) + 1 }));

  if (!valid || (tree.isError && isApiError(tree.error) && tree.error.status === 404)) {
    return (
      <EmptyState title="We couldn't find this tree">
        It may have been removed, or it belongs to a sugarbush you are not part of.{' '}
        <Link to={paths.home.href()} className="underline underline-offset-4">
          Back to your trees
        </Link>
      </EmptyState>
    );
  }
  if (tree.isError) {
    return (
      <ErrorState
        title="We couldn't load this tree."
        error={tree.error}
        onRetry={() => void tree.refetch()}
      />
    );
  }
  if (tree.isPending) {
    return (
      <div role="status" aria-label="Loading tree" className="flex flex-col gap-4">
        <Skeleton className="h-10 w-1/3" />
        <Skeleton className="h-16 w-full" />
        <Skeleton className="h-64 w-full" />
      </div>
    );
  }

  const canRecord = can(role, 'record-measurements');
  const canTap = can(role, 'record-tapholes');
  const canWriteNotes = can(role, 'write-notes');
  return (
    <>
      <title>{`Tree ${tree.data.tag} · Clearwood`}</title>
      <TreeHeader tree={tree.data} />
      {/* A hazard at the tree is read before any drilling advice. */}
      <HazardNotice hazards={advice.data?.hazards} className="mb-6 text-base" />
      <div className="grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        {/* On a phone the work comes first: the advice, then the form; the record follows. */}
        <div className="flex min-w-0 flex-col gap-6 lg:order-2">
          {/* Whoever drills sees the caution beside the taphole form rather than inside the advice. */}
          <AdviceCard
            treeId={treeId}
            caution={canTap ? undefined : <TappingCaution />}
            onUseSpot={canTap ? fillSpot : undefined}
          />
          {canTap && (
            <>
              <TappingCaution />
              <TapholeForm treeId={treeId} sugarbushId={tree.data.sugarbushId} spot={spot} />
            </>
          )}
          {canRecord && <MeasurementForm treeId={treeId} />}
          {canWriteNotes && <TreeNoteForm treeId={treeId} />}
        </div>
        <div className="flex min-w-0 flex-col gap-8 lg:order-1">
          <DiameterHistory treeId={treeId} canRecord={canRecord} />
          <TapholeList treeId={treeId} />
          <TreeNotes treeId={treeId} tag={tree.data.tag} canWrite={canWriteNotes} />
        </div>
      </div>
    </>
  );
}
