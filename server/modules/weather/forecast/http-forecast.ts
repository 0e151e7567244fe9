import { z } from 'zod';
import type { ForecastDay, ForecastProvider } from './forecast-provider';

/** Why the forecast could not be had, in words for the page. */
export class ForecastUnavailable extends Error {}

const numbers = z.array(z.number().finite().nullable());
const answerSchema = z.object({
  daily: z.object({
    time: z.array(z.string().regex(/^\d{4}-\d{2}-\d{2}$/)),
    temperature_2m_max: numbers,
    temperature_2m_min: numbers,
  }),
});

/**
 * A forecast service speaking the common open weather-API daily protocol:
 * `GET <url>?latitude=&longitude=&daily=temperature_2m_max,temperature_2m_min&timezone=auto&forecast_days=N`
 * answering `{ daily: { time, temperature_2m_max, temperature_2m_min } }` in °C.
 */
export function httpForecast(url: string, opts: { timeoutMs: number }): ForecastProvider {
  const base = new URL(url);
  return {
    name: `the forecast service at ${base.host}`,
    async daily(lat, lng, fromDate, days): Promise<ForecastDay[]> {
      const ask = new URL(base);
      ask.searchParams.set('latitude', lat.toFixed(4));
      ask.searchParams.set('longitude', lng.toFixed(4));
      ask.searchParams.set('daily', 'temperature_2m_max,temperature_2m_min');
      ask.searchParams.set('timezone', 'auto');
      ask.searchParams.set('forecast_days', String(days));
      let res: Response;
      try {
        res = await fetch(ask, {
          headers: { accept: 'application/json' },
          signal: AbortSignal.timeout(opts.timeoutMs),
        });
      } catch (err) {
        const timedOut = err instanceof Error && err.name === 'TimeoutError';
        throw new ForecastUnavailable(
          timedOut
            ? `The forecast service at ${base.host} did not answer within ${opts.timeoutMs / 1000} s`
            : `The forecast service at ${base.host} could not be reached`,
        );
      }
      if (!res.ok)
        throw new ForecastUnavailable(
          `The forecast service at ${base.host} answered with an error (${res.status})`,
        );
      const parsed = answerSchema.safeParse(await res.json().catch(() => null));
      const daily = parsed.success ? parsed.data.daily : null;
      if (
        !daily ||
        daily.temperature_2m_max.length !== daily.time.length ||
        daily.temperature_2m_min.length !== daily.time.length
      )
        throw new ForecastUnavailable(
          `The forecast service at ${base.host} sent an answer that is not a daily forecast`,
        );
      const out: ForecastDay[] = [];
      daily.time.forEach((date, i) => {
        const max = daily.temperature_2m_max[i];
        const min = daily.temperature_2m_min[i];
        if (date < fromDate || max === null || min === null) return;
        out.push({ date, minC: Math.min(min, max), maxC: Math.max(min, max) });
      });
      return out.slice(0, days);
    },
  };
}
