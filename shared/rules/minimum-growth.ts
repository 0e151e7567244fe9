/**
 * Basal-area growth lines of the 2016 Forest Science study (van den Berg, Perkins, Isselhardt,
 * Wilmot 2016, Forest Science 62(1):107–114): the minimum for sustainable tapping, and what
 * healthy trees grew. Given at 10 in and 18 in DBH; straight lines between, extended with care.
 */

export interface GrowthLinePoint {
  in2PerYear: number;
  /** True outside 10–18 in DBH, where the study gives no figure. */
  extrapolated: boolean;
}

const LINE_FROM_IN = 10;
const LINE_TO_IN = 18;
const MINIMUM = { at10: 1.4, at18: 2.6 };
const HEALTHY = { at10: 1.8, at18: 3.5 };

function line(dbhIn: number, at: { at10: number; at18: number }): GrowthLinePoint {
  const slope = (at.at18 - at.at10) / (LINE_TO_IN - LINE_FROM_IN);
  return {
    in2PerYear: Math.max(0, at.at10 + slope * (dbhIn - LINE_FROM_IN)),
    extrapolated: dbhIn < LINE_FROM_IN || dbhIn > LINE_TO_IN,
  };
}

/** The minimum basal-area growth line, with a flag outside the study's 10–18 in. */
export function minimumGrowthLine(dbhIn: number): GrowthLinePoint {
  return line(dbhIn, MINIMUM);
}

/** Basal-area growth (in²/yr) below which tapping a tree of this DBH was found unsustainable. */
export function minimumBasalAreaGrowthIn2(dbhIn: number): number {
  return minimumGrowthLine(dbhIn).in2PerYear;
}

/** What healthy trees of this DBH grew (in²/yr): the mark of a "healthy fast grower". */
export function healthyGrowthLine(dbhIn: number): GrowthLinePoint {
  return line(dbhIn, HEALTHY);
}
