import { niceTicks } from './nice-ticks';
import { formatNumber } from './units';

const labels = ({ ticks, decimals }: ReturnType<typeof niceTicks>) =>
  ticks.map((t) => formatNumber(t, decimals));

describe('round ticks for a chart axis', () => {
  it('when readings span a fraction of a unit, then every label is different', () => {
    const axis = niceTicks(12.96, 13.04, { minSpan: 1 });
    const shown = labels(axis);
    expect(new Set(shown).size).toBe(shown.length);
    expect(shown).toEqual(['12.5', '13.0', '13.5']);
  });

  it('when there is one reading, then the axis is widened around it', () => {
    expect(labels(niceTicks(31.5, 31.5, { minSpan: 1 }))).toEqual(['31.0', '31.5', '32.0']);
  });

  it('when readings span several units, then the ticks are whole numbers', () => {
    expect(niceTicks(30.2, 41.7, { minSpan: 1 })).toEqual({
      ticks: [30, 35, 40, 45],
      decimals: 0,
    });
  });

  it('when steps are tenths, then labels keep one decimal and no float noise', () => {
    expect(niceTicks(0.1, 0.5, { minSpan: 0.1 })).toEqual({
      ticks: [0.1, 0.2, 0.3, 0.4, 0.5],
      decimals: 1,
    });
  });
});
