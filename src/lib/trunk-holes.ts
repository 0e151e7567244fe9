import { compassWord, formatHeight } from './advice-words';
import { formatNumber, type UnitSystem } from './units';
import {
  normalizeAzimuth,
  stainLeftInReach,
  type Spot,
  type ZoneParams,
} from '@shared/rules/index';

/** A hole on the record as the trunk diagram reads it. */
export interface RecordedHole extends Spot {
  id?: number;
  season: number;
  bitCm: number;
}

export type TrunkMarkKind = 'earlier' | 'this-season' | 'advised';

export interface TrunkMark extends Spot {
  key: string;
  kind: TrunkMarkKind;
  /** The hole's season; the planned season for an advised spot. */
  season: number;
  bitCm: number;
  /** Share (0–1) of the hole's stain a new hole can still reach: 1 for this season's and advised. */
  stainLeft: number;
  /** An earlier hole the advisor still keeps new holes clear of. */
  inReach: boolean;
}

export interface TrunkReading {
  season: number;
  /** Drilled depth (bark included) of the season's new holes, as advised. */
  depthCm: number;
  radialGrowthCmPerYear: number;
  zone: Partial<ZoneParams>;
  /** The advice's bit, for its spots. */
  bitCm: number;
}

/**
 * Every mark the trunk diagram draws: earlier holes with how much of their stain growth has not
 * yet covered (the advisor's own `stainLeftInReach`), the season's holes already drilled, and
 * the advised spots. Oldest first, so newer marks are drawn over older ones.
 */
export function readTrunkHoles(
  holes: readonly RecordedHole[],
  placements: readonly Spot[],
  reading: TrunkReading,
): TrunkMark[] {
  const { season } = reading;
  const recorded = holes
    .filter((h) => h.season <= season)
    .map((h, i): TrunkMark => {
      const thisSeason = h.season === season;
      const stainLeft = thisSeason ? 1 : stainLeftInReach(h, reading);
      return {
        key: `hole-${h.id ?? i}`,
        kind: thisSeason ? 'this-season' : 'earlier',
        season: h.season,
        heightCm: h.heightCm,
        azimuthDeg: normalizeAzimuth(h.azimuthDeg),
        bitCm: h.bitCm,
        stainLeft,
        inReach: !thisSeason && stainLeft > 0,
      };
    })
    .sort((a, b) => a.season - b.season);
  const advised = placements.map((p, i): TrunkMark => ({
    key: `advised-${i}`,
    kind: 'advised',
    season,
    heightCm: p.heightCm,
    azimuthDeg: normalizeAzimuth(p.azimuthDeg),
    bitCm: reading.bitCm,
    stainLeft: 1,
    inReach: false,
  }));
  return [...recorded, ...advised];
}

/** "5 earlier holes, 3 still in reach; 1 drilled in 2027; 2 advised spots." */
export function trunkSummary(marks: readonly TrunkMark[], season: number): string {
  const earlier = marks.filter((m) => m.kind === 'earlier');
  const inReach = earlier.filter((m) => m.inReach).length;
  const drilled = marks.filter((m) => m.kind === 'this-season').length;
  const advised = marks.filter((m) => m.kind === 'advised').length;
  const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  const parts = [
    earlier.length === 0
      ? 'no earlier holes'
      : `${count(earlier.length, 'earlier hole', 'earlier holes')}, ${inReach} still in reach of new holes`,
  ];
  if (drilled > 0) parts.push(`${drilled} drilled in ${season}`);
  parts.push(advised === 0 ? 'no advised spots' : count(advised, 'advised spot', 'advised spots'));
  return `${parts.join('; ')}.`;
}

/** "south-west (225°) at 1.05 m". */
export const markSpot = (m: Pick<TrunkMark, 'azimuthDeg' | 'heightCm'>, system: UnitSystem) =>
  `${compassWord(m.azimuthDeg)} (${Math.round(m.azimuthDeg) % 360}°) at ${formatHeight(m.heightCm, system)}`;

/** What the text list says of one mark. */
export function markWords(m: TrunkMark, system: UnitSystem): string {
  const spot = markSpot(m, system);
  if (m.kind === 'advised') return `Advised spot: ${spot}`;
  if (m.kind === 'this-season') return `${m.season}, drilled this season: ${spot}`;
  if (!m.inReach) return `${m.season}: ${spot}, grown over, out of reach of new holes`;
  return `${m.season}: ${spot}, ${formatNumber(m.stainLeft * 100)} % of its stain still in reach`;
}
