import { z } from 'zod';
import { validateBoundary, type Boundary } from '../geo/boundary';
import type { Role } from './enums';

/**
 * A GeoJSON Polygon or MultiPolygon, checked by `validateBoundary` (closed rings of at least four
 * positions, longitude/latitude ranges, no self-intersection); a failure names what is wrong.
 */
export const boundarySchema = z.unknown().transform((value, ctx): Boundary => {
  const check = validateBoundary(value);
  if (check.ok) return check.boundary;
  ctx.addIssue({ code: 'custom', message: check.message });
  return z.NEVER;
});
export type { Boundary };

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
