export type SapRule = 'jones-86' | 'revised-66';

/**
 * Units of sap for one unit of syrup at this sap sugar content (%).
 * 'jones-86': the Rule of 86, 86 / sugar %. 'revised-66': for 66.0 °Brix syrup, 87.1 / sugar % − 0.32.
 */
export function sapPerSyrup(sugarPct: number, rule: SapRule = 'jones-86'): number {
  if (!(sugarPct > 0) || !Number.isFinite(sugarPct)) {
    throw new RangeError('Sap sugar must be a percentage above 0');
  }
  return rule === 'jones-86' ? 86 / sugarPct : 87.1 / sugarPct - 0.32;
}
