/**
 * One stand's figures through HTTP against the real server: page loads at 20 connections beside
 * a trivial route measured the same way just before, recompute after a measurement and after a
 * guideline change, and the trivial route while the whole stand is re-advised.
 */
import { performance } from 'node:perf_hooks';
import { busyWindow, type BusyWindow } from './machine';
import { isoDay } from '../../shared/schemas/iso-date';
import { load, ok, timed, type LoadFigures, type Session } from './http';

export const CONNECTIONS = 20;
const LOAD_SECONDS = Number(process.env.BENCH_LOAD_SECONDS ?? 4);
const SLOW_CAP_SECONDS = 30;
const RECOMPUTE_CAP_MS = 240_000;
const SETTLE_CAP_MS = 180_000;
export const TRIVIAL = '/api/auth/csrf';

export type PageFigures = {
  page: string;
  route: string;
  busy: BusyWindow;
} & (
  | {
      figures: LoadFigures;
      /** The trivial route, measured the same way just before. */
      floor: LoadFigures;
      error: null;
    }
  | { figures: null; floor: null; error: string }
);

interface AdviceStatus {
  season: number;
  state: 'current' | 'updating';
  done: number;
  total: number;
}

/** Whether the server keeps stored advice with a status route (404 where it does not). */
export async function hasAdviceStatus(s: Session, standId: number, season: number) {
  const r = await timed(s, 'GET', `/api/sugarbushes/${standId}/advice-status?season=${season}`);
  return r.status === 200;
}

/** Poll the stand's advice status until it is current for the season; milliseconds waited. */
export async function untilCurrent(s: Session, standId: number, season: number, t0: number) {
  for (;;) {
    const r = await ok<AdviceStatus>(
      s,
      'GET',
      `/api/sugarbushes/${standId}/advice-status?season=${season}`,
    );
    if (r.body.state === 'current') return performance.now() - t0;
    if (performance.now() - t0 > RECOMPUTE_CAP_MS)
      throw new Error(`The stand's advice was not current after ${RECOMPUTE_CAP_MS / 1000} s`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/**
 * Wait until the server is idle again: a run cut at its cap leaves requests in flight on the
 * server, which would otherwise land in the next run's figures.
 */
export async function settle(s: Session) {
  const until = performance.now() + SETTLE_CAP_MS;
  let quick = 0;
  while (quick < 3 && performance.now() < until) {
    try {
      quick = (await ok(s, 'GET', TRIVIAL)).ms < 25 ? quick + 1 : 0;
    } catch {
      quick = 0; // still busy past the request's own time-out
    }
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

export async function pageLoads(
  s: Session,
  standId: number,
  season: number,
  treeIds: readonly number[],
): Promise<PageFigures[]> {
  const pages: [string, string, string[]][] = [
    [
      'tree list page',
      'GET /api/sugarbushes/:id/trees?page=1&pageSize=50',
      [`/api/sugarbushes/${standId}/trees?page=1&pageSize=50`],
    ],
    [
      'plan page (with totals)',
      'GET /api/sugarbushes/:id/plan?page=1&pageSize=50',
      [`/api/sugarbushes/${standId}/plan?season=${season}&page=1&pageSize=50`],
    ],
    ['tree page: the tree', 'GET /api/trees/:id', treeIds.map((id) => `/api/trees/${id}`)],
    [
      'tree page: its advice',
      'GET /api/trees/:id/advice',
      treeIds.map((id) => `/api/trees/${id}/advice?season=${season}`),
    ],
  ];
  const out: PageFigures[] = [];
  for (const [page, route, paths] of pages) {
    await settle(s);
    const window = busyWindow();
    try {
      const floor = await load(s, {
        connections: CONNECTIONS,
        seconds: LOAD_SECONDS,
        capSeconds: SLOW_CAP_SECONDS,
        paths: [TRIVIAL],
      });
      const figures = await load(s, {
        connections: CONNECTIONS,
        seconds: LOAD_SECONDS,
        capSeconds: SLOW_CAP_SECONDS,
        paths,
      });
      out.push({ page, route, figures, floor, busy: window.end(), error: null });
      console.log(
        `  ${page.padEnd(26)} p50 ${figures.p50.toFixed(1)} ms, p99 ${figures.p99.toFixed(1)} ms, ${figures.rps.toFixed(0)} req/s` +
          `   (trivial p99 ${floor.p99.toFixed(1)} ms, ${floor.rps.toFixed(0)} req/s)` +
          (figures.failed ? `, ${figures.failed} failed` : '') +
          (figures.capped ? ', cut at the time cap' : '') +
          (figures.connections < CONNECTIONS ? `, on ${figures.connections} connections` : ''),
      );
    } catch (err) {
      console.log(`  ${page}: failed (${(err as Error).message})`);
      out.push({
        page,
        route,
        figures: null,
        floor: null,
        busy: window.end(),
        error: (err as Error).message,
      });
    }
  }
  return out;
}

export interface MeasurementFigures {
  posts: number[];
  adviceReads: number[];
  planAfter: number;
}

/** Record one plausible autumn reading on each of a few trees, then read its advice. */
export async function afterMeasurements(
  s: Session,
  standId: number,
  season: number,
  trees: readonly { id: number; latestDbhCm: number }[],
): Promise<MeasurementFigures> {
  await settle(s);
  const posts: number[] = [];
  const adviceReads: number[] = [];
  // A reading is never dated ahead of today: from June on, `season - 1` is this year.
  const measuredOn = `${season - 1}-11-20` > isoDay() ? isoDay() : `${season - 1}-11-20`;
  for (const t of trees) {
    const post = await ok(s, 'POST', `/api/trees/${t.id}/measurements`, {
      measuredOn,
      dbhCm: Math.round((t.latestDbhCm + 0.2) * 10) / 10,
      crownDiebackPct: 0,
    });
    posts.push(post.ms);
    adviceReads.push((await ok(s, 'GET', `/api/trees/${t.id}/advice?season=${season}`)).ms);
  }
  const plan = await ok(
    s,
    'GET',
    `/api/sugarbushes/${standId}/plan?season=${season}&page=1&pageSize=50`,
  );
  return { posts, adviceReads, planAfter: plan.ms };
}

export interface GuidelineFigures {
  patchMs: number;
  /** PATCH sent → advice current (stored advice), or → the next plan page answered. */
  recomputeMs: number;
  planAfterMs: number;
  stored: boolean;
}

/** Change the stand's guideline and wait for its advice to follow. */
export async function afterGuidelineChange(
  s: Session,
  standId: number,
  season: number,
  profile: string,
  stored: boolean,
): Promise<GuidelineFigures> {
  await settle(s);
  const t0 = performance.now();
  const patch = await ok(s, 'PATCH', `/api/sugarbushes/${standId}`, { profile });
  const planPath = `/api/sugarbushes/${standId}/plan?season=${season}&page=1&pageSize=50`;
  if (stored) {
    const recomputeMs = await untilCurrent(s, standId, season, t0);
    const plan = await ok(s, 'GET', planPath);
    return { patchMs: patch.ms, recomputeMs, planAfterMs: plan.ms, stored };
  }
  const plan = await ok(s, 'GET', planPath);
  return { patchMs: patch.ms, recomputeMs: performance.now() - t0, planAfterMs: plan.ms, stored };
}

export interface UnderRecompute {
  trivial: LoadFigures;
  recomputeMs: number;
  busy: BusyWindow;
}

/** The trivial route at 20 connections while a guideline change re-advises the whole stand. */
export async function trivialDuringRecompute(
  s: Session,
  standId: number,
  season: number,
  profile: string,
  stored: boolean,
): Promise<UnderRecompute> {
  await settle(s);
  const window = busyWindow();
  const t0 = performance.now();
  await ok(s, 'PATCH', `/api/sugarbushes/${standId}`, { profile });
  const done = stored
    ? untilCurrent(s, standId, season, t0)
    : ok(s, 'GET', `/api/sugarbushes/${standId}/plan?season=${season}&page=1&pageSize=50`).then(
        () => performance.now() - t0,
      );
  const trivial = await load(s, {
    connections: CONNECTIONS,
    seconds: RECOMPUTE_CAP_MS / 1000,
    capSeconds: RECOMPUTE_CAP_MS / 1000,
    paths: [TRIVIAL],
    until: done,
  });
  return { trivial, recomputeMs: await done, busy: window.end() };
}
