import { fractionalYear, seasonOf } from './dates';

export interface DatedDbh {
  measuredOn: string;
  dbhCm: number;
  /** A forester confirmed this reading: it is never left out as far off the line. */
  confirmedOutlier?: boolean | null;
}

export type GrowthFlag = 'shrinking' | 'outlier-dropped';

export interface Growth {
  /** Slope of the least-squares line of DBH over time (cm per year). */
  dbhCmPerYear: number;
  /** Basal-area growth at the current DBH: π/2 · DBH · dDBH/dt (cm² per year). */
  basalAreaCm2PerYear: number;
  /** Distinct seasons behind the fit. */
  seasons: number;
  /** Half the DBH growth: how fast clear wood is laid outside old tapholes. */
  radialCmPerYear: number;
  /** The fitted DBH at the latest measurement used. */
  dbhCmNow: number;
  /** True when the figures look like a measuring error (a shrinking trunk). */
  suspect: boolean;
  flags: GrowthFlag[];
  /** The one reading left out as far off the line, if any. */
  dropped: DatedDbh | null;
}

/** A reading is left out only if it lies this far off the others' line: 4 × their scatter, and at least 1 cm. */
const OUTLIER_SCATTER_FACTOR = 4;
const OUTLIER_MIN_CM = 1;

interface Point {
  t: number;
  y: number;
  season: number;
  source: DatedDbh;
}

interface Line {
  slope: number;
  intercept: number;
}

function fit(points: readonly Point[], skip = -1): Line {
  let n = 0;
  let st = 0;
  let sy = 0;
  for (let i = 0; i < points.length; i++) {
    if (i === skip) continue;
    n++;
    st += points[i].t;
    sy += points[i].y;
  }
  const mt = st / n;
  const my = sy / n;
  let stt = 0;
  let sty = 0;
  for (let i = 0; i < points.length; i++) {
    if (i === skip) continue;
    const dt = points[i].t - mt;
    stt += dt * dt;
    sty += dt * (points[i].y - my);
  }
  const slope = stt > 0 ? sty / stt : 0;
  return { slope, intercept: my - slope * mt };
}

function rms(points: readonly Point[], line: Line, skip: number): number {
  let sum = 0;
  let n = 0;
  for (let i = 0; i < points.length; i++) {
    if (i === skip) continue;
    const r = points[i].y - (line.intercept + line.slope * points[i].t);
    sum += r * r;
    n++;
  }
  return n > 2 ? Math.sqrt(sum / (n - 2)) : 0;
}

function distinctSeasons(points: readonly Point[], skip = -1): number {
  const seen = new Set<number>();
  points.forEach((p, i) => i !== skip && seen.add(p.season));
  return seen.size;
}

/** The single reading whose leave-one-out error is far beyond the others' scatter, or -1. */
function findOutlier(points: readonly Point[]): number {
  if (points.length < 4) return -1;
  let worst = -1;
  let worstError = 0;
  let worstScatter = 0;
  for (let i = 0; i < points.length; i++) {
    if (points[i].source.confirmedOutlier === true) continue;
    const line = fit(points, i);
    const error = Math.abs(points[i].y - (line.intercept + line.slope * points[i].t));
    if (error > worstError) {
      worst = i;
      worstError = error;
      worstScatter = rms(points, line, i);
    }
  }
  const threshold = Math.max(OUTLIER_SCATTER_FACTOR * worstScatter, OUTLIER_MIN_CM);
  return worst >= 0 && worstError > threshold && distinctSeasons(points, worst) >= 2 ? worst : -1;
}

/**
 * DBH growth from dated measurements: least squares over time in fractional years, with one
 * reading left out when it lies far off the line of the others. Null with fewer than two seasons.
 */
export function growth(measurements: readonly DatedDbh[]): Growth | null {
  const points: Point[] = [];
  for (const m of measurements) {
    if (!(m.dbhCm > 0) || !Number.isFinite(m.dbhCm)) continue;
    points.push({
      t: fractionalYear(m.measuredOn),
      y: m.dbhCm,
      season: seasonOf(m.measuredOn),
      source: m,
    });
  }
  if (distinctSeasons(points) < 2) return null;
  const origin = points[0].t;
  for (const p of points) p.t -= origin;

  const outlier = findOutlier(points);
  const line = fit(points, outlier);
  let latest = -Infinity;
  points.forEach((p, i) => {
    if (i !== outlier && p.t > latest) latest = p.t;
  });
  const dbhCmNow = line.intercept + line.slope * latest;
  const flags: GrowthFlag[] = [];
  if (line.slope < 0) flags.push('shrinking');
  if (outlier >= 0) flags.push('outlier-dropped');
  return {
    dbhCmPerYear: line.slope,
    basalAreaCm2PerYear: (Math.PI / 2) * dbhCmNow * line.slope,
    seasons: distinctSeasons(points, outlier),
    radialCmPerYear: line.slope / 2,
    dbhCmNow,
    suspect: line.slope < 0,
    flags,
    dropped: outlier >= 0 ? points[outlier].source : null,
  };
}
