import { z } from 'zod';
import { recordedDaySchema } from './iso-date';
import { sortedListQuery } from './list-query';

/**
 * The DBH a reading may give: from 1 in (2.5 cm), below which a stem is no tree to record, to
 * 250 cm, beyond the largest sugar maples on record (common practice; from memory).
 */
export const DBH_MIN_CM = 2.5;
export const DBH_MAX_CM = 250;

/** Crown dieback is rated in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992). */
export const crownDiebackClasses = Array.from({ length: 21 }, (_, i) => i * 5);

export const measurementInputSchema = z.object({
  measuredOn: recordedDaySchema,
  dbhCm: z
    .number({ error: 'Enter the diameter' })
    .min(DBH_MIN_CM, `Diameter must be at least ${DBH_MIN_CM} cm`)
    .max(DBH_MAX_CM, `Diameter must be at most ${DBH_MAX_CM} cm`),
  crownDiebackPct: z
    .number()
    .min(0, 'Dieback is 0–100 %')
    .max(100, 'Dieback is 0–100 %')
    .multipleOf(5, 'Rate dieback in 5 % classes')
    .nullable()
    .optional(),
  note: z.string().trim().max(1000).nullable().optional(),
  /** When this row corrects an earlier one, that row's id. */
  correctsId: z.number().int().positive().nullable().optional(),
  /**
   * The forester confirms a DBH far off the tree's reading before it (more than about 2.5 cm in
   * a year, or a shrink beyond tape error). Without it such a reading is refused.
   */
  confirmedOutlier: z.boolean().optional(),
  /**
   * An id made on the device that recorded the entry (a UUID). Sending the same entry again (a
   * retry after a lost answer, a queue replayed after a reload) stores it once.
   */
  clientId: z.string().uuid('A client id is a UUID').optional(),
});
export type MeasurementInput = z.infer<typeof measurementInputSchema>;

/** A tree's readings, oldest first or (`-measuredOn`) newest first. */
export const measurementListQuerySchema = sortedListQuery(['measuredOn', '-measuredOn']);
export type MeasurementListQuery = z.output<typeof measurementListQuerySchema>;

export interface Measurement {
  id: number;
  treeId: number;
  measuredOn: string;
  season: number;
  dbhCm: number;
  crownDiebackPct: number | null;
  note: string | null;
  correctsId: number | null;
  /** The forester confirmed this DBH although it is far off the reading before it. */
  confirmedOutlier: boolean;
  /** True when a later row corrects this one. */
  superseded: boolean;
  recordedBy: number | null;
  /** The id the recording device gave the entry, when it sent one. */
  clientId: string | null;
  createdAt: string;
}
