/**
 * `BENCH_ONLY=load`: the mixed load section of `npm run bench` alone, for each stand of
 * `BENCH_TREES`, the stand's advice made current first; printed only (docs/benchmarks.md is
 * written by the whole run).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { upcomingSeason } from '../../shared/schemas/plan';
import { ok, signIn } from './http';
import { mixedHeader, mixedPara, mixedRows, mixedSummary, mixedVerdicts } from './mixed-doc';
import { mixedSection, prepareCrew } from './mixed-section';
import { table } from './report';
import { startBenchServer } from './server-process';
import { hasAdviceStatus, untilCurrent } from './stand-bench';
import { BENCH_OWNER, syntheticStandFile } from './synthetic-stand';

export async function mixedOnly(trees: number, seasons: number): Promise<void> {
  const season = upcomingSeason();
  const label = `${trees.toLocaleString('en-US')} trees`;
  console.log(`\n### Mixed load on a stand of ${label}`);
  const cached = await syntheticStandFile({ trees, seasons, lastSeason: season - 1 });
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-bench-'));
  const dbFile = path.join(dir, 'bench.sqlite');
  fs.copyFileSync(cached.file, dbFile);
  const crew = await prepareCrew(dbFile, cached.standId);
  const server = await startBenchServer({ dbFile, logFile: path.join(dir, 'server.log') });
  try {
    const owner = await signIn(server.url, BENCH_OWNER.email, BENCH_OWNER.password);
    const t0 = performance.now();
    await ok(
      owner,
      'GET',
      `/api/sugarbushes/${cached.standId}/plan?season=${season}&page=1&pageSize=50`,
    );
    if (await hasAdviceStatus(owner, cached.standId, season))
      await untilCurrent(owner, cached.standId, season, t0);
    console.log(
      `  advice current ${(performance.now() - t0).toFixed(0)} ms after the first plan page`,
    );
    const f = await mixedSection({
      baseUrl: server.url,
      owner,
      crew,
      standFile: cached.file,
      standId: cached.standId,
      season,
    });
    console.log(mixedPara(f));
    console.log(table(mixedHeader, mixedRows(f)));
    console.log(`  ${mixedSummary(f, label)}`);
    for (const v of mixedVerdicts(f, label))
      console.log(`  ${v.met ? 'met' : 'MISSED'}: ${v.what}: ${v.text}`);
    for (const e of [...f.floor.errorSamples, ...f.mixed.errorSamples])
      console.log(`  error: ${e}`);
  } finally {
    await server.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
