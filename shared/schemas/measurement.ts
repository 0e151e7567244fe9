import { z } from 'zod';

export const DBH_MAX_CM = 400;

/** Crown dieback is rated in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992). */
export const crownDiebackClasses = Array.from({ length: 21 }, (_, i) => i * 5);

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date as YYYY-MM-DD')
  .refine(
    (s) =>
      !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) &&
      new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
    'Not a real date',
  );

export const measurementInputSchema = z.object({
  measuredOn: isoDate,
  dbhCm: z
    .number({ error: 'Enter the diameter' })
    .gt(0, 'Diameter must be more than 0')
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
