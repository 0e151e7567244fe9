import type { Knex } from 'knex';
import type { AdviceJobs } from './modules/advice/advice-jobs';
import type { Config } from './config';
import type { Background } from './lib/background';
import type { Logger } from './lib/logger';
import type { Mailer } from './mail/mailer';
import type { PhotoStore } from './modules/photos/photo-store';
import type { ForecastProvider } from './modules/weather/forecast/forecast-provider';

/** What every module needs, built once per app. */
export interface AppContext {
  db: Knex;
  config: Config;
  mailer: Mailer;
  log: Logger;
  background: Background;
  /** Whole-stand advice in worker threads. */
  advice: AdviceJobs;
  /** Where photo files are kept (PHOTO_STORAGE). */
  photos: PhotoStore;
  /** The coming days' weather for the season log (FORECAST_URL, else the stand-in). */
  forecast: ForecastProvider;
}
