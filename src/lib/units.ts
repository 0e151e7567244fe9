import { useCallback, useSyncExternalStore } from 'react';
import { useMe } from './auth';

export type UnitSystem = 'imperial' | 'metric';
export type LengthUnit = 'in' | 'cm';

/** Exact by definition. */
export const CM_PER_IN = 2.54;

export const inToCm = (inches: number) => inches * CM_PER_IN;
export const cmToIn = (cm: number) => cm / CM_PER_IN;
export const toCm = (value: number, unit: LengthUnit) => (unit === 'in' ? inToCm(value) : value);
export const fromCm = (cm: number, unit: LengthUnit) => (unit === 'in' ? cmToIn(cm) : cm);

/** A trunk measured round: DBH = C / π. */
export const dbhFromCircumference = (circumference: number) => circumference / Math.PI;

export const lengthUnitOf = (system: UnitSystem): LengthUnit =>
  system === 'imperial' ? 'in' : 'cm';

/** Rounds to `digits` decimals without binary noise (30.479999… → 30.48). */
export const roundTo = (value: number, digits: number) => {
  const factor = 10 ** digits;
  return Math.round((value + Number.EPSILON) * factor) / factor;
};

/** Reads "31.5", "31,5" or " 12 " as numbers; anything else is NaN; empty is undefined. */
export function parseDecimal(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

const numberFormats = new Map<number, Intl.NumberFormat>();
export function formatNumber(value: number, digits = 0): string {
  let format = numberFormats.get(digits);
  if (!format) {
    format = new Intl.NumberFormat('en-US', {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    });
    numberFormats.set(digits, format);
  }
  return format.format(value);
}

/** A length held in cm, shown in the chosen unit with its unit: "12.4 in", "31.5 cm". */
export function formatLength(cm: number | null | undefined, unit: LengthUnit, digits = 1): string {
  if (cm === null || cm === undefined) return '—';
  return `${formatNumber(fromCm(cm, unit), digits)} ${unit}`;
}

/** DBH: inches or centimetres, one decimal. */
export const formatDbh = (cm: number | null | undefined, unit: LengthUnit) =>
  formatLength(cm, unit, 1);

/** Drill bits are sold in fractions of an inch; show 5/16 in rather than 0.31 in. */
export function formatBit(cm: number | null | undefined, unit: LengthUnit): string {
  if (cm === null || cm === undefined) return '—';
  if (unit === 'cm') return formatLength(cm, 'cm', 2);
  const sixtyFourths = Math.round(cmToIn(cm) * 64);
  if (sixtyFourths > 0 && Math.abs(cmToIn(cm) * 64 - sixtyFourths) < 0.05) {
    let num = sixtyFourths;
    let den = 64;
    while (num % 2 === 0 && den > 1) {
      num /= 2;
      den /= 2;
    }
    return den === 1 ? `${num} in` : `${num}/${den} in`;
  }
  return formatLength(cm, 'in', 2);
}

export const formatPercent = (pct: number | null | undefined) =>
  pct === null || pct === undefined ? '—' : `${formatNumber(pct)} %`;

// The unit toggle is a per-device preference, kept in localStorage and shared by every
// component that shows a length.
const STORAGE_KEY = 'clearwood.unitSystem';
const CHANGE_EVENT = 'clearwood:unit-system';

function readStoredSystem(): UnitSystem | null {
  try {
    const value = window.localStorage.getItem(STORAGE_KEY);
    return value === 'imperial' || value === 'metric' ? value : null;
  } catch {
    return null;
  }
}

function subscribe(onChange: () => void) {
  const onStorage = (event: StorageEvent) => {
    if (event.key === STORAGE_KEY) onChange();
  };
  window.addEventListener('storage', onStorage);
  window.addEventListener(CHANGE_EVENT, onChange);
  return () => {
    window.removeEventListener('storage', onStorage);
    window.removeEventListener(CHANGE_EVENT, onChange);
  };
}

/** The unit system to show: this device's choice, else the user's profile, else metric. */
export function useUnitSystem() {
  const { data: me } = useMe();
  const stored = useSyncExternalStore(subscribe, readStoredSystem, () => null);
  const system: UnitSystem = stored ?? me?.user.unitSystem ?? 'metric';
  const setSystem = useCallback((next: UnitSystem) => {
    try {
      window.localStorage.setItem(STORAGE_KEY, next);
    } catch {
      // Private mode without storage: the choice lasts until reload.
    }
    window.dispatchEvent(new Event(CHANGE_EVENT));
  }, []);
  return { system, unit: lengthUnitOf(system), setSystem };
}

/** Today as YYYY-MM-DD in the user's own time zone. */
export function todayIso(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

const dateFormat = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone: 'UTC' });
/** "2026-03-14" → "Mar 14, 2026", without a time-zone shift. */
export function formatDate(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(`${iso.slice(0, 10)}T00:00:00Z`);
  return Number.isNaN(date.getTime()) ? iso : dateFormat.format(date);
}
