import { cToF, fToC, galToL, lToGal, type TemperatureUnit } from '@shared/rules/index';
import { formatNumber, roundTo, type UnitSystem } from '@/lib/units';

export type VolumeUnit = 'gal' | 'L';

/** The season log's units: imperial shows °F and US gallons, metric °C and litres. */
export interface SeasonUnits {
  temperature: TemperatureUnit;
  volume: VolumeUnit;
}

export const seasonUnitsOf = (system: UnitSystem): SeasonUnits =>
  system === 'imperial' ? { temperature: 'F', volume: 'gal' } : { temperature: 'C', volume: 'L' };

/** The API holds litres and °C; these turn what was typed into them, a little rounded. */
export const toLitres = (value: number, unit: VolumeUnit) =>
  roundTo(unit === 'gal' ? galToL(value) : value, 3);
export const fromLitres = (litres: number, unit: VolumeUnit) =>
  unit === 'gal' ? lToGal(litres) : litres;
export const toCelsius = (value: number, unit: TemperatureUnit) =>
  roundTo(unit === 'F' ? fToC(value) : value, 3);
export const fromCelsius = (celsius: number, unit: TemperatureUnit) =>
  unit === 'F' ? cToF(celsius) : celsius;

/** Digits a volume is shown with: enough for a bucket's few litres, fewer for a tank's worth. */
const volumeDigits = (value: number) => {
  // Judged on the figure as it will be rounded: 9.99996 gal reads "10.0", not "10.00".
  const size = Math.abs(value);
  return size >= 99.95 ? 0 : size >= 9.995 ? 1 : 2;
};

/** "12.5 gal", "1,240 L"; a dash when there is none. */
export function formatVolume(litres: number | null | undefined, unit: VolumeUnit): string {
  if (litres === null || litres === undefined) return '—';
  const value = fromLitres(litres, unit);
  return `${formatNumber(value, volumeDigits(value))} ${unit}`;
}

/** Sugar content: "2.4 °Brix". */
export const formatBrix = (pct: number | null | undefined) =>
  pct === null || pct === undefined ? '—' : `${formatNumber(pct, 1)} °Brix`;

/** A value as it goes back into a form field, in the field's unit: "11.89". */
export const fieldText = (value: number | null | undefined, digits = 2) =>
  value === null || value === undefined ? '' : String(roundTo(value, digits));
