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

/** 200° → south: the nearest of the eight points. */
export function nearestCompassPoint(azimuthDeg: number): CompassPointInfo {
  const normal = ((azimuthDeg % 360) + 360) % 360;
  return compassPoints[Math.round(normal / 45) % compassPoints.length];
}

/** "South (180°)", for a choice of sides. */
export const compassChoiceLabel = (point: CompassPointInfo) =>
  `${point.word[0].toUpperCase()}${point.word.slice(1)} (${point.deg}°)`;
