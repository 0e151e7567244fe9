import fs from 'node:fs';
import os from 'node:os';
import net from 'node:net';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { startServer } from '../../server/index';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';

/** The real server on a free port and a fresh SQLite file holding the demo stand. */
export async function startDemoServer() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-e2e-'));
  const running = await startServer({
    ...process.env,
    NODE_ENV: 'test',
    PORT: '0',
    DATABASE_URL: undefined,
    DATABASE_FILE: path.join(dir, 'e2e.sqlite'),
    LOGIN_RATE_LIMIT: '1000',
  });
  await seedDemoIfEmpty(running.db);
  return running;
}

/** Debian's Chromium driven by playwright-core: no browser download, no outside traffic. */
export async function launchBrowser(): Promise<Browser> {
  const executablePath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (!fs.existsSync(executablePath))
    throw new Error(`No Chromium at ${executablePath} (set CHROMIUM_PATH)`);
  return chromium.launch({
    executablePath,
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ],
  });
}

/** Every request a page makes; tests fail on any host but localhost. */
export function recordHosts(page: Page): Set<string> {
  const hosts = new Set<string>();
  page.on('request', (req) => {
    const url = new URL(req.url());
    if (url.protocol.startsWith('http')) hosts.add(url.hostname);
  });
  return hosts;
}

export async function signInAs(page: Page, baseUrl: string, email: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('maple-demo-2027');
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export type DemoServer = Awaited<ReturnType<typeof startDemoServer>>;

/**
 * A demo server and a browser for the test file: started before its tests, closed after them.
 * Read `env.server` and `env.browser` inside the tests.
 */
export function demoServerAndBrowser(): { server: DemoServer; browser: Browser } {
  const env = {} as { server: DemoServer; browser: Browser };
  beforeAll(async () => {
    env.server = await startDemoServer();
    env.browser = await launchBrowser();
  });
  afterAll(async () => {
    await env.browser?.close();
    await env.server?.close();
  });
  return env;
}

/** The hosts a page asked that are not this machine: every browser test expects none. */
export const offSite = (hosts: Set<string>) =>
  [...hosts].filter((h) => h !== 'localhost' && h !== '127.0.0.1');

/**
 * A TCP relay in front of the server whose link a test can cut, as a phone loses coverage.
 * Chromium's emulated offline (`context.setOffline`) does not hold across a reload: the new
 * document's first requests may go out before it is applied again, unseen by the page's events.
 * Cut, the relay drops every open connection and resets each new one, so nothing reaches the
 * server whatever the emulation does; use both.
 */
export async function cuttableLink(target: string) {
  const { hostname, port } = new URL(target);
  const open = new Set<net.Socket>();
  let cut = false;
  const relay = net.createServer((client) => {
    if (cut) return client.resetAndDestroy();
    const upstream = net.connect(Number(port), hostname);
    open.add(client).add(upstream);
    const end = () => {
      client.destroy();
      upstream.destroy();
      open.delete(client);
      open.delete(upstream);
    };
    for (const s of [client, upstream]) s.on('error', end).on('close', end);
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => relay.listen(0, '127.0.0.1', resolve));
  const { port: relayPort } = relay.address() as net.AddressInfo;
  const drop = () => {
    for (const s of open) s.destroy();
    open.clear();
  };
  return {
    /** The server's address through the relay (another origin than the server's own). */
    url: `http://127.0.0.1:${relayPort}`,
    cut() {
      cut = true;
      drop();
    },
    restore() {
      cut = false;
    },
    close: () =>
      new Promise<void>((resolve) => {
        cut = true;
        drop();
        relay.close(() => resolve());
      }),
  };
}
