import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { ConfigError, DEFAULT_SESSION_SECRET, loadConfig } from '../../server/config';
import { createApp } from '../../server/app';
import { quietLogger } from '../../server/lib/logger';
import { errorHandler } from '../../server/middleware/errors';
import { makeTestApp } from './test-app';

const closers: (() => Promise<void>)[] = [];
afterEach(async () => {
  while (closers.length) await closers.pop()!();
});

const root = path.resolve(import.meta.dirname, '../..');

/** Start the real server process with this environment; resolves with its exit code and output. */
function startProcess(env: Record<string, string>) {
  return new Promise<{ code: number | null; output: string }>((resolve) => {
    const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server/index.ts')], {
      cwd: root,
      env: { PATH: process.env.PATH ?? '', ...env },
    });
    let output = '';
    child.stdout.on('data', (d) => (output += d));
    child.stderr.on('data', (d) => (output += d));
    const timer = setTimeout(() => child.kill('SIGKILL'), 30_000);
    child.on('exit', (code) => {
      clearTimeout(timer);
      resolve({ code, output });
    });
  });
}

describe('production defaults', () => {
  it('when production starts with the default session secret, then the process exits non-zero naming SESSION_SECRET', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-prod-'));
    const { code, output } = await startProcess({
      NODE_ENV: 'production',
      PORT: '0',
      DATABASE_FILE: path.join(dir, 'prod.sqlite'),
    });
    expect(code).not.toBe(0);
    expect(code).not.toBeNull();
    expect(output).toMatch(/SESSION_SECRET/);
    expect(fs.existsSync(path.join(dir, 'prod.sqlite'))).toBe(false);
  });

  it('when production sets its own secret, then the demo is not seeded unless SEED_DEMO=true', () => {
    const base = { NODE_ENV: 'production', SESSION_SECRET: 'a-real-secret-of-some-length' };
    expect(loadConfig(base).SEED_DEMO).toBe(false);
    expect(loadConfig({ ...base, SEED_DEMO: 'true' }).SEED_DEMO).toBe(true);
    expect(loadConfig({}).SEED_DEMO).toBe(true);
    expect(() =>
      loadConfig({ NODE_ENV: 'production', SESSION_SECRET: DEFAULT_SESSION_SECRET }),
    ).toThrow(ConfigError);
  });

  it('when TRUST_PROXY is "true", then the server refuses it and says why', () => {
    expect(() => loadConfig({ TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY/);
    expect(loadConfig({ TRUST_PROXY: 'loopback' }).TRUST_PROXY).toBe('loopback');
    expect(loadConfig({}).TRUST_PROXY).toBe(false);
  });

  it("when production is given the crash tests' write pause, then the server refuses it", () => {
    const base = { NODE_ENV: 'production', SESSION_SECRET: 'a-real-secret-of-some-length' };
    expect(() => loadConfig({ ...base, IMPORT_WRITE_PAUSE_MS: '20' })).toThrow(
      /IMPORT_WRITE_PAUSE_MS/,
    );
    expect(loadConfig({ ...base, IMPORT_WRITE_PAUSE_MS: '0' }).IMPORT_WRITE_PAUSE_MS).toBe(0);
    expect(
      loadConfig({ NODE_ENV: 'test', IMPORT_WRITE_PAUSE_MS: '20' }).IMPORT_WRITE_PAUSE_MS,
    ).toBe(20);
  });

  it('when served behind HTTPS, then HSTS is sent; on plain http it is not', async () => {
    const secure = await makeTestApp({ COOKIE_SECURE: 'true' });
    closers.push(secure.close);
    const plain = await makeTestApp();
    closers.push(plain.close);
    expect(
      (await request(secure.app).get('/api/auth/csrf')).headers['strict-transport-security'],
    ).toMatch(/max-age=/);
    expect(
      (await request(plain.app).get('/api/auth/csrf')).headers['strict-transport-security'],
    ).toBeUndefined();
  });

  it('then the content security policy allows no outside styles, scripts or fonts', async () => {
    const t = await makeTestApp();
    closers.push(t.close);
    const csp = (await request(t.app).get('/api/auth/csrf')).headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toMatch(/https:/);
  });
});

describe('error bodies carry only our own words', () => {
  for (const NODE_ENV of ['development', 'production'] as const) {
    it(`when a shipped tile is missing (${NODE_ENV}), then the 404 names no file path`, async () => {
      const t = await makeTestApp({
        NODE_ENV,
        SESSION_SECRET: 'a-real-secret-of-some-length',
      });
      closers.push(t.close);
      const res = await request(t.app).get('/tiles/nope.png');
      expect(res.status).toBe(404);
      expect(res.body).toEqual({ error: { code: 'not-found', message: 'Not found' } });
      expect(JSON.stringify(res.body)).not.toContain(root);
    });
  }

  it('when the built client is served, then the service worker, its manifest and the shell are asked for afresh, and hashed assets may be cached', async () => {
    const t = await makeTestApp();
    closers.push(t.close);
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-client-'));
    fs.mkdirSync(path.join(dir, 'assets'));
    for (const [file, body] of [
      ['index.html', '<!doctype html><title>Clearwood</title>'],
      ['sw.js', 'self.addEventListener("fetch", () => {});'],
      ['manifest.webmanifest', '{"name":"Clearwood"}'],
      ['assets/index-abc123.js', 'console.log(1);'],
    ])
      fs.writeFileSync(path.join(dir, file), body);
    const app = createApp({
      config: { ...t.config, NODE_ENV: 'production' },
      db: t.db,
      clientDir: dir,
      log: quietLogger,
    });
    closers.push(async () => {
      await app.ctx.advice.close();
      app.ctx.photos.close();
    });
    for (const url of ['/sw.js', '/manifest.webmanifest', '/index.html']) {
      const res = await request(app).get(url);
      expect({ url, status: res.status, cache: res.headers['cache-control'] }).toEqual({
        url,
        status: 200,
        cache: 'no-cache',
      });
    }
    const asset = await request(app).get('/assets/index-abc123.js');
    expect(asset.headers['cache-control']).toBe('public, max-age=3600');
    const csp = (await request(app).get('/sign-in')).headers['content-security-policy'];
    expect(csp).toContain("worker-src 'self'");
    expect(csp).toContain("manifest-src 'self'");
  });

  it('when a library throws with an internal message, then the client gets a plain 500 and the log gets the detail', () => {
    const logged: unknown[] = [];
    const handler = errorHandler({
      log: { info: () => undefined, error: (_m, e) => logged.push(e) },
    });
    let status = 0;
    let body: unknown;
    const res = {
      status(s: number) {
        status = s;
        return this;
      },
      json(b: unknown) {
        body = b;
        return this;
      },
    };
    const internal = new Error(`SQLITE_ERROR: no such table: trees at ${root}/server/db.ts`);
    handler(internal, { method: 'GET', path: '/api/x' } as never, res as never, () => undefined);
    expect(status).toBe(500);
    expect(body).toEqual({
      error: { code: 'internal', message: 'Something went wrong on our side' },
    });
    expect(logged).toEqual([internal]);
    const clientError = Object.assign(new Error(`ENOENT: ${root}/public/x`), { status: 404 });
    handler(clientError, { method: 'GET', path: '/x' } as never, res as never, () => undefined);
    expect(JSON.stringify(body)).not.toContain(root);
  });
});
