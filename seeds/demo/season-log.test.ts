import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { classifyDay, sapHoldingCautions, summarizeSap } from '../../shared/rules/index';
import { buildDemo } from './demo';
import { demoSeasonLog, LOG_SEASONS } from './season-log';
import { seededDb } from './testing';

let demo: Awaited<ReturnType<typeof seededDb>>;
beforeAll(async () => {
  demo = await seededDb();
});
afterAll(() => demo?.close());

interface Day {
  date: string;
  min_c: number;
  max_c: number;
}
interface Sap {
  collected_on: string;
  season: number;
  volume_l: number;
  sugar_pct: number;
  held_at_c: number;
  collection: string;
  syrup_made_l: number | null;
}

async function logOf(name: string) {
  const { id } = await demo.db('sugarbushes').where({ name }).first('id');
  const days: Day[] = await demo.db('weather_days').where({ sugarbush_id: id }).orderBy('date');
  const sap: Sap[] = await demo.db('sap_entries').where({ sugarbush_id: id }).orderBy('id');
  const holes: { season: number; collection: string }[] = await demo
    .db('tapholes as h')
    .join('trees as t', 't.id', 'h.tree_id')
    .where('t.sugarbush_id', id)
    .select('h.season', 'h.collection');
  return { days, sap, holes };
}

describe.each(['Owl Ledge', 'Cobble Run'])('the demo season log of %s', (name) => {
  it('when the demo is seeded, then every day from 1 February to 20 April of 2025 and 2026 has its weather', async () => {
    const { days } = await logOf(name);
    for (const season of LOG_SEASONS) {
      const of = days.filter((d) => d.date.startsWith(`${season}-`));
      // 28 days of February, 31 of March, 20 of April.
      expect(of).toHaveLength(79);
      expect(of[0].date).toBe(`${season}-02-01`);
      expect(of.at(-1)!.date).toBe(`${season}-04-20`);
      expect(of.every((d) => d.min_c < d.max_c)).toBe(true);
      // Freeze and thaw: March runs more often than February (common practice).
      const runs = (month: string) =>
        of.filter(
          (d) => d.date.slice(5, 7) === month && classifyDay(d.min_c, d.max_c).run !== 'none',
        ).length;
      expect(runs('03')).toBeGreaterThan(runs('02'));
      expect(runs('03')).toBeGreaterThan(10);
    }
  });

  it('when sap was collected, then it was on a run day, from a collection the season’s tapholes used, at 1.5–3.5 °Brix', async () => {
    const { days, sap, holes } = await logOf(name);
    const byDate = new Map(days.map((d) => [d.date, d]));
    expect(sap.length).toBeGreaterThan(40);
    for (const e of sap) {
      const day = byDate.get(e.collected_on)!;
      expect(classifyDay(day.min_c, day.max_c).run, e.collected_on).not.toBe('none');
      expect(e.sugar_pct).toBeGreaterThanOrEqual(1.5);
      expect(e.sugar_pct).toBeLessThanOrEqual(3.5);
    }
    for (const season of LOG_SEASONS) {
      const used = new Set(holes.filter((h) => h.season === season).map((h) => h.collection));
      const logged = new Set(sap.filter((e) => e.season === season).map((e) => e.collection));
      expect([...logged].sort()).toEqual([...used].sort());
    }
  });

  it('when the sap’s holding temperatures are read, then a few were above 40 °F and one above 50 °F', async () => {
    const { sap } = await logOf(name);
    const codes = sap.flatMap((e) => sapHoldingCautions(e.held_at_c).map((c) => c.code));
    expect(codes.filter((c) => c === 'spoiling-sap')).toHaveLength(1);
    const warm = codes.filter((c) => c === 'warm-sap').length;
    expect(warm).toBeGreaterThanOrEqual(1);
    expect(warm).toBeLessThanOrEqual(8);
  });

  it('when syrup was made, then on some days only, and a little less than the Rule of 86 expects', async () => {
    const { sap } = await logOf(name);
    const boiled = sap.filter((e) => e.syrup_made_l !== null);
    expect(boiled.length).toBeGreaterThan(5);
    expect(boiled.length).toBeLessThan(sap.length / 2);
    for (const e of boiled) {
      const expected = summarizeSap(
        [{ volumeL: e.volume_l, sugarPct: e.sugar_pct }],
        0,
      ).expectedSyrupL;
      expect(e.syrup_made_l!).toBeLessThanOrEqual(expected + 0.05);
      // Written to 0.1 L.
      expect(e.syrup_made_l!).toBeGreaterThan(expected * 0.85 - 0.05);
    }
  });
});

describe('the demo’s sap yields', () => {
  it('when Owl Ledge’s vacuum and bucket taps are compared, then vacuum gives two to three times the sap a tap (UVM Extension — P)', async () => {
    const { sap, holes } = await logOf('Owl Ledge');
    for (const season of LOG_SEASONS) {
      const perTap = (collection: string) => {
        const taps = holes.filter((h) => h.season === season && h.collection === collection).length;
        const entries = sap.filter((e) => e.season === season && e.collection === collection);
        return summarizeSap(
          entries.map((e) => ({ volumeL: e.volume_l, sugarPct: e.sugar_pct })),
          taps,
        ).yieldPerTapL!;
      };
      const ratio = perTap('vacuum') / perTap('bucket');
      expect(ratio).toBeGreaterThan(1.8);
      expect(ratio).toBeLessThan(3.2);
      // Some 10–25 US gallons of sap a tap on vacuum over a season: from memory.
      expect(perTap('vacuum')).toBeGreaterThan(38);
      expect(perTap('vacuum')).toBeLessThan(95);
    }
  });

  it('when the log is generated twice, then it is the same', () => {
    const [owl] = buildDemo();
    expect(demoSeasonLog(owl.layout.key, owl.trees, 'USC00999999')).toEqual(owl.seasonLog);
  });
});
