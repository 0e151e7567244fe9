/**
 * One simulated user's connection to the bench server: Node's http with a keep-alive agent of a
 * single socket, the user's own session cookie and CSRF token, gzip asked for as a browser does,
 * each request timed from send to its last byte. Loopback only.
 */
import http from 'node:http';
import { performance } from 'node:perf_hooks';
import zlib from 'node:zlib';
import type { Session } from './http';

export interface Answer {
  /** HTTP status, or 0 for a transport error (refused, reset, timed out). */
  status: number;
  ms: number;
  headers: http.IncomingHttpHeaders;
  /** The body, decoded, for answers that are not 2xx (the error's code); empty otherwise. */
  text: string;
  /** What went wrong when `status` is 0. */
  error?: string;
}

export interface UserClient {
  send(
    method: string,
    path: string,
    body?: unknown,
    headers?: http.OutgoingHttpHeaders,
  ): Promise<Answer>;
  close(): void;
}

export function userClient(s: Session, timeoutMs: number): UserClient {
  const url = new URL(s.baseUrl);
  if (!['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname))
    throw new Error(`Load runs against this machine only, not ${url.hostname}`);
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  return {
    send(method, path, body, headers = {}) {
      const payload = body === undefined ? undefined : Buffer.from(JSON.stringify(body));
      const t0 = performance.now();
      return new Promise<Answer>((resolve) => {
        let settled = false;
        const done = (a: Omit<Answer, 'ms'>) => {
          if (settled) return;
          settled = true;
          resolve({ ...a, ms: performance.now() - t0 });
        };
        const req = http.request(
          {
            host: url.hostname,
            port: url.port,
            method,
            path,
            agent,
            headers: {
              cookie: s.cookie,
              'accept-encoding': 'gzip',
              ...(method === 'GET' ? {} : { 'x-csrf-token': s.csrf }),
              ...(payload
                ? { 'content-type': 'application/json', 'content-length': payload.length }
                : {}),
              ...headers,
            },
          },
          (res) => {
            const chunks: Buffer[] = [];
            const status = res.statusCode ?? 0;
            const keep = status < 200 || status >= 300;
            res.on('data', (c: Buffer) => keep && chunks.push(c));
            res.on('error', (err) =>
              done({ status: 0, headers: {}, text: '', error: err.message }),
            );
            res.on('end', () => {
              let raw = Buffer.concat(chunks);
              if (keep && res.headers['content-encoding'] === 'gzip') {
                try {
                  raw = zlib.gunzipSync(raw);
                } catch {
                  // keep the bytes as they came
                }
              }
              done({ status, headers: res.headers, text: keep ? raw.toString('utf8') : '' });
            });
          },
        );
        req.setTimeout(timeoutMs, () =>
          req.destroy(new Error(`no answer within ${timeoutMs / 1000} s`)),
        );
        req.on('error', (err) => done({ status: 0, headers: {}, text: '', error: err.message }));
        req.end(payload);
      });
    },
    close: () => agent.destroy(),
  };
}
