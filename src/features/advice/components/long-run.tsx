import { LONG_REACH_SEASONS } from '@shared/rules/index';
import type { TreeAdvice } from '@shared/schemas/plan';
import { formatShare } from '@/lib/advice-words';
import { formatNumber } from '@/lib/units';

/**
 * Beside the 20-season projection: where the advised rate settles in the long run, and how long
 * old stain stays within reach of new holes at this growth.
 */
export function LongRun({ advice }: { advice: TreeAdvice }) {
  const reach = advice.stainReachSeasons;
  const decades = reach === null || reach >= LONG_REACH_SEASONS;
  const below = advice.steadyStateShare < advice.profile.floor;
  return (
    <dl className="flex flex-col gap-2 text-sm">
      <div>
        <dt className="text-bark">In the long run at this rate</dt>
        <dd className="text-lg font-bold tabular-nums">
          {formatShare(advice.steadyStateShare)} clear wood
        </dd>
        <dd className="text-bark">
          {below
            ? `Below the ${formatShare(advice.profile.floor)} floor: this rate does not last.`
            : `At or above the ${formatShare(advice.profile.floor)} floor.`}
        </dd>
      </div>
      <div>
        <dt className="text-bark">Old stain within reach</dt>
        <dd className="font-bold tabular-nums">
          {reach === null ? 'For good' : `About ${formatNumber(reach)} years`}
        </dd>
        {decades && (
          <dd className="text-bark">
            {reach === null
              ? 'Without growth, old stain never grows out of reach of new holes.'
              : 'Growth is slow: old stain stays within reach of new holes for decades, so every hole counts for a long time.'}
          </dd>
        )}
      </div>
    </dl>
  );
}
