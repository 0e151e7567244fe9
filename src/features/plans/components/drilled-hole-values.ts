import { z } from 'zod';
import { normalizeAzimuth, type Spot } from '@shared/rules/index';
import { collectionSchema, type Collection } from '@shared/schemas/enums';
import { tapholeInputSchema, type TapholeInput } from '@shared/schemas/taphole';
import { matchBit } from '@/lib/bit-sizes';
import { fromCm, parseDecimal, roundTo, toCm, type LengthUnit } from '@/lib/units';

/**
 * The drilled-hole form as typed. Field names follow the payload, so the server's field errors
 * land on the control they concern; lengths are text in `unit` (inches or centimetres).
 */
export interface DrilledHoleValues {
  season: string;
  heightCm: string;
  azimuthDeg: string;
  depthCm: string;
  /** The bit in cm, as the select holds it. */
  bitCm: string;
  collection: Collection;
}

export const drilledHoleFields = [
  'season',
  'heightCm',
  'azimuthDeg',
  'depthCm',
  'bitCm',
  'collection',
] as const satisfies readonly (keyof DrilledHoleValues)[];

/** The advice as the form starts from it: the spot to drill next, the drill, the collection. */
export interface DrilledHoleStart {
  season: number;
  spot: Spot | undefined;
  depthCm: number;
  bitCm: number;
  collection: Collection;
}

const lengthText = (cm: number, unit: LengthUnit, digits: number) =>
  String(roundTo(fromCm(cm, unit), digits));

/** The form filled in with the advised spot and drill, in the tapper's unit. */
export function drilledHoleDefaults(start: DrilledHoleStart, unit: LengthUnit): DrilledHoleValues {
  return {
    season: String(start.season),
    heightCm: start.spot ? lengthText(start.spot.heightCm, unit, unit === 'in' ? 0 : 1) : '',
    azimuthDeg: start.spot ? String(Math.round(normalizeAzimuth(start.spot.azimuthDeg)) % 360) : '',
    depthCm: lengthText(start.depthCm, unit, 2),
    bitCm: String(matchBit(start.bitCm) ?? start.bitCm),
    collection: start.collection,
  };
}

/** The spot typed so far, in cm and degrees; undefined until both are numbers. */
export function typedSpot(values: DrilledHoleValues, unit: LengthUnit): Spot | undefined {
  const height = parseDecimal(values.heightCm);
  const azimuth = parseDecimal(values.azimuthDeg);
  if (height === undefined || azimuth === undefined) return undefined;
  if (Number.isNaN(height) || Number.isNaN(azimuth)) return undefined;
  if (azimuth < 0 || azimuth >= 360 || height < 0) return undefined;
  return { heightCm: roundTo(toCm(height, unit), 2), azimuthDeg: azimuth };
}

const typedLength = (text: string, unit: LengthUnit) => {
  const value = parseDecimal(text);
  return value === undefined || Number.isNaN(value) ? undefined : roundTo(toCm(value, unit), 4);
};

/** What each field asks for, in the tapper's unit, when the shared schema refuses it. */
function fieldMessage(field: (typeof drilledHoleFields)[number], unit: LengthUnit): string {
  const { shape } = tapholeInputSchema;
  switch (field) {
    case 'season':
      return `Enter the season as a year from ${shape.season.minValue} to ${shape.season.maxValue}`;
    case 'heightCm':
      return unit === 'in'
        ? `Enter the height above the ground in inches, up to ${Math.floor(fromCm(shape.heightCm.maxValue ?? 400, 'in'))}`
        : `Enter the height above the ground in cm, up to ${shape.heightCm.maxValue}`;
    case 'azimuthDeg':
      return 'Enter the side in degrees: 0 is north, 90 east, up to 359';
    case 'depthCm':
      return unit === 'in'
        ? `Enter the depth in inches, bark included, up to ${roundTo(fromCm(shape.depthCm.maxValue ?? 10, 'in'), 1)}`
        : `Enter the depth in cm, bark included, up to ${shape.depthCm.maxValue}`;
    case 'bitCm':
      return 'Choose the bit you drilled with';
    case 'collection':
      return 'Choose how the sap is collected';
  }
}

/**
 * The form's schema: what was typed becomes the API's payload, checked by the very schema the
 * API uses; any refusal is worded for the field in the tapper's unit.
 */
export function drilledHoleSchema(unit: LengthUnit) {
  return z
    .object({
      season: z.string(),
      heightCm: z.string(),
      azimuthDeg: z.string(),
      depthCm: z.string(),
      bitCm: z.string(),
      collection: collectionSchema,
    })
    .transform((values, ctx): Omit<TapholeInput, 'clientId'> => {
      const azimuth = parseDecimal(values.azimuthDeg);
      const result = tapholeInputSchema.omit({ clientId: true }).safeParse({
        season: /^\s*\d{4}\s*$/.test(values.season) ? Number(values.season) : undefined,
        heightCm: typedLength(values.heightCm, unit),
        azimuthDeg: azimuth === undefined || Number.isNaN(azimuth) ? undefined : azimuth,
        depthCm: typedLength(values.depthCm, unit),
        bitCm: parseDecimal(values.bitCm),
        collection: values.collection,
      });
      if (result.success) return result.data;
      const named = new Set<string>();
      for (const issue of result.error.issues) {
        const field = String(issue.path[0] ?? '') as (typeof drilledHoleFields)[number];
        if (!drilledHoleFields.includes(field) || named.has(field)) continue;
        named.add(field);
        ctx.addIssue({ code: 'custom', path: [field], message: fieldMessage(field, unit) });
      }
      return z.NEVER;
    });
}
