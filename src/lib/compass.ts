import { normalizeAzimuth } from '@shared/rules/index';

/** The eight points a tapper aims by eye, clockwise from north. */
export const compassPoints = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'] as const;
export type CompassPoint = (typeof compassPoints)[number];

export const compassPointWords: Record<CompassPoint, string> = {
  N: 'north',
  NE: 'north-east',
  E: 'east',
  SE: 'south-east',
  S: 'south',
  SW: 'south-west',
  W: 'west',
  NW: 'north-west',
};

export const pointDeg = (point: CompassPoint) => compassPoints.indexOf(point) * 45;

/** 200° → "S": the nearest of the eight points. */
export const nearestPoint = (deg: number): CompassPoint =>
  compassPoints[Math.round(normalizeAzimuth(deg) / 45) % compassPoints.length];

/** The point this bearing is exactly on, or undefined between points. */
export const exactPoint = (deg: number): CompassPoint | undefined => {
  const point = nearestPoint(deg);
  return Math.abs(normalizeAzimuth(deg) - pointDeg(point)) < 1e-9 ? point : undefined;
};
