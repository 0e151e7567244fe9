import { z } from 'zod';
import { collectionSchema } from './enums';

export const tapholeInputSchema = z.object({
  season: z.number().int().min(1900).max(2200),
  heightCm: z.number().min(0).max(400),
  azimuthDeg: z.number().min(0).lt(360),
  depthCm: z.number().gt(0).max(10),
  bitCm: z.number().gt(0).max(2),
  collection: collectionSchema,
  drilledOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/)
    .nullable()
    .optional(),
  stainHit: z.boolean().nullable().optional(),
  /**
   * An id made on the device that recorded the entry (a UUID). Sending the same entry again (a
   * retry after a lost answer, a queue replayed after a reload) stores it once.
   */
  clientId: z.string().uuid('A client id is a UUID').optional(),
});
export type TapholeInput = z.infer<typeof tapholeInputSchema>;

export interface Taphole extends Omit<TapholeInput, 'clientId'> {
  id: number;
  /** The id the recording device gave the entry, when it sent one. */
  clientId: string | null;
  treeId: number;
  recordedBy: number | null;
  createdAt: string;
}
