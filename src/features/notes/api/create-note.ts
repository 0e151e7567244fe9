import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Note, NoteInput } from '@shared/schemas/note';
import type { Photo } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import type { NoteOwner } from './note-keys';
import { refreshAfterNote } from './refresh-after-note';
import { uploadNotePhoto } from './upload-photo';

export interface CreateNoteInput extends NoteInput {
  /** A photo to add to the note once it is written. */
  photo?: File | null;
}

export const createNote = (owner: NoteOwner, input: NoteInput) =>
  api.post<Note>(
    'treeId' in owner ? `/trees/${owner.treeId}/notes` : `/sugarbushes/${owner.sugarbushId}/notes`,
    input,
  );

/**
 * Write a note, then add its photo. A photo the server refuses leaves the note written: the
 * answer says so (`photoError`) rather than failing the whole.
 */
export function useCreateNote(owner: NoteOwner) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ photo, ...input }: CreateNoteInput) => {
      const note = await createNote(owner, input);
      if (!photo) return { note, photo: null, photoError: null };
      try {
        const saved: Photo = await uploadNotePhoto(note.id, photo);
        return { note, photo: saved, photoError: null };
      } catch (error) {
        return { note, photo: null, photoError: error };
      }
    },
    onSuccess: ({ note }) => refreshAfterNote(queryClient, note.treeId),
  });
}
