import type {
  DrillSetting,
  GuidelineProfile,
  StressedTreeRules,
  TapBand,
  ZoneParams,
} from './profile-types';
import { sources } from './sources';
import { inToCm } from './units';

/**
 * The built-in guideline sets. Figures in inches are kept as written and converted with
 * 1 in = 2.54 cm; Quebec's table is written in centimetres.
 */

const SPOUT_5_16_CM = inToCm(5 / 16);

export const defaultZone: ZoneParams = {
  barkCm: 0.6,
  stainLengthCm: 30,
  stainMarginCm: 1,
  zoneHeightCm: 90,
  floor: 0.82,
};

/** Roughly 2–5 ft above ground (common practice), rounded so its height equals the zone's 90 cm. */
const heightBand = { minCm: 60, maxCm: 150 };

const stressedOmafra: StressedTreeRules = {
  maxTaps: 1,
  noneBelowCm: inToCm(12),
  diebackPct: 15,
  restAtDiebackPct: 50,
};

function drill(
  vacuumIn: number,
  gravityIn: number,
): Record<'bucket' | 'gravity' | 'vacuum', DrillSetting> {
  return {
    vacuum: { depthCm: inToCm(vacuumIn), bitCm: SPOUT_5_16_CM },
    gravity: { depthCm: inToCm(gravityIn), bitCm: SPOUT_5_16_CM },
    bucket: { depthCm: inToCm(gravityIn), bitCm: SPOUT_5_16_CM },
  };
}

function inchBands(rows: [number, number][], fastGrowerTop = false): TapBand[] {
  return rows.map(([from, taps], i) => ({
    from,
    fromCm: inToCm(from),
    taps,
    ...(fastGrowerTop && i === rows.length - 1 ? { fullOnlyForHealthyFastGrowers: true } : {}),
  }));
}

function make(
  p: Omit<GuidelineProfile, 'minimumDbhCm' | 'maxTaps' | 'seasonRules' | 'drillingRules'> &
    Partial<Pick<GuidelineProfile, 'seasonRules' | 'drillingRules'>>,
): GuidelineProfile {
  return {
    seasonRules: [],
    drillingRules: [],
    ...p,
    minimumDbhCm: p.bands[0].fromCm,
    maxTaps: p.bands[p.bands.length - 1].taps,
  };
}

const spacingNote = `Spacing: ${sources.uvmSpacing} (2–4 in to the side or 6–12 in above/below)`;
const stressedNote = `Stressed trees at most 1 tap, none under 12 in; 7/16 in spouts at most 1 tap: ${sources.omafra}`;
const heightNote = 'Height band about 2–5 ft above ground: common practice / from memory';

/**
 * What both Quebec tables share: DBH at 1.30 m read to 0.1 cm, none up to 23 cm, one from
 * 23.1 cm, two from 39.1 cm, and the conditions of the regulation (1 January – 30 April, bit at
 * most 11 mm, at most 6 cm deep with bark, holes spread evenly, spouts out by 1 June).
 */
const quebec = {
  unit: 'cm' as const,
  dbhStepCm: 0.1,
  bands: [
    { from: 23.1, fromCm: 23.1, taps: 1 },
    { from: 39.1, fromCm: 39.1, taps: 2 },
  ],
  spacing: { sidewaysCm: 10, verticalCm: 30, rule: 'either' as const },
  heightBand,
  drill: {
    vacuum: { depthCm: 5, bitCm: SPOUT_5_16_CM },
    gravity: { depthCm: 5, bitCm: SPOUT_5_16_CM },
    bucket: { depthCm: 5, bitCm: SPOUT_5_16_CM },
  },
  limits: { maxDepthCm: 6, maxBitCm: 1.1 },
  stressed: stressedOmafra,
  zone: defaultZone,
  spacingSource: sources.uvmSpacing,
  depthSource: sources.quebecConditions,
  notes: [
    'DBH measured at 1.30 m above the highest ground level',
    `${spacingNote}, the wider ends rounded to 10 cm and 30 cm`,
    stressedNote,
    heightNote,
  ],
  seasonRules: [
    {
      text: 'Tap once a year, only between 1 January and 30 April.',
      source: sources.quebecConditions,
    },
    {
      text: 'Pull every spout by 1 June at the latest, without tearing the bark.',
      source: sources.quebecConditions,
    },
  ],
  drillingRules: [
    { text: 'Use a bit of at most 11 mm.', source: sources.quebecConditions },
    { text: 'Drill at most 6 cm deep, bark included.', source: sources.quebecConditions },
    {
      text: 'Where a tree takes two holes or more, spread them evenly around the trunk.',
      source: sources.quebecConditions,
    },
  ],
};

export const profiles = {
  conservative: make({
    key: 'conservative',
    label: 'Conservative (one tap from 12 in, two from 18 in)',
    unit: 'in',
    bands: inchBands([
      [12, 1],
      [18, 2],
    ]),
    spacing: { sidewaysCm: inToCm(4), verticalCm: inToCm(12), rule: 'either' },
    heightBand,
    drill: drill(1.75, 2),
    limits: { maxDepthCm: inToCm(2.5), maxBitCm: inToCm(7 / 16) },
    stressed: stressedOmafra,
    zone: defaultZone,
    source: sources.namspm,
    spacingSource: sources.uvmSpacing,
    depthSource: sources.perkins,
    notes: [
      `${spacingNote}; the wider ends of both ranges`,
      `Depth: ${sources.perkins} (1.75–2.0 in on vacuum, up to 2.5 in on gravity)`,
      stressedNote,
      heightNote,
    ],
  }),
  traditional: make({
    key: 'traditional',
    label: 'Traditional (one tap from 10 in, a tap for every 5 in more, up to four)',
    unit: 'in',
    bands: inchBands([
      [10, 1],
      [15, 2],
      [20, 3],
      [25, 4],
    ]),
    spacing: { sidewaysCm: inToCm(3), verticalCm: inToCm(6), rule: 'both' },
    heightBand,
    drill: drill(2, 2.5),
    limits: { maxDepthCm: inToCm(2.5), maxBitCm: inToCm(7 / 16) },
    stressed: stressedOmafra,
    zone: defaultZone,
    source: sources.namspmTraditional,
    spacingSource: sources.ohioSpacing,
    depthSource: sources.perkins,
    notes: [
      `Spacing: ${sources.ohioSpacing} (3 in over and 6 in up or down, both distances: a diagonal step)`,
      `Depth: ${sources.perkins} (2.0 in on vacuum, up to 2.5 in on gravity)`,
      stressedNote,
      heightNote,
    ],
  }),
  'ontario-vacuum': make({
    key: 'ontario-vacuum',
    label: 'Ontario, vacuum tubing',
    unit: 'in',
    bands: inchBands(
      [
        [12, 1],
        [18, 2],
      ],
      true,
    ),
    spacing: { sidewaysCm: inToCm(4), verticalCm: inToCm(12), rule: 'either' },
    heightBand,
    drill: drill(2, 2),
    limits: { maxDepthCm: inToCm(2), maxBitCm: inToCm(7 / 16) },
    stressed: stressedOmafra,
    zone: defaultZone,
    source: sources.omafraLeutyLiu,
    spacingSource: sources.uvmSpacing,
    depthSource: sources.omafra,
    notes: [
      'From 18 in: 1–2 taps, 2 only for healthy fast growers',
      `${spacingNote}; the wider ends of both ranges`,
      `Depth: ${sources.omafra} (1.5–2 in)`,
      stressedNote,
      heightNote,
    ],
  }),
  'ontario-buckets': make({
    key: 'ontario-buckets',
    label: 'Ontario, buckets',
    unit: 'in',
    bands: inchBands([
      [12, 1],
      [18, 2],
      [24, 3],
    ]),
    spacing: { sidewaysCm: inToCm(4), verticalCm: inToCm(12), rule: 'either' },
    heightBand,
    drill: drill(2, 2),
    limits: { maxDepthCm: inToCm(2), maxBitCm: inToCm(7 / 16) },
    stressed: stressedOmafra,
    zone: defaultZone,
    source: sources.omafra,
    spacingSource: sources.uvmSpacing,
    depthSource: sources.omafra,
    notes: [
      `${spacingNote}; the wider ends of both ranges`,
      `Depth: ${sources.omafra} (1.5–2 in)`,
      stressedNote,
      heightNote,
    ],
  }),
  'quebec-private': make({
    key: 'quebec-private',
    label: 'Quebec private land (sugar-bush plan standard)',
    ...quebec,
    source: sources.quebecPrivate,
  }),
  'quebec-public': make({
    key: 'quebec-public',
    label: 'Quebec public land (forest management permits)',
    ...quebec,
    source: sources.quebecPublic,
    notes: [...quebec.notes, sources.quebecPublicUntil2022],
  }),
} satisfies Record<string, GuidelineProfile>;

export type ProfileKey = keyof typeof profiles;
export const profileKeys = Object.keys(profiles) as ProfileKey[];

export function isProfileKey(key: string): key is ProfileKey {
  return Object.prototype.hasOwnProperty.call(profiles, key);
}

/** A profile object from itself or its key; an unknown key is a programming error. */
export function resolveProfile(profile: GuidelineProfile | string): GuidelineProfile {
  if (typeof profile !== 'string') return profile;
  if (!isProfileKey(profile)) throw new RangeError(`Unknown guideline profile "${profile}"`);
  return profiles[profile];
}
