import { useId, useMemo } from 'react';
import { useSearchParams } from 'react-router';
import { SeasonStepper } from '@/components/season-stepper';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { Skeleton, TableSkeleton } from '@/components/ui/skeleton';
import { UnitToggle } from '@/components/ui/unit-toggle';
import { can, useRole } from '@/lib/auth';
import { FIRST_SEASON, lastSeason } from '@/lib/season';
import { useUnitSystem } from '@/lib/units';
import { useSeasonSap } from '../api/get-season-sap';
import { useWeather } from '../api/get-weather';
import { seasonDays } from '../lib/season-days';
import { seasonUnitsOf } from '../lib/season-units';
import { seasonSentence } from '../lib/season-words';
import { ForecastOutlook } from './forecast-outlook';
import { SapEntries } from './sap-entries';
import { SapForm } from './sap-form';
import { SeasonChart } from './season-chart';
import { SeasonDaysTable } from './season-days-table';
import { SeasonTotals } from './season-totals';
import { SyrupSafety } from './syrup-safety';
import { WeatherForm } from './weather-form';
import { WeatherImport } from './weather-import';

const unitLabels = { imperial: '°F, gal', metric: '°C, L' } as const;

/** `?season=` when it names a season the log can hold; otherwise the API's own choice. */
function seasonFrom(value: string | null): number | undefined {
  const season = Number(value);
  if (value === null || !Number.isInteger(season)) return undefined;
  return season >= FIRST_SEASON && season <= lastSeason() ? season : undefined;
}

/**
 * The season log: the season's sap and syrup, the coming days' runs, the season on one chart
 * with every day in a table below it, and, for those who record, the day's sap and weather.
 */
export function SeasonLogPage({
  sugarbushId,
  standName,
}: {
  sugarbushId: number;
  standName: string | undefined;
}) {
  const [search, setSearch] = useSearchParams();
  const asked = seasonFrom(search.get('season'));
  const role = useRole(sugarbushId);
  const mayRecord = can(role, 'record-season-log');
  const { system } = useUnitSystem();
  const units = useMemo(() => seasonUnitsOf(system), [system]);
  const weather = useWeather(sugarbushId, asked);
  const season = asked ?? weather.data?.season;
  const sap = useSeasonSap(sugarbushId, season);
  const tableId = useId();
  const days = useMemo(
    () =>
      weather.data && sap.data
        ? seasonDays(weather.data.items, sap.data.items, units.temperature)
        : [],
    [weather.data, sap.data, units.temperature],
  );

  const header = (
    <PageHeader
      title="Season log"
      subtitle={standName ?? ' '}
      actions={<UnitToggle labels={unitLabels} />}
    />
  );
  if (weather.isError || sap.isError) {
    const failed = weather.isError ? weather : sap;
    return (
      <>
        {header}
        <ErrorState
          title="We couldn't load the season log."
          error={failed.error}
          onRetry={() => void failed.refetch()}
        />
      </>
    );
  }
  if (season === undefined || !weather.data || !sap.data)
    return (
      <>
        {header}
        <div role="status" aria-label="Loading the season log" className="flex flex-col gap-4">
          <Skeleton className="h-24 w-full" />
          <Skeleton className="h-80 w-full" />
          <TableSkeleton rows={6} />
        </div>
      </>
    );

  const recordForms = mayRecord && (
    <section aria-labelledby="record-heading" id="record" className="flex flex-col gap-4">
      <h2 id="record-heading" className="sr-only">
        Record
      </h2>
      <SapForm sugarbushId={sugarbushId} units={units} />
      <div className="grid gap-4 lg:grid-cols-2">
        <WeatherForm sugarbushId={sugarbushId} units={units} />
        <WeatherImport key={units.temperature} sugarbushId={sugarbushId} unit={units.temperature} />
      </div>
    </section>
  );

  return (
    <>
      {header}
      <div className="flex flex-col gap-8">
        <SeasonStepper season={season} onChange={(s) => setSearch({ season: String(s) })} />
        {sap.data.total === 0 ? (
          <EmptyState title={`No sap recorded in ${season} yet`}>
            {mayRecord
              ? "Record the first day's sap below: its volume, its sugar in °Brix and how cold it was kept."
              : 'The sap shows here as the owner, the forester or the tapper records it.'}
          </EmptyState>
        ) : (
          <section aria-labelledby="totals-heading" className="flex flex-col gap-4">
            <h2 id="totals-heading" className="text-lg font-bold">
              Season {season} so far
            </h2>
            <SeasonTotals season={season} totals={sap.data.totals} units={units} />
            <SyrupSafety />
          </section>
        )}
        <ForecastOutlook weather={weather.data} unit={units.temperature} />
        {recordForms || (
          <p className="text-bark">
            You read the season log; the owner, the forester and the tapper record sap and weather.
          </p>
        )}
        {days.length > 0 && (
          <section aria-labelledby="days-heading" className="flex flex-col gap-4">
            <h2 id="days-heading" className="text-lg font-bold">
              The season day by day
            </h2>
            <SeasonChart
              days={days}
              units={units}
              summary={seasonSentence(season, days, units)}
              tableId={tableId}
            />
            <SeasonDaysTable id={tableId} season={season} days={days} units={units} />
          </section>
        )}
        {sap.data.total > 0 && (
          <SapEntries
            sugarbushId={sugarbushId}
            season={season}
            units={units}
            mayRecord={mayRecord}
          />
        )}
      </div>
    </>
  );
}
