import type { QueryClient } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import { api, isApiError } from '@/lib/api-client';
import { authKeys } from '@/lib/auth';
import { queryRoots } from '@/lib/query-roots';
import { treeDetailKeys } from '@/lib/tree-detail-keys';
import { treeListKeys } from '@/lib/tree-list-keys';
import { fieldEntryKeys, type FieldEntry, type FieldEntryResult } from './field-entry';
import { refusedEntries } from './refused-entries';

export function sendFieldEntry(entry: FieldEntry): Promise<FieldEntryResult> {
  const body = { ...entry.input, clientId: entry.clientId };
  switch (entry.kind) {
    case 'measurement':
      return api.post(`/trees/${entry.treeId}/measurements`, body);
    case 'taphole':
      return api.post(`/trees/${entry.treeId}/tapholes`, body);
    case 'sap':
      return api.post(`/sugarbushes/${entry.sugarbushId}/sap`, body);
    case 'weather':
      return api.post(`/sugarbushes/${entry.sugarbushId}/weather`, body);
  }
}

/**
 * What a stored entry moves. A reading or a hole: the tree's record and advice, the register, the
 * plan, the map, the round. A day's sap or weather: the season log (its totals, chart and days).
 */
export function refreshAfterFieldEntry(queryClient: QueryClient, entry: FieldEntry) {
  if (entry.kind === 'sap' || entry.kind === 'weather')
    return queryClient.invalidateQueries({ queryKey: queryRoots.seasonLog });
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: treeDetailKeys.tree(entry.treeId) }),
    queryClient.invalidateQueries({
      queryKey: entry.kind === 'measurement' ? queryRoots.measurements : queryRoots.tapholes,
    }),
    queryClient.invalidateQueries({ queryKey: treeListKeys.all() }),
    queryClient.invalidateQueries({ queryKey: queryRoots.plans }),
    queryClient.invalidateQueries({ queryKey: queryRoots.map }),
    queryClient.invalidateQueries({ queryKey: queryRoots.round }),
  ]);
}

/** The server answered and will answer the same again: a 4xx other than "signed out". */
export const isRefusal = (error: unknown): boolean =>
  isApiError(error) && error.status >= 400 && error.status < 500 && error.status !== 401;

/** An entry recorded by someone other than who is signed in now: never sent under this session. */
export class OtherAuthorError extends Error {
  constructor() {
    super('This entry was recorded by someone else on this device');
    this.name = 'OtherAuthorError';
  }
}

/** Who recorded an entry, kept in the mutation's `meta` (it is persisted with the entry). */
export interface FieldEntryMeta extends Record<string, unknown> {
  authorId?: number;
}

/** Every field entry is sent one after another, in the order recorded. */
export const fieldEntryScope = { id: 'field-entries' };

const MAX_RETRY_DELAY_MS = 60_000;

/**
 * Registered once on the app's query client, so a mutation restored after a reload knows how to
 * send itself (a restored mutation has its variables but not the component's function). Offline,
 * an entry waits (paused); a lost answer, a server error or an ended session is retried, the
 * client id making a second arrival harmless; a refusal moves the entry to the refused list with
 * the server's reason, where it stays until its author edits or discards it.
 */
export function registerFieldEntryDefaults(queryClient: QueryClient): void {
  queryClient.setMutationDefaults(fieldEntryKeys.all, {
    scope: fieldEntryScope,
    mutationFn: (entry: FieldEntry, context) => {
      const authorId = (context?.meta as FieldEntryMeta | undefined)?.authorId;
      const me = queryClient.getQueryData<MeResponse | null>(authKeys.me());
      if (authorId !== undefined && me && me.user.id !== authorId)
        return Promise.reject(new OtherAuthorError());
      return sendFieldEntry(entry);
    },
    retry: (_failures: number, error: unknown) =>
      !isRefusal(error) && !(error instanceof OtherAuthorError),
    retryDelay: (failures: number) => Math.min(1000 * 2 ** failures, MAX_RETRY_DELAY_MS),
    // Not awaited: the entry is on the server once it answers. Awaited, the refetches (which
    // wait for the network like any read) kept it counted as waiting to send, and in the
    // sign-out warning, when the device went offline just after an answer.
    onSuccess: (_result: unknown, entry: FieldEntry) => {
      void refreshAfterFieldEntry(queryClient, entry);
    },
    onError: (error: unknown, entry: FieldEntry) => {
      if (!isRefusal(error) || !isApiError(error)) return;
      refusedEntries.add({
        entry,
        code: error.code,
        message: error.message,
        ...(error.fields ? { fields: error.fields } : {}),
        refusedAt: new Date().toISOString(),
      });
    },
  });
}
