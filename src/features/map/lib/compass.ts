import { formatNumber, type LengthUnit } from '@/lib/units';

const points = ['N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'] as const;
const words: Record<(typeof points)[number], string> = {
  N: 'north',
  NE: 'north-east',
  E: 'east',
  SE: 'south-east',
  S: 'south',
  SW: 'south-west',
  W: 'west',
  NW: 'north-west',
};

/** A bearing in degrees as the nearest of eight compass points: 190° → "S". */
export function compassPoint(azimuthDeg: number): (typeof points)[number] {
  const normal = ((azimuthDeg % 360) + 360) % 360;
  return points[Math.round(normal / 45) % 8];
}

export const compassWord = (azimuthDeg: number) => words[compassPoint(azimuthDeg)];

/** Taphole height above the ground: "1.1 m" or "43 in". */
export function formatHeight(cm: number, unit: LengthUnit): string {
  return unit === 'cm' ? `${formatNumber(cm / 100, 1)} m` : `${formatNumber(cm / 2.54)} in`;
}

/** "south at 1.1 m (190°)" */
export const describePlacement = (p: { azimuthDeg: number; heightCm: number }, unit: LengthUnit) =>
  `${compassWord(p.azimuthDeg)} at ${formatHeight(p.heightCm, unit)} (${formatNumber(p.azimuthDeg)}°)`;
