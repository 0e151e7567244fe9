import { useIsMutating, useMutation } from '@tanstack/react-query';
import { useMe } from '@/lib/auth';
import { fieldEntryKeys, type FieldEntry, type FieldEntryResult } from './field-entry';
import type { FieldEntryMeta } from './send-field-entry';

/**
 * Send a reading or a drilled hole. The function is the one registered on the query client
 * (`registerFieldEntryDefaults`), so an entry waiting for the network sends the same way after a
 * reload. The entry remembers who recorded it.
 */
export function useSendFieldEntry() {
  const { data: me } = useMe();
  const meta: FieldEntryMeta = me ? { authorId: me.user.id } : {};
  return useMutation<FieldEntryResult, Error, FieldEntry>({
    mutationKey: fieldEntryKeys.all,
    meta,
  });
}

/** How many entries recorded on this device are not on the server yet (waiting or sending). */
export const useWaitingFieldEntries = (): number =>
  useIsMutating({ mutationKey: fieldEntryKeys.all });
