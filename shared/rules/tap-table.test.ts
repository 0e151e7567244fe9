import { describe, expect, it } from 'vitest';
import { profiles, resolveProfile } from './profiles';
import { bandForDbh, tapsForDbh } from './tap-table';

describe('tapsForDbh', () => {
  it('takes a profile object or its key alike', () => {
    expect(tapsForDbh(50, profiles.traditional)).toBe(tapsForDbh(50, 'traditional'));
  });

  it('treats an edge written in inches as inside its band despite binary rounding', () => {
    for (const p of Object.values(profiles)) {
      for (const band of p.bands) {
        expect(tapsForDbh(band.fromCm, p)).toBe(band.taps);
        // One reading step below the edge: 0.01 cm, or 0.1 cm where the table is read to 0.1 cm.
        expect(tapsForDbh(band.fromCm - (p.dbhStepCm ?? 0.01), p)).toBe(band.taps - 1);
      }
    }
  });

  it('gives no taps for a missing, zero or negative diameter', () => {
    expect(tapsForDbh(0, 'conservative')).toBe(0);
    expect(tapsForDbh(-3, 'conservative')).toBe(0);
    expect(tapsForDbh(Number.NaN, 'conservative')).toBe(0);
  });

  it('never goes above the profile maximum, however large the tree', () => {
    for (const p of Object.values(profiles)) expect(tapsForDbh(390, p)).toBe(p.maxTaps);
  });

  it('finds the band row for a size', () => {
    expect(bandForDbh(46, 'ontario-vacuum')?.fullOnlyForHealthyFastGrowers).toBe(true);
    expect(bandForDbh(20, 'ontario-vacuum')).toBeNull();
  });

  it('reads a table written to 0.1 cm at that step: 23.04 cm is 23.0, 23.06 cm is 23.1', () => {
    expect(tapsForDbh(23.04, 'quebec-private')).toBe(0);
    expect(tapsForDbh(23.06, 'quebec-private')).toBe(1);
  });

  it('refuses an unknown profile key', () => {
    expect(() => resolveProfile('no-such-set')).toThrow(RangeError);
  });

  it('keeps every built-in band ascending with one more tap each', () => {
    for (const p of Object.values(profiles)) {
      p.bands.forEach((band, i) => {
        expect(band.taps).toBe(i + 1);
        if (i > 0) expect(band.fromCm).toBeGreaterThan(p.bands[i - 1].fromCm);
      });
      expect(p.minimumDbhCm).toBe(p.bands[0].fromCm);
    }
  });
});
