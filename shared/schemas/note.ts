import { z } from 'zod';
import { noteCategorySchema } from './enums';
import { plannedDaySchema } from './iso-date';
import { listQuerySchema } from './list-query';
import type { Photo } from './photo';

/** A follow-up counts as due this many days ahead of its date (and overdue after it). */
export const FOLLOW_UP_DUE_DAYS = 14;

export const noteInputSchema = z.object({
  category: noteCategorySchema,
  body: z.string().trim().min(1, 'Write the note').max(5000, 'A note has at most 5,000 characters'),
  followUpOn: plannedDaySchema.nullable().optional(),
});
export type NoteInput = z.infer<typeof noteInputSchema>;

/** `PATCH /api/notes/:noteId`: resolve or reopen, or move the follow-up date. */
export const noteChangeSchema = z
  .object({
    resolved: z.boolean().optional(),
    followUpOn: plannedDaySchema.nullable().optional(),
  })
  .strict()
  .refine((v) => v.resolved !== undefined || v.followUpOn !== undefined, {
    message: 'Say what changes: resolved, or the follow-up date',
    path: ['resolved'],
  });
export type NoteChange = z.infer<typeof noteChangeSchema>;

export const noteSorts = ['-created', 'created', 'followUp', '-followUp'] as const;
export type NoteSort = (typeof noteSorts)[number];

/**
 * Filters of a note list. `followUp`: `due` (open, its date within FOLLOW_UP_DUE_DAYS or past),
 * `overdue` (open, its date past), `scheduled` (any follow-up date). `scope` on a stand's list:
 * notes on the whole stand, or on its trees.
 */
export const noteListQuerySchema = listQuerySchema.extend({
  sort: z.enum(noteSorts).optional(),
  category: noteCategorySchema.optional(),
  status: z.enum(['open', 'resolved']).optional(),
  followUp: z.enum(['due', 'overdue', 'scheduled']).optional(),
  scope: z.enum(['stand', 'trees']).optional(),
});
export type NoteListQuery = z.output<typeof noteListQuerySchema>;
export type NoteFilters = Omit<NoteListQuery, 'page' | 'pageSize'>;

export interface Note extends NoteInput {
  id: number;
  sugarbushId: number;
  treeId: number | null;
  /** The tree's tag, for a note on a tree. */
  treeTag: string | null;
  authorId: number | null;
  authorName: string | null;
  followUpOn: string | null;
  createdAt: string;
  resolvedAt: string | null;
  resolvedById: number | null;
  resolvedByName: string | null;
  photos: Photo[];
}

/** An unresolved hazard note as a plan item and a tree's advice carry it, oldest first. */
export interface Hazard {
  noteId: number;
  body: string;
  createdAt: string;
}
