import { Rng } from './random';
import type { ProblemCategory, TreeSpec } from './types';

const ol = (...ns: number[]) => ns.map((n) => `OL-${String(n).padStart(4, '0')}`);
const range = (from: number, to: number) =>
  Array.from({ length: to - from + 1 }, (_, i) => from + i);

/**
 * The Owl Ledge trees that carry each kind of trouble. Fixed tags, so screens, tests and the
 * consultant's notes can point at them; every other tree is an ordinary, healthy one.
 */
export const DEMO_PROBLEM_TAGS: Record<ProblemCategory, string[]> = {
  'too-small': ol(23, 158, 377, 512, 760, 934, 1101),
  overtapped: ol(64, 291, 455, 688, 823, 1050),
  'too-close': ol(97, 333, 571, 717, 980, 1139),
  'slow-growth': ol(45, 206, 419, 602, 777, 1012),
  declining: ol(118, 264, 487, 639, 852, 1077),
  'severely-declining': ol(181, 546, 905, 1160),
  dead: ol(139, 398, 731, 1024),
  'held-out': ol(252, 619, 958, 1118),
  removed: ol(87, 470, 866),
  'stale-measurement': ol(310, 590, 745, 1066),
  shrinking: ol(200, 533, 799, 1175),
  // One lateral along the ledge, run hard for years on thin soil.
  'depleted-zone': ol(...range(841, 848)),
  'outside-boundary': ol(155, 730, 1093),
  // Tagged during the 2026 round: not measured yet, or measured for the first time.
  'newly-tagged': ol(1181, 1183, 1185),
  'first-reading': ol(1182, 1184, 1186),
  // An old 7/16 in bit found its way back into the kit in 2025.
  'wide-spout': ol(1031, 1037, 1043),
  // A new crew member has taped these above the butt swell since 2022: every reading runs low,
  // and the first low one was confirmed on the spot.
  'misread-series': ol(1052, 1058, 1064),
  // On the dry knoll: growing, but not enough to carry the two taps their size allows.
  'modest-growth': ol(128, 366, 694),
};

export function problemOf(tag: string): ProblemCategory | null {
  for (const [category, tags] of Object.entries(DEMO_PROBLEM_TAGS))
    if (tags.includes(tag)) return category as ProblemCategory;
  return null;
}

/** Dieback classes climbing from `fromPct` in `fromSeason` to `toPct` in `toSeason`. */
function ramp(fromSeason: number, fromPct: number, toSeason: number, toPct: number) {
  const out: Record<number, number> = {};
  for (let s = fromSeason; s <= toSeason; s++) {
    const t = (s - fromSeason) / (toSeason - fromSeason);
    out[s] = Math.round((fromPct + t * (toPct - fromPct)) / 5) * 5;
  }
  return out;
}

/** Lays one category's trouble over an ordinary tree (positions are handled by the stand). */
export function applyProblem(
  base: TreeSpec,
  category: ProblemCategory,
  lastSeason: number,
): TreeSpec {
  const rng = Rng.for('problem', base.tag);
  const t: TreeSpec = { ...base, category, diebackBySeason: {}, measurementNotes: {} };
  const seasons = lastSeason - t.firstSeason;
  switch (category) {
    case 'too-small': {
      // Some sit just under the 12 in (30.48 cm) line, the rest well below it.
      const nearLine = base.n % 2 === 1;
      const target = nearLine ? rng.range(29.4, 29.9) : rng.range(17, 27);
      t.rate = rng.range(0.3, 0.45);
      t.dbhStart = target - t.rate * seasons;
      t.maxDbh = nearLine ? 30.0 : target + 0.5;
      t.noTapping = true;
      break;
    }
    case 'overtapped':
      t.dbhStart = rng.range(48, 58);
      t.tapsOverride = { from: 2022, min: 3, max: 4 };
      t.stainRate = 0.12;
      break;
    case 'too-close':
      t.dbhStart = rng.range(33, 55);
      t.sloppyFrom = 2024;
      t.stainRate = 0.15;
      break;
    case 'slow-growth':
      t.dbhStart = rng.range(33, 50);
      t.rate = rng.range(0.05, 0.1);
      t.noiseSd = 0.05;
      t.diebackBase = 5;
      t.stainRate = 0.08;
      break;
    case 'declining':
      t.diebackBase = 5;
      t.dbhStart = rng.range(38, 62);
      t.rate = rng.range(0.3, 0.45);
      t.diebackBySeason = ramp(2020, 5, lastSeason, [20, 25, 30, 35, 40, 45][base.n % 6]);
      break;
    case 'severely-declining':
      t.diebackBase = 5;
      t.dbhStart = rng.range(40, 66);
      t.rate = rng.range(0.25, 0.4);
      t.diebackBySeason = ramp(2019, 10, lastSeason, [60, 65, 70, 75, 80][base.n % 5]);
      break;
    case 'dead': {
      const died = base.n % 2 === 0 ? 2024 : 2025;
      t.dbhStart = rng.range(42, 68);
      t.rate = rng.range(0.25, 0.4);
      t.status = 'dead';
      t.diebackBase = 5;
      t.diedIn = died;
      t.tappedThrough = died;
      t.diebackBySeason = ramp(2020, 10, died - 1, 5 * rng.int(12, 15));
      for (let s = died; s <= lastSeason; s++) t.diebackBySeason[s] = 100;
      t.measurementNotes[died] = 'No leaves came out this summer; bark starting to loosen.';
      break;
    }
    case 'held-out':
      t.dbhStart = rng.range(40, 60);
      t.status = 'held-out';
      t.tappedThrough = 2023;
      break;
    case 'removed':
      t.diebackBase = 5;
      t.dbhStart = rng.range(45, 70);
      t.status = 'removed';
      t.removedOn = '2025-01-20 11:45:00';
      t.measuredThrough = 2024;
      t.tappedThrough = 2024;
      t.diebackBySeason = ramp(2022, 10, 2024, 30);
      t.measurementNotes[2024] =
        'Leaning over the main line, split at the fork; marked for felling.';
      break;
    case 'stale-measurement':
      t.dbhStart = rng.range(34, 55);
      t.measuredThrough = 2022;
      break;
    case 'shrinking':
      t.dbhStart = rng.range(35, 58);
      t.measureError = { season: 2021 + (base.n % 4), cm: -rng.range(1.9, 2.2) };
      break;
    case 'depleted-zone':
      t.dbhStart = rng.range(32, 37);
      t.rate = rng.range(0.05, 0.1);
      t.noiseSd = 0.05;
      t.diebackBase = 10;
      t.tapsOverride = { from: t.firstSeason, min: 3, max: 4 };
      t.stainRate = 0.2;
      break;
    case 'outside-boundary':
      break;
    case 'newly-tagged':
      t.firstSeason = lastSeason;
      t.measuredThrough = lastSeason - 1;
      t.noTapping = true;
      break;
    case 'wide-spout':
      t.dbhStart = rng.range(48, 60);
      t.wideSpoutFrom = 2025;
      break;
    case 'misread-series':
      t.dbhStart = rng.range(38, 50);
      t.rate = rng.range(0.2, 0.25);
      t.noiseSd = 0.05;
      t.measureOffset = { from: 2022, cm: -3 };
      break;
    case 'modest-growth':
      t.dbhStart = rng.range(47, 54);
      t.rate = rng.range(0.11, 0.14);
      t.noiseSd = 0.05;
      break;
    case 'first-reading':
      t.firstSeason = lastSeason;
      t.dbhStart = rng.range(32, 45);
      t.noTapping = true;
      break;
  }
  t.dbhStart = Math.round(t.dbhStart * 100) / 100;
  t.rate = Math.round(t.rate * 1000) / 1000;
  return t;
}
