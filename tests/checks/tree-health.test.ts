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

describe('spouts', () => {
  it('with 7/16 in spouts, at most 1 tap per tree (OMAFRA — P)', () => {
    const advice = adviseTree(tree(24, 0, inToCm(7 / 16)), {
      season: 2027,
      profile: 'conservative',
    });
    expect(advice.taps).toBe(1);
    expect(advice.warnings.map((w) => w.code)).toContain('spout-7-16');
  });
});
