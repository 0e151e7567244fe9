import type { AdvisorTree, GuidelineProfile } from '../rules/index';
import type { TreeStatus } from './enums';

/** The statuses of trees that take new readings; the round walks these. */
export const roundStatuses = ['active', 'held-out'] as const satisfies readonly TreeStatus[];

/** A measuring round's season is the year a reading is taken in (its `measuredOn`). */
export const roundSeason = (today: Date = new Date()): number => today.getUTCFullYear();

/**
 * The trees a measuring round walks — every living tree of the stand — column by column, as the
 * map's answer is: the i-th entry of each array is the same tree, in tag order. `measured[i]` is 1
 * when the tree has a reading dated in `season`. The stand's guideline comes along so the device
 * can advise as the forester types, offline too.
 */
export interface RoundColumns {
  season: number;
  /** The season the advice is for (the plan's season). */
  adviceSeason: number;
  count: number;
  ids: number[];
  tags: string[];
  lat: (number | null)[];
  lng: (number | null)[];
  status: (typeof roundStatuses)[number][];
  latestDbhCm: (number | null)[];
  latestMeasuredOn: (string | null)[];
  measured: (0 | 1)[];
  guideline: { profile: GuidelineProfile; sunnyAzimuthDeg: number };
}

/** One tree's standing record as the advisor reads it (`adviseTree`), with its id and tag. */
export type TreeRecordAnswer = AdvisorTree & { id: number; tag: string; sugarbushId: number };
