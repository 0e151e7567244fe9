/**
 * `BENCH_ONLY=import`: the import section of `npm run bench` alone, for each stand of
 * `BENCH_TREES` — the stand's advice made current first, as the whole run leaves it before its
 * import — printed only (docs/benchmarks.md is written by the whole run).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { upcomingSeason } from '../../shared/schemas/plan';
import { ok, signIn } from './http';
import { importBench, IMPORT_ROWS } from './import-bench';
import { pct } from './machine';
import { ratio } from './report';
import { startBenchServer } from './server-process';
import { hasAdviceStatus, untilCurrent } from './stand-bench';
import { BENCH_OWNER, syntheticStandFile } from './synthetic-stand';

export async function importOnly(trees: number, seasons: number): Promise<void> {
  const season = upcomingSeason();
  console.log(
    `\n### ${IMPORT_ROWS.toLocaleString('en-US')}-row import into a stand of ${trees.toLocaleString('en-US')} trees`,
  );
  const cached = await syntheticStandFile({ trees, seasons, lastSeason: season - 1 });
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-bench-'));
  const dbFile = path.join(dir, 'bench.sqlite');
  fs.copyFileSync(cached.file, dbFile);
  const server = await startBenchServer({ dbFile, logFile: path.join(dir, 'server.log') });
  try {
    const s = await signIn(server.url, BENCH_OWNER.email, BENCH_OWNER.password);
    const t0 = performance.now();
    await ok(
      s,
      'GET',
      `/api/sugarbushes/${cached.standId}/plan?season=${season}&page=1&pageSize=50`,
    );
    if (await hasAdviceStatus(s, cached.standId, season))
      await untilCurrent(s, cached.standId, season, t0);
    console.log(
      `  advice current ${(performance.now() - t0).toFixed(0)} ms after the first plan page`,
    );
    const f = await importBench(s, cached.standId, {
      cached: cached.file,
      scratch: path.join(dir, 'floor.sqlite'),
    });
    console.log(
      `  CSV import of ${f.rows.toLocaleString('en-US')} trees (${(f.bytes / 1000).toFixed(0)} kB): ${f.importMs.toFixed(0)} ms, answered ${f.status}, ${f.created} created`,
    );
    console.log(
      `  bare prepared insert of the same rows ${f.floorMs.toFixed(0)} ms; import ÷ insert ${ratio(f.importMs, f.floorMs)}`,
    );
    console.log(
      `  progress polled ${f.polls} times (every 500 ms), steps seen: ${f.steps.join(' → ') || 'none'}`,
    );
    console.log(
      `  GET /api/auth/csrf meanwhile: p50 ${f.trivial.p50.toFixed(1)} ms, p99 ${f.trivial.p99.toFixed(1)} ms, ${f.trivial.requests} requests; others used ${pct(f.busy.others)} of the cores`,
    );
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
