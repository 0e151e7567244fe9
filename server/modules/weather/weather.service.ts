import type { AppContext } from '../../context';
import { classifyDay } from '../../../shared/rules/index';
import { isoDay } from '../../../shared/schemas/iso-date';
import type {
  WeatherDay,
  WeatherDayInput,
  WeatherImportFields,
  WeatherImportResult,
  WeatherSeason,
} from '../../../shared/schemas/weather';
import { auditRepository } from '../audit/audit.repository';
import { storeOnce } from '../field-entries/store-once';
import { ForecastUnavailable } from './forecast/http-forecast';
import { standPosition } from './stand-position';
import { readStationFile } from './station-csv';
import {
  latestLogSeason,
  weatherRepository,
  type StoredDay,
  type WeatherSend,
} from './weather.repository';

/** The coming days the season log shows. */
export const FORECAST_DAYS = 7;

/** A stored or forecast day with its run, the reason in °C. */
export const weatherDay = (d: StoredDay): WeatherDay => {
  const { run, reason } = classifyDay(d.minC, d.maxC, 'C');
  return { ...d, run, reason };
};

/** Readings equal to within rounding of the same file's conversion. */
const same = (a: StoredDay, b: StoredDay) =>
  Math.abs(a.minC - b.minC) < 1e-9 &&
  Math.abs(a.maxC - b.maxC) < 1e-9 &&
  a.source === b.source &&
  a.station === b.station;

/** The season asked for, or the latest one holding sap or weather, else this year. */
export async function logSeason(ctx: AppContext, sugarbushId: number, season?: number) {
  return season ?? (await latestLogSeason(ctx.db, sugarbushId)) ?? new Date().getUTCFullYear();
}

export function weatherService(ctx: AppContext) {
  const repo = weatherRepository(ctx.db);

  async function forecast(sugarbushId: number) {
    const at = await standPosition(ctx.db, sugarbushId);
    if (!at)
      return {
        forecast: [],
        forecastSource: null,
        forecastError: 'Draw the stand’s boundary or map a tree to have a forecast for it',
      };
    try {
      const days = await ctx.forecast.daily(at.lat, at.lng, isoDay(), FORECAST_DAYS);
      return {
        forecast: days.map((d) => weatherDay({ ...d, source: 'forecast', station: null })),
        forecastSource: ctx.forecast.name,
        forecastError: null,
      };
    } catch (err) {
      // The log reads on without it: a provider's trouble is never the page's error.
      if (!(err instanceof ForecastUnavailable)) ctx.log.error('The forecast failed', err);
      return {
        forecast: [],
        forecastSource: null,
        forecastError:
          err instanceof ForecastUnavailable
            ? err.message
            : 'The forecast could not be had just now',
      };
    }
  }

  /** Writes the days that differ from what is stored, each with its audit entry, in one transaction. */
  function write(
    sugarbushId: number,
    userId: number,
    days: StoredDay[],
    action: 'record' | 'import',
    send?: WeatherSend,
  ) {
    return ctx.db.transaction(async (trx) => {
      const stored = weatherRepository(trx);
      // First, so a send racing its own resend stops here before writing anything.
      if (send) await stored.keepSend(send);
      const audit = auditRepository(trx);
      const before = await stored.onDates(
        sugarbushId,
        days.map((d) => d.date),
      );
      const changed = days.filter((d) => !before.has(d.date) || !same(before.get(d.date)!, d));
      const ids = await stored.put(sugarbushId, userId, changed);
      await audit.recordMany(
        changed.map((d) => {
          const earlier = before.get(d.date);
          return {
            sugarbushId,
            userId,
            action: earlier ? 'replace' : action,
            entity: 'weather-day',
            entityId: ids.get(d.date) ?? null,
            // The reading it replaced stays here.
            detail: earlier ? { ...d, earlier } : d,
          };
        }),
      );
      return { before, changed };
    });
  }

  return {
    async season(sugarbushId: number, asked?: number): Promise<WeatherSeason> {
      const season = await logSeason(ctx, sugarbushId, asked);
      const items = (await repo.season(sugarbushId, season)).map(weatherDay);
      const coming =
        season >= new Date().getUTCFullYear()
          ? await forecast(sugarbushId)
          : { forecast: [], forecastSource: null, forecastError: null };
      return { season, items, days: items, total: items.length, ...coming };
    },

    /**
     * Records a day's reading (replacing the date's earlier one). A resend with the same
     * `clientId` writes nothing and answers the day as it now stands (`created: false`), so a
     * late resend never undoes a reading given after it; the same id with another reading is a 409.
     */
    async record(
      sugarbushId: number,
      userId: number,
      input: WeatherDayInput,
    ): Promise<{ entry: WeatherDay; created: boolean }> {
      const { clientId, ...reading } = input;
      const day: StoredDay = { ...reading, source: 'manual', station: null };
      const send = clientId ? { clientId, sugarbushId, ...reading } : undefined;
      const { created } = await storeOnce<WeatherSend | undefined>({
        clientId,
        find: (id) => repo.sent(id),
        matches: (s) =>
          s!.sugarbushId === sugarbushId &&
          s!.date === day.date &&
          s!.minC === day.minC &&
          s!.maxC === day.maxC,
        check: async () => {},
        create: async () => {
          await write(sugarbushId, userId, [day], 'record', send);
          return send;
        },
      });
      if (created) return { entry: weatherDay(day), created };
      const now = (await repo.onDates(sugarbushId, [day.date])).get(day.date) ?? day;
      return { entry: weatherDay(now), created };
    },

    async importFile(
      sugarbushId: number,
      userId: number,
      bytes: Uint8Array,
      fields: WeatherImportFields,
    ): Promise<WeatherImportResult> {
      const file = readStationFile(bytes, fields.unit);
      const days: StoredDay[] = file.readings.map((r) => ({
        ...r,
        source: 'station',
        station: file.station,
      }));
      const dryRun = fields.dryRun ?? false;
      let before: Map<string, StoredDay>;
      let changed: StoredDay[];
      if (dryRun) {
        before = await repo.onDates(
          sugarbushId,
          days.map((d) => d.date),
        );
        changed = days.filter((d) => !before.has(d.date) || !same(before.get(d.date)!, d));
      } else ({ before, changed } = await write(sugarbushId, userId, days, 'import'));
      const replaced = changed.filter((d) => before.has(d.date)).length;
      return {
        station: file.station,
        unit: file.unit,
        added: changed.length - replaced,
        replaced,
        unchanged: days.length - changed.length,
        skipped: file.skipped,
        days: days.map(weatherDay),
        dryRun,
      };
    },
  };
}
