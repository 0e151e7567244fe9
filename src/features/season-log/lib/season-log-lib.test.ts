import { sapEntry, weatherDay } from '@/test/season-fixtures';
import { sapFormSchema, blankSapForm } from './sap-entry-form';
import { seasonDays } from './season-days';
import { formatVolume, seasonUnitsOf } from './season-units';
import { forecastHeadline } from './season-words';
import { weatherFormSchema } from './weather-entry-form';

const imperial = seasonUnitsOf('imperial');
const metric = seasonUnitsOf('metric');

describe('the sap form’s conversion', () => {
  it('turns 26.4172 US gal and 40 °F into litres and °C (1 gal = 3.785411784 L, NIST Handbook 44)', () => {
    const parsed = sapFormSchema(imperial).parse({
      ...blankSapForm(),
      collectedOn: '2026-03-10',
      volumeL: '26.4172',
      sugarPct: '2.4',
      heldAtC: '40',
      syrupMadeL: '0.5',
    });
    expect(parsed.volumeL).toBeCloseTo(100, 2);
    expect(parsed.heldAtC).toBeCloseTo(4.444, 3);
    expect(parsed.syrupMadeL).toBeCloseTo(1.893, 3);
    expect(parsed.collection).toBeNull();
  });

  it('refuses what the shared schema refuses, on the field it concerns', () => {
    const result = sapFormSchema(metric).safeParse({
      ...blankSapForm(),
      volumeL: '0',
      sugarPct: '2',
      heldAtC: '55',
    });
    expect(result.success).toBe(false);
    const byField = Object.fromEntries(
      result.error!.issues.map((i) => [String(i.path[0]), i.message]),
    );
    expect(byField).toEqual({
      volumeL: 'The volume must be more than 0',
      heldAtC: 'Sap held above 40 °C (104 °F) is not a reading',
    });
  });

  it('reads a night low typed with a typographic minus', () => {
    const day = weatherFormSchema(metric).parse({ date: '2026-03-10', minC: '\u22124', maxC: '5' });
    expect(day).toEqual({ date: '2026-03-10', minC: -4, maxC: 5 });
  });
});

describe('the days of a season', () => {
  it('adds up a day’s collections and weights its sugar by volume', () => {
    const days = seasonDays(
      [weatherDay({ date: '2026-03-10' })],
      [
        sapEntry({
          id: 1,
          volumeL: 100,
          sugarPct: 2,
          expectedSyrupL: 2.33,
          expectedSyrupLRevised: 2.31,
        }),
        sapEntry({
          id: 2,
          volumeL: 300,
          sugarPct: 3,
          expectedSyrupL: 10.47,
          expectedSyrupLRevised: 10.45,
        }),
        sapEntry({ id: 3, collectedOn: '2026-03-08', volumeL: 50, sugarPct: 2 }),
      ],
      'C',
    );
    expect(days.map((d) => d.date)).toEqual(['2026-03-08', '2026-03-10']);
    expect(days[0].run).toBeNull();
    expect(days[1].sap).toMatchObject({ volumeL: 400, meanSugarPct: 2.75, entries: 2 });
    expect(days[1].sap!.expectedSyrupL).toBeCloseTo(12.8, 6);
  });

  it('shows a volume with fewer decimals as it grows', () => {
    expect([0.5, 12.34, 1240].map((l) => formatVolume(l, 'L'))).toEqual([
      '0.50 L',
      '12.3 L',
      '1,240 L',
    ]);
  });
});

describe('the forecast in words', () => {
  const forecast = [
    weatherDay({ date: '2026-03-16', minC: 2, maxC: 9, run: 'none' }),
    weatherDay({ date: '2026-03-17', minC: -3, maxC: 4, run: 'run' }),
  ];
  it('names today, tomorrow, or the weekday of the first run', () => {
    expect(forecastHeadline(forecast, 'C', '2026-03-17')).toBe(
      'Expect a run today: −3 °C night, 4 °C day',
    );
    expect(forecastHeadline(forecast, 'C', '2026-03-16')).toBe(
      'Expect a run tomorrow: −3 °C night, 4 °C day',
    );
    // 17 March 2026 is a Tuesday.
    expect(forecastHeadline(forecast, 'F', '2026-03-14')).toBe(
      'Expect a run Tuesday: 26.6 °F night, 39.2 °F day',
    );
  });

  it('says when no run is coming, and why', () => {
    expect(forecastHeadline([forecast[0]], 'C', '2026-03-16')).toBe(
      'No run expected in the coming day: the nights do not freeze',
    );
  });
});
