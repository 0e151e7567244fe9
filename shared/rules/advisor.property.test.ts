import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { collections } from '../schemas/enums';
import { adviseTree } from './advise-tree';
import { CUSTOM_LIMITS, validateCustomProfile } from './custom-profile';
import type { GuidelineProfile } from './profile-types';
import { profileKeys, profiles } from './profiles';
import { tapsForDbh } from './tap-table';
import { conductiveShare, minimumSustainableGrowth } from './tapping-zone';
import type { AdvisorTree } from './tree-record';
import { in2ToCm2, inToCm } from './units';

const SEASON = 2027;

const measurementsArb = fc
  .record({
    dbhCm: fc.double({ min: 15, max: 120, noNaN: true }),
    perYear: fc.double({ min: -0.3, max: 1.5, noNaN: true }),
    seasons: fc.integer({ min: 1, max: 6 }),
    dieback: fc.option(fc.integer({ min: 0, max: 20 }).map((c) => c * 5)),
  })
  .map(({ dbhCm, perYear, seasons, dieback }) =>
    Array.from({ length: seasons }, (_, i) => ({
      measuredOn: `${2026 - 2 * i}-0${1 + (i % 9)}-15`,
      dbhCm: Math.max(5, dbhCm - perYear * 2 * i),
      crownDiebackPct: dieback,
    })),
  );

const holeArb = fc.record({
  season: fc.integer({ min: 2005, max: 2026 }),
  heightCm: fc.double({ min: 30, max: 180, noNaN: true }),
  azimuthDeg: fc.double({ min: 0, max: 359.9, noNaN: true }),
  depthCm: fc.double({ min: 1.5, max: 7, noNaN: true }),
  bitCm: fc.constantFrom(0.75, 0.79375, 0.8, 1.11),
  collection: fc.constantFrom(...collections),
});

const treeArb: fc.Arbitrary<AdvisorTree> = fc.record({
  status: fc.constantFrom('active' as const, 'active' as const, 'active' as const, 'dead' as const),
  measurements: measurementsArb,
  tapholes: fc.array(holeArb, { maxLength: 40 }),
});

const optionsArb = fc.record({
  profile: fc.constantFrom(...profileKeys),
  sunnyAzimuthDeg: fc.double({ min: 0, max: 359.9, noNaN: true }),
});

function arcCm(a: number, b: number, circumference: number): number {
  const gap = Math.abs(a - b) % 360;
  return (Math.min(gap, 360 - gap) / 360) * circumference;
}

/**
 * Clear of an old hole as each source words it: `either` — the sideways OR the vertical spacing;
 * `both` ("over and up") — near the old hole, within twice the spacing, both distances.
 */
function keepsSpacing(
  dx: number,
  dy: number,
  spacing: GuidelineProfile['spacing'],
  eps = 1e-6,
): boolean {
  const { sidewaysCm: x, verticalCm: y } = spacing;
  if (spacing.rule === 'both') {
    const far = dx >= 2 * x - eps || dy >= 2 * y - eps;
    return far || (dx >= x - eps && dy >= y - eps);
  }
  return dx >= x - eps || dy >= y - eps;
}

/** Inside the stain column of the zone model: bit + margin wide, stain length tall, centred. */
function inStain(dx: number, dy: number, oldBit: number, newBit: number, p: GuidelineProfile) {
  return (
    dx < (oldBit + p.zone.stainMarginCm) / 2 + newBit / 2 - 1e-6 &&
    dy < p.zone.stainLengthCm / 2 + newBit / 2 - 1e-6
  );
}

/** Every placement lies in the band, keeps the spacing and stays out of every stain column. */
function checkPlacements(tree: AdvisorTree, profile: GuidelineProfile, sunnyAzimuthDeg: number) {
  const advice = adviseTree(tree, { season: SEASON, profile, sunnyAzimuthDeg });
  if (advice.placements.length === 0) return;
  const circumference = Math.PI * advice.dbhCm!;
  const woodDepth = advice.depthCm - profile.zone.barkCm;
  const inReach = tree.tapholes.filter(
    (h) => h.season < SEASON && advice.radialGrowthCmPerYear * (SEASON - h.season) < woodDepth,
  );
  for (const p of advice.placements) {
    expect(p.heightCm).toBeGreaterThanOrEqual(profile.heightBand.minCm);
    expect(p.heightCm).toBeLessThanOrEqual(profile.heightBand.maxCm);
    const others = [
      ...inReach,
      ...advice.placements.filter((q) => q !== p).map((q) => ({ ...q, bitCm: advice.bitCm })),
    ];
    for (const h of others) {
      const dx = arcCm(p.azimuthDeg, h.azimuthDeg, circumference);
      const dy = Math.abs(p.heightCm - h.heightCm);
      expect(keepsSpacing(dx, dy, profile.spacing)).toBe(true);
      expect(inStain(dx, dy, h.bitCm, advice.bitCm, profile)).toBe(false);
    }
  }
}

describe('advisor properties', () => {
  it('under every built-in profile, never places a hole within spacing or in the stain of a prior hole still in reach, nor outside the band', () => {
    fc.assert(
      fc.property(treeArb, optionsArb, (tree, opts) =>
        checkPlacements(tree, profiles[opts.profile], opts.sunnyAzimuthDeg),
      ),
      { numRuns: 300 },
    );
  });

  it('never gives more placements than taps, nor more taps than the table', () => {
    fc.assert(
      fc.property(treeArb, optionsArb, (tree, opts) => {
        const advice = adviseTree(tree, { season: SEASON, ...opts });
        expect(advice.placements.length).toBeLessThanOrEqual(advice.taps);
        if (advice.dbhCm !== null)
          expect(advice.taps).toBeLessThanOrEqual(tapsForDbh(advice.dbhCm, opts.profile));
        expect(advice.taps).toBeLessThanOrEqual(profiles[opts.profile].maxTaps);
        expect(advice.conductiveShare).toBeGreaterThanOrEqual(0);
        expect(advice.conductiveShare).toBeLessThanOrEqual(1);
      }),
      { numRuns: 300 },
    );
  });

  it('gives identical advice for identical input', () => {
    fc.assert(
      fc.property(treeArb, optionsArb, (tree, opts) => {
        const first = adviseTree(tree, { season: SEASON, ...opts });
        const second = adviseTree(structuredClone(tree), { season: SEASON, ...opts });
        expect(second).toEqual(first);
      }),
    );
  });
});

const zoneHoleArb = fc.record({
  season: fc.integer({ min: 1990, max: SEASON }),
  bitCm: fc.option(fc.double({ min: 0.5, max: 1.2, noNaN: true }), { nil: undefined }),
  depthCm: fc.option(fc.double({ min: 0.5, max: 8, noNaN: true }), { nil: undefined }),
});
const zoneArb = fc.record({
  dbhCm: fc.double({ min: 5, max: 200, noNaN: true }),
  radialGrowthCmPerYear: fc.double({ min: 0, max: 1, noNaN: true }),
  holes: fc.array(zoneHoleArb, { maxLength: 60 }),
});

describe('conductive share properties', () => {
  it('stays within 0–1 and is exactly 1 with no holes', async () => {
    await fc.assert(
      fc.asyncProperty(zoneArb, async (z) => {
        const share = conductiveShare({ ...z, season: SEASON });
        expect(share).toBeGreaterThanOrEqual(0);
        expect(share).toBeLessThanOrEqual(1);
        expect(conductiveShare({ ...z, season: SEASON, holes: [] })).toBe(1);
      }),
    );
  });

  it('does not rise when holes are added', async () => {
    await fc.assert(
      fc.asyncProperty(
        zoneArb,
        fc.array(zoneHoleArb, { minLength: 1, maxLength: 10 }),
        async (z, more) => {
          const before = conductiveShare({ ...z, season: SEASON });
          const after = conductiveShare({ ...z, season: SEASON, holes: [...z.holes, ...more] });
          expect(after).toBeLessThanOrEqual(before + 1e-12);
        },
      ),
    );
  });

  it('does not fall when the tree grows faster', async () => {
    await fc.assert(
      fc.asyncProperty(zoneArb, fc.double({ min: 0, max: 1, noNaN: true }), async (z, extra) => {
        const slow = conductiveShare({ ...z, season: SEASON });
        const fast = conductiveShare({
          ...z,
          season: SEASON,
          radialGrowthCmPerYear: z.radialGrowthCmPerYear + extra,
        });
        expect(fast).toBeGreaterThanOrEqual(slow - 1e-12);
      }),
    );
  });
});

/** Custom sets with values on both sides of every bound the trade sets. */
const wideCustomArb = fc.record({
  label: fc.constant('Owner set'),
  unit: fc.constant('cm' as const),
  bands: fc
    .tuple(
      fc.double({ min: 10, max: 70, noNaN: true }),
      fc.array(fc.double({ min: 0.5, max: 30, noNaN: true }), { maxLength: 5 }),
    )
    .map(([first, gaps]) => {
      let from = first;
      return [first, ...gaps.map((g) => (from += g))].map((f, i) => ({ from: f, taps: i + 1 }));
    }),
  spacing: fc.record({
    sidewaysCm: fc.double({ min: 0.01, max: 40, noNaN: true }),
    verticalCm: fc.double({ min: 0.01, max: 80, noNaN: true }),
    rule: fc.constantFrom('either' as const, 'both' as const),
  }),
  heightBand: fc
    .tuple(
      fc.double({ min: 0, max: 300, noNaN: true }),
      fc.double({ min: 0, max: 200, noNaN: true }),
    )
    .map(([minCm, tall]) => ({ minCm, maxCm: minCm + tall })),
  drill: fc
    .record({
      depthCm: fc.double({ min: 0.5, max: 10, noNaN: true }),
      bitCm: fc.double({ min: 0.3, max: 2, noNaN: true }),
    })
    .map((d) => ({ bucket: d, gravity: d, vacuum: d })),
  limits: fc.record({
    maxDepthCm: fc.double({ min: 2, max: 10, noNaN: true }),
    maxBitCm: fc.double({ min: 0.5, max: 2, noNaN: true }),
  }),
  stressed: fc.record({
    maxTaps: fc.integer({ min: 0, max: 3 }),
    noneBelowCm: fc.double({ min: 0, max: 150, noNaN: true }),
    diebackPct: fc.double({ min: 0, max: 80, noNaN: true }),
    restAtDiebackPct: fc.double({ min: 0, max: 100, noNaN: true }),
  }),
  zone: fc.record({
    barkCm: fc.double({ min: 0, max: 3, noNaN: true }),
    stainLengthCm: fc.double({ min: 1, max: 150, noNaN: true }),
    stainMarginCm: fc.double({ min: 0, max: 5, noNaN: true }),
    zoneHeightCm: fc.double({ min: 10, max: 300, noNaN: true }),
    floor: fc.double({ min: 0.01, max: 0.999, noNaN: true }),
  }),
});

/** Custom sets an owner would plausibly save: mostly inside the bounds, so most are accepted. */
const saneCustomArb = fc.record({
  label: fc.constant('Lease terms'),
  unit: fc.constantFrom('in' as const, 'cm' as const),
  bands: fc
    .tuple(
      fc.integer({ min: 10, max: 16 }),
      fc.integer({ min: 0, max: 3 }),
      fc.integer({ min: 3, max: 8 }),
    )
    .map(([first, extra, step]) =>
      Array.from({ length: extra + 1 }, (_, i) => ({ from: first + i * step, taps: i + 1 })),
    ),
  spacing: fc.record({
    sidewaysCm: fc.double({ min: CUSTOM_LIMITS.spacing.minSidewaysCm, max: 15, noNaN: true }),
    verticalCm: fc.double({ min: CUSTOM_LIMITS.spacing.minVerticalCm, max: 40, noNaN: true }),
    rule: fc.constantFrom('either' as const, 'both' as const),
  }),
  heightBand: fc
    .tuple(fc.integer({ min: 30, max: 100 }), fc.integer({ min: 30, max: 100 }))
    .map(([minCm, tall]) => ({ minCm, maxCm: Math.min(200, minCm + tall) })),
  zone: fc.record({
    barkCm: fc.double({ min: 0.3, max: 1, noNaN: true }),
    stainLengthCm: fc.double({ min: 10, max: 60, noNaN: true }),
    stainMarginCm: fc.double({ min: 0, max: 2, noNaN: true }),
    zoneHeightCm: fc.integer({ min: 30, max: 200 }),
    floor: fc.double({ min: 0.5, max: 0.98, noNaN: true }),
  }),
});

const within = (v: number, lo: number, hi: number) => v >= lo - 1e-9 && v <= hi + 1e-9;

describe('custom profile properties', () => {
  it('every accepted custom profile lies within the bounds the trade sets', async () => {
    let accepted = 0;
    await fc.assert(
      fc.asyncProperty(fc.oneof(wideCustomArb, saneCustomArb), async (input) => {
        const result = validateCustomProfile(input);
        if (!result.ok) {
          expect(result.errors.length).toBeGreaterThan(0);
          return;
        }
        accepted++;
        const p = result.profile;
        const L = CUSTOM_LIMITS;
        expect(p.maxTaps).toBeLessThanOrEqual(4);
        expect(p.bands[0].fromCm).toBeGreaterThanOrEqual(20 - 1e-9);
        p.bands.forEach((b, i) => {
          if (i > 0) expect(b.fromCm - p.bands[i - 1].fromCm).toBeGreaterThanOrEqual(2.5 - 1e-9);
        });
        expect(within(p.heightBand.minCm, 30, 200)).toBe(true);
        expect(within(p.heightBand.maxCm, 30, 200)).toBe(true);
        expect(p.heightBand.maxCm - p.heightBand.minCm).toBeGreaterThanOrEqual(30 - 1e-9);
        // Smallest published spacing: 1 in to the side (Cornell, Wild), 6 in up/down (UVM Proctor; Ohio State).
        expect(p.spacing.sidewaysCm).toBeGreaterThanOrEqual(inToCm(1) - 1e-9);
        expect(p.spacing.verticalCm).toBeGreaterThanOrEqual(inToCm(6) - 1e-9);
        for (const c of collections) {
          expect(p.drill[c].depthCm).toBeLessThanOrEqual(6.5 + 1e-9);
          expect(p.drill[c].depthCm).toBeGreaterThan(p.zone.barkCm);
          expect(within(p.drill[c].bitCm, L.bit.minCm, L.bit.maxCm)).toBe(true);
        }
        expect(p.limits.maxDepthCm).toBeLessThanOrEqual(6.5 + 1e-9);
        expect(within(p.zone.floor, 0.5, 0.98)).toBe(true);
        expect(p.stressed.maxTaps).toBeLessThanOrEqual(1);
        expect(p.stressed.restAtDiebackPct).toBeGreaterThanOrEqual(L.stressed.restMinPct - 1e-9);
        expect(p.stressed.restAtDiebackPct).toBeGreaterThanOrEqual(p.stressed.diebackPct);
      }),
      { numRuns: 400 },
    );
    expect(accepted).toBeGreaterThan(50);
  });

  it('under every accepted custom profile, placements keep the spacing, stay out of every stain column and inside the band', async () => {
    let accepted = 0;
    // Recent holes right where the first new hole is aimed (the sunny side, mid-band), so the
    // search has to step round or over them.
    const crowdedTree = (band: { minCm: number; maxCm: number }, sunny: number) =>
      fc
        .record({
          dbhCm: fc.double({ min: 25, max: 90, noNaN: true }),
          holes: fc.array(
            fc.record({
              season: fc.integer({ min: 2022, max: 2026 }),
              dAz: fc.double({ min: -8, max: 8, noNaN: true }),
              dH: fc.double({ min: -20, max: 20, noNaN: true }),
              bitCm: fc.constantFrom(0.79375, 1.11125),
            }),
            { minLength: 1, maxLength: 8 },
          ),
        })
        .map(({ dbhCm, holes }): AdvisorTree => ({
          measurements: [2022, 2024, 2026].map((y) => ({
            measuredOn: `${y}-06-01`,
            dbhCm: dbhCm - 0.4 * (2026 - y),
            crownDiebackPct: 0,
          })),
          tapholes: holes.map((h) => ({
            season: h.season,
            azimuthDeg: (((sunny + h.dAz) % 360) + 360) % 360,
            heightCm: (band.minCm + band.maxCm) / 2 + h.dH,
            depthCm: 5,
            bitCm: h.bitCm,
            collection: 'vacuum' as const,
          })),
        }));
    await fc.assert(
      fc.asyncProperty(
        saneCustomArb.chain((input) =>
          fc
            .double({ min: 0, max: 359.9, noNaN: true })
            .chain((sunny) =>
              fc
                .oneof(crowdedTree(input.heightBand, sunny), treeArb)
                .map((tree) => ({ input, tree, sunny })),
            ),
        ),
        async ({ input, tree, sunny }) => {
          const result = validateCustomProfile(input);
          if (!result.ok) return;
          accepted++;
          checkPlacements(tree, result.profile, sunny);
        },
      ),
      { numRuns: 400 },
    );
    expect(accepted).toBeGreaterThan(100);
  });
});

/** A tree measured each 1 January 2022–2026 whose basal-area growth is `in2PerYear` at `dbhCm`. */
function treeGrowing(dbhCm: number, in2PerYear: number): AdvisorTree {
  const perYear = (2 * in2ToCm2(in2PerYear)) / (Math.PI * dbhCm);
  return {
    measurements: [2022, 2023, 2024, 2025, 2026].map((y) => ({
      measuredOn: `${y}-01-01`,
      dbhCm: dbhCm - perYear * (2026 - y),
      crownDiebackPct: 0,
    })),
    tapholes: [],
  };
}

describe('growth properties', () => {
  it('a tree growing at least what its taps need gets no slow-growth warning, nor a growth limit', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...profileKeys),
        fc.constantFrom(...collections),
        fc.double({ min: 20, max: 120, noNaN: true }),
        fc.double({ min: 0, max: 1.5, noNaN: true }),
        async (key, collection, dbhCm, surplus) => {
          const profile = profiles[key];
          const taps = tapsForDbh(dbhCm, profile);
          if (taps === 0) return;
          const drill = profile.drill[collection];
          const needed = minimumSustainableGrowth({
            dbhCm,
            tapsPerYear: taps,
            bitCm: Math.min(drill.bitCm, profile.limits.maxBitCm),
            depthCm: Math.min(drill.depthCm, profile.limits.maxDepthCm),
            zone: profile.zone,
          });
          const tree = treeGrowing(dbhCm, needed * (1 + surplus) + 1e-9);
          const advice = adviseTree(tree, { season: SEASON, profile, collection });
          const found = advice.warnings.map((w) => w.code);
          expect(found).not.toContain('slow-growth');
          expect(found).not.toContain('growth-limits-taps');
        },
      ),
      { numRuns: 300 },
    );
  });
});
