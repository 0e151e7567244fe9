/**
 * `npm run bench`: figures for the advisor and the woods map at scale. Not part of `npm test`;
 * nothing here asserts a time. Prints each figure and its ratio to the time it takes merely to
 * read the rows (the plan) or to fetch the map data (the map). BENCH_MAP=0 skips the map.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import { loadConfig } from '../../server/config';
import { createBackground } from '../../server/lib/background';
import { createAdviceJobs } from '../../server/modules/advice/advice-jobs';
import { quietLogger } from '../../server/lib/logger';
import { createDb, migrateLatest } from '../../server/db';
import { createMailer } from '../../server/mail/mailer';
import { loadStandTrees } from '../../server/modules/plans/plans.repository';
import { plansService } from '../../server/modules/plans/plans.service';
import { planStand } from '../../shared/rules/index';
import { benchMapDraw } from './map-draw';
import { writeSyntheticStand } from './synthetic-stand';

const TREES = Number(process.env.BENCH_TREES ?? 20_000);
const SEASONS = 10;
const SEASON = 2027;
const RUNS = 3;

async function time<T>(fn: () => Promise<T> | T): Promise<{ ms: number; value: T }> {
  let best = Infinity;
  let value!: T;
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    value = await fn();
    best = Math.min(best, performance.now() - t0);
  }
  return { ms: best, value };
}

/** The season plan of a synthetic stand, read and advised on the server side. */
async function benchPlan() {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'clearwood-bench-'));
  const file = path.join(dir, 'bench.sqlite');
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_FILE: file });
  const db = createDb(file);
  await migrateLatest(db);

  console.log(
    `Writing a synthetic stand: ${TREES.toLocaleString('en-US')} trees × ${SEASONS} seasons…`,
  );
  const t0 = performance.now();
  const standId = await writeSyntheticStand(db, {
    trees: TREES,
    seasons: SEASONS,
    lastSeason: SEASON - 1,
  });
  const [{ m }] = await db('measurements').count({ m: '*' });
  const [{ h }] = await db('tapholes').count({ h: '*' });
  console.log(
    `  ${Number(m).toLocaleString('en-US')} measurements, ${Number(h).toLocaleString('en-US')} tapholes, written in ${((performance.now() - t0) / 1000).toFixed(1)} s`,
  );

  const read = await time(() => loadStandTrees(db, standId));
  const advise = await time(() =>
    planStand(read.value, { season: SEASON, profile: 'conservative' }),
  );
  const service = plansService({
    db,
    config,
    log: quietLogger,
    mailer: createMailer(config, db, quietLogger),
    background: createBackground(quietLogger),
    advice: createAdviceJobs({ db, database: config.database, log: quietLogger }),
  });
  const endpoint = await time(() =>
    service.planForStand(standId, { page: 1, pageSize: 50, season: SEASON }),
  );
  const memory = process.memoryUsage();

  const rows = [
    ['read the rows (trees, measurements, tapholes)', read.ms],
    ['advise every tree (pure planStand)', advise.ms],
    ['whole plan request (read + advise + page)', endpoint.ms],
  ] as const;
  console.log(`\nSeason ${SEASON} plan, best of ${RUNS} runs:`);
  for (const [label, ms] of rows) {
    console.log(
      `  ${label.padEnd(48)} ${ms.toFixed(0).padStart(6)} ms   ${(ms / read.ms).toFixed(2)}× read`,
    );
  }
  console.log(
    `  per tree (whole request)${' '.repeat(24)} ${((endpoint.ms / TREES) * 1000).toFixed(1).padStart(6)} µs`,
  );
  console.log(
    `  plan totals: ${endpoint.value.totals.treesToTap} trees to tap, ${endpoint.value.totals.taps} taps`,
  );
  console.log(
    `  heap used ${(memory.heapUsed / 2 ** 20).toFixed(0)} MiB, rss ${(memory.rss / 2 ** 20).toFixed(0)} MiB`,
  );

  await db.destroy();
  fs.rmSync(dir, { recursive: true, force: true });
}

async function main() {
  await benchPlan();
  if (process.env.BENCH_MAP !== '0') await benchMapDraw({ trees: TREES, seasons: SEASONS });
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
