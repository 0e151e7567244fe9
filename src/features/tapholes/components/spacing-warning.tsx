import type { Spacing } from '@shared/rules/index';
import { compassWord, formatHeight } from '@/lib/advice-words';
import { formatLength, lengthUnitOf, type UnitSystem } from '@/lib/units';
import type { CrowdedHole } from '@/lib/spacing-check';

function gap(cm: number, system: UnitSystem): string {
  const unit = lengthUnitOf(system);
  const text = formatLength(cm, unit, 0);
  return text.startsWith('0 ') ? `under 1 ${unit}` : text;
}

/** Where the earlier hole sits from the new spot: "3 cm round the trunk and 10 cm above". */
function where(c: CrowdedHole, system: UnitSystem): string {
  const round = c.sidewaysCm >= 0.5 ? `${gap(c.sidewaysCm, system)} round the trunk` : undefined;
  const vertical =
    Math.abs(c.belowCm) >= 0.5
      ? `${gap(Math.abs(c.belowCm), system)} ${c.belowCm > 0 ? 'below' : 'above'}`
      : undefined;
  if (round && vertical) return `${round} and ${vertical} this spot`;
  if (vertical) return `${vertical} this spot, in line with it`;
  if (round) return `${round} from this spot, at the same height`;
  return 'right at this spot';
}

function sentence(nearest: CrowdedHole, others: number, season: number, system: UnitSystem) {
  const { hole } = nearest;
  const which =
    hole.season === season ? `A hole already recorded for ${season}` : `The ${hole.season} hole`;
  const more =
    others === 0
      ? ''
      : others === 1
        ? '; one more hole is close too'
        : `; ${others} more are close too`;
  return `${which} (${compassWord(hole.azimuthDeg)} at ${formatHeight(hole.heightCm, system)}) is ${where(nearest, system)}${more}.`;
}

/**
 * Says in plain words that the spot entered is closer to an earlier hole than the guideline
 * spaces them. Advice only: the tapper records what was drilled.
 */
export function SpacingWarning({
  crowded,
  season,
  spacing,
  system,
}: {
  crowded: CrowdedHole[];
  season: number;
  spacing?: Spacing;
  system: UnitSystem;
}) {
  const [nearest, ...others] = crowded;
  // The region stays mounted, so screen readers announce the words when they appear.
  return (
    <div role="status" aria-live="polite">
      {nearest && spacing && (
        <div className="mt-3 rounded border-l-4 border-sap bg-sap/10 px-4 py-3">
          <p className="font-bold">Close to an earlier hole</p>
          <p className="mt-1 max-w-prose">{sentence(nearest, others.length, season, system)}</p>
          <p className="mt-1 max-w-prose">
            Keep new holes at least {gap(spacing.sidewaysCm, system)} round the trunk{' '}
            {spacing.rule === 'both' ? 'and' : 'or'} {gap(spacing.verticalCm, system)} up or down
            from holes still in reach, and out of their stain. If this is where you drilled, save it
            as it is.
          </p>
        </div>
      )}
    </div>
  );
}
