import type { GuidelineProfile, TapBand } from './profile-types';
import { resolveProfile } from './profiles';
import { CM_PER_IN } from './units';

/**
 * Edges are compared in the table's own unit with a tolerance far below any tape's reading, so
 * 30.48 cm is exactly 12 in (in the "12–<18 in" band) whatever the binary rounding of 30.48 / 2.54.
 */
const EDGE_TOLERANCE = 1e-9;

/** The DBH as the table reads it: in its unit, and to its step where it names one (Quebec: 0.1 cm). */
function inTableUnit(dbhCm: number, profile: GuidelineProfile): number {
  const step = profile.dbhStepCm;
  const read = step ? Math.round(dbhCm / step) * step : dbhCm;
  return profile.unit === 'in' ? read / CM_PER_IN : read;
}

/** The table row a DBH falls in, or null below the smallest tappable size. */
export function bandForDbh(dbhCm: number, profile: GuidelineProfile | string): TapBand | null {
  const p = resolveProfile(profile);
  if (!Number.isFinite(dbhCm) || dbhCm <= 0) return null;
  const size = inTableUnit(dbhCm, p);
  let found: TapBand | null = null;
  for (const band of p.bands) {
    if (size + EDGE_TOLERANCE * Math.max(1, band.from) >= band.from) found = band;
    else break;
  }
  return found;
}

/** Taps the guideline table allows at this DBH — the table lookup alone, nothing about health or growth. */
export function tapsForDbh(dbhCm: number, profile: GuidelineProfile | string): number {
  const band = bandForDbh(dbhCm, profile);
  return band ? Math.min(band.taps, resolveProfile(profile).maxTaps) : 0;
}
