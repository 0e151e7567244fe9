import { dbhCmFrom, measurementFormSchema, type MeasurementFormValues } from './measurement-entry';

const typed = (overrides: Partial<MeasurementFormValues> = {}): MeasurementFormValues => ({
  measuredOn: '2026-10-02',
  mode: 'diameter',
  dbhCm: '40.6',
  unit: 'cm',
  crownDiebackPct: '',
  note: '',
  confirmedOutlier: false,
  ...overrides,
});

const messages = (result: ReturnType<ReturnType<typeof measurementFormSchema>['safeParse']>) =>
  result.success
    ? {}
    : Object.fromEntries(result.error.issues.map((i) => [String(i.path[0]), i.message]));

describe('turning the measurement form into a payload', () => {
  it('converts inches at exactly 2.54 cm and a circumference by π', () => {
    expect(dbhCmFrom(12, 'in', 'diameter')).toBe(30.48);
    expect(dbhCmFrom(100, 'cm', 'circumference')).toBe(31.83);
    expect(dbhCmFrom(40, 'in', 'circumference')).toBeCloseTo((40 * 2.54) / Math.PI, 2);
  });

  it('when the diameter is not a number, then the form says how to write one', () => {
    const result = measurementFormSchema([]).safeParse(typed({ dbhCm: 'ten' }));
    expect(messages(result)).toEqual({ dbhCm: 'Enter the diameter as a number, like 31.5' });
  });

  it('when a reading is far off last season’s, then it asks for confirmation in the form’s unit (common practice: about 1 in a year)', () => {
    const record = [{ measuredOn: '2025-10-01', dbhCm: 40 }];
    const schema = measurementFormSchema(record);
    expect(messages(schema.safeParse(typed({ dbhCm: '44.5' })))).toEqual({
      confirmedOutlier: '4.5 cm more than last season — re-measure or confirm',
    });
    expect(messages(schema.safeParse(typed({ dbhCm: '17.5', unit: 'in' })))).toEqual({
      confirmedOutlier: '1.8 in more than last season — re-measure or confirm',
    });
    const confirmed = schema.safeParse(typed({ dbhCm: '44.5', confirmedOutlier: true }));
    expect(confirmed.success && confirmed.data).toMatchObject({
      dbhCm: 44.5,
      confirmedOutlier: true,
    });
  });

  it('sends an ordinary reading without any confirmation', () => {
    const result = measurementFormSchema([{ measuredOn: '2025-10-01', dbhCm: 40 }]).safeParse(
      typed({ crownDiebackPct: '15', note: ' After the thaw ' }),
    );
    expect(result.success && result.data).toEqual({
      measuredOn: '2026-10-02',
      dbhCm: 40.6,
      crownDiebackPct: 15,
      note: 'After the thaw',
    });
  });
});
