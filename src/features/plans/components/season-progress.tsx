import { Button } from '@/components/ui/button';
import { Skeleton } from '@/components/ui/skeleton';
import { formatNumber } from '@/lib/units';
import { useSeasonProgress } from '../api/get-season-progress';

const plural = (n: number, one: string, many: string) =>
  `${formatNumber(n)} ${n === 1 ? one : many}`;

/** The season in the woods: taps drilled against taps planned, and trees done, in words too. */
export function SeasonProgressBar({
  sugarbushId,
  season,
}: {
  sugarbushId: number;
  season: number;
}) {
  const progress = useSeasonProgress(sugarbushId, season);
  if (progress.isPending)
    return (
      <div role="status" aria-label="Loading the season’s progress" className="mb-4">
        <Skeleton className="h-10 w-full max-w-md" />
      </div>
    );
  if (progress.isError)
    return (
      <p role="alert" className="mb-4 flex flex-wrap items-center gap-3 text-sm">
        We couldn’t load how far the tapping has come.
        <Button variant="quiet" onClick={() => void progress.refetch()}>
          Retry
        </Button>
      </p>
    );
  const p = progress.data;
  const share =
    p.plannedTaps > 0 ? Math.min(100, Math.round((p.drilledTaps / p.plannedTaps) * 100)) : 0;
  const from =
    p.plannedFrom === 'issued'
      ? `Planned as issued to the crew (version ${p.issuedVersion}).`
      : 'Planned from today’s advice: no plan has been issued for this season.';
  return (
    <section aria-labelledby="season-progress-heading" className="mb-4 max-w-xl">
      <h2 id="season-progress-heading" className="font-bold">
        Tapping so far, {p.season}
      </h2>
      {p.plannedTaps === 0 && p.drilledTaps === 0 ? (
        <p className="text-sm">No taps are planned for {p.season}, and none are recorded yet.</p>
      ) : (
        <>
          <p className="tabular-nums">
            {formatNumber(p.drilledTaps)} of {plural(p.plannedTaps, 'tap', 'taps')} drilled
            {p.plannedTaps > 0 ? ` (${share} %)` : ''}; {formatNumber(p.treesDone)} of{' '}
            {plural(p.treesToTap, 'tree', 'trees')} done.
          </p>
          <progress
            className="mt-1 h-3 w-full accent-moss print:hidden"
            value={Math.min(p.drilledTaps, p.plannedTaps)}
            max={Math.max(p.plannedTaps, 1)}
            aria-label="Taps drilled so far"
          />
        </>
      )}
      <p className="text-sm text-bark">{from}</p>
    </section>
  );
}
