import { useSyncExternalStore } from 'react';
import { forgetDevice, readDevice, writeDevice } from '@/lib/device-store';
import type { FieldEntry } from './field-entry';

/** An entry the server would not store, with its reason, kept until its author decides. */
export interface RefusedEntry {
  entry: FieldEntry;
  code: string;
  message: string;
  fields?: Record<string, string>;
  refusedAt: string;
}

const KEY = 'refused-field-entries';
let entries: readonly RefusedEntry[] = [];
const listeners = new Set<() => void>();

function publish(next: readonly RefusedEntry[]) {
  entries = next;
  for (const l of listeners) l();
  void writeDevice(KEY, next);
}

/** Loads what an earlier visit kept (called once before the app renders). */
export async function loadRefusedEntries(): Promise<void> {
  const kept = await readDevice<RefusedEntry[]>(KEY);
  if (kept?.length) {
    entries = kept;
    for (const l of listeners) l();
  }
}

export const refusedEntries = {
  list: () => entries,
  add(refused: RefusedEntry) {
    publish([...entries.filter((r) => r.entry.clientId !== refused.entry.clientId), refused]);
  },
  remove(clientId: string) {
    publish(entries.filter((r) => r.entry.clientId !== clientId));
  },
  /** Everything refused, forgotten: on sign-out, or when another user signs in. */
  async clear() {
    entries = [];
    for (const l of listeners) l();
    await forgetDevice(KEY);
  },
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};

export const useRefusedEntries = (): readonly RefusedEntry[] =>
  useSyncExternalStore(refusedEntries.subscribe, refusedEntries.list, refusedEntries.list);
