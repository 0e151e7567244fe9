/**
 * The woods map at scale, in headless Chromium: how long a large stand takes to fetch and draw,
 * and how smoothly the map pans once it is drawn. Figures only; nothing here asserts a time.
 */
import type { Browser, Page } from 'playwright-core';
import { recordHosts, signInAs } from '../e2e/harness';
import { DRAW_MARK } from './bundle';

const VIEWPORT = { width: 1280, height: 800 };
const FRAME_MS = 1000 / 60;
const LONG_FRAME_MS = 50;
const DRAG = { dx: 480, dy: 200, steps: 60, ms: 2000 };
const AFTER_RELEASE_MS = 1200;
const DRAW_TIMEOUT_MS = 120_000;
const MARK = DRAW_MARK;

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

export interface StandCase {
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

export interface MapFigures {
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

export function reportMap(stand: StandCase, f: MapFigures, others: readonly MapFigures[]) {
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

/**
 * Open the stand's map `runs` times (a fresh page each) on a running server, print the fastest
 * load's figures and return them with the other loads' first-draw times.
 */
export async function measureMap(
  browser: Browser,
  baseUrl: string,
  stand: StandCase,
  runs: number,
): Promise<{ best: MapFigures; others: MapFigures[] }> {
  const all: MapFigures[] = [];
  for (let i = 0; i < runs; i++) all.push(await measureStand(browser, baseUrl, stand));
  all.sort((a, b) => a.firstDrawMs - b.firstDrawMs);
  reportMap(stand, all[0], all.slice(1));
  return { best: all[0], others: all.slice(1) };
}
