import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PROBLEM_TAGS } from './problems';
import { chordCm, seededDb, standRecords } from './testing';
import { problemCategories, type ProblemCategory } from './types';

let demo: Awaited<ReturnType<typeof seededDb>>;
let owl: Awaited<ReturnType<typeof standRecords>>;

beforeAll(async () => {
  demo = await seededDb();
  owl = await standRecords(demo.db, 'Owl Ledge');
});
afterAll(async () => demo?.close());

const trees = (c: ProblemCategory) => DEMO_PROBLEM_TAGS[c].map((tag) => owl.tree(tag));
const last = <T>(xs: T[]) => xs[xs.length - 1];
const perYear = (m: { season: number; dbh_cm: number }[]) =>
  (last(m).dbh_cm - m[0].dbh_cm) / (last(m).season - m[0].season);
const holesIn = (t: ReturnType<typeof owl.tree>, s: number) =>
  t.tapholes.filter((h) => h.season === s);
const IN = 2.54;

describe('demo problem trees', () => {
  it('lists every category with several distinct trees, none in two categories', () => {
    const all = Object.values(DEMO_PROBLEM_TAGS).flat();
    expect(new Set(all).size).toBe(all.length);
    for (const c of problemCategories) {
      expect(DEMO_PROBLEM_TAGS[c].length, c).toBeGreaterThanOrEqual(3);
      for (const tag of DEMO_PROBLEM_TAGS[c]) expect(() => owl.tree(tag)).not.toThrow();
    }
  });

  it('too small: under 12 in every season, never tapped, some close to the line', () => {
    for (const t of trees('too-small')) {
      expect(Math.max(...t.measurements.map((m) => m.dbh_cm))).toBeLessThan(12 * IN);
      expect(t.tapholes).toEqual([]);
    }
    const near = trees('too-small').filter((t) => last(t.measurements).dbh_cm > 29);
    expect(near.length).toBeGreaterThanOrEqual(2);
  });

  it('overtapped: three or four holes a season where the table allows one or two', () => {
    for (const t of trees('overtapped')) {
      for (let s = 2022; s <= 2026; s++) {
        expect(holesIn(t, s).length).toBeGreaterThanOrEqual(3);
        expect(holesIn(t, s).length).toBeLessThanOrEqual(4);
      }
    }
  });

  it('too close: the 2026 hole sits within 3 cm sideways and 5 cm vertically of a 2025 hole', () => {
    for (const t of trees('too-close')) {
      const dbh = last(t.measurements).dbh_cm;
      const close = holesIn(t, 2026).some((a) =>
        holesIn(t, 2025).some(
          (b) =>
            chordCm(dbh, a.azimuth_deg, b.azimuth_deg) <= 3.2 &&
            Math.abs(a.height_cm - b.height_cm) <= 5,
        ),
      );
      expect(close, t.tag).toBe(true);
    }
  });

  it('slow growth: about 0.05–0.1 cm a year, far below the 2016 basal-area minimum', () => {
    for (const t of trees('slow-growth')) {
      expect(perYear(t.measurements)).toBeLessThan(0.13);
      expect(perYear(t.measurements)).toBeGreaterThan(0.02);
      // Basal-area growth (in²/yr) against 1.4 in²/yr at 10 in DBH, the lowest point of the line
      // (van den Berg, Perkins, Isselhardt, Wilmot 2016 — P).
      const d = last(t.measurements).dbh_cm / IN;
      const grew = (Math.PI / 2) * d * (perYear(t.measurements) / IN);
      expect(grew).toBeLessThan(1.4);
    }
  });

  it('declining crowns reach 20–45 % dieback, severely declining 60–80 %', () => {
    for (const t of trees('declining')) {
      expect(last(t.measurements).crown_dieback_pct).toBeGreaterThanOrEqual(20);
      expect(last(t.measurements).crown_dieback_pct).toBeLessThanOrEqual(45);
      expect(t.measurements[0].crown_dieback_pct).toBeLessThanOrEqual(10);
    }
    for (const t of trees('severely-declining')) {
      expect(last(t.measurements).crown_dieback_pct).toBeGreaterThanOrEqual(60);
      expect(last(t.measurements).crown_dieback_pct).toBeLessThanOrEqual(80);
    }
  });

  it('dead trees: status dead, last readings at 100 % dieback, no 2026 holes', () => {
    for (const t of trees('dead')) {
      expect(t.status).toBe('dead');
      expect(last(t.measurements)).toMatchObject({ season: 2026, crown_dieback_pct: 100 });
      expect(holesIn(t, 2026)).toEqual([]);
      expect(t.tapholes.length).toBeGreaterThan(0);
    }
  });

  it('held out and removed trees carry their status and stop where they should', () => {
    for (const t of trees('held-out')) {
      expect(t.status).toBe('held-out');
      expect(Math.max(...t.tapholes.map((h) => h.season))).toBe(2023);
      expect(last(t.measurements).season).toBe(2026);
    }
    for (const t of trees('removed')) {
      expect(t.status).toBe('removed');
      expect(last(t.measurements).season).toBe(2024);
      expect(Math.max(...t.tapholes.map((h) => h.season))).toBeLessThanOrEqual(2024);
    }
  });

  it('stale measurement: nothing measured after 2022, still tapped in 2026', () => {
    for (const t of trees('stale-measurement')) {
      expect(last(t.measurements).season).toBe(2022);
      expect(t.status).toBe('active');
      expect(holesIn(t, 2026).length).toBeGreaterThan(0);
    }
  });

  it('shrinking: one season read about 2 cm low, the next back on track', () => {
    for (const t of trees('shrinking')) {
      const m = t.measurements;
      const dips = m.filter(
        (r, i) =>
          i > 0 && i < m.length - 1 && (m[i - 1].dbh_cm + m[i + 1].dbh_cm) / 2 - r.dbh_cm > 1.5,
      );
      expect(dips.length, t.tag).toBe(1);
      const i = m.indexOf(dips[0]);
      expect(m[i - 1].dbh_cm - m[i].dbh_cm).toBeGreaterThan(1);
      expect(m[i + 1].dbh_cm).toBeGreaterThan(m[i - 1].dbh_cm);
    }
  });

  it('depleted zone: slow growth and three or four holes every season', () => {
    for (const t of trees('depleted-zone')) {
      expect(perYear(t.measurements)).toBeLessThan(0.13);
      for (let s = 2018; s <= 2026; s++) {
        expect(holesIn(t, s).length).toBeGreaterThanOrEqual(3);
        expect(holesIn(t, s).length).toBeLessThanOrEqual(4);
      }
    }
  });

  it('notes by the consultant point at problem trees of every kind', async () => {
    const noted = await demo
      .db('notes as n')
      .join('trees as t', 't.id', 'n.tree_id')
      .where('n.sugarbush_id', owl.sugarbushId)
      .distinct('t.tag');
    const tags = new Set(noted.map((r: { tag: string }) => r.tag));
    for (const c of problemCategories)
      expect(
        DEMO_PROBLEM_TAGS[c].some((tag) => tags.has(tag)),
        c,
      ).toBe(true);
  });
});
