import { describe, expect, it } from 'vitest';
import { placeTapholes, SAME_SEASON_HEIGHT_GAP_CM, type PlacementInput } from './placement';
import { arcDistanceCm, isClearOf } from './spacing';
import { azimuthGapDeg } from './units';

const spacing = { sidewaysCm: 10, verticalCm: 30 };
const base: PlacementInput = {
  dbhCm: 40,
  taps: 1,
  holesInReach: [],
  spacing,
  heightBand: { minCm: 60, maxCm: 150 },
  sunnyAzimuthDeg: 180,
};

describe('the spacing rule', () => {
  it('is a rectangle: far enough sideways OR far enough up/down', () => {
    const c = Math.PI * 40;
    const old = { azimuthDeg: 180, heightCm: 100 };
    expect(isClearOf({ azimuthDeg: 180, heightCm: 130 }, old, spacing, c)).toBe(true);
    const tenCmRound = (10 / c) * 360;
    expect(isClearOf({ azimuthDeg: 180 + tenCmRound, heightCm: 100 }, old, spacing, c)).toBe(true);
    // Diagonal: 8 cm over and 25 cm up is inside both limits, so too close.
    expect(isClearOf({ azimuthDeg: 180 + (8 / c) * 360, heightCm: 125 }, old, spacing, c)).toBe(
      false,
    );
  });

  it('measures the sideways distance as bark arc, the short way round', () => {
    expect(arcDistanceCm(350, 10, 100)).toBeCloseTo((20 / 360) * 100, 10);
  });
});

describe('placeTapholes', () => {
  it('puts the first hole on the sunny side at the middle of the band', () => {
    const { placements } = placeTapholes({ ...base, sunnyAzimuthDeg: 200 });
    expect(placements).toEqual([{ azimuthDeg: 200, heightCm: 105 }]);
  });

  it('puts a second hole on the opposite side at another height', () => {
    const { placements } = placeTapholes({ ...base, taps: 2 });
    expect(azimuthGapDeg(placements[0].azimuthDeg, placements[1].azimuthDeg)).toBe(180);
    expect(Math.abs(placements[0].heightCm - placements[1].heightCm)).toBeGreaterThanOrEqual(
      SAME_SEASON_HEIGHT_GAP_CM,
    );
  });

  it('steps clear of an old hole at the sunny spot, staying close to it', () => {
    const old = { azimuthDeg: 180, heightCm: 105 };
    const { placements } = placeTapholes({ ...base, holesInReach: [old] });
    expect(isClearOf(placements[0], old, spacing, Math.PI * 40)).toBe(true);
    expect(arcDistanceCm(placements[0].azimuthDeg, 180, Math.PI * 40)).toBeLessThanOrEqual(10.5);
  });

  it('wraps round north: a sunny side at 355° works as well as any', () => {
    const old = { azimuthDeg: 355, heightCm: 105 };
    const { placements } = placeTapholes({ ...base, sunnyAzimuthDeg: 355, holesInReach: [old] });
    expect(isClearOf(placements[0], old, spacing, Math.PI * 40)).toBe(true);
    expect(placements[0].azimuthDeg).toBeGreaterThanOrEqual(0);
    expect(placements[0].azimuthDeg).toBeLessThan(360);
  });

  it('when no spot is clear, places fewer and says it was blocked', () => {
    const c = Math.PI * 20;
    const columns = Math.ceil(c / 5);
    const holes = [];
    for (let i = 0; i < columns; i++) {
      for (const heightCm of [60, 85, 110, 135, 150])
        holes.push({ azimuthDeg: (i * 360) / columns, heightCm });
    }
    const result = placeTapholes({ ...base, dbhCm: 20, taps: 2, holesInReach: holes });
    expect(result.placements).toEqual([]);
    expect(result.blocked).toBe(true);
  });

  it('gives the same answer for the same input', () => {
    const holes = [
      { azimuthDeg: 170, heightCm: 100 },
      { azimuthDeg: 190, heightCm: 120 },
      { azimuthDeg: 10, heightCm: 90 },
    ];
    const a = placeTapholes({ ...base, taps: 2, holesInReach: holes });
    const b = placeTapholes({ ...base, taps: 2, holesInReach: [...holes] });
    expect(a).toEqual(b);
  });

  it('places nothing for no taps', () => {
    expect(placeTapholes({ ...base, taps: 0 })).toEqual({ placements: [], blocked: false });
  });
});
