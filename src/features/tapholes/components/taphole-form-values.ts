import { normalizeAzimuth } from '@shared/rules/index';
import type { Collection } from '@shared/schemas/enums';
import { FIRST_SEASON, lastSeason } from '@shared/schemas/plan';
import { TAPHOLE_LIMITS, tapholeInputSchema, type TapholeInput } from '@shared/schemas/taphole';
import { formatBitSize } from '@/lib/advice-words';
import { bitSizes, matchBit } from '@/lib/bit-sizes';
import { nearestPoint, pointDeg, type CompassPoint } from '@/lib/compass';
import { cmToIn, inToCm, parseDecimal, roundTo, type UnitSystem } from '@/lib/units';

export { bitSizes, matchBit };
export const bitLabel = (cm: number, system: UnitSystem) => formatBitSize(cm, system);

/**
 * The form as typed. Lengths are text in `system`'s units. Fields left undefined follow the
 * advice (season, depth, bit) or the tree's record (collection) until the tapper changes them.
 */
export interface TapholeFormValues {
  system: UnitSystem;
  season?: string;
  drilledOn: string;
  /** Imperial height: feet and inches, or inches alone. */
  feet: string;
  inches: string;
  /** Metric height. */
  cm: string;
  side: CompassPoint | '';
  /** Optional exact azimuth; when given it is the one saved. */
  exactDeg: string;
  depth?: string;
  bitCm?: string;
  collection?: Collection;
  stainHit: boolean;
}

export interface TapholeDefaults {
  season: number;
  depthCm: number;
  bitCm: number;
  collection: Collection;
}

export type TapholeField = keyof TapholeInput;
export type TapholeErrors = Partial<Record<TapholeField, string>>;

const fieldNames = Object.keys(tapholeInputSchema.shape) as TapholeField[];
export const isTapholeField = (key: string): key is TapholeField =>
  (fieldNames as string[]).includes(key);

export const emptyTapholeForm = (system: UnitSystem, drilledOn: string): TapholeFormValues => ({
  system,
  drilledOn,
  feet: '',
  inches: '',
  cm: '',
  side: '',
  exactDeg: '',
  stainHit: false,
});

/** A height as the form shows it: whole inches split into feet, or cm to one decimal. */
export function heightText(
  heightCm: number,
  system: UnitSystem,
): Pick<TapholeFormValues, 'feet' | 'inches' | 'cm'> {
  if (system === 'metric') return { feet: '', inches: '', cm: String(roundTo(heightCm, 1)) };
  const total = Math.round(cmToIn(heightCm));
  const feet = Math.floor(total / 12);
  return { feet: feet > 0 ? String(feet) : '', inches: String(total % 12), cm: '' };
}

/** A depth as the form shows it: inches to the hundredth, or cm to one decimal. */
export const depthText = (depthCm: number, system: UnitSystem) =>
  String(system === 'metric' ? roundTo(depthCm, 1) : roundTo(cmToIn(depthCm), 2));

type Read = { cm: number } | { empty: true } | { error: string };

export function readHeight(values: TapholeFormValues): Read {
  if (values.system === 'metric') {
    const cm = parseDecimal(values.cm);
    if (cm === undefined) return { empty: true };
    if (Number.isNaN(cm)) return { error: 'Enter the height in cm as a number, like 110' };
    return { cm: roundTo(cm, 2) };
  }
  const feet = parseDecimal(values.feet);
  const inches = parseDecimal(values.inches);
  if (feet === undefined && inches === undefined) return { empty: true };
  if (Number.isNaN(feet) || Number.isNaN(inches))
    return { error: 'Enter feet and inches as numbers, like 3 ft 7 in' };
  return { cm: roundTo(inToCm((feet ?? 0) * 12 + (inches ?? 0)), 2) };
}

export function readDepth(values: TapholeFormValues, defaults: TapholeDefaults): Read {
  if (values.depth === undefined) return { cm: defaults.depthCm };
  const typed = parseDecimal(values.depth);
  if (typed === undefined) return { empty: true };
  if (Number.isNaN(typed)) return { error: 'Enter the depth as a number, like 2' };
  return { cm: values.system === 'imperial' ? roundTo(inToCm(typed), 4) : typed };
}

/** The azimuth the form stands for: the exact degrees when typed, else the compass point. */
export function readAzimuth(values: TapholeFormValues): Read {
  const exact = parseDecimal(values.exactDeg);
  if (Number.isNaN(exact)) return { error: 'Enter degrees as a number, 0 for north, 90 for east' };
  if (exact !== undefined) return { cm: exact };
  return values.side === '' ? { empty: true } : { cm: pointDeg(values.side) };
}

export const readSeason = (values: TapholeFormValues, defaults: TapholeDefaults) => {
  if (values.season === undefined) return defaults.season;
  return /^\s*\d{4}\s*$/.test(values.season) ? Number(values.season) : undefined;
};

const maxHeightCm = TAPHOLE_LIMITS.heightCm.max;
const { min: minDepthCm, max: maxDepthCm } = TAPHOLE_LIMITS.depthCm;

/** The schema's limits, in the tapper's units. */
function rangeMessage(field: TapholeField, system: UnitSystem): string {
  const imperial = system === 'imperial';
  switch (field) {
    case 'season':
      return `Season must be a year from ${FIRST_SEASON} to ${lastSeason()}`;
    case 'drilledOn':
      return 'Enter the date as YYYY-MM-DD';
    case 'heightCm': {
      const max = imperial
        ? `${Math.floor(cmToIn(maxHeightCm) / 12)} ft ${Math.floor(cmToIn(maxHeightCm) % 12)} in`
        : `${maxHeightCm} cm`;
      return `Height must be between 0 and ${max} above the ground`;
    }
    case 'azimuthDeg':
      return 'Degrees run from 0 (north) to 359, clockwise';
    case 'depthCm': {
      const [min, max] = [minDepthCm, maxDepthCm].map((cm) =>
        imperial ? `${roundTo(cmToIn(cm), 1)} in` : `${cm} cm`,
      );
      return `Depth must be between ${min} and ${max}, bark included`;
    }
    case 'bitCm':
      return 'Choose the bit you drilled with';
    case 'collection':
      return 'Choose how the sap is collected';
    case 'stainHit':
      return 'Tick the box if the shavings came out brown or yellow';
    case 'clientId':
      return 'This entry has no valid id: record it again';
  }
}

/** Turns the form into the API's payload, checked by the same schema the API uses. */
export function toTapholeInput(
  values: TapholeFormValues,
  defaults: TapholeDefaults,
): { ok: true; input: TapholeInput } | { ok: false; errors: TapholeErrors } {
  const errors: TapholeErrors = {};
  const season = readSeason(values, defaults);
  if (season === undefined) errors.season = 'Enter the season as a year, like 2027';

  const height = readHeight(values);
  if ('empty' in height) errors.heightCm = 'Enter the height above the ground';
  else if ('error' in height) errors.heightCm = height.error;

  const azimuth = readAzimuth(values);
  if ('empty' in azimuth) errors.azimuthDeg = 'Choose the side you drilled';
  else if ('error' in azimuth) errors.azimuthDeg = azimuth.error;

  const depth = readDepth(values, defaults);
  if ('empty' in depth) errors.depthCm = 'Enter the depth drilled, bark included';
  else if ('error' in depth) errors.depthCm = depth.error;

  const candidate = {
    season,
    heightCm: 'cm' in height ? height.cm : undefined,
    azimuthDeg: 'cm' in azimuth ? azimuth.cm : undefined,
    depthCm: 'cm' in depth ? depth.cm : undefined,
    bitCm: values.bitCm === undefined ? defaults.bitCm : Number(values.bitCm),
    collection: values.collection ?? defaults.collection,
    drilledOn: values.drilledOn.trim() === '' ? undefined : values.drilledOn.trim(),
    stainHit: values.stainHit,
  };
  const result = tapholeInputSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '');
      if (isTapholeField(key)) errors[key] ??= rangeMessage(key, values.system);
    }
  }
  if (!result.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, input: result.data };
}

/** The same typed spot and depth, re-expressed when the tapper switches units mid-entry. */
export function inSystem(values: TapholeFormValues, system: UnitSystem): TapholeFormValues {
  if (values.system === system) return values;
  const height = readHeight(values);
  const blank = { feet: '', inches: '', cm: '' };
  const next: TapholeFormValues = {
    ...values,
    system,
    ...('cm' in height ? heightText(height.cm, system) : blank),
  };
  if (values.depth !== undefined) {
    const typed = parseDecimal(values.depth);
    next.depth =
      typed === undefined || Number.isNaN(typed)
        ? ''
        : depthText(values.system === 'imperial' ? inToCm(typed) : typed, system);
  }
  return next;
}

/** Height and side from an advised placement; the exact degrees only when off the eight points. */
export function withSpot(
  values: TapholeFormValues,
  spot: { azimuthDeg: number; heightCm: number },
): TapholeFormValues {
  const azimuth = normalizeAzimuth(spot.azimuthDeg);
  const side = nearestPoint(azimuth);
  const onPoint = Math.abs(pointDeg(side) - azimuth) < 0.5;
  return {
    ...values,
    ...heightText(spot.heightCm, values.system),
    side,
    exactDeg: onPoint ? '' : String(Math.round(azimuth) % 360),
  };
}
