import { describe, expect, it } from 'vitest';
import { profiles } from '../../shared/rules/profiles';
import { tapsForDbh } from '../../shared/rules/tap-table';
import { inToCm } from '../../shared/rules/units';

const atIn = (dbhIn: number, key: keyof typeof profiles) => tapsForDbh(inToCm(dbhIn), key);

// The published guideline tables. Each table is checked just below, at and above every edge.
describe('conservative: NAMSPM 2nd ed. 2006, as summarised by UVM Proctor Maple Research Center — S', () => {
  it.each([
    [11.99, 0],
    [12, 1],
    [17.99, 1],
    [18, 2],
    [40, 2],
  ])('%f in → %d taps', (dbhIn, taps) => expect(atIn(dbhIn, 'conservative')).toBe(taps));

  it('12 in exactly (30.48 cm) is one tap, 30.47 cm none', () => {
    expect(tapsForDbh(30.48, 'conservative')).toBe(1);
    expect(tapsForDbh(30.47, 'conservative')).toBe(0);
  });
});

describe('traditional: NAMSPM traditional set, same summary — S', () => {
  it.each([
    [9.99, 0],
    [10, 1],
    [14.99, 1],
    [15, 2],
    [19.99, 2],
    [20, 3],
    [24.99, 3],
    [25, 4],
    [36, 4],
  ])('%f in → %d taps', (dbhIn, taps) => expect(atIn(dbhIn, 'traditional')).toBe(taps));
});

describe('Ontario, vacuum tubing: OMAFRA guidance (Leuty, Liu) — P', () => {
  it.each([
    [11.99, 0],
    [12, 1],
    [17.99, 1],
    [18, 2],
    [30, 2],
  ])('%f in → %d taps (18+ gives up to 2)', (dbhIn, taps) =>
    expect(atIn(dbhIn, 'ontario-vacuum')).toBe(taps),
  );

  it('marks the top band as 2 only for healthy fast growers', () => {
    expect(profiles['ontario-vacuum'].bands[1].fullOnlyForHealthyFastGrowers).toBe(true);
  });
});

describe('Ontario, buckets: OMAFRA guidance — P', () => {
  it.each([
    [11.99, 0],
    [12, 1],
    [18, 2],
    [23.99, 2],
    [24, 3],
  ])('%f in → %d taps', (dbhIn, taps) => expect(atIn(dbhIn, 'ontario-buckets')).toBe(taps));
});

describe('Quebec public land: Quebec regulation A-18.1 r.2 (2004) — P', () => {
  it.each([
    [19.9, 0],
    [20, 1],
    [39.9, 1],
    [40, 2],
    [59.9, 2],
    [60, 3],
    [79.9, 3],
    [80, 4],
  ])('%f cm → %d taps', (dbhCm, taps) => expect(tapsForDbh(dbhCm, 'quebec-public')).toBe(taps));
});

describe('minimum size', () => {
  it('the conservative and Ontario sets start at about one foot (common practice)', () => {
    for (const key of ['conservative', 'ontario-vacuum', 'ontario-buckets'] as const) {
      expect(profiles[key].minimumDbhCm).toBeCloseTo(inToCm(12), 10);
    }
  });

  it('every profile names its source', () => {
    expect(profiles.conservative.source).toContain('NAMSPM');
    expect(profiles.traditional.source).toContain('NAMSPM traditional set');
    expect(profiles['ontario-vacuum'].source).toContain('OMAFRA');
    expect(profiles['ontario-buckets'].source).toContain('OMAFRA');
    expect(profiles['quebec-public'].source).toContain('A-18.1 r.2');
  });
});
