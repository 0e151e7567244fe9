import { z } from 'zod';
import type { SapCaution } from '../rules/season-log';
import { collectionSchema } from './enums';
import { FIRST_RECORDED_DAY, isoDateSchema, isoDay } from './iso-date';
import { listQuerySchema } from './list-query';
import { seasonSchema } from './plan';

/**
 * A day's sap from one collection (a bucket route, a gravity or a vacuum tubing line) or, without
 * `collection`, from the whole stand. Volumes in litres, sugar in °Brix (≈ % sugar by weight).
 */
export const sapEntryInputSchema = z
  .object({
    collectedOn: isoDateSchema
      .refine((d) => d >= FIRST_RECORDED_DAY, 'Give a date from 1950 on')
      .refine((d) => d <= isoDay(new Date(), 1), 'Sap cannot be collected in the future'),
    volumeL: z
      .number({ error: 'Give the volume of sap' })
      .finite('Give the volume as a number')
      .positive('The volume must be more than 0')
      .max(10_000_000, 'More than 10,000,000 L (2,640,000 gal) in a day is not a reading'),
    sugarPct: z
      .number({ error: 'Give the sugar content in °Brix' })
      .finite('Give the sugar content as a number')
      .min(0.5, 'Maple sap is rarely below 0.5 °Brix: check the refractometer')
      .max(12, 'Maple sap is rarely above 12 °Brix: check the refractometer'),
    heldAtC: z
      .number()
      .finite('Give the temperature as a number')
      .min(-10, 'Sap held below −10 °C (14 °F) would be ice')
      .max(40, 'Sap held above 40 °C (104 °F) is not a reading')
      .nullable()
      .optional(),
    collection: collectionSchema.nullable().optional(),
    syrupMadeL: z
      .number()
      .finite('Give the syrup as a number')
      .min(0, 'Syrup made cannot be negative')
      .max(1_000_000, 'More than 1,000,000 L (264,000 gal) of syrup is not a reading')
      .nullable()
      .optional(),
    note: z.string().trim().max(2000, 'A note has at most 2,000 characters').nullable().optional(),
    /** The id the recording device gave the entry: a resend with it stores the entry once. */
    clientId: z.string().uuid('A client id is a UUID').optional(),
  })
  .strict();
export type SapEntryInput = z.infer<typeof sapEntryInputSchema>;

/** `PATCH /api/sap/:entryId`: a correction of any of the entry's fields; the earlier values stay in the audit trail. */
export const sapCorrectionSchema = sapEntryInputSchema
  .omit({ clientId: true })
  .partial()
  .refine((v) => Object.values(v).some((x) => x !== undefined), {
    message: 'Give at least one field to correct',
    path: ['_'],
  });
export type SapCorrection = z.infer<typeof sapCorrectionSchema>;

export const sapListQuerySchema = listQuerySchema.extend({
  season: seasonSchema.optional(),
  sort: z.enum(['collectedOn', '-collectedOn']).optional(),
  collection: z.enum(['bucket', 'gravity', 'vacuum', 'stand']).optional(),
});
export type SapListQuery = z.output<typeof sapListQuerySchema>;

export interface SapEntry {
  id: number;
  sugarbushId: number;
  season: number;
  collectedOn: string;
  volumeL: number;
  sugarPct: number;
  heldAtC: number | null;
  collection: z.infer<typeof collectionSchema> | null;
  syrupMadeL: number | null;
  note: string | null;
  /** Syrup this sap should make by the Rule of 86. */
  expectedSyrupL: number;
  /** By the rule revised for 66.0 °Brix syrup. */
  expectedSyrupLRevised: number;
  /** Keep-it-cold cautions for the temperature it was held at. */
  cautions: SapCaution[];
  /** Taps recorded this season on this collection (the whole stand without one). */
  taps: number;
  yieldPerTapL: number | null;
  recordedById: number | null;
  recordedByName: string | null;
  /** The id the recording device gave the entry; null for entries sent without one. */
  clientId: string | null;
  createdAt: string;
}

export interface SapSeasonTotals {
  volumeL: number;
  meanSugarPct: number | null;
  expectedSyrupL: number;
  expectedSyrupLRevised: number;
  syrupMadeL: number | null;
  /** Entries that give the syrup made, and what the Rule of 86 expects of their sap alone. */
  entriesWithSyrup: number;
  expectedSyrupLWhereMade: number | null;
  taps: number;
  yieldPerTapL: number | null;
  days: number;
}

/** `GET /api/sugarbushes/:id/sap?season=`: a page of entries and the season's totals. */
export interface SapList {
  items: SapEntry[];
  total: number;
  page: number;
  pageSize: number;
  season: number;
  totals: SapSeasonTotals;
}
