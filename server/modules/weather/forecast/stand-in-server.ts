import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { isoDay } from '../../../../shared/schemas/iso-date';
import { standInSeries } from './stand-in-forecast';

export interface StandInServer {
  /** The URL to give `FORECAST_URL`. */
  url: string;
  /** Requests answered so far. */
  requests: () => number;
  close: () => Promise<void>;
}

/**
 * Serves the stand-in series over HTTP in the open weather-API daily protocol, on 127.0.0.1 and a
 * free port: the HTTP adapter is tested against it without leaving the machine. `today` fixes the
 * first day (UTC; `timezone` is accepted and ignored).
 */
export async function serveStandInForecast(
  today: () => string = () => isoDay(),
): Promise<StandInServer> {
  let requests = 0;
  const server = http.createServer((req, res) => {
    requests += 1;
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const lat = Number(url.searchParams.get('latitude'));
    const lng = Number(url.searchParams.get('longitude'));
    const days = Number(url.searchParams.get('forecast_days') ?? 7);
    const daily = (url.searchParams.get('daily') ?? '').split(',');
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { 'content-type': 'application/json' });
      res.end(JSON.stringify(body));
    };
    if (
      url.searchParams.get('latitude') === null ||
      url.searchParams.get('longitude') === null ||
      !(Math.abs(lat) <= 90) ||
      !(Math.abs(lng) <= 180) ||
      !Number.isInteger(days) ||
      days < 1 ||
      days > 16
    )
      return send(400, {
        error: true,
        reason: 'latitude, longitude and forecast_days 1–16 are needed',
      });
    if (!daily.includes('temperature_2m_max') || !daily.includes('temperature_2m_min'))
      return send(400, {
        error: true,
        reason: 'ask for temperature_2m_max and temperature_2m_min',
      });
    const series = standInSeries(lat, lng, today(), days);
    send(200, {
      latitude: lat,
      longitude: lng,
      timezone: 'GMT',
      daily_units: { time: 'iso8601', temperature_2m_max: '°C', temperature_2m_min: '°C' },
      daily: {
        time: series.map((d) => d.date),
        temperature_2m_max: series.map((d) => d.maxC),
        temperature_2m_min: series.map((d) => d.minC),
      },
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/v1/forecast`,
    requests: () => requests,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.closeAllConnections();
        server.close((err) => (err ? reject(err) : resolve()));
      }),
  };
}
