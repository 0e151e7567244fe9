import type { Spacing } from '@shared/rules/index';
import { formatLength, lengthUnitOf, type UnitSystem } from '@/lib/units';
import type { CrowdedHole, DrilledHoleCheck } from '@/lib/spacing-check';

function gap(cm: number, system: UnitSystem): string {
  const unit = lengthUnitOf(system);
  const text = formatLength(cm, unit, 0);
  return text.startsWith('0 ') ? `under 1 ${unit}` : text;
}

/** "the 2024 hole", or "a hole already drilled in 2027". */
const whichHole = (c: CrowdedHole, season: number) =>
  c.hole.season === season ? `a hole already drilled in ${season}` : `the ${c.hole.season} hole`;

/** "8 cm from the 2024 hole: the guideline asks for 15 cm to the side or 20 cm above or below." */
export function closeHoleSentence(
  nearest: CrowdedHole,
  season: number,
  spacing: Spacing,
  system: UnitSystem,
): string {
  const distance = Math.hypot(nearest.sidewaysCm, nearest.belowCm);
  const asks = `${gap(spacing.sidewaysCm, system)} to the side ${spacing.rule === 'both' ? 'and' : 'or'} ${gap(spacing.verticalCm, system)} above or below`;
  return `${gap(distance, system)} from ${whichHole(nearest, season)}: the guideline asks for ${asks}.`;
}

/** "This would be hole 3 in 2027; the advice gives this tree 2 taps." */
export function overtappedSentence(check: DrilledHoleCheck, season: number): string {
  const advised =
    check.advisedTaps === 0
      ? 'the advice is to drill no new hole in this tree'
      : `the advice gives this tree ${check.advisedTaps} ${check.advisedTaps === 1 ? 'tap' : 'taps'}`;
  return `This would be hole ${check.holeNumber} in ${season}; ${advised}.`;
}

/**
 * What the advisor says of the hole as it is typed, before it is saved: too close to a hole
 * still in reach, or one hole more than the advice gives. Advice only: the tapper records what
 * was drilled. The live region stays mounted so the words are announced when they appear.
 */
export function DrilledHoleWarning({
  check,
  season,
  spacing,
  system,
}: {
  check: DrilledHoleCheck | null;
  season: number;
  spacing: Spacing | undefined;
  system: UnitSystem;
}) {
  const [nearest, ...others] = check?.crowded ?? [];
  const close = nearest && spacing ? closeHoleSentence(nearest, season, spacing, system) : null;
  const over = check?.over ? overtappedSentence(check, season) : null;
  return (
    <div role="status" aria-live="polite">
      {(close || over) && (
        <div className="rounded border-l-4 border-sap bg-sap/10 px-4 py-3">
          <p className="font-bold">Before you save</p>
          {close && (
            <p className="mt-1 max-w-prose">
              {close}
              {others.length > 0 &&
                ` ${others.length === 1 ? 'One more hole is' : `${others.length} more holes are`} close too.`}
            </p>
          )}
          {over && <p className="mt-1 max-w-prose">{over}</p>}
          <p className="mt-1 max-w-prose text-sm">
            If this is where you drilled, save it as it is: the record should say what was done.
          </p>
        </div>
      )}
    </div>
  );
}
