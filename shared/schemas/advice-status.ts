import { z } from 'zod';
import { seasonSchema } from './plan';

/** `GET /api/sugarbushes/:id/advice-status?season=`: whether the stand's stored advice is current. */
export const adviceStatusQuerySchema = z.object({
  season: seasonSchema.optional(),
});

export interface AdviceStatus {
  season: number;
  /** `updating`: the stand is being re-advised in the background, `done` of `total` trees so far. */
  state: 'current' | 'updating';
  done: number;
  total: number;
}
