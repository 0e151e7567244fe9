import { describe, expect, it } from 'vitest';
import { sapPerSyrup } from '../../shared/rules/sap';

// Rule of 86 (Jones, UVM): sap per syrup = 86 / sugar % — P; check values from UNH Extension.
describe('Rule of 86', () => {
  it.each([
    [2, 43],
    [2.5, 34.4],
    [3, 28.7],
  ])(
    '%f %% sap takes %f units of sap per unit of syrup (Rule of 86, Jones, UVM — P; UNH Extension)',
    (pct, sap) => {
      expect(sapPerSyrup(pct, 'jones-86')).toBeCloseTo(sap, 1);
    },
  );
});

// Revised for 66.0 °Brix syrup: 87.1 / sugar % − 0.32 (Perkins & Isselhardt, UVM Proctor — S).
describe('revised rule for 66.0 °Brix', () => {
  it.each([
    [2, 43.23],
    [3, 28.71],
  ])('%f %% sap takes %f (Perkins & Isselhardt, UVM Proctor — S)', (pct, sap) => {
    expect(sapPerSyrup(pct, 'revised-66')).toBeCloseTo(sap, 2);
  });

  it('refuses a sugar content of 0 (the rules divide by it)', () => {
    expect(() => sapPerSyrup(0, 'jones-86')).toThrow(RangeError);
  });
});
