import { z } from 'zod';
import type { GuidelineProfile } from './profile-types';
import { defaultZone, profiles } from './profiles';
import { CM_PER_IN, inToCm } from './units';

/**
 * What a custom guideline may say, bounded by what the trade allows (DOMAIN.md §2–§4): no
 * guideline taps a tree under 20 cm or sets more than four taps; spacing at least the smallest
 * published figures (1 in to the side — Cornell, Wild; 6 in up or down — UVM Proctor, Ohio
 * State); holes at most 6.5 cm deep (a little over the 2.5 in gravity depth — Perkins, UVM
 * Proctor) with bits from 19/64 to 7/16 in; a height band within about 30–200 cm (common
 * practice); a floor the zone model can mean (0.5–0.98, calibrated default 0.82).
 */
export const CUSTOM_LIMITS = {
  smallestTappableCm: 20,
  largestEdgeCm: 200,
  maxTaps: 4,
  bandGapCm: 2.5,
  heightBand: { lowestCm: 30, highestCm: 200, minTallCm: 30 },
  spacing: {
    minSidewaysCm: inToCm(1),
    maxSidewaysCm: 30,
    minVerticalCm: inToCm(6),
    maxVerticalCm: 60,
  },
  depth: { minCm: 2.5, maxCm: 6.5 },
  bit: { minCm: 0.7, maxCm: 1.12 },
  floor: { min: 0.5, max: 0.98 },
  stressed: {
    maxTaps: 1,
    noneBelowMinCm: inToCm(12),
    noneBelowMaxCm: 100,
    diebackMinPct: 10,
    diebackMaxPct: 50,
    restMinPct: 20,
  },
  zone: {
    barkCm: [0.2, 1.5],
    stainLengthCm: [10, 100],
    stainMarginCm: [0, 3],
    zoneHeightCm: [30, 200],
  },
} as const;

const L = CUSTOM_LIMITS;

/**
 * A number between two bounds. The bounds carry no message of their own, so that a form can word
 * them in the units it shows (`validateCustomProfile` words them in cm, with the reason).
 */
const between = (min: number, max: number) => z.number().min(min).max(max);

/** Why each bound is where it is, for the messages `validateCustomProfile` gives. */
const reasons: Record<string, string> = {
  'spacing.sidewaysCm': 'no published spacing is closer than 1 in (2.54 cm) to the side',
  'spacing.verticalCm': 'no published spacing is closer than 6 in (15.24 cm) up or down',
  'heightBand.minCm': 'tapholes go about 30–200 cm above ground, in a band at least 30 cm tall',
  'heightBand.maxCm': 'tapholes go about 30–200 cm above ground, in a band at least 30 cm tall',
  depthCm: 'holes go 2.5–6.5 cm deep, bark included',
  maxDepthCm: 'holes go 2.5–6.5 cm deep, bark included',
  bitCm: 'bits run from 19/64 in to 7/16 in (0.7–1.12 cm)',
  maxBitCm: 'bits run from 19/64 in to 7/16 in (0.7–1.12 cm)',
  noneBelowCm: 'stressed trees under 12 in (30.48 cm) take none',
  diebackPct: 'up to 10 % dieback is no decline; over 15 % is cause for concern',
  restAtDiebackPct: 'up to 10 % dieback is no decline, so no tree is rested for less than 20 %',
  barkCm: 'bark is 0.2–1.5 cm thick',
  stainLengthCm: 'a stain column is 10–100 cm long',
  stainMarginCm: 'stain reaches 0–3 cm beyond the bit',
  zoneHeightCm: 'the tapping zone is 30–200 cm tall',
  floor: `the clear-wood floor is 0.5–0.98; Clearwood’s calibrated value is ${defaultZone.floor}`,
};

const unitOf = (key: string) => (key.endsWith('Cm') ? ' cm' : key.endsWith('Pct') ? ' %' : '');

/** Messages for the bounds the schema states plainly: "Use 2.54 cm or more: no published …". */
const boundMessages: z.core.$ZodErrorMap = (issue) => {
  const path = (issue.path ?? []).map(String);
  const key = [...path].reverse().find((p) => Number.isNaN(Number(p))) ?? '';
  const reason = reasons[path.join('.')] ?? reasons[key];
  const tail = reason ? `: ${reason}` : '';
  if (issue.code === 'invalid_type' && issue.expected === 'number') return 'Enter a number';
  if (issue.code === 'too_small' && issue.origin === 'number')
    return `Use ${Number(issue.minimum)}${unitOf(key)} or more${tail}`;
  if (issue.code === 'too_big' && issue.origin === 'number')
    return `Use ${Number(issue.maximum)}${unitOf(key)} or less${tail}`;
  return undefined;
};

const depthCm = between(L.depth.minCm, L.depth.maxCm);
const bitCm = between(L.bit.minCm, L.bit.maxCm);
const drillSetting = z.object({ depthCm, bitCm });

const base = profiles.conservative;
const owner = 'Custom profile saved by the owner';

export const customProfileSchema = z
  .object({
    key: z
      .string()
      .regex(/^custom(-[a-z0-9-]{1,30})?$/, 'A custom profile key starts with "custom"')
      .default('custom'),
    label: z
      .string()
      .trim()
      .min(1, 'Name the profile')
      .max(80, 'Keep the name under 80 characters'),
    unit: z.enum(['in', 'cm'], { error: 'Write the table in in or cm' }),
    bands: z
      .array(
        z.object({
          from: z
            .number({ error: 'Give the band’s smallest DBH' })
            .positive('A band starts above 0'),
          taps: z
            .number({ error: 'Give the band’s taps' })
            .int('Taps are whole numbers')
            .min(1, 'A band gives at least one tap')
            .max(L.maxTaps, `No guideline sets more than ${L.maxTaps} taps`),
          fullOnlyForHealthyFastGrowers: z.boolean().optional(),
        }),
        { error: 'Give the bands of the table' },
      )
      .min(1, 'Give at least one band')
      .max(L.maxTaps, `At most ${L.maxTaps} bands: no guideline sets more than ${L.maxTaps} taps`),
    spacing: z.object(
      {
        sidewaysCm: between(L.spacing.minSidewaysCm, L.spacing.maxSidewaysCm),
        verticalCm: between(L.spacing.minVerticalCm, L.spacing.maxVerticalCm),
        rule: z
          .enum(['either', 'both'], { error: 'Read the spacing as either distance or both' })
          .default('either'),
      },
      { error: 'Give the spacing between holes' },
    ),
    heightBand: z
      .object({
        minCm: between(L.heightBand.lowestCm, L.heightBand.highestCm - L.heightBand.minTallCm),
        maxCm: between(L.heightBand.lowestCm + L.heightBand.minTallCm, L.heightBand.highestCm),
      })
      .default(base.heightBand),
    drill: z
      .object({ bucket: drillSetting, gravity: drillSetting, vacuum: drillSetting })
      .default(base.drill),
    limits: z
      .object({
        maxDepthCm: between(L.depth.minCm, L.depth.maxCm),
        maxBitCm: between(L.bit.minCm, L.bit.maxCm),
      })
      .default(base.limits),
    stressed: z
      .object({
        maxTaps: z
          .number({ error: 'Give the taps for a stressed tree' })
          .int('Taps are whole numbers')
          .min(0, 'A stressed tree takes 0 or 1 tap')
          .max(L.stressed.maxTaps, 'A stressed tree takes 0 or 1 tap (OMAFRA guidance)'),
        noneBelowCm: between(L.stressed.noneBelowMinCm, L.stressed.noneBelowMaxCm),
        diebackPct: between(L.stressed.diebackMinPct, L.stressed.diebackMaxPct),
        restAtDiebackPct: between(L.stressed.restMinPct, 100),
      })
      .default(base.stressed),
    zone: z
      .object({
        barkCm: between(L.zone.barkCm[0], L.zone.barkCm[1]),
        stainLengthCm: between(L.zone.stainLengthCm[0], L.zone.stainLengthCm[1]),
        stainMarginCm: between(L.zone.stainMarginCm[0], L.zone.stainMarginCm[1]),
        zoneHeightCm: between(L.zone.zoneHeightCm[0], L.zone.zoneHeightCm[1]),
        floor: between(L.floor.min, L.floor.max),
      })
      .default(defaultZone),
    source: z.string().trim().min(1).max(300).default(owner),
    spacingSource: z.string().trim().min(1).max(300).default(owner),
    depthSource: z.string().trim().min(1).max(300).default(owner),
    notes: z.array(z.string().max(300)).max(10).default([]),
  })
  .superRefine((p, ctx) => {
    const toCm = p.unit === 'in' ? CM_PER_IN : 1;
    const issue = (path: (string | number)[], message: string) =>
      ctx.addIssue({ code: 'custom', path, message });
    p.bands.forEach((band, i) => {
      const path = ['bands', i];
      if (i === 0 && band.from * toCm < L.smallestTappableCm - 1e-9)
        issue([...path, 'from'], 'No guideline taps a tree under 20 cm (7.9 in)');
      if (band.from * toCm > L.largestEdgeCm)
        issue([...path, 'from'], 'A band edge is at most 200 cm (78.7 in)');
      if (band.taps !== i + 1) issue([...path, 'taps'], 'Bands add one tap each, starting at 1');
      const prev = p.bands[i - 1];
      if (prev && band.from <= prev.from)
        issue([...path, 'from'], 'Band edges must rise from band to band');
      else if (prev && (band.from - prev.from) * toCm < L.bandGapCm - 1e-9)
        issue([...path, 'from'], 'Keep band edges at least 2.5 cm (1 in) apart');
      if (band.fullOnlyForHealthyFastGrowers && (i !== p.bands.length - 1 || band.taps < 2))
        issue(
          [...path, 'fullOnlyForHealthyFastGrowers'],
          'Only the top band, with two taps or more, can be kept for fast growers',
        );
    });
    if (p.heightBand.maxCm - p.heightBand.minCm < L.heightBand.minTallCm - 1e-9)
      issue(['heightBand', 'maxCm'], 'Leave at least 30 cm between the lowest and highest hole');
    for (const collection of ['bucket', 'gravity', 'vacuum'] as const) {
      const d = p.drill[collection];
      if (d.depthCm > p.limits.maxDepthCm + 1e-9)
        issue(['drill', collection, 'depthCm'], 'Deeper than the profile allows');
      if (d.depthCm <= p.zone.barkCm + 1e-9)
        issue(['drill', collection, 'depthCm'], 'The hole must reach past the bark');
      if (d.bitCm > p.limits.maxBitCm + 1e-9)
        issue(['drill', collection, 'bitCm'], 'Wider than the profile allows');
    }
    if (p.stressed.restAtDiebackPct < p.stressed.diebackPct)
      issue(['stressed', 'restAtDiebackPct'], 'Resting must start at or above the stress level');
  });

export type CustomProfileInput = z.input<typeof customProfileSchema>;
/** A custom profile as it is stored: checked, defaults filled in, nothing else kept. */
export type CustomProfile = z.output<typeof customProfileSchema>;

export type CustomProfileResult =
  | { ok: true; profile: GuidelineProfile; value: CustomProfile }
  | { ok: false; errors: { path: string; message: string }[] };

/** Builds the advisor's profile from a checked custom set. */
function toProfile(p: CustomProfile): GuidelineProfile {
  const toCm = p.unit === 'in' ? CM_PER_IN : 1;
  const bands = p.bands.map((b) => ({
    from: b.from,
    fromCm: b.from * toCm,
    taps: b.taps,
    ...(b.fullOnlyForHealthyFastGrowers ? { fullOnlyForHealthyFastGrowers: true } : {}),
  }));
  return {
    ...p,
    bands,
    minimumDbhCm: bands[0].fromCm,
    maxTaps: bands[bands.length - 1].taps,
    seasonRules: [],
    drillingRules: [],
  };
}

/**
 * Checks a custom profile against the trade's bounds and builds it. `value` is what to store:
 * the checked set with its defaults, never the body as sent.
 */
export function validateCustomProfile(input: unknown): CustomProfileResult {
  const parsed = customProfileSchema.safeParse(input, { error: boundMessages });
  if (!parsed.success) {
    // One message per field: the first, which names the bound that was broken.
    const errors = new Map<string, string>();
    for (const issue of parsed.error.issues) {
      const path = issue.path.join('.');
      if (!errors.has(path)) errors.set(path, issue.message);
    }
    return { ok: false, errors: [...errors].map(([path, message]) => ({ path, message })) };
  }
  return { ok: true, profile: toProfile(parsed.data), value: parsed.data };
}
