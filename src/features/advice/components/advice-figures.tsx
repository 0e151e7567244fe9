import { in2ToCm2 } from '@shared/rules/index';
import type { TreeAdvice } from '@shared/schemas/plan';
import { formatNumber, type UnitSystem } from '@/lib/units';
import { formatShare } from '../advice-words';

/** Basal-area growth a year, in² or cm². */
function areaPerYear(in2: number, system: UnitSystem): string {
  return system === 'metric'
    ? `${formatNumber(in2ToCm2(in2), 1)} cm²/yr`
    : `${formatNumber(in2, 2)} in²/yr`;
}

function growthWords(advice: TreeAdvice, system: UnitSystem): string {
  if (advice.basalAreaGrowthIn2 === null) {
    return advice.growth?.suspect
      ? 'The measurements disagree, so growth is taken as slow until the DBH is checked.'
      : 'Not measured over two seasons yet, so growth is taken as slow.';
  }
  return `${areaPerYear(advice.basalAreaGrowthIn2, system)} measured`;
}

/** The figures behind the count: how much clear wood is left, and whether growth keeps up. */
export function AdviceFigures({
  advice,
  floor,
  system,
}: {
  advice: TreeAdvice;
  floor: number;
  system: UnitSystem;
}) {
  const drilling = advice.taps > 0;
  const growing = advice.dbhCm !== null && advice.minimumGrowthIn2 !== null;
  return (
    <dl className="flex flex-col gap-3">
      <div>
        <dt className="text-sm text-bark">Clear wood in the tapping zone</dt>
        <dd className="font-bold tabular-nums">
          {formatShare(advice.conductiveShare)} now
          {drilling && <> → {formatShare(advice.shareAfter)} after drilling</>}
          {' → '}
          {formatShare(advice.steadyStateShare)} in the long run at this rate
        </dd>
        <dd className="text-sm text-bark">
          The chance a new hole finds clear wood. Keep it at or above {formatShare(floor)}.
        </dd>
      </div>
      {growing && (
        <div>
          <dt className="text-sm text-bark">Basal-area growth</dt>
          <dd className="font-bold tabular-nums">{growthWords(advice, system)}</dd>
          <dd className="text-sm text-bark">
            At this size tapping needs at least {areaPerYear(advice.minimumGrowthIn2!, system)}.
            {advice.maxSustainableTaps > 0 &&
              ` Growth covers the stain of ${advice.maxSustainableTaps} ${advice.maxSustainableTaps === 1 ? 'tap' : 'taps'} a year.`}
          </dd>
        </div>
      )}
    </dl>
  );
}
