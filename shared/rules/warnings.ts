import { sources } from './sources';
import { cmToIn } from './units';

export const warningCodes = [
  'undersized',
  'overtapped',
  'too-close',
  'slow-growth',
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

function pct(share: number): string {
  return `${Math.round(share * 100)} %`;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export const warn = {
  undersized: (dbhCm: number, minimumCm: number, source: string): AdvisorWarning => ({
    code: 'undersized',
    message: `At ${size(dbhCm)} this tree is below the ${size(minimumCm)} the guideline starts tapping at. Let it grow.`,
    source,
  }),
  overtapped: (season: number, holes: number, allowed: number, source: string): AdvisorWarning => ({
    code: 'overtapped',
    message: `In ${season} this tree carried ${plural(holes, 'tap')}; at its size then the guideline allowed ${allowed}.`,
    source,
  }),
  crowdedRecord: (season: number, source: string): AdvisorWarning => ({
    code: 'too-close',
    message: `Holes drilled in ${season} sit closer than the spacing to each other or to older holes. Keep new holes further apart.`,
    source,
  }),
  noSpot: (placed: number, wanted: number, source: string): AdvisorWarning => ({
    code: 'too-close',
    message:
      placed === 0
        ? 'There is no spot left in the height band clear of the holes still in reach. Rest the tree or widen the band.'
        : `Only ${plural(placed, 'spot')} left clear of the holes still in reach, so set ${placed} instead of ${wanted}.`,
    source,
  }),
  slowGrowth: (grewIn2: number, neededIn2: number, extrapolated: boolean): AdvisorWarning => ({
    code: 'slow-growth',
    message:
      `Basal area grew ${grewIn2.toFixed(2)} in² a year; a tree this size needs ${neededIn2.toFixed(2)} in² for tapping to keep up.` +
      (extrapolated ? ' (The study covered 10–18 in trees; this figure extends its line.)' : '') +
      ' Tap lightly and shallow.',
    source: sources.minimumGrowth,
  }),
  rateTooFast: (taps: number, sustainable: number): AdvisorWarning => ({
    code: 'slow-growth',
    message: `At its measured growth this tree covers the stain of ${plural(sustainable, 'tap')} a year, not ${taps}.`,
    source: sources.tappingZone,
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
    message: `Only ${pct(share)} of the tapping zone is clear wood, below the ${pct(floor)} floor. Rest the tree while growth covers old stain.`,
    source: sources.tappingZone,
  }),
  nearlyDepleted: (fit: number, wanted: number, floor: number): AdvisorWarning => ({
    code: 'zone-depleted',
    message: `${plural(wanted, 'new hole')} would take the clear share of the tapping zone below ${pct(floor)}; set ${fit}.`,
    source: sources.tappingZone,
  }),
  stale: (measuredSeason: number): AdvisorWarning => ({
    code: 'stale-measurement',
    message: `Last measured in ${measuredSeason}. Measure the DBH and crown again before you drill.`,
  }),
  noMeasurement: (): AdvisorWarning => ({
    code: 'no-measurement',
    message: 'No diameter on record. Measure the DBH before planning taps.',
  }),
  wideSpout: (): AdvisorWarning => ({
    code: 'spout-7-16',
    message:
      'Your last holes were drilled for 7/16 in spouts. With those, set one tap at most; 5/16 in spouts allow the full count.',
    source: sources.omafra,
  }),
  spoutTooWide: (maxBitCm: number, source: string): AdvisorWarning => ({
    code: 'spout-7-16',
    message: `Your last holes were drilled wider than the ${(maxBitCm * 10).toFixed(0)} mm this guideline allows. Use a 5/16 in bit.`,
    source,
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
};
