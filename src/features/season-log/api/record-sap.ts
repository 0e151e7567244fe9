import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SapEntry, SapEntryInput } from '@shared/schemas/sap';
import { api } from '@/lib/api-client';
import { seasonLogKeys } from './season-log-keys';

export const recordSap = (sugarbushId: number, input: SapEntryInput) =>
  api.post<SapEntry>(`/sugarbushes/${sugarbushId}/sap`, input);

/** A day's sap from one collection, or the whole stand. */
export function useRecordSap(sugarbushId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SapEntryInput) => recordSap(sugarbushId, input),
    // Totals, the chart, the table of days and the entries all read the stand's sap.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: seasonLogKeys.stand(sugarbushId) }),
  });
}
