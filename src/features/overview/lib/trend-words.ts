import type { TrendSeason, TrendsResponse } from '@shared/schemas/trends';
import { warningLabel } from '@/lib/warning-labels';
import { formatNumber, type UnitSystem } from '@/lib/units';

const CM2_PER_IN2 = 2.54 * 2.54;

/** The area and basal-area units of a system: per acre in ft², or per hectare in m². */
export const areaWords = (system: UnitSystem) =>
  system === 'imperial'
    ? { per: 'acre', basal: 'ft²', basalDigits: 0, growth: 'in²' }
    : { per: 'hectare', basal: 'm²', basalDigits: 1, growth: 'cm²' };

export const basalPerArea = (i: TrendSeason, system: UnitSystem) =>
  system === 'imperial' ? i.basalAreaFt2PerAcre : i.basalAreaM2PerHa;

export const treesPerArea = (i: TrendSeason, system: UnitSystem) =>
  system === 'imperial' ? i.treesPerAcre : i.treesPerHa;

export const tapsSetPerArea = (i: TrendSeason, system: UnitSystem) =>
  system === 'imperial' ? i.tapsSetPerAcre : i.tapsSetPerHa;

export const tapsAdvisedPerArea = (i: TrendSeason, system: UnitSystem) =>
  system === 'imperial' ? i.tapsAdvisedPerAcre : i.tapsAdvisedPerHa;

/** Basal-area growth (held in cm² a year) in the unit shown. */
export const growthIn = (cm2: number, system: UnitSystem) =>
  system === 'imperial' ? cm2 / CM2_PER_IN2 : cm2;

export const seasonLabel = (i: TrendSeason) =>
  i.planned ? `${i.season} (planned)` : String(i.season);

export const percent = (part: number, whole: number, digits = 0) =>
  whole > 0 ? `${formatNumber((100 * part) / whole, digits)} %` : '—';

/** Seasons that carry a figure, the planned one left out where nothing is recorded for it. */
const recorded = <T>(items: readonly TrendSeason[], value: (i: TrendSeason) => T | null) =>
  items.filter((i) => !i.planned && value(i) !== null);

interface Point {
  season: number;
  text: string;
  n: number;
}

/** A low or a high between the first and last seasons, when it stands out (over 5 % beyond both). */
function turn(points: readonly Point[], unit: string): string {
  if (points.length < 3) return '';
  const first = points[0];
  const last = points.at(-1)!;
  const inner = points.slice(1, -1);
  const low = inner.reduce((a, b) => (b.n < a.n ? b : a));
  const high = inner.reduce((a, b) => (b.n > a.n ? b : a));
  if (low.n < Math.min(first.n, last.n) * 0.95)
    return `, lowest at ${low.text}${unit} in ${low.season}`;
  if (high.n > Math.max(first.n, last.n) * 1.05)
    return `, highest at ${high.text}${unit} in ${high.season}`;
  return '';
}

/** The first and last seasons compared, with a low or high between them if one stands out. */
function change(
  what: string,
  points: readonly Point[],
  unit: string,
  [up, down] = ['rose', 'fell'],
) {
  const first = points[0];
  const last = points.at(-1)!;
  if (first.season === last.season) return `${what} was ${last.text}${unit} in ${last.season}`;
  const between = turn(points, unit);
  if (first.text === last.text)
    return between
      ? `${what} was ${last.text}${unit} in ${first.season} and again in ${last.season}${between}`
      : `${what} held at ${last.text}${unit} from ${first.season} to ${last.season}`;
  const verb = last.n > first.n ? up : down;
  return `${what} ${verb} from ${first.text} to ${last.text}${unit} since ${first.season}${between}`;
}

/** "Basal area per acre rose from 86 to 92 ft² since 2018". */
export function basalAreaSentence(t: TrendsResponse, system: UnitSystem): string {
  const w = areaWords(system);
  if (!t.boundary) return `Draw the stand’s boundary on the map to see basal area per ${w.per}`;
  const seasons = recorded(t.items, (i) => basalPerArea(i, system));
  if (seasons.length === 0) return `No basal area per ${w.per} on record yet`;
  const at = (i: TrendSeason) => {
    const n = basalPerArea(i, system)!;
    return { season: i.season, n, text: formatNumber(n, w.basalDigits) };
  };
  return change(`Basal area per ${w.per}`, seasons.map(at), ` ${w.basal}`);
}

const living = (i: TrendSeason) => i.byStatus.active + i.byStatus['held-out'];

/** "Living trees went from 1,184 in 2018 to 1,180 in 2026; 4 dead and 3 removed by then". */
export function statusSentence(t: TrendsResponse): string {
  const seasons = recorded(t.items, (i) => (i.trees > 0 ? i : null));
  if (seasons.length === 0) return 'No trees on record yet';
  const first = seasons[0];
  const last = seasons.at(-1)!;
  const gone = `${formatNumber(last.byStatus.dead)} dead and ${formatNumber(last.byStatus.removed)} removed`;
  if (first === last)
    return `${formatNumber(living(last))} living trees in ${last.season}; ${gone}`;
  return `Living trees went from ${formatNumber(living(first))} in ${first.season} to ${formatNumber(living(last))} in ${last.season}; ${gone} by then`;
}

/** "Median DBH grew from 15.9 to 17.6 in since 2018". */
export function dbhSentence(t: TrendsResponse, system: UnitSystem): string {
  const unit = system === 'imperial' ? 'in' : 'cm';
  const seasons = recorded(t.items, (i) => i.dbhCm);
  if (seasons.length === 0) return 'No DBH on record yet';
  const at = (i: TrendSeason) => {
    const n = system === 'imperial' ? i.dbhCm!.median / 2.54 : i.dbhCm!.median;
    return { season: i.season, n, text: formatNumber(n, 1) };
  };
  return change('Median DBH', seasons.map(at), ` ${unit}`, ['grew', 'shrank']);
}

/** "Median basal-area growth was lowest in 2020 (3.8 in²) and highest in 2023 (6.0 in²)". */
export function growthSentence(t: TrendsResponse, system: UnitSystem): string {
  const unit = areaWords(system).growth;
  const seasons = recorded(t.items, (i) => i.basalAreaGrowthCm2);
  if (seasons.length === 0) return 'Growth shows once trees are measured in two seasons running';
  const value = (i: TrendSeason) => growthIn(i.basalAreaGrowthCm2!.median, system);
  const text = (i: TrendSeason) => `${formatNumber(value(i), 1)} ${unit}`;
  if (seasons.length === 1)
    return `Median basal-area growth was ${text(seasons[0])} a year in ${seasons[0].season}`;
  const low = seasons.reduce((a, b) => (value(b) < value(a) ? b : a));
  const high = seasons.reduce((a, b) => (value(b) > value(a) ? b : a));
  return `Median basal-area growth was lowest in ${low.season} (${text(low)} a year) and highest in ${high.season} (${text(high)})`;
}

/** "Taps set per acre went from 18 in 2018 to 21 in 2026, on 16 trees per acre". */
export function densitySentence(t: TrendsResponse, system: UnitSystem): string {
  const { per } = areaWords(system);
  if (!t.boundary) return `Draw the stand’s boundary on the map to see trees and taps per ${per}`;
  const seasons = recorded(t.items, (i) => tapsSetPerArea(i, system));
  if (seasons.length === 0) return `No taps per ${per} on record yet`;
  const first = seasons[0];
  const last = seasons.at(-1)!;
  const taps = (i: TrendSeason) => formatNumber(tapsSetPerArea(i, system)!);
  const trees = formatNumber(treesPerArea(last, system)!);
  if (first === last)
    return `${taps(last)} taps set per ${per} in ${last.season}, on ${trees} trees per ${per}`;
  return `Taps set per ${per} went from ${taps(first)} in ${first.season} to ${taps(last)} in ${last.season}, on ${trees} trees per ${per}`;
}

/** "In 2026, 1,512 taps were set against 1,504 the advice allowed; 28 trees carried more". */
export function tapsSentence(t: TrendsResponse): string {
  const last = recorded(t.items, (i) => (i.tapsSet > 0 ? i : null)).at(-1);
  const planned = t.items.find((i) => i.planned);
  const next = planned
    ? `; for ${planned.season} the advice allows ${formatNumber(planned.tapsAdvised)}`
    : '';
  if (!last) return `No taps recorded yet${next}`;
  const over =
    last.treesOverAdvice === 0
      ? 'no tree carried more than advised'
      : `${formatNumber(last.treesOverAdvice)} ${last.treesOverAdvice === 1 ? 'tree' : 'trees'} carried more than advised`;
  return `In ${last.season}, ${formatNumber(last.tapsSet)} taps were set against ${formatNumber(last.tapsAdvised)} the advice allowed; ${over}${next}`;
}

/** The warnings worth a line of their own: the most common in the latest season, most first. */
export function leadingWarnings(t: TrendsResponse, count = 4) {
  const latest = t.items.at(-1);
  if (!latest) return [];
  return (Object.entries(latest.warnings) as [keyof TrendSeason['warnings'], number][])
    .filter(([, n]) => n > 0)
    .sort((a, b) => b[1] - a[1])
    .slice(0, count)
    .map(([code]) => code);
}

/** "In 2027 the most common warning is Slow growth, on 12 % of trees". */
export function warningsSentence(t: TrendsResponse): string {
  const latest = t.items.at(-1);
  const [top] = leadingWarnings(t, 1);
  if (!latest || !top) return 'No tree carries a warning';
  return `In ${latest.season} the most common warning is ${warningLabel(top)}, on ${percent(latest.warnings[top], latest.trees)} of trees`;
}

/** Trees under 90 % clear wood, as a share of the trees big enough to tap. */
export const thinShare = (i: TrendSeason) =>
  i.shareBands['under-80'] + i.shareBands['80-85'] + i.shareBands['85-90'];

/** "Trees with under 90 % clear wood were 0.0 % of those big enough to tap in 2018, 0.8 % in 2027". */
export function shareSentence(t: TrendsResponse): string {
  const seasons = t.items.filter((i) => i.sharedTrees > 0);
  if (seasons.length === 0) return 'No tree is big enough to tap yet';
  const first = seasons[0];
  const last = seasons.at(-1)!;
  const share = (i: TrendSeason) => percent(thinShare(i), i.sharedTrees, 1);
  const head = 'Trees with under 90 % clear wood were';
  if (first === last) return `${head} ${share(last)} of those big enough to tap in ${last.season}`;
  return `${head} ${share(first)} of those big enough to tap in ${first.season}, ${share(last)} in ${last.season}`;
}

/** Ratings over 15 %: cause for concern (UVM Forest Ecosystem Monitoring Cooperative). */
export const concerning = (i: TrendSeason) =>
  i.crownClasses.filter((c) => c.pct > 15).reduce((n, c) => n + c.trees, 0);

/** "Trees rated over 15 % crown dieback went from 0.2 % in 2018 to 1.4 % in 2026". */
export function diebackSentence(t: TrendsResponse): string {
  const seasons = t.items.filter((i) => i.crownRated > 0);
  if (seasons.length === 0) return 'No crown ratings on record yet';
  const first = seasons[0];
  const last = seasons.at(-1)!;
  const share = (i: TrendSeason) => percent(concerning(i), i.crownRated, 1);
  if (first === last)
    return `${share(last)} of the crowns rated in ${last.season} showed over 15 % dieback`;
  return `Crowns rated over 15 % dieback went from ${share(first)} in ${first.season} to ${share(last)} in ${last.season}`;
}
