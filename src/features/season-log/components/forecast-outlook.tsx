import type { TemperatureUnit } from '@shared/rules/index';
import type { WeatherSeason } from '@shared/schemas/weather';
import { cn } from '@/components/ui/cn';
import { dayReason } from '../lib/season-days';
import { forecastHeadline, runLabels, runSymbols, shortDayOf } from '../lib/season-words';

/** The coming days: when to expect a run, each day's reason, and where the forecast came from. */
export function ForecastOutlook({
  weather,
  unit,
}: {
  weather: WeatherSeason;
  unit: TemperatureUnit;
}) {
  const { forecast, forecastSource, forecastError } = weather;
  if (forecast.length === 0 && !forecastError) return null;
  return (
    <section aria-labelledby="forecast-heading" className="rounded border border-rule p-4">
      <h2 id="forecast-heading" className="text-lg font-bold">
        The coming days
      </h2>
      {forecast.length === 0 ? (
        <p className="mt-1 text-bark">No forecast just now: {forecastError}</p>
      ) : (
        <>
          <p className="mt-1 font-bold">{forecastHeadline(forecast, unit)}.</p>
          <ul
            aria-label="Forecast by day"
            className="mt-2 flex flex-col gap-1 text-sm tabular-nums"
          >
            {forecast.map((d) => (
              <li key={d.date} data-forecast-run={d.run} className="flex gap-2">
                <span aria-hidden="true" className={cn('w-4', d.run === 'none' && 'text-bark')}>
                  {runSymbols[d.run]}
                </span>
                <span className="w-28 shrink-0">{shortDayOf(d.date)}</span>
                <span>
                  <span className="sr-only">{runLabels[d.run]}: </span>
                  {dayReason(d, unit)}
                </span>
              </li>
            ))}
          </ul>
          {forecastSource && (
            <p className="mt-2 text-sm text-bark">Forecast from {forecastSource}.</p>
          )}
        </>
      )}
    </section>
  );
}
