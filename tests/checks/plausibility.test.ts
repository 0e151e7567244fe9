import { describe, expect, it } from 'vitest';
import { adviseTree } from '../../shared/rules/advise-tree';
import {
  checkNewReading,
  checkReading,
  OUTLIER_CHANGE_CM_PER_YEAR,
  OUTLIER_SHRINK_CM,
  readingQuestion,
  screenReadings,
} from '../../shared/rules/plausibility';
import type { AdvisorMeasurement } from '../../shared/rules/tree-record';
import { inToCm } from '../../shared/rules/units';

const reading = (measuredOn: string, dbhCm: number, confirmedOutlier?: boolean) => ({
  measuredOn,
  dbhCm,
  ...(confirmedOutlier ? { confirmedOutlier } : {}),
});

// A DBH change of more than about 1 in (2.5 cm) in one year, or a shrink beyond tape error
// (about 0.3 cm), is a measuring or entry error until confirmed — common practice.
describe('believable readings (common practice)', () => {
  it('about 1 in (2.5 cm) of change in a year is the most that is believable', () => {
    expect(OUTLIER_CHANGE_CM_PER_YEAR).toBeCloseTo(inToCm(1), 1);
    const before = reading('2025-10-01', 40);
    expect(checkReading(before, reading('2026-10-01', 42.4))).toBeNull();
    expect(checkReading(before, reading('2026-10-01', 42.6))).toMatchObject({ kind: 'jump' });
    // Over three years, 5 cm is ordinary growth.
    expect(checkReading(reading('2023-10-01', 40), reading('2026-10-01', 45))).toBeNull();
  });

  it('a shrink of up to about 0.3 cm is tape error; more is an outlier', () => {
    expect(OUTLIER_SHRINK_CM).toBe(0.3);
    const before = reading('2025-10-01', 40);
    expect(checkReading(before, reading('2026-10-01', 39.75))).toBeNull();
    expect(checkReading(before, reading('2026-10-01', 39.6))).toMatchObject({ kind: 'shrink' });
  });

  it('an unconfirmed outlier is left out; a confirmed one is kept and later readings go by it', () => {
    const jumped = [
      reading('2024-10-01', 40),
      reading('2025-10-01', 44.5),
      reading('2026-10-01', 45),
    ];
    expect(screenReadings(jumped).accepted.map((r) => r.dbhCm)).toEqual([40]);
    const confirmed = [jumped[0], { ...jumped[1], confirmedOutlier: true }, jumped[2]];
    expect(screenReadings(confirmed).accepted.map((r) => r.dbhCm)).toEqual([40, 44.5, 45]);
  });

  it('the form asks in plain words: "4.5 cm more than last season — re-measure or confirm"', () => {
    const check = checkNewReading([reading('2025-10-01', 40)], reading('2026-10-02', 44.5))!;
    expect(readingQuestion(check, 2026)).toBe(
      '4.5 cm more than last season — re-measure or confirm',
    );
    expect(readingQuestion(check, 2026, 'in')).toBe(
      '1.8 in more than last season — re-measure or confirm',
    );
  });
});

describe('entry errors never move the advice (common practice)', () => {
  const steady: AdvisorMeasurement[] = [2021, 2022, 2023, 2024, 2025].map((y, i) => ({
    measuredOn: `${y}-10-01`,
    dbhCm: 44 + 0.5 * i,
    crownDiebackPct: 0,
  }));
  const base = adviseTree(
    { measurements: steady, tapholes: [] },
    { season: 2027, profile: 'conservative' },
  );

  it.each([
    ['a typo ten times too big', 460],
    ['a reading 4.5 cm over', 50.5],
    ['a reading that shrank 2 cm', 44],
  ])(
    '%s is left out of growth, the zone model and the tap count, and the tree says why',
    (_, dbhCm) => {
      const withError = [...steady, { measuredOn: '2026-10-01', dbhCm, crownDiebackPct: 0 }];
      const advice = adviseTree(
        { measurements: withError, tapholes: [] },
        { season: 2027, profile: 'conservative' },
      );
      expect(advice.dbhCm).toBe(base.dbhCm);
      expect(advice.taps).toBe(base.taps);
      expect(advice.radialGrowthCmPerYear).toBeCloseTo(base.radialGrowthCmPerYear, 12);
      expect(advice.conductiveShare).toBe(base.conductiveShare);
      const why = advice.warnings.find((w) => w.code === 'measurement-outlier');
      expect(why?.message).toContain('2026-10-01');
      expect(why?.message).toContain('confirmed');
      expect(why?.source).toContain('common practice');
    },
  );

  it('once confirmed, the reading counts', () => {
    const confirmed = [
      ...steady,
      { measuredOn: '2026-10-01', dbhCm: 50.5, crownDiebackPct: 0, confirmedOutlier: true },
    ];
    const advice = adviseTree(
      { measurements: confirmed, tapholes: [] },
      { season: 2027, profile: 'conservative' },
    );
    expect(advice.dbhCm).toBe(50.5);
    expect(advice.warnings.map((w) => w.code)).not.toContain('measurement-outlier');
  });
});
