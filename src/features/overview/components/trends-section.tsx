import { ErrorState } from '@/components/ui/error-state';
import { EmptyState } from '@/components/ui/empty-state';
import { Skeleton } from '@/components/ui/skeleton';
import { paths } from '@/config/paths';
import { cmToIn, useUnitSystem } from '@/lib/units';
import { useTrends } from '../api/get-trends';
import { dbhSentence, growthIn, growthSentence, areaWords } from '../lib/trend-words';
import { BasalAreaTrend } from './basal-area-trend';
import { DensityTrend } from './density-trend';
import { DiebackTrend } from './dieback-trend';
import { ShareTrend } from './share-trend';
import { SpreadTrend } from './spread-trend';
import { StatusTrend } from './status-trend';
import { TapsTrend } from './taps-trend';
import { WarningsTrend } from './warnings-trend';

/** The stand season by season: a chart for each question, each read in one sentence. */
export function TrendsSection({ sugarbushId }: { sugarbushId: number }) {
  const trends = useTrends(sugarbushId);
  const { system } = useUnitSystem();
  const heading = (
    <h2 id="trends-heading" className="text-lg font-bold">
      Season by season
    </h2>
  );

  if (trends.isPending)
    return (
      <section aria-labelledby="trends-heading">
        {heading}
        <div
          role="status"
          aria-label="Loading the trends"
          className="mt-3 grid gap-4 lg:grid-cols-2"
        >
          {[0, 1, 2, 3].map((n) => (
            <Skeleton key={n} className="h-72 w-full" />
          ))}
        </div>
      </section>
    );
  if (trends.isError)
    return (
      <section aria-labelledby="trends-heading">
        {heading}
        <ErrorState
          title="We couldn't load the stand's trends."
          error={trends.error}
          onRetry={() => void trends.refetch()}
        />
      </section>
    );

  const data = trends.data;
  const recorded = data.items.filter((i) => !i.planned);
  const unit = system === 'imperial' ? 'in' : 'cm';
  return (
    <section aria-labelledby="trends-heading">
      {heading}
      {recorded.length === 0 ? (
        <EmptyState title="No seasons on record yet">
          Trends show once trees are measured or tapped: import a CSV or record the first
          measurements on the trees.
        </EmptyState>
      ) : (
        <>
          <p className="mt-1 max-w-prose text-sm text-bark">
            {recorded[0].season}–{recorded.at(-1)!.season} as recorded, and {data.upcoming} as the
            advisor plans it (marked *). Guideline: {data.profile.label}.
          </p>
          <div className="mt-3 grid gap-4 lg:grid-cols-2">
            <BasalAreaTrend trends={data} system={system} />
            <StatusTrend trends={data} />
            <SpreadTrend
              trends={data}
              title="DBH of the living trees"
              sentence={dbhSentence(data, system)}
              spreadOf={(i) => i.dbhCm}
              convert={(cm) => (system === 'imperial' ? cmToIn(cm) : cm)}
              unit={unit}
              digits={1}
              linkFor={(i) => paths.plan.href(sugarbushId, { season: i.season, sort: 'dbh' })}
            />
            <SpreadTrend
              trends={data}
              title="Basal-area growth a year"
              sentence={growthSentence(data, system)}
              spreadOf={(i) => i.basalAreaGrowthCm2}
              convert={(cm2) => growthIn(cm2, system)}
              unit={areaWords(system).growth}
              digits={1}
              linkFor={(i) =>
                paths.plan.href(sugarbushId, { season: i.season, warning: 'slow-growth' })
              }
            />
            <DensityTrend trends={data} system={system} />
            <TapsTrend trends={data} />
            <WarningsTrend trends={data} />
            <ShareTrend trends={data} />
            <DiebackTrend trends={data} />
          </div>
        </>
      )}
    </section>
  );
}
