import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { collections } from '../schemas/enums';
import { adviseTree } from './advise-tree';
import { profileKeys, profiles } from './profiles';
import { tapsForDbh } from './tap-table';
import { conductiveShare } from './tapping-zone';
import type { AdvisorTree } from './tree-record';

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

describe('advisor properties', () => {
  it('never places a hole within spacing of a prior hole still in reach, nor outside the band', () => {
    fc.assert(
      fc.property(treeArb, optionsArb, (tree, opts) => {
        const profile = profiles[opts.profile];
        const advice = adviseTree(tree, { season: SEASON, ...opts });
        if (advice.placements.length === 0) return;
        const circumference = Math.PI * advice.dbhCm!;
        const woodDepth = advice.depthCm - profile.zone.barkCm;
        const inReach = tree.tapholes.filter(
          (h) =>
            h.season < SEASON && advice.radialGrowthCmPerYear * (SEASON - h.season) < woodDepth,
        );
        for (const p of advice.placements) {
          expect(p.heightCm).toBeGreaterThanOrEqual(profile.heightBand.minCm);
          expect(p.heightCm).toBeLessThanOrEqual(profile.heightBand.maxCm);
          for (const h of [...inReach, ...advice.placements.filter((q) => q !== p)]) {
            const clear =
              arcCm(p.azimuthDeg, h.azimuthDeg, circumference) >=
                profile.spacing.sidewaysCm - 1e-6 ||
              Math.abs(p.heightCm - h.heightCm) >= profile.spacing.verticalCm - 1e-6;
            expect(clear).toBe(true);
          }
        }
      }),
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
