import { describe, expect, it } from 'vitest';
import { adviseTree, ASSUMED_RADIAL_GROWTH_CM } from '../../shared/rules/advise-tree';
import { publishedGrowth } from '../../shared/rules/minimum-growth';
import { sources } from '../../shared/rules/sources';
import { minimumSustainableGrowth, steadyStateShare } from '../../shared/rules/tapping-zone';
import type { AdvisorTree } from '../../shared/rules/tree-record';
import { in2ToCm2, inToCm } from '../../shared/rules/units';

const codes = (t: AdvisorTree, profile = 'conservative') =>
  adviseTree(t, { season: 2027, profile }).warnings.map((w) => w.code);

/** A tree measured each 1 January 2022–2026, reaching `dbhIn` with `in2PerYear` of basal-area growth. */
function growing(dbhIn: number, in2PerYear: number): AdvisorTree {
  const dbhCm = inToCm(dbhIn);
  // Basal-area growth π · DBH · dr/dt with dr/dt half the DBH growth.
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

// Minimum growth: van den Berg, Perkins, Isselhardt, Wilmot 2016, Forest Science 62(1):107–114 — P.
// The two figures belong to one tap (at 10 in) and two taps (at 18 in): check values of the zone
// model's minimumSustainableGrowth, never a line over DBH.
describe('minimum growth for the taps set (van den Berg, Perkins, Isselhardt, Wilmot 2016, Forest Science 62(1):107–114 — P)', () => {
  it('one tap at 10 in needs about 1.4 in²/yr and two taps at 18 in about 2.6 in²/yr', () => {
    const [one, two] = publishedGrowth.minimum;
    expect(one).toMatchObject({ dbhIn: 10, taps: 1 });
    expect(two).toMatchObject({ dbhIn: 18, taps: 2 });
    for (const point of publishedGrowth.minimum) {
      const needed = minimumSustainableGrowth({
        dbhCm: inToCm(point.dbhIn),
        tapsPerYear: point.taps,
      });
      // Within 5 %, the calibration window of the model (docs/decisions/001).
      expect(Math.abs(needed / point.in2PerYear - 1)).toBeLessThan(0.05);
    }
  });

  it('scales with the taps set, about 1.3–1.45 in²/yr a tap, and barely with DBH', () => {
    for (const dbhIn of [10, 14, 18, 24, 30]) {
      const one = minimumSustainableGrowth({ dbhCm: inToCm(dbhIn), tapsPerYear: 1 });
      const two = minimumSustainableGrowth({ dbhCm: inToCm(dbhIn), tapsPerYear: 2 });
      expect(one).toBeGreaterThan(1.2);
      expect(one).toBeLessThan(1.45);
      expect(two / one).toBeGreaterThan(1.9);
      expect(two / one).toBeLessThan(2.1);
    }
    const at10 = minimumSustainableGrowth({ dbhCm: inToCm(10), tapsPerYear: 1 });
    const at30 = minimumSustainableGrowth({ dbhCm: inToCm(30), tapsPerYear: 1 });
    expect(at30 / at10).toBeGreaterThan(0.8);
  });

  it('a healthy 14 in one-tap tree growing 1.8 in²/yr gets no slow-growth warning and its tap at full depth', () => {
    const advice = adviseTree(growing(14, 1.8), { season: 2027, profile: 'conservative' });
    expect(advice.basalAreaGrowthIn2).toBeCloseTo(1.8, 6);
    expect(advice.warnings.map((w) => w.code)).not.toContain('slow-growth');
    expect(advice.warnings.map((w) => w.code)).not.toContain('growth-limits-taps');
    expect(advice).toMatchObject({ taps: 1, verdict: 'tap' });
    expect(advice.depthCm).toBeCloseTo(inToCm(1.75), 10);
  });

  it('a 24 in two-tap tree growing 2.9 in²/yr keeps both taps', () => {
    const advice = adviseTree(growing(24, 2.9), { season: 2027, profile: 'conservative' });
    expect(advice).toMatchObject({ taps: 2, verdict: 'tap' });
    expect(codes(growing(24, 2.9))).not.toContain('slow-growth');
    expect(codes(growing(24, 2.9))).not.toContain('growth-limits-taps');
  });

  it('compares growth with what the taps the tree would carry need, at its bit and depth', () => {
    const advice = adviseTree(growing(24, 2.9), { season: 2027, profile: 'conservative' });
    expect(advice.minimumGrowthTaps).toBe(2);
    expect(advice.minimumGrowthIn2).toBeCloseTo(
      minimumSustainableGrowth({
        dbhCm: inToCm(24),
        tapsPerYear: 2,
        bitCm: advice.bitCm,
        depthCm: advice.depthCm,
      }),
      10,
    );
  });

  it('healthy trees grew 1.8 and 3.5 in²/yr: context above the minimum for the same taps, not a rule', () => {
    expect(publishedGrowth.healthy.map((h) => h.in2PerYear)).toEqual([1.8, 3.5]);
    publishedGrowth.healthy.forEach((h, i) => {
      const taps = publishedGrowth.minimum[i].taps;
      expect(h.in2PerYear).toBeGreaterThan(
        minimumSustainableGrowth({ dbhCm: inToCm(h.dbhIn), tapsPerYear: taps }),
      );
    });
    expect(publishedGrowth.source).toBe(sources.minimumGrowth);
  });
});

// The slow-growth tests are the zone model's (docs/decisions/001) — our assumption, calibrated above.
describe('slow growth and growth that limits the taps (Clearwood tapping-zone model — our assumption)', () => {
  it('a tree growing less than one tap needs is slow: one shallow tap at most, about 1 in deep (Chabot — S)', () => {
    const advice = adviseTree(growing(20, 0.8), { season: 2027, profile: 'conservative' });
    const slow = advice.warnings.find((w) => w.code === 'slow-growth');
    expect(slow).toBeDefined();
    expect(advice.taps).toBeLessThanOrEqual(1);
    expect(advice.depthCm).toBeCloseTo(inToCm(1), 10);
  });

  it('a tree growing enough for one tap but not two is not called slow; its warning says what growth carries', () => {
    const advice = adviseTree(growing(20, 2.0), { season: 2027, profile: 'conservative' });
    const found = advice.warnings.map((w) => w.code);
    expect(found).not.toContain('slow-growth');
    expect(found).toContain('growth-limits-taps');
    expect(advice).toMatchObject({ taps: 1, verdict: 'tap-reduced' });
    expect(advice.depthCm).toBeCloseTo(inToCm(1.75), 10);
  });

  it('warnings the model computes cite the model, not the 2016 paper, and call the floor calibrated', () => {
    const slow = adviseTree(growing(20, 0.8), { season: 2027, profile: 'conservative' });
    const limited = adviseTree(growing(20, 2.0), { season: 2027, profile: 'conservative' });
    for (const w of [...slow.warnings, ...limited.warnings]) {
      if (
        w.code === 'slow-growth' ||
        w.code === 'growth-limits-taps' ||
        w.code === 'zone-depleted'
      ) {
        expect(w.source).toBe(sources.ourModel);
        expect(w.source).not.toBe(sources.minimumGrowth);
      }
    }
    expect(sources.ourModel).toContain('001-tapping-zone-model');
    expect(sources.ourModel).toContain('calibrated');
  });
});

// The tapping-zone model: concept van den Berg & Perkins 2014 — P; defaults from memory (our assumption).
describe('calibration of the tapping-zone model against the 2016 figures', () => {
  it('one tap at 10 in needs 1.44 in²/yr within 5 % (floor 0.82, defaults from memory — our assumption)', () => {
    const needed = minimumSustainableGrowth({ dbhCm: inToCm(10), tapsPerYear: 1 });
    expect(Math.abs(needed / 1.44 - 1)).toBeLessThan(0.05);
  });

  it('two taps at 18 in need 2.64 in²/yr within 5 % (floor 0.82, defaults from memory — our assumption)', () => {
    const needed = minimumSustainableGrowth({ dbhCm: inToCm(18), tapsPerYear: 2 });
    expect(Math.abs(needed / 2.64 - 1)).toBeLessThan(0.05);
  });

  it('at typical growth the stained share is a few per cent, the order of the 4.5 % stain-hit average (UVM Extension 2019, cited by UVM Proctor — S)', () => {
    // Typical second-growth sugar maple: about 2 in of DBH a decade (USFS Silvics of North America — S).
    const radial = inToCm(2) / 10 / 2;
    const stained =
      1 - steadyStateShare({ dbhCm: inToCm(16), radialGrowthCmPerYear: radial, tapsPerYear: 1 });
    expect(stained).toBeGreaterThan(0.01);
    expect(stained).toBeLessThan(0.15);
  });

  it('growth assumed while unknown is half the typical 2 in a decade (USFS Silvics of North America — S; halving is our choice)', () => {
    expect(ASSUMED_RADIAL_GROWTH_CM * 2 * 10).toBeCloseTo(inToCm(1), 10);
  });
});
