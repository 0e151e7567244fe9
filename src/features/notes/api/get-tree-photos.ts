import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Photo } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import { noteKeys } from './note-keys';

export const getTreePhotos = (treeId: number, signal?: AbortSignal) =>
  api.get<Page<Photo>>(`/trees/${treeId}/photos`, { signal, query: { pageSize: 60 } });

export const treePhotosQueryOptions = (treeId: number) =>
  queryOptions({
    queryKey: noteKeys.treePhotos(treeId),
    queryFn: ({ signal }) => getTreePhotos(treeId, signal),
  });

/** Photos of the tree itself (a note's photos come with the note). */
export const useTreePhotos = (treeId: number) => useQuery(treePhotosQueryOptions(treeId));
