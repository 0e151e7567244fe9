import { cn } from '@/components/ui/cn';
import { FIRST_SEASON, lastSeason } from '@/lib/season';

const stepClass = cn(
  'inline-grid min-h-11 min-w-11 place-items-center text-lg leading-none hover:bg-frost md:min-h-9 md:min-w-9',
  'disabled:cursor-not-allowed disabled:text-ink/40 print:hidden',
);

/** One season back or forward; the year between the buttons. */
export function SeasonStepper({
  season,
  onChange,
}: {
  season: number;
  onChange: (season: number) => void;
}) {
  return (
    <div role="group" aria-label="Season" className="inline-flex items-center gap-2">
      <span className="text-sm font-bold print:hidden">Season</span>
      <div className="inline-flex items-center rounded border border-bark/40 print:border-0">
        <button
          type="button"
          aria-label="Previous season"
          className={stepClass}
          disabled={season <= FIRST_SEASON}
          onClick={() => onChange(season - 1)}
        >
          −
        </button>
        <output aria-live="polite" className="min-w-14 px-1 text-center font-bold tabular-nums">
          {season}
        </output>
        <button
          type="button"
          aria-label="Next season"
          className={stepClass}
          disabled={season >= lastSeason()}
          onClick={() => onChange(season + 1)}
        >
          +
        </button>
      </div>
    </div>
  );
}
