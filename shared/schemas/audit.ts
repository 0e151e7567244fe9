import { z } from 'zod';
import { listQuerySchema, type Page } from './list-query';

/** What an audit entry is about, as the trail names it. */
export const auditKinds = [
  'sugarbush',
  'tree',
  'measurement',
  'taphole',
  'note',
  'member',
  'invitation',
  'basemap',
  'photo',
  'weather-day',
  'sap-entry',
] as const;

export const auditQuerySchema = listQuerySchema.extend({
  /** Entries about one kind of thing (`auditKinds`, or any kind the trail holds). */
  kind: z
    .string()
    .regex(/^[a-z][a-z-]{0,23}$/, 'Name a kind such as tree or measurement')
    .optional(),
  /** Entries made by one person. */
  userId: z.coerce.number().int().positive().optional(),
});
export type AuditQuery = z.output<typeof auditQuerySchema>;

/** One entry: who did what to which thing, and when; `detail` as it was recorded. */
export interface AuditItem {
  id: number;
  /** ISO timestamp, UTC. */
  at: string;
  userId: number | null;
  userName: string | null;
  action: string;
  kind: string;
  entityId: number | null;
  /** The tree the entry is about, where it is about one (a tree, its measurement, a taphole). */
  tree: { id: number; tag: string } | null;
  detail: unknown;
}

export interface AuditPage extends Page<AuditItem> {
  /** Everyone with an entry in the stand's trail, for the filter. */
  people: { id: number; name: string }[];
}
