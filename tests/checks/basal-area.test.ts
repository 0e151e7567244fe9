import { describe, expect, it } from 'vitest';
import {
  basalAreaFt2FromIn,
  basalAreaM2,
  dbhFromCircumference,
  standBasalAreaFt2PerAcre,
} from '../../shared/rules/basal-area';

// Basal area: BA(ft²) = π/576 · DBH(in)², BA(m²) = π/40000 · DBH(cm)² — P.
describe('basal area check values', () => {
  it.each([
    [10, 0.545],
    [12, 0.785],
    [20, 2.182],
    [24, 3.142],
    [30, 4.909],
  ])('a %d in tree has %f ft² of basal area (basal-area formula — P)', (dbhIn, ft2) => {
    expect(basalAreaFt2FromIn(dbhIn)).toBeCloseTo(ft2, 3);
  });

  it('π/576 is about 0.005454 (basal-area formula — P)', () => {
    expect(basalAreaFt2FromIn(1)).toBeCloseTo(0.005454, 6);
  });

  it('100 trees of 12 in on one acre make 78.54 ft²/acre (basal-area formula — P)', () => {
    expect(standBasalAreaFt2PerAcre(Array(100).fill(12), 1)).toBeCloseTo(78.54, 2);
  });

  it('a 30 cm tree has 0.0707 m² of basal area (basal-area formula — P)', () => {
    expect(basalAreaM2(30)).toBeCloseTo(0.0707, 4);
  });
});

// DBH measured with a diameter tape, or as circumference: DBH = C / π.
describe('DBH from circumference', () => {
  it('a circumference of π × 40 cm is a 40 cm DBH (DBH = C / π)', () => {
    expect(dbhFromCircumference(Math.PI * 40)).toBeCloseTo(40, 10);
  });
});
