import { z } from 'zod';
import { isoDateSchema } from '@shared/schemas/iso-date';
import { noteInputSchema } from '@shared/schemas/note';

/** The note form: the shared schema, with an empty follow-up date meaning none. */
export const noteFormSchema = noteInputSchema.extend({
  followUpOn: z.union([z.literal(''), isoDateSchema]).transform((v) => (v === '' ? null : v)),
});
export type NoteFormValues = z.input<typeof noteFormSchema>;
export type NoteFormOutput = z.output<typeof noteFormSchema>;

export const noteFields = ['category', 'body', 'followUpOn'] as const;
