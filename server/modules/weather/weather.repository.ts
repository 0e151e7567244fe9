import type { Knex } from 'knex';
import type { WeatherSource } from '../../../shared/schemas/weather';

/** A day's reading as stored (°C). */
export interface StoredDay {
  date: string;
  minC: number;
  maxC: number;
  source: WeatherSource;
  station: string | null;
}

const toDay = (r: Record<string, unknown>): StoredDay => ({
  date: String(r.date),
  minC: Number(r.min_c),
  maxC: Number(r.max_c),
  source: r.source as WeatherSource,
  station: (r.station as string | null) ?? null,
});

const COLUMNS = ['date', 'min_c', 'max_c', 'source', 'station'];
/** Dates per `IN (…)` list, well under either engine's bound-variable limit. */
const DATES_PER_QUERY = 500;
/** Rows per INSERT: 9 values each, well under SQLite's bound-variable limit. */
const ROWS_PER_INSERT = 100;

/** What a device sent under its client id: the day's reading as it was given. */
export interface WeatherSend {
  clientId: string;
  sugarbushId: number;
  date: string;
  minC: number;
  maxC: number;
}

export function weatherRepository(db: Knex) {
  return {
    /** The reading sent under this client id, if one was stored. */
    async sent(clientId: string): Promise<WeatherSend | undefined> {
      const r = await db('weather_day_sends').where({ client_id: clientId }).first();
      return r
        ? {
            clientId: String(r.client_id),
            sugarbushId: Number(r.sugarbush_id),
            date: String(r.date),
            minC: Number(r.min_c),
            maxC: Number(r.max_c),
          }
        : undefined;
    },

    /** Keeps the client id of a sent reading (its unique key refuses a second one). */
    async keepSend(send: WeatherSend): Promise<void> {
      await db('weather_day_sends').insert({
        client_id: send.clientId,
        sugarbush_id: send.sugarbushId,
        date: send.date,
        min_c: send.minC,
        max_c: send.maxC,
      });
    },

    /** The season's days (its calendar year), oldest first. */
    async season(sugarbushId: number, season: number): Promise<StoredDay[]> {
      const rows = await db('weather_days')
        .where('sugarbush_id', sugarbushId)
        .whereBetween('date', [`${season}-01-01`, `${season}-12-31`])
        .orderBy('date')
        .select(COLUMNS);
      return rows.map(toDay);
    },

    /** The stored days among these dates, by date. */
    async onDates(sugarbushId: number, dates: readonly string[]): Promise<Map<string, StoredDay>> {
      const out = new Map<string, StoredDay>();
      for (let i = 0; i < dates.length; i += DATES_PER_QUERY) {
        const rows = await db('weather_days')
          .where('sugarbush_id', sugarbushId)
          .whereIn('date', dates.slice(i, i + DATES_PER_QUERY))
          .select(COLUMNS);
        for (const r of rows) out.set(String(r.date), toDay(r));
      }
      return out;
    },

    /** Writes the days' readings, replacing any earlier ones of those dates; their ids by date. */
    async put(
      sugarbushId: number,
      userId: number,
      days: StoredDay[],
    ): Promise<Map<string, number>> {
      const now = new Date().toISOString();
      const ids = new Map<string, number>();
      for (let i = 0; i < days.length; i += ROWS_PER_INSERT) {
        const rows: { id: number; date: string }[] = await db('weather_days')
          .insert(
            days.slice(i, i + ROWS_PER_INSERT).map((day) => ({
              sugarbush_id: sugarbushId,
              date: day.date,
              min_c: day.minC,
              max_c: day.maxC,
              source: day.source,
              station: day.station,
              recorded_by: userId,
              created_at: now,
              updated_at: now,
            })),
          )
          .onConflict(['sugarbush_id', 'date'])
          .merge(['min_c', 'max_c', 'source', 'station', 'recorded_by', 'updated_at'])
          .returning(['id', 'date']);
        for (const r of rows) ids.set(String(r.date), Number(r.id));
      }
      return ids;
    },
  };
}

/**
 * The latest season holding sap or weather for the stand, or null when the log is empty. Both
 * reads are the first row of an index.
 */
export async function latestLogSeason(db: Knex, sugarbushId: number): Promise<number | null> {
  const day = await db('weather_days')
    .where('sugarbush_id', sugarbushId)
    .orderBy('date', 'desc')
    .first('date');
  const sap = await db('sap_entries')
    .where('sugarbush_id', sugarbushId)
    .orderBy('season', 'desc')
    .first('season');
  const seasons = [
    day ? Number(String(day.date).slice(0, 4)) : null,
    sap ? Number(sap.season) : null,
  ];
  const known = seasons.filter((s): s is number => s !== null);
  return known.length > 0 ? Math.max(...known) : null;
}
