import { z } from 'zod';

/** `GET /api/sugarbushes/:id/advice-status?season=`: whether the stand's stored advice is current. */
export const adviceStatusQuerySchema = z.object({
  season: z.coerce.number().int().min(1990).max(2200).optional(),
});

export interface AdviceStatus {
  season: number;
  /** `updating`: the stand is being re-advised in the background, `done` of `total` trees so far. */
  state: 'current' | 'updating';
  done: number;
  total: number;
}
