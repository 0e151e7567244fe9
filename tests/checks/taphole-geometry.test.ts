import { describe, expect, it } from 'vitest';
import { adviseTree } from '../../shared/rules/advise-tree';
import { profileKeys, profiles } from '../../shared/rules/profiles';
import { isClearOf, isInStainColumn } from '../../shared/rules/spacing';
import { DEFAULT_BIT_CM, DEFAULT_DEPTH_CM } from '../../shared/rules/tapping-zone';
import { azimuthGapDeg, inToCm } from '../../shared/rules/units';

const healthy = (dbhCm: number) => ({
  measurements: [
    { measuredOn: '2024-06-01', dbhCm: dbhCm - 2, crownDiebackPct: 0 },
    { measuredOn: '2026-06-01', dbhCm, crownDiebackPct: 0 },
  ],
  tapholes: [],
});

describe('bits and depths', () => {
  it('the default bit is 5/16 in (S) and the default hole 2 in deep with bark (common practice)', () => {
    expect(DEFAULT_BIT_CM).toBeCloseTo(0.79375, 10);
    expect(DEFAULT_DEPTH_CM).toBeCloseTo(5.08, 10);
  });

  it('vacuum holes are 1.75–2.0 in deep with bark, gravity up to 2.5 in (Perkins, UVM Proctor — S)', () => {
    for (const p of [profiles.conservative, profiles.traditional]) {
      expect(p.drill.vacuum.depthCm).toBeGreaterThanOrEqual(inToCm(1.75) - 1e-9);
      expect(p.drill.vacuum.depthCm).toBeLessThanOrEqual(inToCm(2) + 1e-9);
      expect(p.drill.gravity.depthCm).toBeLessThanOrEqual(inToCm(2.5) + 1e-9);
    }
  });

  it('Ontario holes are 1.5–2 in deep (OMAFRA — P)', () => {
    for (const p of [profiles['ontario-vacuum'], profiles['ontario-buckets']]) {
      for (const c of ['bucket', 'gravity', 'vacuum'] as const) {
        expect(p.drill[c].depthCm).toBeGreaterThanOrEqual(inToCm(1.5) - 1e-9);
        expect(p.drill[c].depthCm).toBeLessThanOrEqual(inToCm(2) + 1e-9);
      }
    }
  });

  it('Quebec holes are at most 6 cm deep with a bit of at most 11 mm (Quebec — P)', () => {
    const q = profiles['quebec-public'];
    expect(q.limits).toEqual({ maxDepthCm: 6, maxBitCm: 1.1 });
    for (const c of ['bucket', 'gravity', 'vacuum'] as const) {
      expect(q.drill[c].depthCm).toBeLessThanOrEqual(6);
      expect(q.drill[c].bitCm).toBeLessThanOrEqual(1.1);
    }
  });

  it('small trees get a hole about 1 in deep, never over 2 in (Chabot — S)', () => {
    const advice = adviseTree(healthy(27), { season: 2027, profile: 'traditional' });
    expect(advice.depthCm).toBeCloseTo(inToCm(1), 10);
  });
});

describe('spacing from holes still in reach', () => {
  it('the conservative set keeps 4 in sideways or 12 in up/down, the wide ends of 2–4 in / 6–12 in (UVM Proctor sap-yield tips 2020 — S)', () => {
    expect(profiles.conservative.spacing).toEqual({
      sidewaysCm: inToCm(4),
      verticalCm: inToCm(12),
      rule: 'either',
    });
  });

  it('the traditional set keeps 3 in over and 6 in up/down, both distances (Ohio State — S)', () => {
    expect(profiles.traditional.spacing).toEqual({
      sidewaysCm: inToCm(3),
      verticalCm: inToCm(6),
      rule: 'both',
    });
  });

  it('where a source says "over and up", a hole 6 in straight above an old one is not clear (Ohio State — S)', () => {
    const c = Math.PI * inToCm(20);
    const old = { azimuthDeg: 180, heightCm: 100 };
    const over = (inches: number) => 180 + (inToCm(inches) / c) * 360;
    const { spacing } = profiles.traditional;
    expect(isClearOf({ azimuthDeg: 180, heightCm: 100 + inToCm(6) }, old, spacing, c)).toBe(false);
    expect(isClearOf({ azimuthDeg: over(3), heightCm: 100 }, old, spacing, c)).toBe(false);
    expect(isClearOf({ azimuthDeg: over(3), heightCm: 100 + inToCm(6) }, old, spacing, c)).toBe(
      true,
    );
    // The opposite side of the trunk at the same height is another part of the tree.
    expect(isClearOf({ azimuthDeg: 0, heightCm: 100 }, old, spacing, c)).toBe(true);
  });

  it('where a source says "to the side or above/below", either distance is enough (UVM Proctor sap-yield tips 2020 — S)', () => {
    const c = Math.PI * inToCm(20);
    const old = { azimuthDeg: 180, heightCm: 100 };
    const { spacing } = profiles.conservative;
    expect(isClearOf({ azimuthDeg: 180, heightCm: 100 + inToCm(12) }, old, spacing, c)).toBe(true);
    const fourIn = (inToCm(4) / c) * 360;
    expect(isClearOf({ azimuthDeg: 180 + fourIn, heightCm: 100 }, old, spacing, c)).toBe(true);
  });

  it('whatever the profile, the advice never puts a hole 6 in straight above last season’s (zone model — our assumption)', () => {
    for (const key of profileKeys) {
      const advice = adviseTree(
        {
          measurements: [
            { measuredOn: '2024-06-01', dbhCm: 48, crownDiebackPct: 0 },
            { measuredOn: '2026-06-01', dbhCm: 50, crownDiebackPct: 0 },
          ],
          tapholes: [
            {
              season: 2026,
              heightCm: 90,
              azimuthDeg: 180,
              depthCm: 5,
              bitCm: 0.79375,
              collection: 'vacuum',
            },
          ],
        },
        { season: 2027, profile: key },
      );
      const column = {
        stainLengthCm: profiles[key].zone.stainLengthCm,
        stainMarginCm: profiles[key].zone.stainMarginCm,
      };
      for (const p of advice.placements) {
        expect(
          isInStainColumn(
            p,
            { azimuthDeg: 180, heightCm: 90, bitCm: 0.79375 },
            advice.bitCm,
            column,
            Math.PI * 50,
          ),
        ).toBe(false);
        expect(p.azimuthDeg === 180 && p.heightCm === 90 + inToCm(6)).toBe(false);
      }
    }
  });

  it('every spacing lies within 1–4 in sideways and 6–12 in vertically (UVM Proctor — S; Cornell, Wild — S; Ohio State — S)', () => {
    for (const p of Object.values(profiles)) {
      expect(p.spacing.sidewaysCm).toBeGreaterThanOrEqual(inToCm(1) - 1e-9);
      expect(p.spacing.sidewaysCm).toBeLessThanOrEqual(inToCm(4) + 1e-9);
      expect(p.spacing.verticalCm).toBeGreaterThanOrEqual(inToCm(6) - 1e-9);
      expect(p.spacing.verticalCm).toBeLessThanOrEqual(inToCm(12) + 1e-9);
    }
  });

  it('the height band is roughly 2–5 ft above ground (common practice / from memory)', () => {
    for (const p of Object.values(profiles)) {
      expect(p.heightBand.minCm).toBeGreaterThanOrEqual(inToCm(24) - 1);
      expect(p.heightBand.maxCm).toBeLessThanOrEqual(inToCm(60) + 1);
    }
  });
});

describe('where the holes go', () => {
  it('the first hole goes on the sunny side (common practice)', () => {
    const advice = adviseTree(healthy(50), {
      season: 2027,
      profile: 'conservative',
      sunnyAzimuthDeg: 170,
    });
    expect(advice.placements[0].azimuthDeg).toBe(170);
  });

  it('a second tap goes on the opposite side, at a different height (OMAFRA — P)', () => {
    const advice = adviseTree(healthy(50), { season: 2027, profile: 'conservative' });
    const [a, b] = advice.placements;
    expect(azimuthGapDeg(a.azimuthDeg, b.azimuthDeg)).toBeCloseTo(180, 5);
    expect(a.heightCm).not.toBe(b.heightCm);
  });

  it('several holes are spread evenly around the trunk (Quebec — P)', () => {
    const advice = adviseTree(healthy(85), { season: 2027, profile: 'quebec-public' });
    expect(advice.taps).toBe(2);
    const az = advice.placements.map((p) => p.azimuthDeg).sort((x, y) => x - y);
    az.forEach((x, i) => expect(azimuthGapDeg(x, az[(i + 1) % az.length])).toBeCloseTo(180, 5));
  });

  it('four holes of the traditional set go a quarter turn apart (Quebec — P, holes spread evenly)', () => {
    const advice = adviseTree(healthy(inToCm(26)), { season: 2027, profile: 'traditional' });
    expect(advice.taps).toBe(4);
    const az = advice.placements.map((p) => p.azimuthDeg).sort((x, y) => x - y);
    az.forEach((x, i) => expect(azimuthGapDeg(x, az[(i + 1) % az.length])).toBeCloseTo(90, 5));
  });
});
