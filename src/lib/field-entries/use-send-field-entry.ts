import { useMutation } from '@tanstack/react-query';
import { fieldEntryKeys, type FieldEntry, type FieldEntryResult } from './field-entry';

/**
 * Send a reading or a drilled hole. The function is the one registered on the query client
 * (`registerFieldEntryDefaults`), so an entry waiting for the network sends the same way after a
 * reload.
 */
export function useSendFieldEntry() {
  return useMutation<FieldEntryResult, Error, FieldEntry>({ mutationKey: fieldEntryKeys.all });
}
