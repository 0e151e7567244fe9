import { describe, expect, it } from 'vitest';
import { validateCustomProfile } from '../../shared/rules/custom-profile';
import { inToCm } from '../../shared/rules/units';

const sane = {
  label: 'Lease terms 2027',
  unit: 'in' as const,
  bands: [
    { from: 12, taps: 1 },
    { from: 18, taps: 2 },
  ],
  spacing: { sidewaysCm: 10, verticalCm: 30 },
};

function refused(patch: object): Record<string, string> {
  const result = validateCustomProfile({ ...sane, ...patch });
  expect(result.ok).toBe(false);
  return result.ok ? {} : Object.fromEntries(result.errors.map((e) => [e.path, e.message]));
}

describe('custom guidelines stay within what the trade allows', () => {
  it('spacing is at least the smallest published figures: 1 in to the side (Cornell, Wild — S), 6 in up or down (UVM Proctor sap-yield tips 2020 — S; Ohio State — S)', () => {
    expect(refused({ spacing: { sidewaysCm: 0.01, verticalCm: 30 } })).toHaveProperty(
      'spacing.sidewaysCm',
    );
    expect(refused({ spacing: { sidewaysCm: 10, verticalCm: 0.01 } })).toHaveProperty(
      'spacing.verticalCm',
    );
    const edge = validateCustomProfile({
      ...sane,
      spacing: { sidewaysCm: inToCm(1), verticalCm: inToCm(6) },
    });
    expect(edge.ok).toBe(true);
  });

  it('the height band lies within about 30–200 cm and is at least 30 cm tall (common practice / from memory)', () => {
    expect(refused({ heightBand: { minCm: 0, maxCm: 400 } })).toMatchObject({
      'heightBand.minCm': expect.any(String),
      'heightBand.maxCm': expect.any(String),
    });
    expect(refused({ heightBand: { minCm: 300, maxCm: 400 } })).toMatchObject({
      'heightBand.minCm': expect.any(String),
      'heightBand.maxCm': expect.any(String),
    });
    expect(refused({ heightBand: { minCm: 80, maxCm: 100 } })).toHaveProperty('heightBand.maxCm');
    expect(validateCustomProfile({ ...sane, heightBand: { minCm: 30, maxCm: 200 } }).ok).toBe(true);
  });

  it('holes go at most 6.5 cm deep with bark, past the bark, with a 19/64–7/16 in bit (Perkins, UVM Proctor — S; Quebec — P; OMAFRA — P)', () => {
    const deep = { depthCm: 10, bitCm: 2 };
    const errors = refused({ drill: { bucket: deep, gravity: deep, vacuum: deep } });
    expect(errors).toHaveProperty('drill.vacuum.depthCm');
    expect(errors).toHaveProperty('drill.vacuum.bitCm');
    const tooShallow = { depthCm: 1, bitCm: 0.8 };
    expect(
      refused({ drill: { bucket: tooShallow, gravity: tooShallow, vacuum: tooShallow } }),
    ).toHaveProperty('drill.vacuum.depthCm');
    // The shallowest allowed hole (about 1 in, Chabot — S) still reaches past the thickest bark allowed.
    const shallow = { depthCm: 2.6, bitCm: 0.8 };
    expect(
      validateCustomProfile({
        ...sane,
        drill: { bucket: shallow, gravity: shallow, vacuum: shallow },
        zone: { barkCm: 1.5, stainLengthCm: 30, stainMarginCm: 1, zoneHeightCm: 90, floor: 0.82 },
      }).ok,
    ).toBe(true);
  });

  it('the clear-wood floor is 0.5–0.98 (Clearwood tapping-zone model — calibrated at 0.82, our assumption)', () => {
    const zone = { barkCm: 0.6, stainLengthCm: 30, stainMarginCm: 1, zoneHeightCm: 90 };
    expect(refused({ zone: { ...zone, floor: 0.01 } })).toHaveProperty('zone.floor');
    expect(refused({ zone: { ...zone, floor: 0.99 } })).toHaveProperty('zone.floor');
    expect(validateCustomProfile({ ...sane, zone: { ...zone, floor: 0.5 } }).ok).toBe(true);
  });

  it('a tree is not rested from 0 % dieback: ≤ 10 % is no decline, > 15 % cause for concern (UVM Forest Ecosystem Monitoring Cooperative — S)', () => {
    const errors = refused({
      stressed: { maxTaps: 1, noneBelowCm: 30.48, diebackPct: 15, restAtDiebackPct: 0 },
    });
    expect(errors).toHaveProperty('stressed.restAtDiebackPct');
  });

  it('band edges are at least 2.5 cm apart and there are at most four taps (NAMSPM traditional set — S: four at most)', () => {
    expect(
      refused({
        unit: 'cm',
        bands: [
          { from: 30, taps: 1 },
          { from: 31, taps: 2 },
        ],
      }),
    ).toHaveProperty('bands.1.from');
    const five = [12, 15, 18, 21, 24].map((from, i) => ({ from, taps: i + 1 }));
    expect(refused({ bands: five })).toHaveProperty('bands');
  });

  it('keeps only what it checked: an unknown field is not part of the stored profile', () => {
    const result = validateCustomProfile({ ...sane, padding: 'x'.repeat(900_000) });
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.value).not.toHaveProperty('padding');
      expect(JSON.stringify(result.value).length).toBeLessThan(5000);
    }
  });
});
