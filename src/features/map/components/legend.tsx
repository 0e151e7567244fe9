import { VerdictBadge } from '@/components/verdict-badge';
import { formatNumber } from '@/lib/units';
import type { LegendCounts } from '../lib/legend-counts';
import { verdictStyles } from '../lib/verdict-style';
import { ShapeSwatch } from './shape-swatch';

/** What each mark means, and how many trees carry it for the season shown. */
export function Legend({
  counts,
  season,
  filtered,
}: {
  counts: LegendCounts;
  season: number;
  filtered: boolean;
}) {
  return (
    <section aria-label="Legend" className="rounded border border-rule p-4">
      <h2 className="font-bold tabular-nums">{formatNumber(counts.total)} trees</h2>
      <p className="text-sm text-bark">
        Advice for season {season}
        {filtered && ` · ${formatNumber(counts.matching)} match the filters`}
      </p>
      <ul className="mt-3 flex flex-col gap-1.5 tabular-nums">
        {verdictStyles.map((style) => (
          <li key={style.key} className="flex items-center gap-2" title={style.description}>
            <ShapeSwatch style={style} />
            <VerdictBadge verdict={style.key} />
            <span className="ml-auto" data-testid={`legend-count-${style.key}`}>
              {formatNumber(counts.byVerdict[style.key])}
            </span>
          </li>
        ))}
        <li className="flex items-center gap-2 border-t border-rule pt-1.5">
          <span aria-hidden="true" className="size-5 shrink-0 text-center text-bark">
            –
          </span>
          <span>Not mapped</span>
          <span className="ml-auto" data-testid="legend-count-not-mapped">
            {formatNumber(counts.notMapped)}
          </span>
        </li>
      </ul>
    </section>
  );
}
