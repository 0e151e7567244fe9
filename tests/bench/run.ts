/**
 * `npm run bench`: Clearwood's figures at scale, each beside a floor measured in the same run,
 * printed and written to docs/benchmarks.md. Not part of `npm test`; nothing here asserts a
 * time. Everything runs on this machine (the server on 127.0.0.1, headless Chromium).
 *
 *   BENCH_TREES=20000,100000   stands to measure      BENCH_MAP=0        skip the browser
 *   BENCH_MAP_RUNS=2           page loads per stand   BENCH_LOAD_SECONDS=4  per autocannon run
 *   BENCH_WRITE_DOC=0          print only, leave docs/benchmarks.md as it is
 *   BENCH_ONLY=import          only the 10,000-row import (and the trivial route meanwhile) for
 *                              each stand, no build, no browser, printed only
 *   BENCH_ONLY=load            only the mixed load run (50 signed-in users, reads and writes,
 *                              beside the trivial route) for each stand, printed only
 *   BENCH_MIXED_SECONDS=30     length of each of the mixed load's two runs
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import type { Browser } from 'playwright-core';
import { upcomingSeason } from '../../shared/schemas/plan';
import { launchBrowser } from '../e2e/harness';
import { bundleFigures, ensureClientBuilt, type BundleFigures } from './bundle';
import { importBench, IMPORT_ROWS } from './import-bench';
import { importOnly } from './import-only';
import { mixedOnly } from './mixed-only';
import { mixedSummary } from './mixed-doc';
import { mixedSection, prepareCrew } from './mixed-section';
import { busyWindow, machineInfo, pct } from './machine';
import { measureMap } from './map-draw';
import { readStand, standSettings, timePlanStand } from './plan-floor';
import { signIn, ok } from './http';
import { writeDoc, type StandResult } from './write-doc';
import { startBenchServer, root } from './server-process';
import {
  afterGuidelineChange,
  afterMeasurements,
  hasAdviceStatus,
  pageLoads,
  trivialDuringRecompute,
  untilCurrent,
} from './stand-bench';
import { BENCH_OWNER, syntheticStandFile } from './synthetic-stand';

const STANDS = (process.env.BENCH_TREES ?? '20000,100000').split(',').map(Number);
const SEASONS = 10;
const SEASON = upcomingSeason();
const MAP = process.env.BENCH_MAP !== '0';
const MAP_RUNS = Math.max(1, Number(process.env.BENCH_MAP_RUNS ?? 2) || 1);
const OTHER_PROFILE = 'traditional';
const ONLY = process.env.BENCH_ONLY ?? '';
if (ONLY !== '' && ONLY !== 'import' && ONLY !== 'load') {
  console.error(`BENCH_ONLY must be "import" or "load" (or unset), not "${ONLY}"`);
  process.exit(2);
}
const SAMPLE_TREES = 200;
/** The whole run puts the mixed load on this stand only (`BENCH_ONLY=load` on each of BENCH_TREES). */
const MIXED_STAND = 20_000;
const MEASURED_TREES = 10;

async function benchStand(trees: number, browser: Browser | null): Promise<StandResult> {
  const label = `${trees.toLocaleString('en-US')} trees`;
  console.log(`\n### Stand of ${label} × ${SEASONS} seasons, season ${SEASON} advised`);
  const cached = await syntheticStandFile({ trees, seasons: SEASONS, lastSeason: SEASON - 1 });
  console.log(
    cached.generatedS === null
      ? `  from the cache (${cached.file})`
      : `  written in ${cached.generatedS.toFixed(1)} s`,
  );
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-bench-'));
  const dbFile = path.join(dir, 'bench.sqlite');
  fs.copyFileSync(cached.file, dbFile);

  // The floor: the advisor alone over the whole stand, one thread, the server not yet running.
  const floorWindow = busyWindow();
  const t0 = performance.now();
  const record = readStand(cached.file, cached.standId);
  const readMs = performance.now() - t0;
  const settings = standSettings(cached.file, cached.standId);
  const plan = timePlanStand(record, { season: SEASON, ...settings });
  const planOther = timePlanStand(record, { ...settings, season: SEASON, profile: OTHER_PROFILE });
  const floorBusy = floorWindow.end();
  console.log(
    `  single-thread planStand: ${plan.ms.toFixed(0)} ms (${settings.profile}), ${planOther.ms.toFixed(0)} ms (${OTHER_PROFILE}); reading the record ${readMs.toFixed(0)} ms`,
  );
  const step = Math.max(1, Math.floor(record.length / SAMPLE_TREES));
  const sample = record.filter((_, i) => i % step === 0).slice(0, SAMPLE_TREES);
  const treeIds = sample.map((t) => Number(t.treeId));

  const crew = trees === MIXED_STAND ? await prepareCrew(dbFile, cached.standId) : null;
  const server = await startBenchServer({ dbFile, logFile: path.join(dir, 'server.log') });
  try {
    console.log(`  server on ${server.url}, answering ${server.readyS.toFixed(1)} s after start`);
    const s = await signIn(server.url, BENCH_OWNER.email, BENCH_OWNER.password);
    const stored = await hasAdviceStatus(s, cached.standId, SEASON);

    // The first plan after start: with stored advice, the stand's advice is computed (workers)
    // and the page waits for it; without, every plan request computes it.
    const w0 = performance.now();
    const firstPlan = await ok(
      s,
      'GET',
      `/api/sugarbushes/${cached.standId}/plan?season=${SEASON}&page=1&pageSize=50`,
    );
    const warmMs = stored
      ? Math.max(firstPlan.ms, await untilCurrent(s, cached.standId, SEASON, w0))
      : firstPlan.ms;
    console.log(
      `  first plan page after start ${warmMs.toFixed(0)} ms (stored advice: ${stored ? 'yes' : 'no'})`,
    );

    const pages = await pageLoads(s, cached.standId, SEASON, treeIds);

    const errors: string[] = [];
    /** A section that fails is reported as failed; the other sections still run. */
    const attempt = async <T>(what: string, work: () => Promise<T>): Promise<T | null> => {
      try {
        return await work();
      } catch (err) {
        console.log(`  ${what} failed: ${(err as Error).message}`);
        errors.push(`${what}: ${(err as Error).message}`);
        return null;
      }
    };
    for (const p of pages) if (p.error) errors.push(`${p.page}: ${p.error}`);

    const map = !browser
      ? null
      : await attempt('the woods map', async () => {
          const w = busyWindow();
          const m = await measureMap(
            browser,
            server.url,
            {
              label: `Bench Stand, ${label}`,
              sugarbushId: cached.standId,
              email: BENCH_OWNER.email,
              trees,
            },
            MAP_RUNS,
          );
          return { ...m, busy: w.end() };
        });

    const measured = sample
      .filter((t) => t.measurements.length > 0 && t.status !== 'dead')
      .slice(0, MEASURED_TREES)
      .map((t) => ({ id: Number(t.treeId), latestDbhCm: t.measurements.at(-1)!.dbhCm }));
    const measurements = await attempt('recompute after a measurement', async () => {
      const w = busyWindow();
      const m = await afterMeasurements(s, cached.standId, SEASON, measured);
      console.log(`  one measurement: POST median ${median(m.posts).toFixed(1)} ms`);
      return { ...m, busy: w.end() };
    });
    const guideline = await attempt('recompute after a guideline change', async () => {
      const w = busyWindow();
      const g = await afterGuidelineChange(s, cached.standId, SEASON, OTHER_PROFILE, stored);
      console.log(
        `  guideline change → ${stored ? 'advice current' : 'next plan page'} ${g.recomputeMs.toFixed(0)} ms`,
      );
      return { ...g, busy: w.end() };
    });
    const during = await attempt('the trivial route during a whole-stand recompute', async () => {
      const d = await trivialDuringRecompute(s, cached.standId, SEASON, settings.profile, stored);
      console.log(
        `  trivial route during a whole-stand recompute (${d.recomputeMs.toFixed(0)} ms): p99 ${d.trivial.p99.toFixed(1)} ms, ${d.trivial.requests} requests`,
      );
      return d;
    });
    // Before the import, which adds 10,000 trees to the stand.
    const mixed = !crew
      ? undefined
      : await attempt('the mixed load', async () => {
          const f = await mixedSection({
            baseUrl: server.url,
            owner: s,
            crew,
            standFile: cached.file,
            standId: cached.standId,
            season: SEASON,
          });
          console.log(`  ${mixedSummary(f, 'mixed load')}`);
          return f;
        });
    const imports = await attempt(`a ${IMPORT_ROWS}-row CSV import`, async () => {
      const f = await importBench(s, cached.standId, {
        cached: cached.file,
        scratch: path.join(dir, 'floor.sqlite'),
      });
      console.log(
        `  CSV import of ${f.rows} trees ${f.importMs.toFixed(0)} ms (bare insert ${f.floorMs.toFixed(0)} ms); trivial route meanwhile p99 ${f.trivial.p99.toFixed(1)} ms`,
      );
      return f;
    });
    return {
      trees,
      label,
      measurementsCount: cached.measurements,
      tapholesCount: cached.tapholes,
      generatedS: cached.generatedS,
      writtenInS: cached.writtenInS,
      serverReadyS: server.readyS,
      stored,
      warmMs,
      floor: {
        readMs,
        planMs: plan.ms,
        planOtherMs: planOther.ms,
        profile: settings.profile,
        otherProfile: OTHER_PROFILE,
        busy: floorBusy,
      },
      pages,
      map,
      measurements,
      guideline,
      during,
      mixed,
      imports,
      errors,
    };
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

export const median = (xs: readonly number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.floor(s.length / 2)] : NaN;
};

async function main() {
  if (ONLY === 'import') {
    for (const trees of STANDS) await importOnly(trees, SEASONS);
    return;
  }
  if (ONLY === 'load') {
    for (const trees of STANDS) await mixedOnly(trees, SEASONS);
    return;
  }
  const started = performance.now();
  const machine = machineInfo();
  const whole = busyWindow();
  console.log(
    `Clearwood benchmarks at ${machine.commit}${machine.dirty ? ' (uncommitted changes)' : ''}: ${machine.cores} cores, Node ${machine.node}, load ${machine.load.join(' / ')}`,
  );
  const build = ensureClientBuilt();
  if (build.built) console.log(`Built the client in ${build.seconds.toFixed(0)} s`);
  const bundle: BundleFigures = bundleFigures();

  let browser: Browser | null = null;
  const stands: StandResult[] = [];
  try {
    if (MAP) browser = await launchBrowser();
    for (const trees of STANDS) stands.push(await benchStand(trees, browser));
  } finally {
    await browser?.close();
  }
  const busy = whole.end();
  const seconds = (performance.now() - started) / 1000;
  const markdown = writeDoc({
    machine,
    endLoad: os.loadavg(),
    busy,
    seconds,
    build,
    bundle,
    stands,
    season: SEASON,
    mapRuns: MAP_RUNS,
  });
  if (process.env.BENCH_WRITE_DOC !== '0') {
    fs.writeFileSync(path.join(root, 'docs', 'benchmarks.md'), markdown);
    console.log('\nWritten to docs/benchmarks.md');
  }
  console.log(
    `The whole run took ${(seconds / 60).toFixed(1)} min; others used ${pct(busy.others)} of the cores meanwhile.`,
  );
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
