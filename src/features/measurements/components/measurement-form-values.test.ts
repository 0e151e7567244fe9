import { dbhCmFrom, toMeasurementInput } from './measurement-form-values';

describe('turning the measurement form into a payload', () => {
  it('converts inches at exactly 2.54 cm and a circumference by π', () => {
    expect(dbhCmFrom(12, 'in', 'diameter')).toBe(30.48);
    expect(dbhCmFrom(100, 'cm', 'circumference')).toBe(31.83);
    expect(dbhCmFrom(40, 'in', 'circumference')).toBeCloseTo((40 * 2.54) / Math.PI, 2);
  });

  it('when the diameter is not a number, then the form says how to write one', () => {
    const result = toMeasurementInput({
      measuredOn: '2027-03-02',
      mode: 'diameter',
      value: 'ten',
      unit: 'cm',
      crownDieback: '',
      note: '',
    });
    expect(result).toEqual({
      ok: false,
      errors: { dbhCm: 'Enter the diameter as a number, like 31.5' },
    });
  });
});
