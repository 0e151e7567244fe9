import { describe, expect, it } from 'vitest';
import type { AdvisorTaphole, AdvisorTree } from './tree-record';
import { seasonCompliance } from './season-compliance';
import { inToCm } from './units';

const hole = (season: number, azimuthDeg: number, heightCm: number, bitCm = 0.79375) =>
  ({
    season,
    azimuthDeg,
    heightCm,
    bitCm,
    depthCm: 5.08,
    collection: 'vacuum',
  }) satisfies AdvisorTaphole;

const tree = (over: Partial<AdvisorTree> = {}): AdvisorTree => ({
  measurements: [
    { measuredOn: '2024-10-02', dbhCm: inToCm(19.6), crownDiebackPct: 5 },
    { measuredOn: '2025-10-03', dbhCm: inToCm(20.1), crownDiebackPct: 5 },
  ],
  tapholes: [],
  ...over,
});

describe('seasonCompliance', () => {
  // Conservative set: 12–<18 in one tap, 18 in and over two (NAMSPM 2006 via UVM Proctor — S).
  it('allows the taps of the table at the DBH measured before the season, not the one after', () => {
    const t = tree({
      measurements: [
        { measuredOn: '2025-10-03', dbhCm: inToCm(17.9) },
        { measuredOn: '2026-10-03', dbhCm: inToCm(18.4) },
      ],
      tapholes: [hole(2026, 180, 80), hole(2026, 0, 120)],
    });
    const c = seasonCompliance(t, 2026, 'conservative');
    expect(c.dbhBeforeCm).toBeCloseTo(inToCm(17.9), 9);
    expect(c.dbhMeasuredOn).toBe('2025-10-03');
    expect(c).toMatchObject({ tapsSet: 2, tapsAllowed: 1, tapsOver: 1, findings: ['over'] });
  });

  // Traditional set: 20–<25 in three taps (NAMSPM traditional set, same summary — S).
  it('reads the same holes against another guideline', () => {
    const t = tree({ tapholes: [hole(2026, 180, 80), hole(2026, 0, 120)] });
    expect(seasonCompliance(t, 2026, 'conservative').findings).toEqual([]);
    expect(seasonCompliance(t, 2026, 'traditional')).toMatchObject({
      tapsAllowed: 3,
      tapsOver: 0,
      findings: [],
    });
  });

  // With 7/16 in spouts at most 1 tap per tree (OMAFRA guidance — P).
  it('allows one tap where the season was drilled for 7/16 in spouts', () => {
    const t = tree({ tapholes: [hole(2026, 180, 80, 1.11), hole(2026, 0, 120, 1.11)] });
    expect(seasonCompliance(t, 2026, 'conservative')).toMatchObject({
      tapsAllowed: 1,
      tapsOver: 1,
    });
  });

  // Minimum size of about one foot (12 in) DBH: common practice; conservative starts at 12 in.
  it('finds a tree tapped below the smallest tappable size', () => {
    const t = tree({
      measurements: [{ measuredOn: '2025-10-01', dbhCm: inToCm(11) }],
      tapholes: [hole(2026, 180, 90)],
    });
    expect(seasonCompliance(t, 2026, 'conservative').findings).toEqual(['over', 'too-small']);
  });

  // Crown dieback over 15 % is cause for concern (UVM Forest Ecosystem Monitoring Cooperative — S).
  it('finds a tree tapped while its last crown rating before the season was over the limit', () => {
    const t = tree({
      measurements: [
        { measuredOn: '2024-10-02', dbhCm: 52, crownDiebackPct: 10 },
        { measuredOn: '2025-10-02', dbhCm: 52.3, crownDiebackPct: 20 },
        { measuredOn: '2026-10-02', dbhCm: 52.5, crownDiebackPct: 5 },
      ],
      tapholes: [hole(2026, 180, 90)],
    });
    const c = seasonCompliance(t, 2026, 'conservative');
    expect(c).toMatchObject({ diebackBeforePct: 20, diebackRatedOn: '2025-10-02' });
    expect(c.findings).toEqual(['declining']);
    // A rating of exactly 15 % is not over the limit.
    const at15 = tree({
      measurements: [{ measuredOn: '2025-10-02', dbhCm: 52.3, crownDiebackPct: 15 }],
      tapholes: [hole(2026, 180, 90)],
    });
    expect(seasonCompliance(at15, 2026, 'conservative').findings).toEqual([]);
  });

  it('finds a tree tapped with no DBH on record before the season, and allows nothing known', () => {
    const t = tree({
      measurements: [{ measuredOn: '2026-10-02', dbhCm: 40 }],
      tapholes: [hole(2026, 180, 90)],
    });
    expect(seasonCompliance(t, 2026, 'conservative')).toMatchObject({
      tapsAllowed: null,
      tapsOver: 0,
      findings: ['unmeasured'],
    });
  });

  // Spacing: 2–4 in to the side or 6–12 in above/below (UVM Proctor sap-yield tips 2020 — S).
  it('counts holes set within the spacing of last season’s holes still in reach', () => {
    const circumference = Math.PI * inToCm(19.6);
    const sideways = (cm: number) => (cm / circumference) * 360;
    const t = tree({
      tapholes: [hole(2025, 180, 80), hole(2026, 180 + sideways(3), 85), hole(2026, 0, 120)],
    });
    const c = seasonCompliance(t, 2026, 'conservative');
    expect(c.holesTooClose).toBe(1);
    expect(c.findings).toEqual(['too-close']);
    // 5 in round the trunk clears the 4 in of the conservative set.
    const clear = tree({
      tapholes: [hole(2025, 180, 80), hole(2026, 180 + sideways(inToCm(5)), 85)],
    });
    expect(seasonCompliance(clear, 2026, 'conservative').holesTooClose).toBe(0);
  });

  it('leaves an untapped season without findings', () => {
    const c = seasonCompliance(tree({ tapholes: [hole(2025, 180, 80)] }), 2026, 'conservative');
    expect(c).toMatchObject({ tapsSet: 0, tapsOver: 0, holesTooClose: 0, findings: [] });
    expect(c.tapsAllowed).toBe(2);
  });
});
