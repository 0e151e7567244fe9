import { area } from '@turf/turf';
import type { Boundary } from './boundary';

/** One acre is exactly 4046.8564224 m² (the international acre: 43,560 ft² of 0.3048 m). */
export const M2_PER_ACRE = 4046.8564224;
export const M2_PER_HA = 10_000;
/** 1 ha = 2.4710538… acres. */
export const ACRES_PER_HA = M2_PER_HA / M2_PER_ACRE;

/**
 * Area on the sphere in square metres (turf `area`: Chamberlain & Duquette's ring formula on a
 * sphere of turf's mean Earth radius, 6 371 008.8 m). Holes are subtracted.
 */
export function boundaryAreaM2(boundary: Boundary): number {
  return area(boundary);
}

export const hectaresFromM2 = (m2: number) => m2 / M2_PER_HA;
export const acresFromM2 = (m2: number) => m2 / M2_PER_ACRE;

/** Count (or any sum) per hectare and per acre of an area in m²; null without a positive area. */
export function perArea(
  amount: number,
  areaM2: number | null,
): { perHa: number; perAcre: number } | null {
  if (areaM2 === null || !(areaM2 > 0)) return null;
  return { perHa: amount / hectaresFromM2(areaM2), perAcre: amount / acresFromM2(areaM2) };
}
