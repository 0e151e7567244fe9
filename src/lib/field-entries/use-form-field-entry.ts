import { useEffect, useEffectEvent, useRef } from 'react';
import type { FieldEntry, FieldEntryResult } from './field-entry';
import { refusedEntries } from './refused-entries';
import { isRefusal } from './send-field-entry';
import { useSendFieldEntry } from './use-send-field-entry';

export interface FormSendCallbacks<R> {
  /** The server stored it; `late` when the form had already handed it over and moved on. */
  onStored: (result: R, late: boolean) => void;
  /** The server refused it while the form still held its values. */
  onRefused: (error: unknown) => void;
}

/**
 * A form's entry sent through the device's queue. While the first answer is awaited the form
 * shows it saving, as for any save. Once the entry has to wait (offline, or a try that failed and
 * will be tried again), the form hands it over: `onWait` runs once for it (clear the form, say
 * that it waits), and a refusal from then on goes to the refused list, not to a form that holds
 * other values by now. A refusal while the form still holds the entry is the form's to show, with
 * its fields, so it is not kept in the refused list as well.
 */
export function useFormFieldEntry<R extends FieldEntryResult>(onWait: (entry: FieldEntry) => void) {
  const send = useSendFieldEntry();
  const handedOver = useRef(new Set<string>());
  const entry = send.variables;
  const waits = send.isPending && (send.isPaused || send.failureCount > 0);
  const handOver = useEffectEvent((e: FieldEntry) => onWait(e));
  useEffect(() => {
    if (!waits || !entry || handedOver.current.has(entry.clientId)) return;
    handedOver.current.add(entry.clientId);
    handOver(entry);
    // An effect event is never a dependency (this linter's version does not know the hook yet).
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [waits, entry]);

  return {
    /** Saving and not yet waiting: the form's button shows it busy. */
    saving: send.isPending && !waits,
    send(next: FieldEntry, callbacks: FormSendCallbacks<R>) {
      send.mutate(next, {
        onSuccess: (result) =>
          callbacks.onStored(result as R, handedOver.current.has(next.clientId)),
        onError: (error) => {
          if (handedOver.current.has(next.clientId)) return;
          if (isRefusal(error)) refusedEntries.remove(next.clientId);
          callbacks.onRefused(error);
        },
      });
    },
  };
}
