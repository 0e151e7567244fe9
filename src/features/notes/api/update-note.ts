import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Note, NoteChange } from '@shared/schemas/note';
import { api } from '@/lib/api-client';
import { refreshAfterNote } from './refresh-after-note';

export const updateNote = (noteId: number, change: NoteChange) =>
  api.patch<Note>(`/notes/${noteId}`, change);

/** Resolve or reopen a note (or move its follow-up). */
export function useUpdateNote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ noteId, change }: { noteId: number; change: NoteChange }) =>
      updateNote(noteId, change),
    onSuccess: (note) => refreshAfterNote(queryClient, note.treeId),
  });
}
