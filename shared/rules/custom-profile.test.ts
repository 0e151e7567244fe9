import { describe, expect, it } from 'vitest';
import { adviseTree } from './advise-tree';
import { customProfileSchema, validateCustomProfile } from './custom-profile';
import { tapsForDbh } from './tap-table';

const valid = {
  label: 'Our own stricter set',
  unit: 'in' as const,
  bands: [
    { from: 14, taps: 1 },
    { from: 22, taps: 2 },
  ],
  spacing: { sidewaysCm: 12, verticalCm: 35 },
};

describe('custom profiles', () => {
  it('when an owner saves a sane set, then it builds a profile the advisor can use', () => {
    const result = validateCustomProfile(valid);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.profile.key).toBe('custom');
    expect(result.profile.minimumDbhCm).toBeCloseTo(35.56, 10);
    expect(result.profile.maxTaps).toBe(2);
    expect(tapsForDbh(35.56, result.profile)).toBe(1);
    expect(tapsForDbh(35.5, result.profile)).toBe(0);
    const advice = adviseTree(
      { measurements: [{ measuredOn: '2026-05-01', dbhCm: 60 }], tapholes: [] },
      { season: 2027, profile: result.profile },
    );
    expect(advice.tableTaps).toBe(2);
  });

  it('when the band edges do not rise, then it is refused', () => {
    const result = validateCustomProfile({
      ...valid,
      bands: [
        { from: 22, taps: 1 },
        { from: 14, taps: 2 },
      ],
    });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.some((e) => e.path === 'bands.1.from')).toBe(true);
  });

  it('when a band skips a tap count, then it is refused', () => {
    const result = validateCustomProfile({
      ...valid,
      bands: [
        { from: 14, taps: 1 },
        { from: 22, taps: 3 },
      ],
    });
    expect(result.ok).toBe(false);
  });

  it('when the smallest size is under 20 cm, then it is refused', () => {
    expect(validateCustomProfile({ ...valid, unit: 'cm', bands: [{ from: 15, taps: 1 }] }).ok).toBe(
      false,
    );
  });

  it('when the drilling goes deeper than its own limit, then it is refused', () => {
    const drill = {
      bucket: { depthCm: 5, bitCm: 0.8 },
      gravity: { depthCm: 5, bitCm: 0.8 },
      vacuum: { depthCm: 7, bitCm: 0.8 },
    };
    const result = validateCustomProfile({
      ...valid,
      drill,
      limits: { maxDepthCm: 6, maxBitCm: 1.1 },
    });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((e) => e.path)).toContain('drill.vacuum.depthCm');
  });

  it('when the fast-grower condition sits on a lower band, then it is refused', () => {
    const bands = [
      { from: 14, taps: 1, fullOnlyForHealthyFastGrowers: true },
      { from: 22, taps: 2 },
    ];
    expect(validateCustomProfile({ ...valid, bands }).ok).toBe(false);
  });

  it('fills in the defaults of the conservative set for what is left out', () => {
    const parsed = customProfileSchema.parse(valid);
    expect(parsed.zone.floor).toBe(0.82);
    expect(parsed.heightBand).toEqual({ minCm: 60, maxCm: 150 });
  });
});
