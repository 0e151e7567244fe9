import { z } from 'zod';
import type { Role } from './enums';

const position = z.tuple([z.number().min(-180).max(180), z.number().min(-90).max(90)]);
const ring = z.array(position).min(4, 'A ring needs at least four positions');
export const boundarySchema = z.union([
  z.object({ type: z.literal('Polygon'), coordinates: z.array(ring).min(1) }),
  z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(z.array(ring).min(1)).min(1) }),
]);
export type Boundary = z.infer<typeof boundarySchema>;

export const sugarbushInputSchema = z.object({
  name: z.string().trim().min(1, 'Name the sugarbush').max(120),
  boundary: boundarySchema.nullable().optional(),
  profile: z.string().min(1).max(40).default('conservative'),
  sunnyAzimuthDeg: z.number().min(0).lt(360).default(180),
});
export type SugarbushInput = z.input<typeof sugarbushInputSchema>;
export const sugarbushPatchSchema = z.object({
  name: sugarbushInputSchema.shape.name.optional(),
  boundary: boundarySchema.nullable().optional(),
  profile: z.string().min(1).max(40).optional(),
  sunnyAzimuthDeg: z.number().min(0).lt(360).optional(),
  /** A custom guideline set (validated by the advisor's `validateCustomProfile`). */
  customProfile: z.unknown().optional(),
});

export interface Sugarbush {
  id: number;
  name: string;
  boundary: Boundary | null;
  profile: string;
  customProfile: unknown | null;
  sunnyAzimuthDeg: number;
  role: Role;
  treeCount: number;
}
