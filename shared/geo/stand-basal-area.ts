import { basalAreaFt2FromIn, basalAreaM2 } from '../rules/basal-area';
import { M2_PER_ACRE, M2_PER_HA } from './area';

const CM_PER_IN = 2.54;

export interface BasalAreaPerArea {
  m2PerHa: number;
  ft2PerAcre: number;
}

/**
 * Stand basal area over an area given in m²: the sum of every trunk's cross-section
 * (BA m² = π/40000 · DBH cm², ft² = π/576 · DBH in²) per hectare and per acre. Null without a
 * positive area.
 */
export function basalAreaPerArea(
  dbhsCm: readonly number[],
  areaM2: number | null,
): BasalAreaPerArea | null {
  if (areaM2 === null || !(areaM2 > 0)) return null;
  let m2 = 0;
  let ft2 = 0;
  for (const d of dbhsCm) {
    m2 += basalAreaM2(d);
    ft2 += basalAreaFt2FromIn(d / CM_PER_IN);
  }
  return { m2PerHa: m2 / (areaM2 / M2_PER_HA), ft2PerAcre: ft2 / (areaM2 / M2_PER_ACRE) };
}
