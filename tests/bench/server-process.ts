/**
 * The real server in a child process of its own, listening on loopback only, so that the load
 * generator and the server each have their own event loop (and, on two cores, roughly a core).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const READY_TIMEOUT_MS = 180_000;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

export interface BenchServer {
  url: string;
  pid: number;
  /** Seconds from spawn to the first answer (start-up, migrations forward included). */
  readyS: number;
  stop(): Promise<void>;
}

/**
 * Start `server/index.ts` under tsx on a copy of a database file; resolves once it answers. `env`
 * adds or overrides settings (a crash test's pause, say).
 */
export async function startBenchServer(opts: {
  dbFile: string;
  logFile: string;
  env?: Record<string, string>;
}) {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const log = fs.openSync(opts.logFile, 'a');
  const t0 = performance.now();
  const child: ChildProcess = spawn(
    process.execPath,
    ['--import', 'tsx', path.join(root, 'server', 'index.ts')],
    {
      cwd: root,
      stdio: ['ignore', log, log],
      env: {
        PATH: process.env.PATH,
        HOME: process.env.HOME,
        NODE_ENV: 'production',
        HOST: '127.0.0.1',
        PORT: String(port),
        APP_URL: url,
        DATABASE_FILE: opts.dbFile,
        SESSION_SECRET: 'clearwood-bench-session-secret',
        SEED_DEMO: 'false',
        LOGIN_RATE_LIMIT: '1000',
        ...opts.env,
      },
    },
  );
  let exited: number | null = null;
  child.once('exit', (code) => (exited = code ?? -1));

  const stop = async () => {
    if (exited !== null) return;
    const gone = new Promise<void>((resolve) => child.once('exit', () => resolve()));
    child.kill('SIGTERM');
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    await gone;
    clearTimeout(timer);
    fs.closeSync(log);
  };

  for (;;) {
    if (exited !== null) {
      const tail = fs.readFileSync(opts.logFile, 'utf8').slice(-3000);
      throw new Error(`The server exited (${exited}) before answering:\n${tail}`);
    }
    if (performance.now() - t0 > READY_TIMEOUT_MS) {
      await stop();
      throw new Error(`The server did not answer within ${READY_TIMEOUT_MS / 1000} s`);
    }
    try {
      const res = await fetch(`${url}/api/auth/csrf`, { signal: AbortSignal.timeout(2000) });
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    url,
    pid: child.pid!,
    readyS: (performance.now() - t0) / 1000,
    stop,
  } satisfies BenchServer;
}
