import type { Config } from '../../../config';
import { cachedForecast, type ForecastProvider } from './forecast-provider';
import { httpForecast } from './http-forecast';
import { standInForecast } from './stand-in-forecast';

/** A place's forecast is asked for again after this long. */
export const FORECAST_CACHE_MS = 15 * 60_000;

/** The stand-in unless `FORECAST_URL` names a forecast service. */
export function createForecast(config: Config): ForecastProvider {
  if (!config.FORECAST_URL) return standInForecast();
  return cachedForecast(
    httpForecast(config.FORECAST_URL, { timeoutMs: config.FORECAST_TIMEOUT_MS }),
    FORECAST_CACHE_MS,
  );
}
