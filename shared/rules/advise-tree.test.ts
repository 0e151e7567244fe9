import { describe, expect, it } from 'vitest';
import { adviseTree, type AdviseOptions } from './advise-tree';
import type { AdvisorTaphole, AdvisorTree } from './tree-record';
import { inToCm } from './units';
import { verdicts } from './verdicts';

const options: AdviseOptions = { season: 2027, profile: 'conservative' };

/** A tree growing `perYear` cm of DBH a year up to `dbhCm` in 2026. */
function tree(dbhCm: number, perYear = 0.6, extra: Partial<AdvisorTree> = {}): AdvisorTree {
  return {
    status: 'active',
    measurements: [2022, 2024, 2026].map((y) => ({
      measuredOn: `${y}-06-01`,
      dbhCm: dbhCm - perYear * (2026 - y),
      crownDiebackPct: 5,
    })),
    tapholes: [],
    ...extra,
  };
}

function hole(
  season: number,
  azimuthDeg = 180,
  heightCm = 105,
  more: Partial<AdvisorTaphole> = {},
): AdvisorTaphole {
  return { season, heightCm, azimuthDeg, depthCm: 4.5, bitCm: 0.79, collection: 'vacuum', ...more };
}

const codes = (t: AdvisorTree, o: AdviseOptions = options) =>
  adviseTree(t, o).warnings.map((w) => w.code);

describe('adviseTree', () => {
  it('when a healthy, well-grown tree is big enough, then it gets the table count', () => {
    const advice = adviseTree(tree(inToCm(20)), options);
    expect(advice).toMatchObject({ taps: 2, tableTaps: 2, verdict: 'tap' });
    expect(advice.placements).toHaveLength(2);
    expect(advice.conductiveShare).toBe(1);
  });

  it('when the tree is below the table, then it is too small and warned undersized', () => {
    const advice = adviseTree(tree(28), options);
    expect(advice).toMatchObject({ taps: 0, verdict: 'too-small', placements: [] });
    expect(advice.warnings[0]).toMatchObject({
      code: 'undersized',
      source: expect.stringContaining('NAMSPM'),
    });
  });

  it('when the tree is dead, held out or removed, then it is out of production', () => {
    for (const status of ['dead', 'held-out', 'removed'] as const) {
      expect(adviseTree(tree(50, 0.6, { status }), options)).toMatchObject({
        taps: 0,
        verdict: 'retired',
      });
    }
  });

  it('when nothing is measured, then it asks for a measurement', () => {
    const advice = adviseTree({ measurements: [], tapholes: [] }, options);
    expect(advice.verdict).toBe('unmeasured');
    expect(advice.warnings.map((w) => w.code)).toEqual(['no-measurement']);
  });

  it('when the last DBH is more than three seasons old, then it is stale', () => {
    const old = { measurements: [{ measuredOn: '2023-06-01', dbhCm: 50 }], tapholes: [] };
    expect(codes(old)).toContain('stale-measurement');
    expect(
      codes({ ...old, measurements: [{ measuredOn: '2024-06-01', dbhCm: 50 }] }),
    ).not.toContain('stale-measurement');
  });

  it('reads only what was known by the season it plans', () => {
    const later = tree(50, 0.6, {
      measurements: [...tree(50).measurements, { measuredOn: '2028-06-01', dbhCm: 10 }],
    });
    expect(adviseTree(later, options).dbhCm).toBe(50);
  });

  it('when crown dieback passes 15 %, then one tap at most', () => {
    const t = tree(50);
    const sick = { ...t, measurements: t.measurements.map((m) => ({ ...m, crownDiebackPct: 25 })) };
    const advice = adviseTree(sick, options);
    expect(advice).toMatchObject({ taps: 1, verdict: 'tap-reduced' });
    expect(advice.warnings.map((w) => w.code)).toContain('crown-dieback');
  });

  it('when crown dieback reaches 50 %, then the tree rests', () => {
    const t = tree(50);
    const failing = {
      ...t,
      measurements: t.measurements.map((m) => ({ ...m, crownDiebackPct: 50 })),
    };
    expect(adviseTree(failing, options)).toMatchObject({ taps: 0, verdict: 'rest' });
  });

  it('when a forester flags the tree as stressed, then one tap at most', () => {
    expect(adviseTree(tree(50, 0.6, { stressed: true }), options).taps).toBe(1);
  });

  it('when growth is below what one tap needs, then it warns, cuts to one tap and drills shallow', () => {
    const advice = adviseTree(tree(50, 0.05), options);
    expect(advice.warnings.map((w) => w.code)).toContain('slow-growth');
    expect(advice.taps).toBeLessThanOrEqual(1);
    expect(advice.depthCm).toBeCloseTo(inToCm(1), 10);
  });

  it('when last season carried more holes than the table allowed, then it is overtapped', () => {
    const t = tree(40, 0.6, {
      tapholes: [hole(2026, 180), hole(2026, 0, 130), hole(2026, 90, 80)],
    });
    expect(codes(t)).toContain('overtapped');
  });

  it('when last season’s holes sat too close together, then it warns too-close', () => {
    const t = tree(40, 0.6, { tapholes: [hole(2026, 180, 100), hole(2026, 182, 110)] });
    expect(codes(t)).toContain('too-close');
  });

  it('when the tapping zone is used up, then the tree rests', () => {
    const holes = [];
    for (let s = 2017; s <= 2026; s++)
      for (let i = 0; i < 8; i++)
        holes.push(hole(s, (i * 45 + s * 7) % 360, 65 + i * 10, { depthCm: 5.08 }));
    const advice = adviseTree(tree(40, 0.6, { tapholes: holes }), options);
    expect(advice.conductiveShare).toBeLessThan(0.82);
    expect(advice).toMatchObject({ taps: 0, verdict: 'rest' });
    expect(advice.warnings.map((w) => w.code)).toContain('zone-depleted');
  });

  it('in Ontario vacuum, keeps the second tap for healthy fast growers; one tap is full compliance', () => {
    const fast = adviseTree(tree(50, 1.2), { ...options, profile: 'ontario-vacuum' });
    const ordinary = adviseTree(tree(50, 0.26), { ...options, profile: 'ontario-vacuum' });
    expect(fast).toMatchObject({ taps: 2, guidelineTaps: 1, verdict: 'tap' });
    expect(ordinary).toMatchObject({ taps: 1, tableTaps: 2, guidelineTaps: 1, verdict: 'tap' });
  });

  it('with only one season measured, assumes slow growth and says so', () => {
    const advice = adviseTree(
      { measurements: [{ measuredOn: '2026-06-01', dbhCm: 50 }], tapholes: [] },
      options,
    );
    expect(advice.growthAssumed).toBe(true);
    expect(advice.warnings.map((w) => w.code)).toContain('growth-unknown');
    expect(advice.taps).toBe(2);
  });

  it('with a record that shrinks within tape error, flags it and falls back on the assumed growth', () => {
    const advice = adviseTree(tree(50, -0.1), options);
    expect(advice.warnings.map((w) => w.code)).toContain('growth-suspect');
    expect(advice.growthAssumed).toBe(true);
  });

  it('leaves out a reading that shrinks beyond tape error, and says so', () => {
    const advice = adviseTree(tree(50, -0.5), options);
    expect(advice.warnings.filter((w) => w.code === 'measurement-outlier')).toHaveLength(2);
    expect(advice.dbhCm).toBe(52);
  });

  it('drills by the collection of the latest hole: deeper on gravity in the traditional set', () => {
    const gravity = tree(50, 0.8, { tapholes: [hole(2024, 0, 90, { collection: 'gravity' })] });
    expect(adviseTree(gravity, { ...options, profile: 'traditional' }).depthCm).toBeCloseTo(
      inToCm(2.5),
      10,
    );
    expect(adviseTree(tree(50, 0.8), { ...options, profile: 'traditional' }).collection).toBe(
      'vacuum',
    );
  });

  it('in Quebec, advises a 5/16 in bit when the last holes were wider than 11 mm', () => {
    const wide = tree(50, 0.8, { tapholes: [hole(2026, 0, 90, { bitCm: inToCm(7 / 16) })] });
    const advice = adviseTree(wide, { ...options, profile: 'quebec-public' });
    expect(advice.bitCm).toBeLessThanOrEqual(1.1);
    expect(advice.warnings.map((w) => w.code)).toContain('spout-7-16');
  });

  it('adds a 20-season projection on request', () => {
    const advice = adviseTree(tree(50), { ...options, withProjection: true });
    expect(advice.projection).toHaveLength(20);
    expect(advice.projection![0].shareBefore).toBe(advice.conductiveShare);
  });

  it('gives every warning a message in plain words', () => {
    const advice = adviseTree(
      tree(50, 0.05, { tapholes: [hole(2026), hole(2026, 181, 106), hole(2026, 0, 90)] }),
      options,
    );
    for (const w of advice.warnings) expect(w.message.length).toBeGreaterThan(10);
  });
});

describe('verdicts', () => {
  it('lists each verdict once with a label and a one-letter cue', () => {
    const letters = verdicts.map((v) => v.letter);
    expect(new Set(letters).size).toBe(verdicts.length);
    for (const v of verdicts) expect(v.letter).toMatch(/^[A-Z]$/);
    expect(verdicts.map((v) => v.key)).toEqual([
      'tap',
      'tap-reduced',
      'rest',
      'too-small',
      'retired',
      'unmeasured',
    ]);
  });
});
