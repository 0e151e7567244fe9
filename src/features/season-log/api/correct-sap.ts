import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SapEntry, SapEntryInput } from '@shared/schemas/sap';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

/** A correction: the entry's new values; the server keeps the earlier ones in its record of changes. */
export const correctSap = (entryId: number, change: Partial<SapEntryInput>) =>
  api.patch<SapEntry>(`/sap/${entryId}`, change);

export function useCorrectSap(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ entryId, change }: { entryId: number; change: Partial<SapEntryInput> }) =>
      correctSap(entryId, change),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: seasonLogKeys.stand(sugarbushId) }),
  });
}
