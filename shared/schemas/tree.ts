import { z } from 'zod';
import { speciesSchema, treeStatusSchema } from './enums';

export const treeInputSchema = z.object({
  tag: z
    .string()
    .trim()
    .min(1, 'Give the tree its tag number')
    .max(40, 'A tag has at most 40 characters'),
  species: speciesSchema,
  lat: z.number().min(-90).max(90).nullable().optional(),
  lng: z.number().min(-180).max(180).nullable().optional(),
  status: treeStatusSchema.default('active'),
});
export type TreeInput = z.input<typeof treeInputSchema>;

export const treePatchSchema = z.object({
  tag: treeInputSchema.shape.tag.optional(),
  species: speciesSchema.optional(),
  lat: z.number().min(-90).max(90).nullable().optional(),
  lng: z.number().min(-180).max(180).nullable().optional(),
  status: treeStatusSchema.optional(),
});
export type TreePatch = z.infer<typeof treePatchSchema>;

/** A tree as the API returns it, with its latest figures for the register. */
export interface Tree {
  id: number;
  sugarbushId: number;
  tag: string;
  species: z.infer<typeof speciesSchema>;
  lat: number | null;
  lng: number | null;
  status: z.infer<typeof treeStatusSchema>;
  latestDbhCm: number | null;
  latestMeasuredOn: string | null;
  latestCrownDiebackPct: number | null;
}

export const treeSortFields = ['tag', 'dbh', 'status', 'species'] as const;
