/** Basal area: the cross-section of a trunk at breast height. BA(m²) = π/40000 · DBH(cm)². */
export function basalAreaM2(dbhCm: number): number {
  return (Math.PI / 40000) * dbhCm * dbhCm;
}

export function basalAreaCm2(dbhCm: number): number {
  return (Math.PI / 4) * dbhCm * dbhCm;
}

/** BA(ft²) = π/576 · DBH(in)² ≈ 0.005454 · DBH². */
export function basalAreaFt2FromIn(dbhIn: number): number {
  return (Math.PI / 576) * dbhIn * dbhIn;
}

/** Stand basal area in ft² per acre from tree diameters in inches. */
export function standBasalAreaFt2PerAcre(dbhsIn: readonly number[], acres: number): number {
  if (!(acres > 0)) throw new RangeError('The stand needs an area above 0 acres');
  return dbhsIn.reduce((sum, d) => sum + basalAreaFt2FromIn(d), 0) / acres;
}

/** DBH from a circumference taken at breast height: DBH = C / π. */
export function dbhFromCircumference(circumferenceCm: number): number {
  return circumferenceCm / Math.PI;
}

export function circumferenceFromDbh(dbhCm: number): number {
  return Math.PI * dbhCm;
}

/** Basal-area growth (cm²/yr) of a trunk of this DBH whose radius grows this fast: dBA/dt = π · DBH · dr/dt. */
export function basalAreaGrowthCm2(dbhCm: number, radialGrowthCmPerYear: number): number {
  return Math.PI * dbhCm * radialGrowthCmPerYear;
}
