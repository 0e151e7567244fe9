import { describe, expect, it } from 'vitest';
import { defaultZone } from './profiles';
import {
  conductiveShare,
  DEFAULT_BIT_CM,
  maxSustainableTaps,
  minimumSustainableGrowth,
  stainAgeSum,
  steadyStateShare,
  zoneVolumeCm3,
} from './tapping-zone';
import { projectConductiveShare } from './zone-projection';

const d = 5.08 - defaultZone.barkCm;
const stainPerHole = 30 * (DEFAULT_BIT_CM + 1) * d;

describe('conductive share', () => {
  it('is 1 with no holes', () => {
    expect(
      conductiveShare({ dbhCm: 40, radialGrowthCmPerYear: 0.2, season: 2027, holes: [] }),
    ).toBe(1);
  });

  it('takes the annulus π(R² − (R − d)²)·H as the zone', () => {
    const r = 20;
    expect(zoneVolumeCm3(40, d, defaultZone)).toBeCloseTo(Math.PI * (r * r - (r - d) ** 2) * 90, 6);
  });

  it('counts a hole of this season in full and an older one by 1 − g·k/d', () => {
    const zone = zoneVolumeCm3(40, d, defaultZone);
    const fresh = conductiveShare({
      dbhCm: 40,
      radialGrowthCmPerYear: 0.3,
      season: 2027,
      holes: [{ season: 2027 }],
    });
    expect(fresh).toBeCloseTo(1 - stainPerHole / zone, 10);
    const older = conductiveShare({
      dbhCm: 40,
      radialGrowthCmPerYear: 0.3,
      season: 2027,
      holes: [{ season: 2022 }],
    });
    expect(older).toBeCloseTo(1 - (stainPerHole * (1 - (0.3 * 5) / d)) / zone, 10);
  });

  it('drops holes grown out of reach and ignores holes of later seasons', () => {
    const input = { dbhCm: 40, radialGrowthCmPerYear: 0.3, season: 2027 };
    expect(conductiveShare({ ...input, holes: [{ season: 2010 }, { season: 2030 }] })).toBe(1);
  });

  it('counts a shallow old hole only as deep as it went', () => {
    const input = { dbhCm: 40, radialGrowthCmPerYear: 0, season: 2027 };
    const shallow = conductiveShare({ ...input, holes: [{ season: 2026, depthCm: 0.6 + d / 2 }] });
    const full = conductiveShare({ ...input, holes: [{ season: 2026 }] });
    expect(1 - shallow).toBeCloseTo((1 - full) / 2, 10);
  });

  it('never goes below 0', () => {
    const holes = Array.from({ length: 500 }, () => ({ season: 2026 }));
    expect(conductiveShare({ dbhCm: 20, radialGrowthCmPerYear: 0.1, season: 2027, holes })).toBe(0);
  });
});

describe('steady state', () => {
  it('sums max(0, 1 − g·k/d) over k = 0, 1, 2 …', () => {
    expect(stainAgeSum(1, 4)).toBeCloseTo(1 + 0.75 + 0.5 + 0.25, 10);
    expect(stainAgeSum(1.5, 4)).toBeCloseTo(1 + (1 - 1.5 / 4) + (1 - 3 / 4), 10);
    expect(stainAgeSum(0, 4)).toBe(Infinity);
  });

  it('is where a long projection settles', () => {
    const input = { dbhCm: 45, radialGrowthCmPerYear: 0.25, tapsPerYear: 2 };
    expect(steadyStateShare({ ...input, radialGrowthCmPerYear: 0 })).toBe(0);
    const growing = projectConductiveShare({ ...input, season: 2000, holes: [], seasons: 20 });
    // Growth widens the trunk in the projection, so it settles a little above the fixed-size figure.
    expect(growing.at(-1)!.shareAfter).toBeGreaterThanOrEqual(steadyStateShare(input) - 1e-9);
    expect(growing.at(-1)!.shareAfter).toBeLessThan(steadyStateShare(input) + 0.02);
  });

  it('allows the largest rate whose steady share stays at the floor, and not one more', () => {
    const input = { dbhCm: 60, radialGrowthCmPerYear: 0.2 };
    const n = maxSustainableTaps(input);
    expect(n).toBeGreaterThan(0);
    expect(steadyStateShare({ ...input, tapsPerYear: n })).toBeGreaterThanOrEqual(0.82);
    expect(steadyStateShare({ ...input, tapsPerYear: n + 1 })).toBeLessThan(0.82);
  });

  it('needs more growth for more taps and none for none', () => {
    const one = minimumSustainableGrowth({ dbhCm: 45.72, tapsPerYear: 1 });
    const two = minimumSustainableGrowth({ dbhCm: 45.72, tapsPerYear: 2 });
    expect(two).toBeGreaterThan(one);
    expect(minimumSustainableGrowth({ dbhCm: 45.72, tapsPerYear: 0 })).toBe(0);
  });

  it('needs less growth with shallower holes', () => {
    const deep = minimumSustainableGrowth({ dbhCm: 40, tapsPerYear: 1, depthCm: 5.08 });
    const shallow = minimumSustainableGrowth({ dbhCm: 40, tapsPerYear: 1, depthCm: 2.54 });
    expect(shallow).toBeLessThan(deep);
  });

  it('calls a rate hopeless when this season’s holes alone pass the floor', () => {
    expect(minimumSustainableGrowth({ dbhCm: 20, tapsPerYear: 20 })).toBe(Infinity);
  });
});
