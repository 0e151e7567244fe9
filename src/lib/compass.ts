import { normalizeAzimuth } from '@shared/rules/index';

/** The eight compass points, clockwise from north (0°), with the bearing each stands for. */
export const compassPoints = [
  { key: 'N', word: 'north', deg: 0 },
  { key: 'NE', word: 'north-east', deg: 45 },
  { key: 'E', word: 'east', deg: 90 },
  { key: 'SE', word: 'south-east', deg: 135 },
  { key: 'S', word: 'south', deg: 180 },
  { key: 'SW', word: 'south-west', deg: 225 },
  { key: 'W', word: 'west', deg: 270 },
  { key: 'NW', word: 'north-west', deg: 315 },
] as const;

export type CompassPointInfo = (typeof compassPoints)[number];

/** The points' letters, as a form's select holds them. */
export const compassKeys = compassPoints.map((p) => p.key);
export type CompassPoint = CompassPointInfo['key'];

/** 200° → south: the nearest of the eight points. */
export function nearestCompassPoint(azimuthDeg: number): CompassPointInfo {
  return compassPoints[Math.round(normalizeAzimuth(azimuthDeg) / 45) % compassPoints.length];
}

/** "South (180°)", for a choice of sides. */
export const compassChoiceLabel = (point: CompassPointInfo) =>
  `${point.word[0].toUpperCase()}${point.word.slice(1)} (${point.deg}°)`;

export const pointDeg = (key: CompassPoint) => compassKeys.indexOf(key) * 45;

/** 200° → "S". */
export const nearestPoint = (deg: number): CompassPoint => nearestCompassPoint(deg).key;

/** The point this bearing is exactly on, or undefined between points. */
export function exactPoint(deg: number): CompassPointInfo | undefined {
  const point = nearestCompassPoint(deg);
  return Math.abs(normalizeAzimuth(deg) - point.deg) < 1e-9 ? point : undefined;
}
