import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '@shared/schemas/list-query';
import type { Note } from '@shared/schemas/note';
import { api } from '@/lib/api-client';
import { noteKeys, type NoteListFilters, type NoteOwner } from './note-keys';

export const NOTE_PAGE_SIZE = 20;

const pathOf = (owner: NoteOwner) =>
  'treeId' in owner ? `/trees/${owner.treeId}/notes` : `/sugarbushes/${owner.sugarbushId}/notes`;

export const getNotes = (owner: NoteOwner, filters: NoteListFilters, signal?: AbortSignal) =>
  api.get<Page<Note>>(pathOf(owner), { signal, query: { ...filters } });

export const notesQueryOptions = (owner: NoteOwner, filters: NoteListFilters) =>
  queryOptions({
    queryKey: noteKeys.list(owner, filters),
    queryFn: ({ signal }) => getNotes(owner, filters, signal),
    placeholderData: keepPreviousData,
  });

export const useNotes = (owner: NoteOwner, filters: NoteListFilters) =>
  useQuery(notesQueryOptions(owner, filters));
