import { useSyncExternalStore } from 'react';

/**
 * A newer build of the app is installed and waits for the user: the shell offers to reload when
 * they are ready, so nobody loses what they are typing to an update.
 */
let reload: (() => void) | null = null;
const listeners = new Set<() => void>();

export const appUpdate = {
  ready(apply: () => void) {
    reload = apply;
    for (const l of listeners) l();
  },
  apply: () => reload?.(),
  waiting: () => reload !== null,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
};

export const useAppUpdateWaiting = (): boolean =>
  useSyncExternalStore(appUpdate.subscribe, appUpdate.waiting, appUpdate.waiting);
