/**
 * The woods map at scale, in headless Chromium: how long a large stand takes to fetch and draw,
 * and how smoothly the map pans once it is drawn. Figures only; nothing here asserts a time.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../seeds/01_demo';
import { startServer } from '../../server/index';
import { seedDemoIfEmpty } from '../../server/scripts/seed-demo';
import { upcomingSeason } from '../../shared/schemas/plan';
import { launchBrowser, recordHosts, signInAs } from '../e2e/harness';
import { writeStandOwner, writeSyntheticStand } from './synthetic-stand';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const VIEWPORT = { width: 1280, height: 800 };
const FRAME_MS = 1000 / 60;
const LONG_FRAME_MS = 50;
const DRAG = { dx: 480, dy: 200, steps: 60, ms: 2000 };
const AFTER_RELEASE_MS = 1200;
const DRAW_TIMEOUT_MS = 120_000;
const BENCH_OWNER = 'bench-owner@stand.example';
const DEMO_OWNER = 'owner@fernside.example';
const MARK = 'clearwood:trees-drawn';
const RUNS = Math.max(1, Number(process.env.BENCH_MAP_RUNS ?? 2) || 1);

/** What the page records about itself; installed before any of its own scripts run. */
interface Probe {
  drawnAt?: number;
  drawnCount?: number;
  fullAt?: number;
  longestTask: number;
  frames: number[];
  recording: boolean;
  downAt?: number;
  upAt?: number;
}
type ProbeWindow = Window & { __clearwoodBench: Probe };

function installProbe(mark: string) {
  const probe: Probe = { longestTask: 0, frames: [], recording: false };
  (window as unknown as ProbeWindow).__clearwoodBench = probe;
  try {
    new PerformanceObserver((list) => {
      for (const e of list.getEntries())
        probe.longestTask = Math.max(probe.longestTask, e.duration);
    }).observe({ type: 'longtask', buffered: true });
  } catch {
    // No long-task timing in this browser: the figure stays 0.
  }
  // The tree layer stamps its container once every marker is in the group; two frames later the
  // canvas has painted them.
  new MutationObserver((records) => {
    if (probe.drawnAt !== undefined) return;
    for (const r of records) {
      const el = r.target as HTMLElement;
      const count = Number(el.dataset.treesDrawn);
      if (!count) continue;
      probe.drawnAt = performance.getEntriesByName(mark).at(-1)?.startTime ?? performance.now();
      probe.drawnCount = count;
      requestAnimationFrame(() =>
        requestAnimationFrame(() => {
          probe.fullAt = performance.now();
        }),
      );
      return;
    }
  }).observe(document, { subtree: true, attributes: true, attributeFilter: ['data-trees-drawn'] });
  addEventListener('mousedown', () => (probe.downAt = performance.now()), true);
  addEventListener('mouseup', () => (probe.upAt = performance.now()), true);
}

/** A rAF loop that records frame intervals until stopped, and never for more than `maxMs`. */
function startFrames(maxMs: number) {
  const probe = (window as unknown as ProbeWindow).__clearwoodBench;
  probe.frames = [];
  probe.recording = true;
  const until = performance.now() + maxMs;
  const tick = (t: number) => {
    probe.frames.push(t);
    if (probe.recording && t < until) requestAnimationFrame(tick);
    else probe.recording = false;
  };
  requestAnimationFrame(tick);
}

/** Builds the client when dist/ is missing, older than the sources, or lacks the draw signal. */
export function ensureClientBuilt() {
  const index = path.join(root, 'dist', 'index.html');
  const newest = (dir: string): number =>
    fs
      .readdirSync(dir, { withFileTypes: true })
      .reduce(
        (m, e) =>
          Math.max(
            m,
            e.isDirectory()
              ? newest(path.join(dir, e.name))
              : fs.statSync(path.join(dir, e.name)).mtimeMs,
          ),
        0,
      );
  const assets = path.join(root, 'dist', 'assets');
  const stale =
    !fs.existsSync(index) ||
    Math.max(newest(path.join(root, 'src')), newest(path.join(root, 'shared'))) >
      fs.statSync(index).mtimeMs ||
    !fs.existsSync(assets) ||
    !fs
      .readdirSync(assets)
      .some(
        (f) => f.endsWith('.js') && fs.readFileSync(path.join(assets, f), 'utf8').includes(MARK),
      );
  if (!stale) return;
  console.log('Building the client (vite build)…');
  const built = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], {
    cwd: root,
    encoding: 'utf8',
    timeout: 180_000,
  });
  if (built.status !== 0) {
    process.stderr.write(`${built.stdout ?? ''}${built.stderr ?? ''}`);
    throw new Error('vite build failed');
  }
}

const quantile = (sorted: readonly number[], q: number) =>
  sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

function frameStats(intervals: readonly number[]) {
  const sorted = [...intervals].sort((a, b) => a - b);
  return {
    count: sorted.length,
    median: quantile(sorted, 0.5),
    p95: quantile(sorted, 0.95),
    max: sorted.at(-1) ?? NaN,
    long: sorted.filter((ms) => ms > LONG_FRAME_MS).length,
  };
}

interface StandCase {
  label: string;
  sugarbushId: number;
  email: string;
  trees: number;
}

interface Timing {
  startAt: number;
  endAt: number;
  ms: number;
  waitMs: number;
  bytes: number;
  wireBytes: number;
}

interface MapFigures {
  treesDrawn: number;
  fetch: Timing;
  code: Timing | null;
  figures: Timing | null;
  treesInLayerMs: number;
  firstDrawMs: number;
  longestTaskMs: number;
  heapBytes: number | null;
  drag: ReturnType<typeof frameStats>;
  afterRelease: ReturnType<typeof frameStats>;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, Math.max(0, ms)));

async function dragAcross(page: Page) {
  const box = await page.locator('.leaflet-container').boundingBox();
  if (!box) throw new Error('No map on the page');
  const x0 = box.x + box.width / 2 - DRAG.dx / 2;
  const y0 = box.y + box.height / 2 - DRAG.dy / 2;
  await page.mouse.move(x0, y0);
  await page.evaluate(startFrames, DRAG.ms + AFTER_RELEASE_MS + 5000);
  await sleep(150);
  await page.mouse.down();
  const t0 = Date.now();
  for (let i = 1; i <= DRAG.steps; i++) {
    await page.mouse.move(x0 + (DRAG.dx * i) / DRAG.steps, y0 + (DRAG.dy * i) / DRAG.steps);
    await sleep(t0 + (DRAG.ms * i) / DRAG.steps - Date.now());
  }
  await page.mouse.up();
  await sleep(AFTER_RELEASE_MS);
  return page.evaluate(() => {
    const probe = (window as unknown as ProbeWindow).__clearwoodBench;
    probe.recording = false;
    return { frames: probe.frames, downAt: probe.downAt ?? 0, upAt: probe.upAt ?? Infinity };
  });
}

async function measureStand(browser: Browser, baseUrl: string, stand: StandCase) {
  const context = await browser.newContext({ viewport: VIEWPORT });
  try {
    const page = await context.newPage();
    const hosts = recordHosts(page);
    await signInAs(page, baseUrl, stand.email);
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.waitForLoadState('networkidle');

    // tsx keeps function names through an `__name` helper that the page lacks.
    await page.addInitScript({ content: 'globalThis.__name = (f) => f;' });
    await page.addInitScript(installProbe, MARK);
    await page.goto(`${baseUrl}/sugarbushes/${stand.sugarbushId}/map`);
    await page.waitForFunction(
      () => (window as unknown as ProbeWindow).__clearwoodBench.fullAt !== undefined,
      undefined,
      { timeout: DRAW_TIMEOUT_MS, polling: 100 },
    );
    const api = `/api/sugarbushes/${stand.sugarbushId}`;
    const loaded = await page.evaluate((api) => {
      const probe = (window as unknown as ProbeWindow).__clearwoodBench;
      const resources = performance.getEntriesByType('resource') as PerformanceResourceTiming[];
      const find = (test: (pathname: string) => boolean) =>
        resources.find((e) => test(new URL(e.name).pathname));
      const timing = (e: PerformanceResourceTiming) => ({
        startAt: e.startTime,
        endAt: e.responseEnd,
        ms: e.responseEnd - e.startTime,
        waitMs: e.responseStart - e.requestStart,
        bytes: e.decodedBodySize,
        wireBytes: e.encodedBodySize,
      });
      const data = find((p) => p === `${api}/map`);
      // Leaflet and the map's own code load beside the page, once the data is in: the last
      // script or style sheet in before the trees were drawn.
      const code = resources
        .filter((e) => /^\/assets\/.*\.(js|css)$/.test(new URL(e.name).pathname))
        .filter((e) => e.responseEnd <= (probe.drawnAt ?? Infinity))
        .sort((a, b) => b.responseEnd - a.responseEnd)[0];
      const figures = find((p) => p === `${api}/figures`);
      const memory = (performance as unknown as { memory?: { usedJSHeapSize: number } }).memory;
      return {
        probe: { ...probe, frames: [] },
        fetch: data && timing(data),
        code: code ? timing(code) : null,
        figures: figures ? timing(figures) : null,
        heapBytes: memory ? memory.usedJSHeapSize : null,
      };
    }, api);
    if (!loaded.fetch) throw new Error('The page made no map data request');
    if (process.env.BENCH_MAP_VERBOSE === '1') {
      const timeline = await page.evaluate(() =>
        (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).map(
          (e) => [e.startTime, e.responseEnd, new URL(e.name).pathname] as const,
        ),
      );
      for (const [from, to, where] of timeline)
        console.log(`    ${fmt(from).padStart(6)} → ${fmt(to).padStart(6)} ms  ${where}`);
    }

    // Let the stand figures and the rest of the page settle, then pan.
    await page.waitForLoadState('networkidle');
    await sleep(500);
    const pan = await dragAcross(page);
    const intervals = pan.frames.slice(1).map((t, i) => ({ at: t, ms: t - pan.frames[i] }));
    const outside = [...hosts].filter((h) => h !== 'localhost' && h !== '127.0.0.1');
    if (outside.length) throw new Error(`The map reached beyond this machine: ${outside.join()}`);

    const figures: MapFigures = {
      treesDrawn: loaded.probe.drawnCount ?? 0,
      fetch: loaded.fetch,
      code: loaded.code,
      figures: loaded.figures,
      treesInLayerMs: loaded.probe.drawnAt ?? NaN,
      firstDrawMs: loaded.probe.fullAt ?? NaN,
      longestTaskMs: loaded.probe.longestTask,
      heapBytes: loaded.heapBytes,
      drag: frameStats(
        intervals.filter((f) => f.at > pan.downAt && f.at <= pan.upAt).map((f) => f.ms),
      ),
      afterRelease: frameStats(intervals.filter((f) => f.at > pan.upAt).map((f) => f.ms)),
    };
    return figures;
  } finally {
    await context.close();
  }
}

const fmt = (n: number, digits = 0) =>
  n.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
const mib = (bytes: number) => `${fmt(bytes / 2 ** 20, 1)} MiB`;

function report(stand: StandCase, f: MapFigures, others: readonly MapFigures[]) {
  const data = f.fetch.ms;
  const rest = others.map((o) => `${fmt(o.firstDrawMs)} ms`).join(', ');
  console.log(
    `\n${stand.label}: ${fmt(f.treesDrawn)} trees drawn, ${VIEWPORT.width}×${VIEWPORT.height}, ${others.length ? `the fastest of ${others.length + 1} page loads` : 'one page load'}${rest ? ` (${others.length > 1 ? 'the others' : 'the other'}: ${rest})` : ''}`,
  );
  if (f.treesDrawn !== stand.trees)
    console.log(
      `  (the stand has ${fmt(stand.trees)} mapped trees; the map drew a different count)`,
    );
  const inHand = Math.max(f.fetch.endAt, f.code?.endAt ?? 0);
  const rows: [string, number][] = [
    ['navigation → map data requested', f.fetch.startAt],
    ['map data request (page’s resource timing)', data],
    ['  of which waiting for the server', f.fetch.waitMs],
  ];
  if (f.code) rows.push(['data in hand → map code in hand', inHand - f.fetch.endAt]);
  rows.push(
    ['data and code in hand → every marker in the layer', f.treesInLayerMs - inHand],
    ['every marker in the layer → painted (2 frames)', f.firstDrawMs - f.treesInLayerMs],
    ['navigation → first full draw', f.firstDrawMs],
    ['longest task while loading', f.longestTaskMs],
  );
  if (f.figures) rows.push(['stand figures request (same server)', f.figures.ms]);
  for (const [label, ms] of rows) {
    console.log(
      `  ${label.padEnd(52)} ${fmt(ms).padStart(6)} ms   ${(ms / data).toFixed(2)}× data`,
    );
  }
  console.log(
    `  map data ${mib(f.fetch.bytes)} of JSON (${mib(f.fetch.wireBytes)} on the wire), ${fmt(f.fetch.bytes / f.treesDrawn)} bytes a tree`,
  );
  console.log(
    `  first full draw ${fmt(f.firstDrawMs)} ms (${(f.firstDrawMs / data).toFixed(1)}× the ${fmt(data)} ms to fetch the map data)`,
  );
  const frames = (label: string, s: ReturnType<typeof frameStats>) =>
    console.log(
      `    ${label.padEnd(22)} ${String(s.count).padStart(4)} frames: median ${fmt(s.median, 1)} ms (${(s.median / FRAME_MS).toFixed(2)}× a 60 Hz frame), p95 ${fmt(s.p95, 1)} ms, max ${fmt(s.max, 1)} ms, ${s.long} long (> ${LONG_FRAME_MS} ms)`,
    );
  console.log(
    `  panning, ${DRAG.dx} px across and ${DRAG.dy} px down in ${DRAG.steps} steps over ${fmt(DRAG.ms / 1000, 1)} s:`,
  );
  frames('while dragging', f.drag);
  frames(`${fmt(AFTER_RELEASE_MS)} ms after release`, f.afterRelease);
  console.log(
    `  JS heap used ${f.heapBytes === null ? 'n/a (no performance.memory)' : `${mib(f.heapBytes)} (performance.memory), ${(f.heapBytes / f.fetch.bytes).toFixed(1)}× the map data`}`,
  );
}

/** The map benchmark: a synthetic stand of `trees` trees, then the demo stand for comparison. */
export async function benchMapDraw(opts: { trees: number; seasons: number }) {
  ensureClientBuilt();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-bench-map-'));
  let server: Awaited<ReturnType<typeof startServer>> | undefined;
  let browser: Browser | undefined;
  try {
    server = await startServer({
      ...process.env,
      NODE_ENV: 'test',
      PORT: '0',
      DATABASE_FILE: path.join(dir, 'bench-map.sqlite'),
      LOGIN_RATE_LIMIT: '1000',
    });
    const db = server.db;
    await seedDemoIfEmpty(db);
    const sugarbushId = await writeSyntheticStand(db, {
      trees: opts.trees,
      seasons: opts.seasons,
      lastSeason: upcomingSeason() - 1,
    });
    await writeStandOwner(db, sugarbushId, { email: BENCH_OWNER, password: DEMO_PASSWORD });
    const demo = await db('sugarbushes as s')
      .join('trees as t', 't.sugarbush_id', 's.id')
      .where('s.name', 'Owl Ledge')
      .whereNotNull('t.lat')
      .groupBy('s.id')
      .first('s.id', db.raw('count(*) as n'));

    const stands: StandCase[] = [
      { label: 'Bench Stand', sugarbushId, email: BENCH_OWNER, trees: opts.trees },
      ...(demo && process.env.BENCH_MAP_DEMO !== '0'
        ? [{ label: 'Owl Ledge (demo)', sugarbushId: demo.id, email: DEMO_OWNER, trees: demo.n }]
        : []),
    ];
    console.log(
      `\nWoods map in headless Chromium (${path.basename(process.env.CHROMIUM_PATH ?? '/usr/bin/chromium')}), server on ${server.url}`,
    );
    browser = await launchBrowser();
    const results: MapFigures[] = [];
    for (const stand of stands) {
      const runs: MapFigures[] = [];
      for (let i = 0; i < RUNS; i++) runs.push(await measureStand(browser, server.url, stand));
      runs.sort((a, b) => a.firstDrawMs - b.firstDrawMs);
      report(stand, runs[0], runs.slice(1));
      results.push(runs[0]);
    }
    if (results.length === 2) {
      const [big, small] = results;
      console.log(
        `\n${fmt(big.treesDrawn / small.treesDrawn, 1)}× the trees: map data ${fmt(big.fetch.ms / small.fetch.ms, 1)}×, first full draw ${fmt(big.firstDrawMs / small.firstDrawMs, 1)}×, longest task ${fmt(big.longestTaskMs / Math.max(small.longestTaskMs, 1), 1)}×, drag median frame ${fmt(big.drag.median / small.drag.median, 2)}×`,
      );
    }
  } finally {
    await browser?.close();
    await server?.close();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
