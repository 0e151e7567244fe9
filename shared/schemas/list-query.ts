import { z } from 'zod';

/** `?page=&pageSize=&sort=&q=` as every list route takes it. `sort` is a field, `-field` descending. */
export const listQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
  sort: z
    .string()
    .regex(/^-?[a-zA-Z]+$/, 'Sort by a field name, with - for descending')
    .optional(),
  q: z.string().trim().max(100).optional(),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
