import { Rng, round } from './random';
import type { MeasurementRow, TreeSpec } from './types';

/** The dry summer: every tree put on a thin ring, and some crowns thinned that autumn and next. */
export const DROUGHT_SEASON = 2020;

/**
 * Stand-wide growing conditions per season (1 = an average summer): the 2020 drought, a slow
 * 2021 after it, a wet 2023, a late frost in 2025. Sugar maple DBH growth runs about 2 in (5 cm)
 * per decade on second-growth trees and up to about 4 in (USFS Silvics of North America, Godman,
 * Yawney & Tubbs 1990 — S), so ordinary trees draw 0.25–1.0 cm a year.
 */
const SEASON_GROWTH: Record<number, number> = {
  2018: 1,
  2019: 1.04,
  [DROUGHT_SEASON]: 0.6,
  2021: 0.9,
  2022: 1,
  2023: 1.1,
  2024: 1,
  2025: 0.88,
  2026: 1,
};

export interface GrowthHistory {
  /** True DBH (cm) at each autumn round. */
  autumnDbh: Record<number, number>;
  /** True DBH (cm) when the season's holes were drilled (late winter, before that summer's ring). */
  springDbh: Record<number, number>;
  /** Crown dieback class (%) rated at each autumn round. */
  dieback: Record<number, number>;
  measurements: MeasurementRow[];
}

const pad = (x: number) => String(x).padStart(2, '0');

/** The autumn round walks the tags in order, about 130 trees a day through October. */
export function roundDate(key: string, season: number, n: number): string {
  const start = Rng.for(key, 'round', season).int(1, 6);
  return `${season}-10-${pad(start + Math.floor((n - 1) / 130))}`;
}

/** Crown vigour: growth slows once dieback passes the 10 % that still counts as healthy. */
const vigour = (diebackPct: number) =>
  Math.min(1, Math.max(0.1, 1 - Math.max(0, diebackPct - 10) / 60));

/** A released crown grows faster, though hardly past the 4 in a decade of a fast sugar maple. */
function released(spec: TreeSpec, season: number): number {
  const r = spec.release;
  if (!r || season < r.from) return spec.rate;
  const factor = season === r.from ? 1 + (r.factor - 1) / 2 : r.factor;
  return Math.min(spec.rate * factor, Math.max(spec.rate, 1.05));
}

/** Crown dieback moves a class now and then; the drought thinned crowns that autumn and the next. */
const FLICKER = [
  [0, 84],
  [5, 9],
  [-5, 7],
] as const;
const DRY_FLICKER = [
  [0, 76],
  [5, 18],
  [-5, 6],
] as const;

export function growTree(key: string, spec: TreeSpec, lastSeason: number): GrowthHistory {
  const rng = Rng.for(key, 'growth', spec.n);
  const dieback: Record<number, number> = {};
  for (let s = spec.firstSeason; s <= lastSeason; s++) {
    const dry = s === DROUGHT_SEASON || s === DROUGHT_SEASON + 1;
    const flicker = rng.weighted(dry ? DRY_FLICKER : FLICKER);
    dieback[s] = spec.diebackBySeason[s] ?? Math.max(0, spec.diebackBase + flicker);
  }

  const autumnDbh: Record<number, number> = { [spec.firstSeason]: spec.dbhStart };
  const springDbh: Record<number, number> = {
    [spec.firstSeason]: spec.dbhStart - spec.rate * SEASON_GROWTH[spec.firstSeason] * 0.8,
  };
  for (let s = spec.firstSeason + 1; s <= lastSeason; s++) {
    const prev = autumnDbh[s - 1];
    springDbh[s] = prev;
    const alive = spec.diedIn === null || s < spec.diedIn;
    const gain = alive
      ? released(spec, s) * (SEASON_GROWTH[s] ?? 1) * rng.range(0.85, 1.15) * vigour(dieback[s])
      : 0;
    autumnDbh[s] = Math.min(spec.maxDbh, prev + gain);
  }

  const measurements: MeasurementRow[] = [];
  const last = Math.min(lastSeason, spec.measuredThrough);
  for (let s = spec.firstSeason; s <= last; s++) {
    const error = rng.clampedNormal(0, spec.noiseSd, -0.3, 0.3);
    const slip =
      (spec.measureError?.season === s ? spec.measureError.cm : 0) +
      (spec.measureOffset && s >= spec.measureOffset.from ? spec.measureOffset.cm : 0);
    measurements.push({
      season: s,
      measuredOn: roundDate(key, s, spec.n),
      dbhCm: round(autumnDbh[s] + error + slip, 1),
      crownDiebackPct: dieback[s],
      note: spec.measurementNotes[s] ?? null,
      confirmedOutlier: spec.measureOffset?.from === s,
    });
  }
  return { autumnDbh, springDbh, dieback, measurements };
}
