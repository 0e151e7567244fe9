import { z } from 'zod';
import { collectionSchema } from './enums';
import { recordedDaySchema } from './iso-date';
import { seasonNumberSchema } from './plan';

/**
 * What a recorded taphole may say. Heights from the ground up to 300 cm (the band is roughly
 * 2–5 ft, DOMAIN §3: common practice; a ladder reaches higher, nothing sensible goes past 3 m).
 * Depth, bark included, 1–8 cm: guidelines drill 1–2.5 in (DOMAIN §3: OMAFRA, Perkins, Chabot;
 * Quebec ≤ 6 cm), and a hole drilled too deep must still be recordable as drilled. Bits from
 * 3/16 in (health-spout bits) to 1/2 in (old spouts): from memory; today's are 19/64–7/16 in.
 */
export const TAPHOLE_LIMITS = {
  heightCm: { min: 0, max: 300 },
  depthCm: { min: 1, max: 8 },
  bitCm: { min: 0.45, max: 1.3 },
} as const;
const { heightCm, depthCm, bitCm } = TAPHOLE_LIMITS;

export const tapholeInputSchema = z.object({
  season: seasonNumberSchema,
  heightCm: z
    .number()
    .min(heightCm.min, 'A height is measured from the ground up')
    .max(heightCm.max, `A taphole sits at most ${heightCm.max} cm up`),
  azimuthDeg: z.number().min(0, 'Azimuth runs 0–359°').lt(360, 'Azimuth runs 0–359°'),
  depthCm: z
    .number()
    .min(depthCm.min, `A hole is ${depthCm.min}–${depthCm.max} cm deep, bark included`)
    .max(depthCm.max, `A hole is ${depthCm.min}–${depthCm.max} cm deep, bark included`),
  bitCm: z
    .number()
    .min(bitCm.min, `A bit is ${bitCm.min}–${bitCm.max} cm (3/16–1/2 in)`)
    .max(bitCm.max, `A bit is ${bitCm.min}–${bitCm.max} cm (3/16–1/2 in)`),
  collection: collectionSchema,
  drilledOn: recordedDaySchema.nullable().optional(),
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
