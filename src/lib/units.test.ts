import { formatBit, formatDbh, parseDecimal } from './units';

describe('units', () => {
  it('shows DBH with one decimal in the chosen unit', () => {
    expect(formatDbh(30.48, 'in')).toBe('12.0 in');
    expect(formatDbh(31.83, 'cm')).toBe('31.8 cm');
    expect(formatDbh(null, 'cm')).toBe('—');
  });

  it('shows drill bits as the fractions they are sold in', () => {
    expect(formatBit(0.79375, 'in')).toBe('5/16 in');
    expect(formatBit(0.79375, 'cm')).toBe('0.79 cm');
  });

  it('reads a decimal comma as well as a point', () => {
    expect(parseDecimal('31,5')).toBe(31.5);
    expect(parseDecimal(' 12 ')).toBe(12);
    expect(parseDecimal('')).toBeUndefined();
    expect(parseDecimal('12a')).toBeNaN();
  });
});
