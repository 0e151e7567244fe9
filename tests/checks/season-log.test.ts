import { describe, expect, it } from 'vitest';
import {
  classifyDay,
  expectedSyrup,
  formatTemperature,
  galToL,
  sapHoldingCautions,
  summarizeSap,
} from '../../shared/rules/season-log';
import { fToC } from '../../shared/rules/units';

// Sap runs after a night below 32 °F and a day above it (DOMAIN §5 — S/CP); a night near 25 °F
// before a day near 40 °F gives a strong run (common practice).
describe('a day of the season log, by the freeze–thaw rule', () => {
  it('a 25 °F night then a 40 °F day is a run, a strong one (common practice)', () => {
    const day = classifyDay(fToC(25), fToC(40));
    expect(day.run).toBe('strong');
    expect(day.reason).toBe('−3.9 °C night, 4.4 °C day: a strong run');
    expect(classifyDay(fToC(25), fToC(40), 'F').reason).toBe(
      '25 °F night, 40 °F day: a strong run',
    );
  });

  it('a −4 °C night and a 5 °C day are a run, said so in words (common practice)', () => {
    expect(classifyDay(-4, 5)).toMatchObject({
      run: 'strong',
      reason: '−4 °C night, 5 °C day: a strong run',
    });
  });

  it('a 30 °F night and a 38 °F day still run, though not at their best (S/CP)', () => {
    expect(classifyDay(fToC(30), fToC(38)).run).toBe('run');
  });

  it('a night above freezing is no run, however warm the day (S/CP)', () => {
    const day = classifyDay(fToC(35), fToC(48));
    expect(day.run).toBe('none');
    expect(day.reason).toMatch(/night does not freeze/);
  });

  it('a night at exactly 32 °F does not freeze: nights must go below it (S/CP)', () => {
    expect(classifyDay(0, 8).run).toBe('none');
  });

  it('a day that stays at or below freezing is no run (S/CP)', () => {
    expect(classifyDay(fToC(10), fToC(32)).run).toBe('none');
  });

  it('writes a minus sign, and −0.4 °C as −0.4, not 0 (so a freezing night never reads "0 °C")', () => {
    expect(formatTemperature(-0.4)).toBe('−0.4 °C');
    expect(formatTemperature(0)).toBe('0 °C');
  });
});

// Rule of 86 (Jones, UVM — P): sap per syrup = 86 / sugar %; revised for 66.0 °Brix syrup:
// 87.1 / sugar % − 0.32 (Perkins & Isselhardt, UVM Proctor — S). Check values DOMAIN §5 / UNH Extension.
describe('syrup expected from the sap', () => {
  it('at 2 % sugar, 43 gallons of sap make a gallon of syrup by the Rule of 86 (Jones; UNH Extension)', () => {
    expect(expectedSyrup(43, 2).jones86).toBeCloseTo(1, 6);
  });

  it('at 2 % sugar the revised rule takes 43.23 gallons for a gallon (Perkins & Isselhardt)', () => {
    expect(expectedSyrup(43.23, 2).revised66).toBeCloseTo(1, 6);
  });

  it('at 3 %, 1,000 L of sap make about 34.9 L of syrup (Rule of 86: 1000 / 28.67)', () => {
    expect(expectedSyrup(1000, 3).jones86).toBeCloseTo(34.88, 2);
  });

  it('adds a season entry by entry, each at its own sugar, and divides by the taps', () => {
    const totals = summarizeSap(
      [
        { volumeL: 430, sugarPct: 2 },
        { volumeL: 287, sugarPct: 3, syrupMadeL: 9.5 },
      ],
      100,
    );
    expect(totals.volumeL).toBe(717);
    expect(totals.expectedSyrupL).toBeCloseTo(10 + 287 / (86 / 3), 6);
    expect(totals.syrupMadeL).toBe(9.5);
    // Syrup made compares with what its own sap should make: 287 L at 3 % → 10.01 L.
    expect(totals.entriesWithSyrup).toBe(1);
    expect(totals.expectedSyrupLWhereMade).toBeCloseTo(287 / (86 / 3), 6);
    expect(totals.yieldPerTapL).toBeCloseTo(7.17, 6);
    expect(totals.meanSugarPct).toBeCloseTo((430 * 2 + 287 * 3) / 717, 6);
    expect(summarizeSap([], 0)).toMatchObject({
      volumeL: 0,
      meanSugarPct: null,
      yieldPerTapL: null,
      syrupMadeL: null,
    });
  });

  it('a US gallon is 3.785411784 L (NIST Handbook 44)', () => {
    expect(galToL(1)).toBe(3.785411784);
  });
});

// Sap spoils: slow below 40 °F, rapid above 50 °F (Ohio State maple program — S).
describe('keep the sap cold', () => {
  it.each([
    [34, []],
    [40, []],
    [45, ['warm-sap']],
    [50, ['warm-sap']],
    [51, ['spoiling-sap']],
    [60, ['spoiling-sap']],
  ])('sap held at %f °F gives %j (Ohio State maple program — S)', (f, codes) => {
    expect(sapHoldingCautions(fToC(f)).map((c) => c.code)).toEqual(codes);
  });

  it('the caution names the temperature in the chosen scale', () => {
    expect(sapHoldingCautions(fToC(45), 'F')[0]?.message).toMatch(/^Sap held at 45 °F/);
    expect(sapHoldingCautions(null)).toEqual([]);
  });
});
