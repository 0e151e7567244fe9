import { describe, expect, it } from 'vitest';
import {
  healthyGrowthLine,
  minimumBasalAreaGrowthIn2,
  minimumGrowthLine,
} from '../../shared/rules/minimum-growth';
import { minimumSustainableGrowth, steadyStateShare } from '../../shared/rules/tapping-zone';
import { ASSUMED_RADIAL_GROWTH_CM } from '../../shared/rules/advise-tree';
import { inToCm } from '../../shared/rules/units';

// Minimum growth: van den Berg, Perkins, Isselhardt, Wilmot 2016, Forest Science 62(1):107–114 — P.
describe('the 2016 minimum-growth line', () => {
  it('is 1.4 in²/yr at 10 in and 2.6 in²/yr at 18 in (van den Berg et al. 2016, Forest Science — P)', () => {
    expect(minimumBasalAreaGrowthIn2(10)).toBeCloseTo(1.4, 10);
    expect(minimumBasalAreaGrowthIn2(18)).toBeCloseTo(2.6, 10);
  });

  it('is straight between: 2.0 in²/yr at 14 in (van den Berg et al. 2016 — P, interpolated)', () => {
    expect(minimumBasalAreaGrowthIn2(14)).toBeCloseTo(2.0, 10);
    expect(minimumGrowthLine(14).extrapolated).toBe(false);
  });

  it('says so outside 10–18 in (van den Berg et al. 2016 — P, extrapolated with care)', () => {
    expect(minimumGrowthLine(24)).toEqual({
      in2PerYear: expect.closeTo(3.5, 10),
      extrapolated: true,
    });
    expect(minimumGrowthLine(8).extrapolated).toBe(true);
  });

  it('healthy trees grew 1.8 and 3.5 in²/yr (van den Berg et al. 2016 — P)', () => {
    expect(healthyGrowthLine(10).in2PerYear).toBeCloseTo(1.8, 10);
    expect(healthyGrowthLine(18).in2PerYear).toBeCloseTo(3.5, 10);
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
