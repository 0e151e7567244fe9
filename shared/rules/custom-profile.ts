import { z } from 'zod';
import type { GuidelineProfile } from './profile-types';
import { defaultZone, profiles } from './profiles';
import { CM_PER_IN } from './units';

/** No guideline taps a tree under 20 cm; none of ours goes above six taps. */
export const CUSTOM_LIMITS = { smallestTappableCm: 20, largestEdgeCm: 200, maxTaps: 6 } as const;

const drillSetting = z.object({
  depthCm: z.number().gt(0).max(10, 'Drill at most 10 cm deep'),
  bitCm: z.number().gt(0).max(2, 'A bit is at most 2 cm wide'),
});

const base = profiles.conservative;

/** A guideline set an owner saves for a sugarbush. Band edges are in `unit`; every other length in cm. */
export const customProfileSchema = z
  .object({
    key: z
      .string()
      .regex(/^custom(-[a-z0-9-]{1,30})?$/, 'A custom profile key starts with "custom"')
      .default('custom'),
    label: z.string().trim().min(1, 'Name the profile').max(80),
    unit: z.enum(['in', 'cm']),
    bands: z
      .array(
        z.object({
          from: z.number().positive('A band starts above 0'),
          taps: z.number().int().min(1).max(CUSTOM_LIMITS.maxTaps),
          fullOnlyForHealthyFastGrowers: z.boolean().optional(),
        }),
      )
      .min(1, 'Give at least one band')
      .max(CUSTOM_LIMITS.maxTaps),
    spacing: z.object({
      sidewaysCm: z.number().gt(0).max(60),
      verticalCm: z.number().gt(0).max(100),
    }),
    heightBand: z
      .object({ minCm: z.number().min(0).max(300), maxCm: z.number().gt(0).max(400) })
      .default(base.heightBand),
    drill: z
      .object({ bucket: drillSetting, gravity: drillSetting, vacuum: drillSetting })
      .default(base.drill),
    limits: z
      .object({ maxDepthCm: z.number().gt(0).max(10), maxBitCm: z.number().gt(0).max(2) })
      .default(base.limits),
    stressed: z
      .object({
        maxTaps: z.number().int().min(0).max(CUSTOM_LIMITS.maxTaps),
        noneBelowCm: z.number().min(0).max(200),
        diebackPct: z.number().min(0).max(100),
        restAtDiebackPct: z.number().min(0).max(100),
      })
      .default(base.stressed),
    zone: z
      .object({
        barkCm: z.number().min(0).max(3),
        stainLengthCm: z.number().gt(0).max(100),
        stainMarginCm: z.number().min(0).max(5),
        zoneHeightCm: z.number().gt(0).max(400),
        floor: z.number().gt(0).lt(1),
      })
      .default(defaultZone),
    source: z.string().trim().min(1).max(300).default('Custom profile saved by the owner'),
    spacingSource: z.string().trim().min(1).max(300).default('Custom profile saved by the owner'),
    depthSource: z.string().trim().min(1).max(300).default('Custom profile saved by the owner'),
    notes: z.array(z.string().max(300)).max(10).default([]),
  })
  .superRefine((p, ctx) => {
    const toCm = p.unit === 'in' ? CM_PER_IN : 1;
    p.bands.forEach((band, i) => {
      const path = ['bands', i];
      if (i === 0 && band.from * toCm < CUSTOM_LIMITS.smallestTappableCm - 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'from'],
          message: 'No guideline taps a tree under 20 cm (7.9 in)',
        });
      if (band.from * toCm > CUSTOM_LIMITS.largestEdgeCm)
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'from'],
          message: 'A band edge is at most 200 cm (78.7 in)',
        });
      if (band.taps !== i + 1)
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'taps'],
          message: 'Bands add one tap each, starting at 1',
        });
      const prev = p.bands[i - 1];
      if (prev && band.from <= prev.from)
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'from'],
          message: 'Band edges must rise from band to band',
        });
      if (band.fullOnlyForHealthyFastGrowers && (i !== p.bands.length - 1 || band.taps < 2))
        ctx.addIssue({
          code: 'custom',
          path: [...path, 'fullOnlyForHealthyFastGrowers'],
          message: 'Only the top band, with two taps or more, can be kept for fast growers',
        });
    });
    if (p.heightBand.maxCm - p.heightBand.minCm < 20)
      ctx.addIssue({
        code: 'custom',
        path: ['heightBand', 'maxCm'],
        message: 'Leave at least 20 cm between the lowest and highest hole',
      });
    for (const collection of ['bucket', 'gravity', 'vacuum'] as const) {
      const d = p.drill[collection];
      if (d.depthCm > p.limits.maxDepthCm + 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: ['drill', collection, 'depthCm'],
          message: 'Deeper than the profile allows',
        });
      if (d.depthCm <= p.zone.barkCm)
        ctx.addIssue({
          code: 'custom',
          path: ['drill', collection, 'depthCm'],
          message: 'The hole must reach past the bark',
        });
      if (d.bitCm > p.limits.maxBitCm + 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: ['drill', collection, 'bitCm'],
          message: 'Wider than the profile allows',
        });
    }
    if (p.stressed.restAtDiebackPct < p.stressed.diebackPct)
      ctx.addIssue({
        code: 'custom',
        path: ['stressed', 'restAtDiebackPct'],
        message: 'Resting must start at or above the stress level',
      });
  });

export type CustomProfileInput = z.input<typeof customProfileSchema>;

export type CustomProfileResult =
  | { ok: true; profile: GuidelineProfile }
  | { ok: false; errors: { path: string; message: string }[] };

/** Checks a custom profile (bands ascending, one tap per band, sane lengths) and builds it. */
export function validateCustomProfile(input: unknown): CustomProfileResult {
  const parsed = customProfileSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      errors: parsed.error.issues.map((issue) => ({
        path: issue.path.join('.'),
        message: issue.message,
      })),
    };
  }
  const p = parsed.data;
  const toCm = p.unit === 'in' ? CM_PER_IN : 1;
  const bands = p.bands.map((b) => ({
    from: b.from,
    fromCm: b.from * toCm,
    taps: b.taps,
    ...(b.fullOnlyForHealthyFastGrowers ? { fullOnlyForHealthyFastGrowers: true } : {}),
  }));
  return {
    ok: true,
    profile: {
      ...p,
      bands,
      minimumDbhCm: bands[0].fromCm,
      maxTaps: bands[bands.length - 1].taps,
    },
  };
}
