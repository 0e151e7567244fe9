import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { centroid } from '@turf/turf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config';
import { classifyDay } from '../../shared/rules/index';
import { isoDay } from '../../shared/schemas/iso-date';
import {
  STAND_IN_NAME,
  standInSeries,
} from '../../server/modules/weather/forecast/stand-in-forecast';
import {
  serveStandInForecast,
  type StandInServer,
} from '../../server/modules/weather/forecast/stand-in-server';
import { addMember, addSugarbush, addTree, addUser, makeTestApp, signIn } from './test-app';

const boundary: GeoJSON.Polygon = {
  type: 'Polygon',
  coordinates: [
    [
      [-72.65, 44.3],
      [-72.63, 44.3],
      [-72.63, 44.32],
      [-72.65, 44.32],
      [-72.65, 44.3],
    ],
  ],
};
const thisYear = new Date().getUTCFullYear();

type App = Awaited<ReturnType<typeof makeTestApp>>;
const opened: App[] = [];
const servers: { close: () => Promise<void> }[] = [];
afterAll(async () => {
  for (const a of opened) await a.close();
  for (const s of servers) await s.close();
});

/** An app (on its own database) with one stand and its owner signed in. */
async function standApp(
  env: Record<string, string> = {},
  place: 'boundary' | 'trees' = 'boundary',
) {
  const app = await makeTestApp(env);
  opened.push(app);
  const standId = await addSugarbush(app.db, 'Forecast Hill');
  if (place === 'boundary')
    await app
      .db('sugarbushes')
      .where({ id: standId })
      .update({ boundary: JSON.stringify(boundary) });
  else {
    await addTree(app.db, standId, 'F-1', { lat: 44.4, lng: -72.5 });
    await addTree(app.db, standId, 'F-2', { lat: 44.2, lng: -72.7 });
    await addTree(app.db, standId, 'F-3');
  }
  await addMember(app.db, await addUser(app.db, 'owner@forecast.example'), standId, 'owner');
  const owner = await signIn(app.app, 'owner@forecast.example');
  const read = async (season = thisYear) => {
    const res = await owner.agent.get(`/api/sugarbushes/${standId}/weather?season=${season}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return res.body;
  };
  return { read };
}

/** A loopback server answering every request with `answer` (or never, when it is null). */
async function fakeService(answer: ((res: http.ServerResponse) => void) | null) {
  const server = http.createServer((_req, res) => answer?.(res));
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const close = () =>
    new Promise<void>((resolve) => {
      server.closeAllConnections();
      server.close(() => resolve());
    });
  servers.push({ close });
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}/v1/forecast`, close };
}

describe('the stand-in series', () => {
  const [lng, lat] = centroid(boundary).geometry.coordinates;

  it('when asked twice for the same place and days, then it answers the same; another place differs', () => {
    const a = standInSeries(lat, lng, '2026-03-01', 30);
    expect(standInSeries(lat, lng, '2026-03-01', 30)).toEqual(a);
    expect(standInSeries(lat + 1, lng - 1, '2026-03-01', 30)).not.toEqual(a);
    expect(a.every((d) => d.minC < d.maxC)).toBe(true);
  });

  it('when it covers a winter, then December and January mostly stay frozen and March brings runs on most days', () => {
    const runs = (from: string, n: number) =>
      standInSeries(lat, lng, from, n).filter((d) => classifyDay(d.minC, d.maxC).run !== 'none')
        .length;
    const frozen = standInSeries(lat, lng, '2025-12-01', 62).filter((d) => d.maxC <= 0).length;
    expect(frozen / 62).toBeGreaterThan(0.5);
    expect(runs('2026-03-01', 31) / 31).toBeGreaterThan(0.5);
    expect(runs('2025-12-01', 62) / 62).toBeLessThan(0.35);
  });
});

describe('the forecast in the season log', () => {
  let standIn: StandInServer;
  beforeAll(async () => {
    standIn = await serveStandInForecast();
    servers.push(standIn);
  });

  it('when no forecast service is set, then this season’s log has the stand-in’s coming seven days at the boundary’s centroid, each classified', async () => {
    const { read } = await standApp();
    const body = await read();
    expect(body.forecastSource).toBe(STAND_IN_NAME);
    expect(body.forecastError).toBeNull();
    const [lng, lat] = centroid(boundary).geometry.coordinates;
    const expected = standInSeries(lat, lng, isoDay(), 7);
    expect(body.forecast).toEqual(
      expected.map((d) => {
        const { run, reason } = classifyDay(d.minC, d.maxC, 'C');
        return { ...d, run, reason, source: 'forecast', station: null };
      }),
    );
    expect(body.forecast[0].date).toBe(isoDay());
    expect(body.forecast[6].date).toBe(isoDay(new Date(), 6));
    // A past season has no coming days.
    expect((await read(thisYear - 1)).forecast).toEqual([]);
  });

  it('when the stand has no boundary, then the forecast is for the mean of its mapped trees', async () => {
    const { read } = await standApp({}, 'trees');
    const body = await read();
    expect(body.forecast.map((d: { minC: number }) => d.minC)).toEqual(
      standInSeries(44.3, -72.6, isoDay(), 7).map((d) => d.minC),
    );
  });

  it('when FORECAST_URL names the stand-in served over HTTP on loopback, then the adapter brings the same days, asking once for repeated reads', async () => {
    const local = await (await standApp()).read();
    const before = standIn.requests();
    const { read } = await standApp({ FORECAST_URL: standIn.url });
    const body = await read();
    expect(body.forecastError).toBeNull();
    expect(body.forecastSource).toBe(`the forecast service at ${new URL(standIn.url).host}`);
    expect(body.forecast).toEqual(local.forecast);
    expect(body.forecast).toHaveLength(7);
    await read();
    await read();
    expect(standIn.requests() - before).toBe(1);
  });

  it('when the service is down, then the log still answers 200 with no forecast and says why', async () => {
    const gone = await fakeService(null);
    await gone.close();
    const { read } = await standApp({ FORECAST_URL: gone.url });
    const body = await read();
    expect(body).toMatchObject({ forecast: [], forecastSource: null });
    expect(body.forecastError).toMatch(/could not be reached/);
  });

  it('when the service does not answer in time, then the log answers without a forecast and says it waited', async () => {
    const silent = await fakeService(null);
    const slow = await (
      await standApp({ FORECAST_URL: silent.url, FORECAST_TIMEOUT_MS: '300' })
    ).read();
    expect(slow).toMatchObject({ forecast: [], forecastSource: null });
    expect(slow.forecastError).toMatch(/did not answer within 0.3 s/);
  });

  it('when the service answers 500, then it is a forecastError and never a 5xx', async () => {
    const failing = await fakeService((res) => {
      res.writeHead(500, { 'content-type': 'application/json' });
      res.end('{"error":true}');
    });
    const five = await (await standApp({ FORECAST_URL: failing.url })).read();
    expect(five.forecastError).toMatch(/error \(500\)/);
  });

  it('when the service sends something that is not a daily forecast, then it is a forecastError', async () => {
    const odd = await fakeService((res) => {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end('{"daily":{"time":["2026-03-01"],"temperature_2m_max":[]}}');
    });
    const garbled = await (await standApp({ FORECAST_URL: odd.url })).read();
    expect(garbled).toMatchObject({
      forecast: [],
      forecastError: expect.stringMatching(/not a daily forecast/),
    });
  });

  it('when FORECAST_URL is not an http URL, then the configuration is refused naming it', () => {
    expect(() => loadConfig({ FORECAST_URL: 'ftp://127.0.0.1/forecast' })).toThrow(
      /FORECAST_URL: must be an http/,
    );
    expect(loadConfig({ FORECAST_URL: '' }).FORECAST_URL).toBeUndefined();
  });
});
