import { createStore, del, get, set, type UseStore } from 'idb-keyval';

/**
 * What this device keeps for the signed-in user in IndexedDB: the query cache and the field
 * entries waiting to be sent (`query-persistence.ts`), the entries the server refused
 * (`field-entries/refused-entries.ts`) and whose they are. Created on first use, so nothing
 * touches IndexedDB where it is not there (tests in jsdom).
 */
/** The IndexedDB database and object store the device's keys live in. */
export const DEVICE_DB = 'clearwood';
export const DEVICE_STORE = 'device';

let store: UseStore | null = null;
const deviceStore = (): UseStore | null => {
  if (typeof indexedDB === 'undefined') return null;
  store ??= createStore(DEVICE_DB, DEVICE_STORE);
  return store;
};

export async function readDevice<T>(key: string): Promise<T | undefined> {
  const s = deviceStore();
  return s ? get<T>(key, s) : undefined;
}

export async function writeDevice(key: string, value: unknown): Promise<void> {
  const s = deviceStore();
  if (s) await set(key, value, s);
}

export async function forgetDevice(key: string): Promise<void> {
  const s = deviceStore();
  if (s) await del(key, s);
}
