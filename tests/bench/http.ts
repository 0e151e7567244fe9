/**
 * Talking to the bench server as a signed-in owner would: a cookie jar, CSRF tokens, timed
 * requests, and autocannon runs (loopback only, bounded in time).
 */
import { performance } from 'node:perf_hooks';
import autocannon from 'autocannon';

export interface Session {
  baseUrl: string;
  cookie: string;
  csrf: string;
}

const REQUEST_TIMEOUT_MS = 120_000;

function mergeCookies(jar: Map<string, string>, res: Response) {
  for (const line of res.headers.getSetCookie()) {
    const [pair] = line.split(';');
    const eq = pair.indexOf('=');
    jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
  }
}
const cookieHeader = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join('; ');

/** Sign in; the answer holds the session cookie and a CSRF token bound to that session. */
export async function signIn(baseUrl: string, email: string, password: string): Promise<Session> {
  const jar = new Map<string, string>();
  const csrf = async () => {
    const res = await fetch(`${baseUrl}/api/auth/csrf`, {
      headers: { cookie: cookieHeader(jar) },
    });
    mergeCookies(jar, res);
    return ((await res.json()) as { token: string }).token;
  };
  const first = await csrf();
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: {
      'content-type': 'application/json',
      'x-csrf-token': first,
      cookie: cookieHeader(jar),
    },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`Sign-in failed: ${login.status} ${await login.text()}`);
  mergeCookies(jar, login);
  const token = await csrf();
  return { baseUrl, cookie: cookieHeader(jar), csrf: token };
}

export interface Timed<T> {
  ms: number;
  status: number;
  body: T;
}

/** One request, timed from send to the last byte of the body. */
export async function timed<T = unknown>(
  s: Session,
  method: string,
  path: string,
  body?: unknown,
): Promise<Timed<T>> {
  const t0 = performance.now();
  const res = await fetch(`${s.baseUrl}${path}`, {
    method,
    headers: {
      cookie: s.cookie,
      ...(method === 'GET' ? {} : { 'x-csrf-token': s.csrf }),
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS),
  });
  const text = await res.text();
  const ms = performance.now() - t0;
  let parsed: unknown = text;
  try {
    parsed = JSON.parse(text);
  } catch {
    // not JSON: keep the text
  }
  return { ms, status: res.status, body: parsed as T };
}

export async function ok<T = unknown>(
  s: Session,
  method: string,
  path: string,
  body?: unknown,
): Promise<Timed<T>> {
  const r = await timed<T>(s, method, path, body);
  if (r.status >= 300)
    throw new Error(`${method} ${path} answered ${r.status}: ${JSON.stringify(r.body)}`);
  return r;
}

export interface LoadFigures {
  p50: number;
  p99: number;
  max: number;
  rps: number;
  requests: number;
  seconds: number;
  /** Answers other than 2xx, connection errors and time-outs. */
  failed: number;
  /** The run was cut short at its time cap. */
  capped: boolean;
  connections: number;
  /** One request alone, before the run (null when not probed). */
  probeMs: number | null;
}

export interface LoadOptions {
  connections: number;
  /** How long to run; a run on a slow route is cut at `capSeconds` instead. */
  seconds: number;
  capSeconds: number;
  /** Paths to cycle through, one per request (e.g. different trees). */
  paths: readonly string[];
  /** Stop early when this resolves (e.g. a recompute finished). */
  until?: Promise<unknown>;
}

/**
 * An autocannon run of GET requests with the session's cookie. When one request alone already
 * takes more than a twentieth of the run, a fixed number of requests is sent instead of running
 * for `seconds`, so that the slowest answers are counted rather than cut off at the end; and on
 * fewer connections when `connections` of them would not be served within `capSeconds`, so that
 * the server is not left with minutes of queued work after the run.
 */
export async function load(s: Session, opts: LoadOptions): Promise<LoadFigures> {
  const url = new URL(s.baseUrl);
  if (!['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname))
    throw new Error(`Load runs against this machine only, not ${url.hostname}`);
  let i = 0;
  const probeMs = opts.until ? null : (await ok(s, 'GET', opts.paths[0])).ms;
  const slow = probeMs !== null && probeMs > (opts.seconds * 1000) / 20;
  const connections = slow
    ? Math.max(1, Math.min(opts.connections, Math.floor((opts.capSeconds * 1000) / probeMs)))
    : opts.connections;
  const t0 = performance.now();
  let finish!: (r: autocannon.Result) => void;
  let fail!: (e: unknown) => void;
  const finished = new Promise<autocannon.Result>((resolve, reject) => {
    finish = resolve;
    fail = reject;
  });
  const instance = autocannon(
    {
      url: s.baseUrl,
      connections,
      ...(slow
        ? { amount: connections }
        : { duration: opts.until ? opts.capSeconds : opts.seconds }),
      timeout: REQUEST_TIMEOUT_MS / 1000,
      headers: { cookie: s.cookie },
      requests: [
        {
          method: 'GET',
          setupRequest: (req) => ({ ...req, path: opts.paths[i++ % opts.paths.length] }),
        },
      ],
    },
    (err, result) => (err ? fail(err) : finish(result)),
  );
  let capped = false;
  const cap = setTimeout(() => {
    capped = true;
    instance.stop();
  }, opts.capSeconds * 1000);
  void opts.until?.then(() => instance.stop());
  const result = await finished;
  clearTimeout(cap);
  const seconds = (performance.now() - t0) / 1000;
  return {
    p50: result.latency.p50,
    p99: result.latency.p99,
    max: result.latency.max,
    rps: result.requests.total / seconds,
    requests: result.requests.total,
    seconds,
    failed: result.non2xx + result.errors + result.timeouts,
    capped: capped && !opts.until,
    connections,
    probeMs,
  };
}
