import { describe, expect, it } from 'vitest';
import { growth } from './growth';

describe('growth', () => {
  it('is null with fewer than two seasons, even with several readings in one season', () => {
    expect(growth([])).toBeNull();
    expect(
      growth([
        { measuredOn: '2026-04-01', dbhCm: 30 },
        { measuredOn: '2026-10-01', dbhCm: 30.3 },
      ]),
    ).toBeNull();
  });

  it('fits a straight line over time in fractional years', () => {
    const g = growth([
      { measuredOn: '2020-01-01', dbhCm: 30 },
      { measuredOn: '2024-01-01', dbhCm: 32 },
    ])!;
    expect(g.dbhCmPerYear).toBeCloseTo(2 / 4, 3);
    expect(g.radialCmPerYear).toBeCloseTo(0.25, 3);
    expect(g.seasons).toBe(2);
    expect(g.suspect).toBe(false);
  });

  it('uses the date within the year, not just the season', () => {
    const g = growth([
      { measuredOn: '2020-01-01', dbhCm: 30 },
      { measuredOn: '2020-12-31', dbhCm: 30.5 },
      { measuredOn: '2021-07-02', dbhCm: 30.75 },
    ])!;
    expect(g.dbhCmPerYear).toBeCloseTo(0.5, 1);
  });

  it('gives basal-area growth at the current DBH: π/2 · DBH · dDBH/dt', () => {
    const g = growth([
      { measuredOn: '2020-06-01', dbhCm: 40 },
      { measuredOn: '2022-06-01', dbhCm: 41 },
      { measuredOn: '2024-06-01', dbhCm: 42 },
    ])!;
    expect(g.dbhCmNow).toBeCloseTo(42, 2);
    expect(g.basalAreaCm2PerYear).toBeCloseTo((Math.PI / 2) * g.dbhCmNow * g.dbhCmPerYear, 10);
    expect(g.basalAreaCm2PerYear).toBeCloseTo((Math.PI / 2) * 42 * 0.5, 1);
  });

  it('leaves out one season read far off the line of the others', () => {
    const readings = [2018, 2019, 2020, 2021, 2022, 2023].map((year, i) => ({
      measuredOn: `${year}-06-01`,
      dbhCm: 35 + 0.4 * i + (year === 2021 ? 6 : 0),
    }));
    const g = growth(readings)!;
    expect(g.dropped?.measuredOn).toBe('2021-06-01');
    expect(g.flags).toContain('outlier-dropped');
    expect(g.dbhCmPerYear).toBeCloseTo(0.4, 2);
    expect(g.seasons).toBe(5);
  });

  it('keeps ordinary tape scatter', () => {
    const wobble = [0, 0.2, -0.15, 0.1, -0.2, 0.15];
    const readings = wobble.map((w, i) => ({
      measuredOn: `${2018 + i}-06-01`,
      dbhCm: 35 + 0.4 * i + w,
    }));
    expect(growth(readings)!.dropped).toBeNull();
  });

  it('flags a shrinking trunk as a likely measuring error', () => {
    const g = growth([
      { measuredOn: '2022-06-01', dbhCm: 40 },
      { measuredOn: '2025-06-01', dbhCm: 38.5 },
    ])!;
    expect(g.suspect).toBe(true);
    expect(g.flags).toEqual(['shrinking']);
  });

  it('ignores readings of zero or less', () => {
    expect(
      growth([
        { measuredOn: '2022-06-01', dbhCm: 0 },
        { measuredOn: '2025-06-01', dbhCm: 38.5 },
      ]),
    ).toBeNull();
  });
});
