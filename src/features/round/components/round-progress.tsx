import { formatNumber } from '@/lib/units';

/** Measured of due this season, always in view at the top of the round. */
export function RoundProgress({
  measured,
  due,
  season,
}: {
  measured: number;
  due: number;
  season: number;
}) {
  const share = due === 0 ? 1 : measured / due;
  return (
    <div className="sticky top-0 z-10 -mx-4 border-b border-rule bg-paper px-4 py-2 md:mx-0 md:px-0">
      <p className="flex flex-wrap justify-between gap-2" data-testid="round-progress">
        <span className="font-bold">
          {formatNumber(measured)} of {formatNumber(due)} measured in {season}
        </span>
        <span>{formatNumber(due - measured)} to go</span>
      </p>
      <div
        role="progressbar"
        aria-label="Trees measured this season"
        aria-valuemin={0}
        aria-valuemax={due}
        aria-valuenow={measured}
        className="mt-1 h-2 w-full overflow-hidden rounded bg-rule"
      >
        <div className="h-full bg-moss" style={{ width: `${Math.round(share * 100)}%` }} />
      </div>
    </div>
  );
}
