import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ImportProgress } from '@shared/schemas/imports';
import { api } from '@/lib/api-client';
import { importKeys } from './import-keys';

/** How often a running import is asked how far it has come. */
export const PROGRESS_POLL_MS = 500;

export const getImportProgress = (sugarbushId: number, importId: string, signal?: AbortSignal) =>
  api.get<ImportProgress>(`/sugarbushes/${sugarbushId}/imports/${importId}/progress`, { signal });

export const importProgressQuery = (sugarbushId: number, importId: string) =>
  queryOptions({
    queryKey: importKeys.progress(sugarbushId, importId),
    queryFn: ({ signal }) => getImportProgress(sugarbushId, importId, signal),
    // Until the server has the request (or on another process behind the proxy) it says 404:
    // keep asking, and show what the browser knows meanwhile.
    retry: false,
    refetchInterval: PROGRESS_POLL_MS,
    refetchIntervalInBackground: true,
    gcTime: 0,
  });

/** The steps of the import with this id, asked for while `running`. */
export function useImportProgress(sugarbushId: number, importId: string | null, running: boolean) {
  return useQuery({
    ...importProgressQuery(sugarbushId, importId ?? ''),
    enabled: running && importId !== null,
  });
}
