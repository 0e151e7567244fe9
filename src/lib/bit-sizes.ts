import { inToCm, roundTo } from './units';

/** The bits the trade sells, in cm to the last digit the fraction has (7/16 in = 1.11125 cm). */
export const bitSizes = [5 / 16, 19 / 64, 7 / 16].map((inches) => roundTo(inToCm(inches), 7));

/** The offered bit this width matches, within rounding. */
export const matchBit = (cm: number) => bitSizes.find((b) => Math.abs(b - cm) < 1e-4);

/** The sold sizes, and the advised bit too where a guideline asks for another. */
export const bitChoices = (advisedCm: number) =>
  matchBit(advisedCm) ? bitSizes : [...bitSizes, advisedCm];
