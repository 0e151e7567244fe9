import { describe, expect, it } from 'vitest';
import { adviseTree } from '../../shared/rules/advise-tree';
import { crownDiebackClasses } from '../../shared/schemas/measurement';
import { inToCm } from '../../shared/rules/units';

function tree(dbhIn: number, crownDiebackPct: number, bitCm = 0.79) {
  const dbhCm = inToCm(dbhIn);
  return {
    measurements: [
      { measuredOn: '2023-06-01', dbhCm: dbhCm - 2.4, crownDiebackPct: 0 },
      { measuredOn: '2026-06-01', dbhCm, crownDiebackPct },
    ],
    tapholes: [
      {
        season: 2026,
        heightCm: 100,
        azimuthDeg: 180,
        depthCm: 5,
        bitCm,
        collection: 'vacuum' as const,
      },
    ],
  };
}

describe('crown dieback', () => {
  it('10 % dieback does not indicate decline: no warning (UVM Forest Ecosystem Monitoring Cooperative — S)', () => {
    const advice = adviseTree(tree(20, 10), { season: 2027, profile: 'conservative' });
    expect(advice.warnings.map((w) => w.code)).not.toContain('crown-dieback');
    expect(advice.taps).toBe(2);
  });

  it('above 15 % is cause for concern (UVM Forest Ecosystem Monitoring Cooperative — S) and a stressed tree takes at most 1 tap (OMAFRA — P)', () => {
    const advice = adviseTree(tree(20, 20), { season: 2027, profile: 'conservative' });
    expect(advice.warnings.map((w) => w.code)).toContain('crown-dieback');
    expect(advice.taps).toBe(1);
  });

  it('a stressed tree under 12 in takes none (OMAFRA — P)', () => {
    const advice = adviseTree(tree(11, 25), { season: 2027, profile: 'traditional' });
    expect(advice.taps).toBe(0);
    expect(advice.verdict).toBe('rest');
  });

  it('dieback is rated in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992 — P)', () => {
    expect(crownDiebackClasses.slice(0, 4)).toEqual([0, 5, 10, 15]);
  });
});

describe('crown ratings', () => {
  it('a rating more than three seasons old is flagged like an old DBH and not gone by (USFS Crown Condition Rating Guide, Millers et al. 1992 — P; common practice)', () => {
    const t = {
      measurements: [
        { measuredOn: '2022-06-01', dbhCm: inToCm(20) - 2.4, crownDiebackPct: 40 },
        { measuredOn: '2024-06-01', dbhCm: inToCm(20) - 0.8 },
        { measuredOn: '2026-06-01', dbhCm: inToCm(20) },
      ],
      tapholes: [],
    };
    const advice = adviseTree(t, { season: 2027, profile: 'conservative' });
    const stale = advice.warnings.find((w) => w.code === 'stale-measurement');
    expect(stale?.message).toContain('Crown last rated in 2022');
    expect(advice.warnings.map((w) => w.code)).not.toContain('crown-dieback');
    // The same rating three seasons before is still recent, and counts (OMAFRA — P).
    const recent = adviseTree(t, { season: 2025, profile: 'conservative' });
    expect(recent.warnings.map((w) => w.code)).toContain('crown-dieback');
    expect(recent.taps).toBe(1);
  });
});

describe('spouts', () => {
  it('a tree with 7/16 in holes in its history gets a 5/16 in bit for new holes, with the note (OMAFRA — P)', () => {
    const advice = adviseTree(tree(24, 0, inToCm(7 / 16)), {
      season: 2027,
      profile: 'conservative',
    });
    expect(advice.bitCm).toBeCloseTo(inToCm(5 / 16), 10);
    const note = advice.warnings.find((w) => w.code === 'spout-7-16');
    expect(note?.message).toContain('7/16 in');
    expect(note?.message).toContain('5/16 in');
    expect(note?.message).not.toContain('mm');
    expect(note?.source).toBe('OMAFRA guidance');
  });

  it('its tap count then comes from the zone model, not the one-tap rule for 7/16 in spouts (OMAFRA — P)', () => {
    const advice = adviseTree(tree(24, 0, inToCm(7 / 16)), {
      season: 2027,
      profile: 'conservative',
    });
    expect(advice.taps).toBe(2);
    expect(advice.taps).toBeLessThanOrEqual(advice.maxSustainableTaps);
  });

  it('a metric guideline names the bit it forbids in millimetres (Quebec — P)', () => {
    const advice = adviseTree(tree(24, 0, inToCm(7 / 16)), {
      season: 2027,
      profile: 'quebec-private',
    });
    const note = advice.warnings.find((w) => w.code === 'spout-7-16');
    expect(note?.message).toContain('11 mm');
    expect(advice.bitCm).toBeLessThanOrEqual(1.1);
  });
});
