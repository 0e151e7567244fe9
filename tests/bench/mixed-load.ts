/**
 * The mixed load run: every member of the crew signed in on a keep-alive connection of their
 * own, each in a loop of one action then a think time, for exactly `MIXED_SECONDS` (no new request
 * after that; the at most one request per user still in flight is waited for and counted). Every
 * answer is counted by kind and status; the floor is the same users and loop on the trivial route,
 * measured just before. A hand-written client rather than autocannon: autocannon sends each
 * connection's next request the moment the last is answered (no think time) and times all
 * requests as one.
 */
import { performance } from 'node:perf_hooks';
import seedrandom from 'seedrandom';
import type { Role } from '../../shared/schemas/enums';
import { ok, type Session } from './http';
import { busyWindow, type BusyWindow } from './machine';
import {
  KINDS,
  nextAction,
  trivialAction,
  TRIVIAL_KIND,
  type StandAt,
  type Step,
} from './mixed-actions';
import { userClient, type Answer } from './user-client';

export const MIXED_SECONDS = Math.max(1, Number(process.env.BENCH_MIXED_SECONDS ?? 30) || 30);
/** Between one action's answer and the next action: uniform in this range. */
export const THINK_MS = [250, 1250] as const;
const REQUEST_TIMEOUT_MS = 15_000;
const ERROR_SAMPLES = 8;

export interface KindFigures {
  kind: string;
  route: string;
  requests: number;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  /** Answers by status ("0" is a transport error). */
  statuses: Record<string, number>;
  /** Refusals the step asked for (a reading far off), answered as expected. */
  refused: number;
  errors: number;
}

export interface LoopFigures {
  users: number;
  /** From the first request to the last answer, the drain after the deadline included. */
  seconds: number;
  /** After the deadline, until the last request in flight was answered. */
  drainMs: number;
  requests: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  max: number;
  errors: number;
  refused: number;
  kinds: KindFigures[];
  errorSamples: string[];
  busy: BusyWindow;
}

export interface MixedFigures {
  users: number;
  roles: Partial<Record<Role, number>>;
  seconds: number;
  thinkMs: readonly [number, number];
  treePool: number;
  seeded: { sap: number; weather: number };
  floor: LoopFigures;
  mixed: LoopFigures;
}

/** Nearest-rank percentile of sorted values. */
export const percentile = (sorted: readonly number[], p: number) =>
  sorted.length
    ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]
    : NaN;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, Math.max(0, ms)));

class Tally {
  private times = new Map<string, number[]>();
  private statuses = new Map<string, Map<string, number>>();
  private refusedBy = new Map<string, number>();
  private errorsBy = new Map<string, number>();
  readonly samples: string[] = [];

  count(step: Step, a: Answer) {
    const k = step.kind;
    if (!this.times.has(k)) this.times.set(k, []);
    if (a.status !== 0) this.times.get(k)!.push(a.ms);
    const byStatus = this.statuses.get(k) ?? new Map<string, number>();
    this.statuses.set(k, byStatus);
    byStatus.set(String(a.status), (byStatus.get(String(a.status)) ?? 0) + 1);
    const why = judge(step, a);
    if (why === 'refused') this.refusedBy.set(k, (this.refusedBy.get(k) ?? 0) + 1);
    else if (why !== null) {
      this.errorsBy.set(k, (this.errorsBy.get(k) ?? 0) + 1);
      if (this.samples.length < ERROR_SAMPLES)
        this.samples.push(`${step.method} ${step.path} → ${why}`);
    }
  }

  figures(seconds: number, drainMs: number, users: number, busy: BusyWindow): LoopFigures {
    const order = [TRIVIAL_KIND, ...Object.keys(KINDS)];
    const kinds = [...this.times.keys()]
      .sort((a, b) => order.indexOf(a) - order.indexOf(b))
      .map((kind): KindFigures => {
        const t = [...this.times.get(kind)!].sort((a, b) => a - b);
        const statuses = Object.fromEntries(this.statuses.get(kind) ?? []);
        return {
          kind,
          route: kind === TRIVIAL_KIND ? 'GET /api/auth/csrf' : KINDS[kind as keyof typeof KINDS],
          requests: Object.values(statuses).reduce((n, x) => n + x, 0),
          p50: percentile(t, 50),
          p95: percentile(t, 95),
          p99: percentile(t, 99),
          max: t.at(-1) ?? NaN,
          statuses,
          refused: this.refusedBy.get(kind) ?? 0,
          errors: this.errorsBy.get(kind) ?? 0,
        };
      });
    const all = [...this.times.values()].flat().sort((a, b) => a - b);
    const requests = kinds.reduce((n, k) => n + k.requests, 0);
    return {
      users,
      seconds,
      drainMs,
      requests,
      rps: requests / seconds,
      p50: percentile(all, 50),
      p95: percentile(all, 95),
      p99: percentile(all, 99),
      max: all.at(-1) ?? NaN,
      errors: kinds.reduce((n, k) => n + k.errors, 0),
      refused: kinds.reduce((n, k) => n + k.refused, 0),
      kinds,
      errorSamples: this.samples,
      busy,
    };
  }
}

const errorCode = (text: string) => {
  try {
    return (JSON.parse(text) as { error?: { code?: string } }).error?.code ?? null;
  } catch {
    return null;
  }
};

/** null for an answer as expected, 'refused' for an expected refusal, else what was wrong. */
function judge(step: Step, a: Answer): null | 'refused' | string {
  if (a.status === 0) return `no answer (${a.error})`;
  const code = a.status >= 300 ? errorCode(a.text) : null;
  if (step.refusal) {
    if (a.status === 400 && code === step.refusal) return 'refused';
    return `${a.status}${code ? ` ${code}` : ''} where a ${step.refusal} refusal was expected`;
  }
  if (a.status >= 200 && a.status < 300) return null;
  if (a.status === 304 && step.conditional) return null;
  return `${a.status}${code ? ` ${code}` : ''} ${a.text.slice(0, 160)}`;
}

export interface LoopUser {
  role: Role;
  session: Session;
}

/** Run every user's loop for `seconds`; `actionFor` gives each role its next-action chooser. */
export async function runLoop(
  users: readonly LoopUser[],
  at: StandAt,
  seconds: number,
  actionFor: (role: Role) => ReturnType<typeof nextAction>,
): Promise<LoopFigures> {
  const tally = new Tally();
  const window = busyWindow();
  const t0 = performance.now();
  const deadline = t0 + seconds * 1000;
  const [thinkMin, thinkMax] = THINK_MS;
  const loop = async (u: LoopUser, i: number) => {
    const rng = seedrandom(`clearwood-mixed-${i}`);
    const client = userClient(u.session, REQUEST_TIMEOUT_MS);
    const etags = new Map<string, string>();
    const act = actionFor(u.role);
    try {
      // Users arrive spread over one think time rather than all at once.
      await sleep(Math.min(rng() * thinkMax, deadline - performance.now()));
      while (performance.now() < deadline) {
        for (const step of act(at, rng)) {
          if (performance.now() >= deadline) break;
          const etag = step.conditional ? etags.get(step.kind) : undefined;
          const a = await client.send(
            step.method,
            step.path,
            step.body,
            etag ? { 'if-none-match': etag } : {},
          );
          const got = a.headers.etag;
          if (step.conditional && typeof got === 'string') etags.set(step.kind, got);
          tally.count(step, a);
        }
        await sleep(
          Math.min(thinkMin + rng() * (thinkMax - thinkMin), deadline - performance.now()),
        );
      }
    } finally {
      client.close();
    }
  };
  await Promise.all(users.map(loop));
  const end = performance.now();
  return tally.figures((end - t0) / 1000, Math.max(0, end - deadline), users.length, window.end());
}

/** The same users and loop, first on the trivial route (the floor), then mixed. */
export async function mixedLoad(
  users: readonly LoopUser[],
  at: StandAt,
  seeded: MixedFigures['seeded'],
): Promise<MixedFigures> {
  const floor = await runLoop(users, at, MIXED_SECONDS, trivialAction);
  const mixed = await runLoop(users, at, MIXED_SECONDS, nextAction);
  const roles: Partial<Record<Role, number>> = {};
  for (const u of users) roles[u.role] = (roles[u.role] ?? 0) + 1;
  return {
    users: users.length,
    roles,
    seconds: MIXED_SECONDS,
    thinkMs: THINK_MS,
    treePool: at.trees.length,
    seeded,
    floor,
    mixed,
  };
}

/**
 * A season's log for the stand, through the API as its owner would type it in: a sap entry for
 * each of 45 days from late February, and 70 days of weather from the first of February.
 */
export async function seedSeasonLog(s: Session, standId: number, logSeason: number) {
  const rng = seedrandom('clearwood-mixed-season-log');
  const day = (month: number, d: number) => {
    const at = new Date(Date.UTC(logSeason, month - 1, d));
    return at.toISOString().slice(0, 10);
  };
  const SAP_DAYS = 45;
  const WEATHER_DAYS = 70;
  for (let i = 0; i < SAP_DAYS; i++) {
    await ok(s, 'POST', `/api/sugarbushes/${standId}/sap`, {
      collectedOn: day(2, 20 + i),
      volumeL: Math.round(2000 + rng() * 18000),
      sugarPct: Math.round((1.6 + rng() * 1.6) * 10) / 10,
      heldAtC: Math.round(rng() * 60) / 10,
      collection: i % 3 === 0 ? 'gravity' : 'vacuum',
    });
  }
  for (let i = 0; i < WEATHER_DAYS; i++) {
    const minC = Math.round((-14 + i * 0.15 + rng() * 8) * 10) / 10;
    await ok(s, 'POST', `/api/sugarbushes/${standId}/weather`, {
      date: day(2, 1 + i),
      minC,
      maxC: Math.round((minC + 3 + rng() * 10) * 10) / 10,
    });
  }
  return { sap: SAP_DAYS, weather: WEATHER_DAYS };
}
