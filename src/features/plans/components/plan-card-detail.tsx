import { TrunkDiagram } from '@/components/trunk-diagram';
import { ErrorState } from '@/components/ui/error-state';
import { Skeleton } from '@/components/ui/skeleton';
import { useTreeDrilling } from '@/lib/use-tree-drilling';
import type { UnitSystem } from '@/lib/units';
import { markSpot } from '@/lib/trunk-holes';
import { DrilledHoleForm } from './drilled-hole-form';

/**
 * An opened plan card: the tree's holes this season, its trunk with every earlier hole and the
 * advised spots, and (for those who record tapholes) the drilled-hole form.
 */
export function PlanCardDetail({
  treeId,
  tag,
  season,
  sugarbushId,
  system,
  recording,
}: {
  treeId: number;
  tag: string;
  season: number;
  sugarbushId: number;
  system: UnitSystem;
  recording: boolean;
}) {
  const drilling = useTreeDrilling(treeId, sugarbushId, season);
  const advice = drilling.advice.data;

  if (drilling.isError)
    return (
      <ErrorState
        title={`We couldn't load the holes of tree ${tag}.`}
        error={drilling.advice.error ?? drilling.tapholes.error}
        onRetry={() => void drilling.refetch()}
      />
    );
  if (drilling.isPending || !advice || !drilling.marks || !drilling.rules)
    return (
      <div role="status" aria-label={`Loading the holes of tree ${tag}`}>
        <Skeleton className="h-48 w-full" />
      </div>
    );

  return (
    <div className="flex flex-col gap-3">
      {drilling.seasonHoles.length > 0 && (
        <section aria-label={`Drilled in ${season}`} className="rounded bg-moss/10 px-3 py-2">
          <h4 className="text-sm font-bold text-moss">
            <span aria-hidden="true">✓ </span>Drilled in {season}
          </h4>
          <ul className="text-sm">
            {drilling.seasonHoles.map((h) => (
              <li key={h.id}>{markSpot(h, system)}</li>
            ))}
          </ul>
        </section>
      )}
      <TrunkDiagram
        marks={drilling.marks}
        season={season}
        heightBand={advice.profile.heightBand}
        dbhCm={advice.dbhCm}
        stainLengthCm={advice.profile.stainLengthCm}
        stainMarginCm={advice.profile.stainMarginCm}
        system={system}
        tag={tag}
        // On a phone the list of every hole opens on request, below the drawing.
        listOpen={false}
      />
      {recording && (
        <DrilledHoleForm
          // A new unit starts the form afresh in that unit.
          key={system}
          treeId={treeId}
          tag={tag}
          season={season}
          advice={advice}
          holes={drilling.tapholes.data?.items ?? []}
          rules={drilling.rules}
          system={system}
        />
      )}
    </div>
  );
}
