import { in2ToCm2, publishedGrowth } from '@shared/rules/index';
import type { TreeAdvice } from '@shared/schemas/plan';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { formatShare } from '@/lib/advice-words';
import { formatNumber, type UnitSystem } from '@/lib/units';

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

const taps = (n: number) => `${n} ${n === 1 ? 'tap' : 'taps'}`;

/** What healthy trees grew in the 2016 study, for context: "1.8 in²/yr at 10 in and 3.5 at 18 in". */
function healthyWords(system: UnitSystem): string {
  const [small, large] = publishedGrowth.healthy;
  if (system === 'metric')
    return `${formatNumber(in2ToCm2(small.in2PerYear), 0)} cm²/yr at 25 cm and ${formatNumber(in2ToCm2(large.in2PerYear), 0)} cm²/yr at 46 cm`;
  return `${small.in2PerYear} in²/yr at ${small.dbhIn} in and ${large.in2PerYear} in²/yr at ${large.dbhIn} in`;
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
          The chance a new hole finds clear wood. Keep it at or above {formatShare(floor)}, the
          floor Clearwood’s model is calibrated to.
        </dd>
      </div>
      {growing && (
        <div>
          <dt className="text-sm text-bark">Basal-area growth</dt>
          <dd className="font-bold tabular-nums">{growthWords(advice, system)}</dd>
          <dd className="text-sm text-bark">
            {taps(advice.minimumGrowthTaps)} a year at this bit and depth need at least{' '}
            {areaPerYear(advice.minimumGrowthIn2!, system)}.
            {advice.maxSustainableTaps > 0 &&
              ` Growth covers the stain of ${taps(advice.maxSustainableTaps)} a year.`}
          </dd>
          <dd className="text-sm text-bark">
            For comparison, healthy trees in the 2016 study grew about {healthyWords(system)}.
          </dd>
          <dd>
            <WhyDisclosure source={publishedGrowth.source} />
          </dd>
        </div>
      )}
    </dl>
  );
}
