import type { Collection, Species, TreeStatus } from '../../shared/schemas/enums';

/** The kinds of trouble the demo stand shows, each on a few trees. */
export const problemCategories = [
  'too-small',
  'overtapped',
  'too-close',
  'slow-growth',
  'declining',
  'severely-declining',
  'dead',
  'held-out',
  'removed',
  'stale-measurement',
  'shrinking',
  'depleted-zone',
  'outside-boundary',
  'newly-tagged',
  'first-reading',
  'wide-spout',
  'misread-series',
  'modest-growth',
] as const;
export type ProblemCategory = (typeof problemCategories)[number];

/** Number of taps a guideline table allows at a DBH (cm). */
export type TapTable = (dbhCm: number) => number;

/** Everything that decides one tree's record; the generators turn it into rows. */
export interface TreeSpec {
  /** Running number behind the tag (OL-0001 → 1). */
  n: number;
  tag: string;
  species: Species;
  /** Position in local metres; null when the tree was never mapped. */
  xy: readonly [number, number] | null;
  collection: Collection;
  status: TreeStatus;
  category: ProblemCategory | null;
  /** True DBH (cm) at the first autumn round. */
  dbhStart: number;
  /** Typical DBH growth, cm per year, before the season's weather and the crown's vigour. */
  rate: number;
  /** The tree's usual crown dieback class (%). */
  diebackBase: number;
  /** Dieback class per season where it departs from the usual one. */
  diebackBySeason: Record<number, number>;
  /** The tree never grows past this true DBH (keeps small trees small). */
  maxDbh: number;
  /** Standard deviation of the forester's reading error (cm); readings stay within ±0.3 cm. */
  noiseSd: number;
  firstSeason: number;
  measuredThrough: number;
  tappedThrough: number;
  noTapping: boolean;
  /** The tree stops growing from this season on (it died). */
  diedIn: number | null;
  /** When the register was set to `removed` (the tree was felled); null while it stands. */
  removedOn: string | null;
  /**
   * Its neighbours were cut: from season `from` on it grows `factor` times as fast (half the gain
   * in the first summer, while the crown fills the gap).
   */
  release: { from: number; factor: number } | null;
  /** From `from` on, every season carries between min and max holes whatever the table says. */
  tapsOverride: { from: number; min: number; max: number } | null;
  /** From this season on, the tapper used the old 7/16 in bit on this tree. */
  wideSpoutFrom: number | null;
  /** From this season on, the first hole is drilled right beside last season's. */
  sloppyFrom: number | null;
  /**
   * From season `from` on every reading is off by `cm` (taken at the wrong height); the first
   * such reading was confirmed by the forester when it was entered.
   */
  measureOffset: { from: number; cm: number } | null;
  /** A reading error of `cm` (negative: too small) in one season. */
  measureError: { season: number; cm: number } | null;
  stainRate: number;
  /** A remark the forester wrote beside a season's reading. */
  measurementNotes: Record<number, string>;
}

export interface MeasurementRow {
  season: number;
  measuredOn: string;
  dbhCm: number;
  crownDiebackPct: number;
  note: string | null;
  /** The forester confirmed this reading although it is far off the one before. */
  confirmedOutlier: boolean;
}

export interface TapholeRow {
  season: number;
  heightCm: number;
  azimuthDeg: number;
  depthCm: number;
  bitCm: number;
  collection: Collection;
  drilledOn: string;
  stainHit: boolean;
}

export interface TreePlan {
  spec: TreeSpec;
  lat: number | null;
  lng: number | null;
  measurements: MeasurementRow[];
  tapholes: TapholeRow[];
}
