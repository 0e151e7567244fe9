import { fractionalYear, seasonOf } from './dates';
import { cmToIn } from './units';

/**
 * Whether a DBH reading is believable next to the tree's earlier ones. A change of more than
 * about 1 in (2.5 cm) a year, or a shrink beyond a diameter tape's error (about 0.3 cm), is a
 * measuring or entry error until a forester confirms it (common practice). Unconfirmed, such a
 * reading is left out of growth, the tapping-zone model and the tap count.
 */

/** Most DBH change a year that is still believable: about 1 in (common practice). */
export const OUTLIER_CHANGE_CM_PER_YEAR = 2.5;
/** Largest shrink a diameter tape's error explains (common practice). */
export const OUTLIER_SHRINK_CM = 0.3;

export interface DatedReading {
  measuredOn: string;
  dbhCm: number;
  /** A forester has confirmed this reading although it is far off the one before. */
  confirmedOutlier?: boolean | null;
}

export interface ReadingCheck {
  kind: 'jump' | 'shrink';
  /** This reading less the one it is compared with (cm). */
  changeCm: number;
  /** The reading it is compared with: the latest believable one before it. */
  previous: DatedReading;
}

function byDate<T extends DatedReading>(a: T, b: T): number {
  return a.measuredOn < b.measuredOn ? -1 : a.measuredOn > b.measuredOn ? 1 : 0;
}

/** The check of one reading against the one before it; null when it is believable. */
export function checkReading(
  previous: DatedReading | null,
  reading: DatedReading,
): ReadingCheck | null {
  if (!previous) return null;
  const changeCm = reading.dbhCm - previous.dbhCm;
  const years = Math.max(
    1,
    fractionalYear(reading.measuredOn) - fractionalYear(previous.measuredOn),
  );
  if (changeCm < -OUTLIER_SHRINK_CM - 1e-9) return { kind: 'shrink', changeCm, previous };
  if (Math.abs(changeCm) > OUTLIER_CHANGE_CM_PER_YEAR * years + 1e-9)
    return { kind: 'jump', changeCm, previous };
  return null;
}

export interface ScreenedReadings<T extends DatedReading> {
  /** Readings the advisor uses, by date. */
  accepted: T[];
  /** Unconfirmed readings far off the one before, with why. */
  leftOut: { reading: T; check: ReadingCheck }[];
}

/**
 * Walks the readings by date, each against the latest one kept before it. The first reading
 * is kept; a confirmed reading is kept whatever it says, and later ones are read against it.
 */
export function screenReadings<T extends DatedReading>(
  readings: readonly T[],
): ScreenedReadings<T> {
  const accepted: T[] = [];
  const leftOut: { reading: T; check: ReadingCheck }[] = [];
  for (const reading of [...readings].sort(byDate)) {
    if (!(reading.dbhCm > 0) || !Number.isFinite(reading.dbhCm)) continue;
    const check = checkReading(accepted[accepted.length - 1] ?? null, reading);
    if (check && reading.confirmedOutlier !== true) leftOut.push({ reading, check });
    else accepted.push(reading);
  }
  return { accepted, leftOut };
}

/**
 * A new reading checked against a tree's record: against the latest believable reading dated
 * on or before it. Null when it is believable (or there is nothing to compare with).
 */
export function checkNewReading(
  record: readonly DatedReading[],
  reading: DatedReading,
): ReadingCheck | null {
  const before = record.filter((r) => r.measuredOn <= reading.measuredOn);
  const { accepted } = screenReadings(before);
  return checkReading(accepted[accepted.length - 1] ?? null, reading);
}

/**
 * The question a form asks before it saves such a reading, in the user's unit:
 * "4.5 cm more than last season — re-measure or confirm".
 */
export function readingQuestion(
  check: ReadingCheck,
  season: number,
  unit: 'cm' | 'in' = 'cm',
): string {
  const size = Math.abs(check.changeCm);
  const amount = unit === 'in' ? `${cmToIn(size).toFixed(1)} in` : `${size.toFixed(1)} cm`;
  const then = seasonOf(check.previous.measuredOn);
  const when =
    then === season ? 'earlier this season' : then === season - 1 ? 'last season' : `in ${then}`;
  return `${amount} ${check.changeCm > 0 ? 'more' : 'less'} than ${when} — re-measure or confirm`;
}
