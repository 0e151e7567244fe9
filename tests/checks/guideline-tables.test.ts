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

// Quebec private land: M-35.1 r.8.1 s.6 (in force 2023–), read 2026-12-01 in the version of
// 2023-09-20: 0 to 23 cm none, 23.1 to 39 cm one, 39.1 cm and more two — P.
describe('Quebec private land: Quebec, sugar-bush plan standard for private land, M-35.1 r.8.1 s.6 (in force 2023–) — P', () => {
  it.each([
    [23.0, 0],
    [23.1, 1],
    [39.0, 1],
    [39.1, 2],
    [90, 2],
  ])('%f cm → %d taps', (dbhCm, taps) => expect(tapsForDbh(dbhCm, 'quebec-private')).toBe(taps));

  it('names the standard and the date it was read', () => {
    expect(profiles['quebec-private'].source).toContain('M-35.1 r.8.1 s.6');
    expect(profiles['quebec-private'].source).toContain('read 2026-12-01');
  });
});

// Quebec public land: Regulation respecting forest management permits, A-18.1 r.8.1 s.24. The
// text in force since 2023 was not found among the official pages read 2026-12-01, so its table
// is from memory (matching the private-land table, as DOMAIN.md says); s.58, read 2026-12-01 in
// the version of 2024-11-19, gives the rule until 2022-12-31 (19.1/39.1/59.1/79.1 cm) — P.
describe('Quebec public land: Regulation respecting forest management permits, A-18.1 r.8.1 s.24 — P (table from memory)', () => {
  it.each([
    [23.0, 0],
    [23.1, 1],
    [39.0, 1],
    [39.1, 2],
    [85, 2],
  ])('%f cm → %d taps (from memory)', (dbhCm, taps) =>
    expect(tapsForDbh(dbhCm, 'quebec-public')).toBe(taps),
  );

  it('is no longer the repealed 2004 table (A-18.1 r.2: 20/40/60/80 cm, replaced 2018-08-16)', () => {
    expect(tapsForDbh(20, 'quebec-public')).toBe(0);
    expect(tapsForDbh(60, 'quebec-public')).toBe(2);
    expect(tapsForDbh(80, 'quebec-public')).toBe(2);
    for (const p of Object.values(profiles)) expect(p.source).not.toMatch(/A-18\.1 r\.2\b/);
  });

  it('cites the section, says the table is from memory and gives the date read', () => {
    const source = profiles['quebec-public'].source;
    expect(source).toContain('A-18.1 r.8.1 s.24');
    expect(source).toContain('from memory');
    expect(source).toContain('read 2026-12-01');
  });
});

describe('the Quebec conditions (A-18.1 r.8.1 s.24 as s.58 reads it — P)', () => {
  it.each(['quebec-private', 'quebec-public'] as const)(
    '%s: tap 1 January – 30 April and pull spouts by 1 June, for the season',
    (key) => {
      const text = profiles[key].seasonRules.map((r) => r.text).join(' ');
      expect(text).toContain('1 January and 30 April');
      expect(text).toContain('1 June');
      for (const r of profiles[key].seasonRules) expect(r.source).toContain('A-18.1 r.8.1');
    },
  );

  it.each(['quebec-private', 'quebec-public'] as const)(
    '%s: bit at most 11 mm, at most 6 cm deep with bark, holes spread evenly, with the drilling',
    (key) => {
      const p = profiles[key];
      expect(p.limits).toEqual({ maxDepthCm: 6, maxBitCm: 1.1 });
      const text = p.drillingRules.map((r) => r.text).join(' ');
      expect(text).toContain('11 mm');
      expect(text).toContain('6 cm deep');
      expect(text).toContain('evenly');
    },
  );
});

describe('the built-in profiles', () => {
  it('are the six guideline sets, each with its source', () => {
    expect(Object.keys(profiles).sort()).toEqual(
      [
        'conservative',
        'ontario-buckets',
        'ontario-vacuum',
        'quebec-private',
        'quebec-public',
        'traditional',
      ].sort(),
    );
    for (const p of Object.values(profiles)) expect(p.source.length).toBeGreaterThan(10);
  });
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
    expect(profiles['quebec-public'].source).toContain('A-18.1 r.8.1');
    expect(profiles['quebec-private'].source).toContain('M-35.1 r.8.1');
  });
});
