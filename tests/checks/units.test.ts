import { describe, expect, it } from 'vitest';
import { cToF, cmToIn, fToC, inToCm } from '../../shared/rules/units';

describe('units', () => {
  it('1 in is 2.54 cm exactly (NIST SP 811)', () => {
    expect(inToCm(1)).toBe(2.54);
    expect(cmToIn(2.54)).toBe(1);
  });

  it('°F = °C × 9/5 + 32 (definition of the Fahrenheit scale)', () => {
    expect(cToF(0)).toBe(32);
    expect(cToF(100)).toBe(212);
    expect(fToC(40)).toBeCloseTo(4.444, 3);
  });

  it('syrup boils about 7 °F (4 °C) above water: the same step in both scales (S)', () => {
    expect(cToF(4) - cToF(0)).toBeCloseTo(7.2, 1);
  });

  it('breast height is 4.5 ft, about 1.37 m, in the US (P)', () => {
    expect(inToCm(4.5 * 12) / 100).toBeCloseTo(1.37, 2);
  });
});
