/** Unit conversions. Canonical lengths are centimetres; 1 in = 2.54 cm exactly (NIST SP 811). */

export const CM_PER_IN = 2.54;
export const CM2_PER_IN2 = CM_PER_IN * CM_PER_IN;

export function cmToIn(cm: number): number {
  return cm / CM_PER_IN;
}

export function inToCm(inches: number): number {
  return inches * CM_PER_IN;
}

export function cm2ToIn2(cm2: number): number {
  return cm2 / CM2_PER_IN2;
}

export function in2ToCm2(in2: number): number {
  return in2 * CM2_PER_IN2;
}

/** °F = °C × 9/5 + 32. */
export function cToF(celsius: number): number {
  return (celsius * 9) / 5 + 32;
}

export function fToC(fahrenheit: number): number {
  return ((fahrenheit - 32) * 5) / 9;
}

/** Smallest angle between two azimuths, in degrees (0–180). */
export function azimuthGapDeg(a: number, b: number): number {
  const gap = Math.abs(normalizeAzimuth(a) - normalizeAzimuth(b));
  return gap > 180 ? 360 - gap : gap;
}

/** An azimuth folded into [0, 360). */
export function normalizeAzimuth(deg: number): number {
  const folded = deg % 360;
  const positive = folded < 0 ? folded + 360 : folded;
  return positive >= 360 ? 0 : positive;
}
