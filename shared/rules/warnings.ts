import type { ReadingCheck } from './plausibility';
import { sources } from './sources';
import { cmToIn, in2ToCm2 } from './units';

export const warningCodes = [
  'undersized',
  'overtapped',
  'too-close',
  'slow-growth',
  'growth-limits-taps',
  'crown-dieback',
  'zone-depleted',
  'stale-measurement',
  'no-measurement',
  'spout-7-16',
  'growth-unknown',
  'growth-suspect',
  'measurement-outlier',
] as const;

export type WarningCode = (typeof warningCodes)[number];

export interface AdvisorWarning {
  code: WarningCode;
  message: string;
  source?: string;
}

/** "30.5 cm (12.0 in)". */
export function size(cm: number): string {
  return `${cm.toFixed(1)} cm (${cmToIn(cm).toFixed(1)} in)`;
}

/** "1.80 in² (11.6 cm²)". */
function area(in2: number): string {
  return `${in2.toFixed(2)} in² (${in2ToCm2(in2).toFixed(1)} cm²)`;
}

/** A bit as the guideline's unit sells it: "7/16 in" for an inch profile, "11 mm" for a metric one. */
export function bitWords(cm: number, unit: 'in' | 'cm'): string {
  if (unit === 'cm') return `${Number((cm * 10).toFixed(1))} mm`;
  let num = Math.round(cmToIn(cm) * 64);
  let den = 64;
  while (num > 0 && num % 2 === 0 && den > 1) {
    num /= 2;
    den /= 2;
  }
  return den === 1 ? `${num} in` : `${num}/${den} in`;
}

function pct(share: number): string {
  return `${Math.round(share * 100)} %`;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

const floorWords = (floor: number) =>
  `the ${pct(floor)} floor (a calibrated value of Clearwood’s model)`;

export const warn = {
  undersized: (dbhCm: number, minimumCm: number, source: string): AdvisorWarning => ({
    code: 'undersized',
    message: `At ${size(dbhCm)} this tree is below the ${size(minimumCm)} the guideline starts tapping at. Let it grow.`,
    source,
  }),
  overtapped: (
    season: number,
    holes: number,
    allowed: number,
    dbhThenCm: number,
    source: string,
  ): AdvisorWarning => ({
    code: 'overtapped',
    message: `In ${season} this tree carried ${plural(holes, 'tap')}; at the ${size(dbhThenCm)} measured before that season the guideline allowed ${allowed}.`,
    source,
  }),
  crowdedRecord: (season: number, source: string): AdvisorWarning => ({
    code: 'too-close',
    message: `Holes drilled in ${season} sit closer than the spacing to each other or to older holes, or in an older hole’s stain. Keep new holes further apart.`,
    source,
  }),
  noSpot: (placed: number, wanted: number, source: string): AdvisorWarning => ({
    code: 'too-close',
    message:
      placed === 0
        ? 'There is no spot left in the height band clear of the holes still in reach and their stain. Rest the tree this season.'
        : `Only ${plural(placed, 'spot')} left clear of the holes still in reach and their stain, so set ${placed} instead of ${wanted}.`,
    source,
  }),
  slowGrowth: (grewIn2: number, oneTapNeedsIn2: number): AdvisorWarning => ({
    code: 'slow-growth',
    message: `Basal area grew ${area(grewIn2)} a year; even one tap on a tree this size needs ${area(oneTapNeedsIn2)} a year to lay clear wood over its stain. Set one shallow tap at most.`,
    source: sources.ourModel,
  }),
  growthLimitsTaps: (
    wanted: number,
    carried: number,
    grewIn2: number,
    neededIn2: number,
  ): AdvisorWarning => ({
    code: 'growth-limits-taps',
    message: `Basal area grew ${area(grewIn2)} a year: enough for ${plural(carried, 'tap')}, while ${plural(wanted, 'tap')} would need ${area(neededIn2)}. Set ${carried}.`,
    source: sources.ourModel,
  }),
  dieback: (
    pctValue: number,
    limit: number,
    maxTaps: number,
    noneBelowCm: number,
  ): AdvisorWarning => ({
    code: 'crown-dieback',
    message: `Crown dieback is ${pctValue} %: above ${limit} % is cause for concern. Set ${plural(maxTaps, 'tap')} at most, none under ${size(noneBelowCm)}.`,
    source: `${sources.crownDieback}; ${sources.omafra}`,
  }),
  severeDieback: (pctValue: number): AdvisorWarning => ({
    code: 'crown-dieback',
    message: `Crown dieback is ${pctValue} %: the tree is in serious decline. Leave it untapped and have it looked at.`,
    source: sources.crownDieback,
  }),
  depleted: (share: number, floor: number): AdvisorWarning => ({
    code: 'zone-depleted',
    message: `Only ${pct(share)} of the tapping zone is clear wood, below ${floorWords(floor)}. Rest the tree while growth covers old stain.`,
    source: sources.ourModel,
  }),
  nearlyDepleted: (fit: number, wanted: number, floor: number): AdvisorWarning => ({
    code: 'zone-depleted',
    message: `${plural(wanted, 'new hole')} would take the clear wood of the tapping zone below ${floorWords(floor)}; set ${fit}.`,
    source: sources.ourModel,
  }),
  stale: (measuredSeason: number): AdvisorWarning => ({
    code: 'stale-measurement',
    message: `DBH last measured in ${measuredSeason}. Measure the DBH and rate the crown again before you drill.`,
  }),
  staleCrown: (ratedSeason: number, diebackPct: number): AdvisorWarning => ({
    code: 'stale-measurement',
    message: `Crown last rated in ${ratedSeason} (${diebackPct} % dieback): too long ago to go by. Rate the crown again before you drill.`,
    source: sources.crownRating,
  }),
  noMeasurement: (): AdvisorWarning => ({
    code: 'no-measurement',
    message: 'No DBH on record. Measure the DBH before planning taps.',
  }),
  wideHistory: (oldBitCm: number, newBitCm: number, unit: 'in' | 'cm'): AdvisorWarning => ({
    code: 'spout-7-16',
    message: `Earlier holes on this tree were drilled with a ${bitWords(oldBitCm, unit)} bit for 7/16 in spouts. Drill new holes with a ${bitWords(newBitCm, unit)} bit; the wide old holes still count against the tapping zone.`,
    source: sources.omafra,
  }),
  wideBeyondLimit: (
    oldBitCm: number,
    maxBitCm: number,
    newBitCm: number,
    unit: 'in' | 'cm',
    source: string,
  ): AdvisorWarning => ({
    code: 'spout-7-16',
    message: `Earlier holes on this tree were drilled with a ${bitWords(oldBitCm, unit)} bit, wider than the ${bitWords(maxBitCm, unit)} this guideline allows. Drill new holes with a ${bitWords(newBitCm, unit)} bit.`,
    source,
  }),
  wideBit: (): AdvisorWarning => ({
    code: 'spout-7-16',
    message: 'This guideline drills for 7/16 in spouts: with those, set one tap at most.',
    source: sources.omafra,
  }),
  growthUnknown: (assumedDbhCmPerDecade: number): AdvisorWarning => ({
    code: 'growth-unknown',
    message: `Only one season is measured, so growth is taken as slow (${size(assumedDbhCmPerDecade)} of DBH a decade). Measure again next season.`,
    source: sources.silvics,
  }),
  growthSuspect: (): AdvisorWarning => ({
    code: 'growth-suspect',
    message:
      'The measurements say the trunk is shrinking, which is most likely a measuring error. Check the DBH.',
  }),
  outlier: (measuredOn: string, dbhCm: number): AdvisorWarning => ({
    code: 'measurement-outlier',
    message: `The reading of ${measuredOn} (${size(dbhCm)}) is far off the others and is left out of the growth figure. Check it.`,
  }),
  unconfirmed: (
    reading: { measuredOn: string; dbhCm: number },
    check: ReadingCheck,
  ): AdvisorWarning => ({
    code: 'measurement-outlier',
    message: `The reading of ${reading.measuredOn} (${size(reading.dbhCm)}) is ${Math.abs(check.changeCm).toFixed(1)} cm ${check.changeCm > 0 ? 'more' : 'less'} than the one of ${check.previous.measuredOn}${check.kind === 'shrink' ? ', a shrink beyond tape error' : ', more than a year’s growth'}. It is left out of the advice until it is confirmed: re-measure, or record it again as confirmed.`,
    source: sources.plausibility,
  }),
};
