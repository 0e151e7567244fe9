import type { Advice } from '@shared/rules/index';
import { cmToIn, formatNumber, type UnitSystem } from './units';

/**
 * The advisor's figures in the words a tapper reads at the tree: compass sides, heights in
 * feet and inches or metres, bits as the fractions they are sold in.
 */

const points = [
  ['north', 'N'],
  ['north-east', 'NE'],
  ['east', 'E'],
  ['south-east', 'SE'],
  ['south', 'S'],
  ['south-west', 'SW'],
  ['west', 'W'],
  ['north-west', 'NW'],
] as const;

const pointOf = (azimuthDeg: number) => {
  const turn = ((azimuthDeg % 360) + 360) % 360;
  return points[Math.round(turn / 45) % points.length];
};

/** 200° → "south"; 80° → "east". Eight points are as fine as a tapper aims by eye. */
export const compassWord = (azimuthDeg: number) => pointOf(azimuthDeg)[0];
/** 200° → "S". */
export const compassLetter = (azimuthDeg: number) => pointOf(azimuthDeg)[1];

/** A height above ground: "3 ft 7 in" or "1.10 m". */
export function formatHeight(cm: number, system: UnitSystem): string {
  if (system === 'metric') return `${formatNumber(cm / 100, 2)} m`;
  const inches = Math.round(cmToIn(cm));
  const feet = Math.floor(inches / 12);
  const rest = inches % 12;
  if (feet === 0) return `${rest} in`;
  return rest === 0 ? `${feet} ft` : `${feet} ft ${rest} in`;
}

/** Inches to the nearest eighth, as a tape shows them: 1.75 → "1 3/4 in". */
export function formatInchFraction(inches: number): string {
  const eighths = Math.round(inches * 8);
  const whole = Math.floor(eighths / 8);
  let num = eighths % 8;
  let den = 8;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  const fraction = num > 0 ? `${num}/${den}` : '';
  if (whole === 0) return fraction ? `${fraction} in` : '0 in';
  return fraction ? `${whole} ${fraction} in` : `${whole} in`;
}

/** Bits are sold in 64ths of an inch or in millimetres. */
export function formatBitSize(cm: number, system: UnitSystem): string {
  if (system === 'metric') return `${formatNumber(cm * 10, 1)} mm`;
  const sixtyFourths = Math.round(cmToIn(cm) * 64);
  let num = sixtyFourths;
  let den = 64;
  while (num > 0 && num % 2 === 0 && den > 1) {
    num /= 2;
    den /= 2;
  }
  return den === 1 ? `${num} in` : `${num}/${den} in`;
}

/** "5/16 in bit, 2 in deep including bark" / "7.9 mm bit, 5.1 cm deep including bark". */
export function drillWords(bitCm: number, depthCm: number, system: UnitSystem): string {
  const depth =
    system === 'metric' ? `${formatNumber(depthCm, 1)} cm` : formatInchFraction(cmToIn(depthCm));
  return `${formatBitSize(bitCm, system)} bit, ${depth} deep including bark`;
}

const timesWords = ['', 'once', 'twice', 'three times', 'four times', 'five times'];
const times = (n: number) => timesWords[n] ?? `${n} times`;

type Spot = Advice['placements'][number];

/** "south at 1.10 m". */
export const spotWords = (spot: Spot, system: UnitSystem) =>
  `${compassWord(spot.azimuthDeg)} at ${formatHeight(spot.heightCm, system)}`;

/** "S 1.10 m · N 0.80 m": the plan table's short form. */
export const shortPlacements = (placements: readonly Spot[], system: UnitSystem) =>
  placements
    .map((p) => `${compassLetter(p.azimuthDeg)} ${formatHeight(p.heightCm, system)}`)
    .join(' · ');

/** The first line of the advice, in the second person: "Tap twice: south at 1.10 m, north at 0.80 m." */
export function adviceSentence(
  advice: Pick<Advice, 'verdict' | 'placements'>,
  season: number,
  system: UnitSystem,
): string {
  const spots = advice.placements;
  switch (advice.verdict) {
    case 'tap':
    case 'tap-reduced':
      if (spots.length === 0) return `Leave this tree untapped in ${season}.`;
      return `Tap ${times(spots.length)}: ${spots.map((s) => spotWords(s, system)).join(', ')}.`;
    case 'rest':
      return `Rest this tree in ${season}: drill no new holes.`;
    case 'too-small':
      return `Too small to tap in ${season}. Let it grow.`;
    case 'retired':
      return 'This tree is out of production: no taps.';
    case 'unmeasured':
      return 'Measure the DBH first; then Clearwood can plan its taps.';
  }
}

/** 0.9404 → "94 %". */
export const formatShare = (share: number) => `${formatNumber(share * 100)} %`;
