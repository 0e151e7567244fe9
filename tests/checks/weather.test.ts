import { describe, expect, it } from 'vitest';
import { freezeThaw, sapSpoilage } from '../../shared/rules/weather';
import { fToC } from '../../shared/rules/units';

// Sap runs with nights below 32 °F and days above freezing, best in the 40s °F — S/CP.
describe('freeze–thaw', () => {
  it('a night near 25 °F and a day near 40 °F give a strong run (common practice)', () => {
    expect(freezeThaw(fToC(25), fToC(42))).toBe('strong-run');
  });

  it('no run when the night stays above 32 °F (S/CP)', () => {
    expect(freezeThaw(fToC(34), fToC(50))).toBe('no-freeze');
  });

  it('no run when the day stays at or below 32 °F (S/CP)', () => {
    expect(freezeThaw(fToC(10), fToC(31))).toBe('stays-frozen');
  });

  it('a freeze and a warm day outside the 40s still runs, just not at its best (S/CP)', () => {
    expect(freezeThaw(fToC(26), fToC(55))).toBe('run');
  });
});

// Sap spoilage: suppressed near freezing, slow below 40 °F, rapid above 50 °F (Ohio State maple program — S).
describe('sap spoilage', () => {
  it.each([
    [fToC(32), 'suppressed'],
    [fToC(38), 'slow'],
    [fToC(55), 'rapid'],
  ])('at %f °C spoilage is %s (Ohio State maple program — S)', (c, expected) => {
    expect(sapSpoilage(c)).toBe(expected);
  });
});
