import { onlineManager } from '@tanstack/react-query';
import { useState, useSyncExternalStore } from 'react';
import { Button } from '@/components/ui/button';
import { useAppUpdateWaiting, appUpdate } from '@/lib/app-update';
import { useRefusedEntries, useWaitingFieldEntries } from '@/lib/field-entries';
import { RefusedEntries } from './refused-entries';

const isOnline = () => onlineManager.isOnline();
const useOnline = () => useSyncExternalStore((l) => onlineManager.subscribe(l), isOnline, isOnline);

const entries = (n: number) => (n === 1 ? '1 entry' : `${n} entries`);

/**
 * What the device holds that the server has not: entries waiting to send, entries the server
 * refused (with their list), that the device is offline, and a newer build waiting for a reload.
 * Nothing shows when all is sent and the network is there.
 */
export function FieldEntryStatus() {
  const waiting = useWaitingFieldEntries();
  const refused = useRefusedEntries();
  const updateWaiting = useAppUpdateWaiting();
  const [open, setOpen] = useState(false);
  const online = useOnline();
  if (online && waiting === 0 && refused.length === 0 && !updateWaiting) return null;
  return (
    <div className="mb-4 flex flex-col gap-2">
      {!online && (
        <p className="rounded border-l-4 border-bark bg-frost/60 px-3 py-2">
          You&apos;re offline. What you record is kept on this device and sent when the network is
          back.
        </p>
      )}
      <p role="status" className="text-base">
        {waiting > 0 && (
          <span className="inline-block rounded bg-frost px-3 py-2 font-bold">
            {waiting} waiting to send
          </span>
        )}
      </p>
      {refused.length > 0 && (
        <div className="rounded border-l-4 border-alert bg-alert/5 px-3 py-2">
          <div className="flex flex-wrap items-center gap-3">
            <p className="font-bold">{entries(refused.length)} not accepted</p>
            <Button field aria-expanded={open} onClick={() => setOpen((o) => !o)}>
              {open ? 'Hide' : 'Review'}
            </Button>
          </div>
          {open && <RefusedEntries entries={refused} />}
        </div>
      )}
      {updateWaiting && (
        <div className="flex flex-wrap items-center gap-3 rounded bg-frost px-3 py-2">
          <p>A new version of Clearwood is ready.</p>
          <Button field onClick={appUpdate.apply}>
            Reload now
          </Button>
        </div>
      )}
    </div>
  );
}
