import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Photo } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import { noteKeys } from './note-keys';

const formWith = (file: File) => {
  const form = new FormData();
  form.append('file', file);
  return form;
};

export const uploadNotePhoto = (noteId: number, file: File) =>
  api.postForm<Photo>(`/notes/${noteId}/photos`, formWith(file));

export const uploadTreePhoto = (treeId: number, file: File) =>
  api.postForm<Photo>(`/trees/${treeId}/photos`, formWith(file));

export function useUploadTreePhoto(treeId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadTreePhoto(treeId, file),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: noteKeys.treePhotos(treeId) }),
  });
}
