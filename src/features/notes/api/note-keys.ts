import type { AttentionQuery } from '@shared/schemas/attention';
import type { NoteListQuery } from '@shared/schemas/note';
import { queryRoots } from '@/lib/query-roots';

export type NoteListFilters = Omit<NoteListQuery, 'page' | 'pageSize'> & {
  page: number;
  pageSize: number;
};
export type AttentionFilters = Omit<AttentionQuery, 'page' | 'pageSize' | 'season'> & {
  season: number;
  page: number;
  pageSize: number;
};

/** Whose notes a list holds: one tree's, or a whole stand's. */
export type NoteOwner = { treeId: number } | { sugarbushId: number };

export const noteKeys = {
  all: () => queryRoots.notes,
  lists: () => [...noteKeys.all(), 'list'] as const,
  list: (owner: NoteOwner, filters: NoteListFilters) =>
    [...noteKeys.lists(), owner, filters] as const,
  attention: () => [...noteKeys.all(), 'attention'] as const,
  attentionPage: (sugarbushId: number, filters: AttentionFilters) =>
    [...noteKeys.attention(), sugarbushId, filters] as const,
  treePhotos: (treeId: number) => [...noteKeys.all(), 'tree-photos', treeId] as const,
};
