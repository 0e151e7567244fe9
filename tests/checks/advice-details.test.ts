import { describe, expect, it } from 'vitest';
import { adviseTree, LONG_REACH_SEASONS } from '../../shared/rules/advise-tree';
import { profiles } from '../../shared/rules/profiles';
import { steadyStateShare, woodDepthCm } from '../../shared/rules/tapping-zone';
import type { AdvisorTaphole, AdvisorTree } from '../../shared/rules/tree-record';
import { inToCm } from '../../shared/rules/units';
import { warningCodes } from '../../shared/rules/warnings';

const hole = (season: number, azimuthDeg: number, heightCm: number): AdvisorTaphole => ({
  season,
  heightCm,
  azimuthDeg,
  depthCm: 5,
  bitCm: 0.79375,
  collection: 'vacuum',
});

/** A tree measured every October, growing `perYear` cm of DBH, `dbhCm` in October 2026. */
function measured(dbhCm: number, perYear: number, from = 2020): AdvisorTree['measurements'] {
  return Array.from({ length: 2026 - from + 1 }, (_, i) => ({
    measuredOn: `${from + i}-10-01`,
    dbhCm: dbhCm - perYear * (2026 - from - i),
    crownDiebackPct: 0,
  }));
}

// Guideline tables: NAMSPM 2nd ed. 2006, as summarised by UVM Proctor Maple Research Center — S.
describe('tapped too hard (NAMSPM 2nd ed. 2006, as summarised by UVM Proctor Maple Research Center — S)', () => {
  it('compares a season’s taps with the DBH measured before that season, not after it', () => {
    // 17.9 in in October 2025, 18.2 in in October 2026: two taps in spring 2026 were one too many.
    const t: AdvisorTree = {
      measurements: [
        { measuredOn: '2024-10-01', dbhCm: inToCm(17.6) },
        { measuredOn: '2025-10-01', dbhCm: inToCm(17.9) },
        { measuredOn: '2026-10-01', dbhCm: inToCm(18.2) },
      ],
      tapholes: [hole(2026, 180, 80), hole(2026, 0, 120)],
    };
    const advice = adviseTree(t, { season: 2027, profile: 'conservative' });
    const warning = advice.warnings.find((w) => w.code === 'overtapped');
    expect(warning?.message).toContain('allowed 1');
    expect(warning?.source).toBe(profiles.conservative.source);
    // Measured 18.2 in before 2027, two taps in 2027 would not be too hard.
    const next = { ...t, tapholes: [...t.tapholes, hole(2027, 90, 100), hole(2027, 270, 130)] };
    expect(
      adviseTree(next, { season: 2028, profile: 'conservative' }).warnings.map((w) => w.code),
    ).not.toContain('overtapped');
  });
});

// Ontario, vacuum tubing: 18 in and over 1–2 taps, 2 only for healthy fast growers — OMAFRA
// guidance (Leuty, Liu) — P; fast = at least the typical 2 in of DBH a decade (USFS Silvics — S).
describe('tap fewer (OMAFRA guidance (Leuty, Liu) — P)', () => {
  it('one tap on an 18 in+ tree under the Ontario vacuum profile is full compliance', () => {
    const advice = adviseTree(
      { measurements: measured(inToCm(22), 0.35), tapholes: [] },
      { season: 2027, profile: 'ontario-vacuum' },
    );
    expect(advice).toMatchObject({ taps: 1, tableTaps: 2, guidelineTaps: 1, verdict: 'tap' });
  });

  it('says "tap fewer" only when the tree gets fewer taps than its guideline allows a healthy tree', () => {
    const sick = measured(inToCm(22), 0.6).map((m) => ({ ...m, crownDiebackPct: 25 }));
    const advice = adviseTree(
      { measurements: sick, tapholes: [] },
      { season: 2027, profile: 'conservative' },
    );
    expect(advice).toMatchObject({ taps: 1, guidelineTaps: 2, verdict: 'tap-reduced' });
  });
});

// Do not drill a frozen trunk: wait until it is no colder than about −5 °C (OMAFRA — S).
describe('frozen trunks (OMAFRA guidance — S)', () => {
  const t = { measurements: measured(50, 0.6), tapholes: [] };

  it('the drilling advice says to wait until the trunk is no colder than about −5 °C', () => {
    const advice = adviseTree(t, { season: 2027, profile: 'conservative' });
    expect(advice.frozen).toBeNull();
    const note = advice.drillingNotes.find((n) => n.text.includes('−5 °C'));
    expect(note?.source).toBe('OMAFRA guidance');
  });

  it('where the temperature is known to be colder, it says not to drill now', () => {
    const cold = adviseTree(t, { season: 2027, profile: 'conservative', temperatureC: -9 });
    expect(cold.frozen).toBe(true);
    expect(cold.drillingNotes.some((n) => n.text.includes('Wait to drill'))).toBe(true);
    const mild = adviseTree(t, { season: 2027, profile: 'conservative', temperatureC: -2 });
    expect(mild.frozen).toBe(false);
  });

  it('Quebec’s drilling rules come with the drilling advice (A-18.1 r.8.1 s.24 — P)', () => {
    const advice = adviseTree(t, { season: 2027, profile: 'quebec-public' });
    expect(advice.drillingNotes.map((n) => n.text).join(' ')).toContain('11 mm');
  });
});

// The projection and its long run: Clearwood tapping-zone model — our assumption.
describe('the long run (Clearwood tapping-zone model — our assumption)', () => {
  it('gives the share where the advised rate settles, beside the 20-season projection', () => {
    const t = { measurements: measured(50, 0.5), tapholes: [] };
    const advice = adviseTree(t, { season: 2027, profile: 'conservative', withProjection: true });
    expect(advice.projection).toHaveLength(20);
    expect(advice.steadyStateShare).toBeCloseTo(
      steadyStateShare({
        dbhCm: 50,
        radialGrowthCmPerYear: advice.radialGrowthCmPerYear,
        tapsPerYear: advice.taps,
        bitCm: advice.bitCm,
        depthCm: advice.depthCm,
      }),
      12,
    );
  });

  it('says how long old stain stays within reach: decades when growth is slow', () => {
    const slow = adviseTree(
      { measurements: measured(50, 0.1), tapholes: [] },
      { season: 2027, profile: 'conservative' },
    );
    const depth = woodDepthCm(slow.depthCm, profiles.conservative.zone);
    expect(slow.stainReachSeasons).toBeCloseTo(depth / slow.radialGrowthCmPerYear, 6);
    expect(slow.stainReachSeasons!).toBeGreaterThan(LONG_REACH_SEASONS);
    const fast = adviseTree(
      { measurements: measured(50, 1.0), tapholes: [] },
      { season: 2027, profile: 'conservative' },
    );
    expect(fast.stainReachSeasons!).toBeLessThan(LONG_REACH_SEASONS);
  });
});

describe('warning codes', () => {
  it('keep the too-many-taps-for-this-growth warning apart from slow growth (common practice)', () => {
    expect(warningCodes).toContain('slow-growth');
    expect(warningCodes).toContain('growth-limits-taps');
  });
});
