import { z } from 'zod';

/**
 * `?page=&pageSize=&sort=&q=` as every list route takes it. A list that keeps one order refuses
 * any `sort`; a list with orders names them (`sortedListQuery`): `field`, `-field` descending.
 */
export const listQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  sort: z.never({ error: 'This list keeps one order' }).optional(),
  q: z.string().trim().max(100).optional(),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

/** A list query whose `sort` is one of these, and nothing else. */
export const sortedListQuery = <const S extends readonly [string, ...string[]]>(sorts: S) =>
  listQuerySchema.extend({
    sort: z.enum(sorts, { error: `Sort by one of ${sorts.join(', ')}` }).optional(),
  });

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
