import { z } from 'zod';
import { noteCategorySchema } from './enums';

export const noteInputSchema = z.object({
  category: noteCategorySchema,
  body: z.string().trim().min(1, 'Write the note').max(5000),
  followUpOn: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/)
    .nullable()
    .optional(),
});
export type NoteInput = z.infer<typeof noteInputSchema>;

export interface Note extends NoteInput {
  id: number;
  treeId: number | null;
  sugarbushId: number;
  authorId: number | null;
  authorName: string | null;
  createdAt: string;
}
