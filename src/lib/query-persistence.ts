import {
  dehydrate,
  hydrate,
  onlineManager,
  type DehydratedState,
  type Mutation,
  type Query,
  type QueryClient,
} from '@tanstack/react-query';
import { authKeys } from './auth';
import { forgetDevice, readDevice, writeDevice } from './device-store';
import { fieldEntryKeys } from './field-entries/field-entry';
import { loadRefusedEntries, refusedEntries } from './field-entries/refused-entries';
import { queryRoots } from './query-roots';

/** A restored cache older than this is not shown (the queue of field entries is always kept). */
export const CACHE_MAX_AGE_MS = 14 * 24 * 3600_000;

/**
 * The reads kept on the device for the woods: who is signed in, the stand, the measuring round,
 * each tree's record and advice, the season plan and the season log. The map's columns and the lists are not:
 * they are large and asked for again on the way out.
 */
const keptRoots = new Set<unknown>([
  authKeys.all[0],
  queryRoots.sugarbushes[0],
  queryRoots.round[0],
  queryRoots.trees[0],
  queryRoots.plans[0],
  // The season log is read at the sugarhouse and by the tanks, often out of coverage.
  queryRoots.seasonLog[0],
]);

/** The device key of the kept reads. */
export const CACHE_KEY = 'query-cache';
/** The device key of the field entries waiting to be sent. */
export const QUEUE_KEY = 'field-entry-queue';
const OWNER_KEY = 'owner';

interface StoredCache {
  build: string;
  savedAt: number;
  queries: DehydratedState['queries'];
}

const isFieldEntry = (m: Mutation) => m.options.mutationKey?.[0] === fieldEntryKeys.all[0];

const shouldDehydrateQuery = (q: Query) =>
  q.state.status === 'success' && keptRoots.has(q.queryKey[0]);

/** Every entry not on the server yet, sending or waiting, survives a reload. */
const shouldDehydrateMutation = (m: Mutation) => isFieldEntry(m) && m.state.status === 'pending';

/**
 * A small IndexedDB persister (idb-keyval) that keeps the queue apart from the cache: a new build
 * drops the cached reads (their shapes may have changed) but never an entry waiting to be sent.
 * Writes follow the query cache's changes, at most one every 200 ms, and every change of an entry
 * at once.
 */
function devicePersister(queryClient: QueryClient, build: string) {
  let timer: ReturnType<typeof setTimeout> | null = null;
  const write = async () => {
    timer = null;
    const state = dehydrate(queryClient, { shouldDehydrateQuery, shouldDehydrateMutation });
    const cache: StoredCache = { build, savedAt: Date.now(), queries: state.queries };
    await Promise.all([writeDevice(CACHE_KEY, cache), writeDevice(QUEUE_KEY, state.mutations)]);
  };
  return {
    schedule: () => {
      timer ??= setTimeout(() => void write().catch(() => undefined), 200);
    },
    /** An entry recorded, sent or refused is written at once: a reload may follow right away. */
    now: () => {
      if (timer) clearTimeout(timer);
      void write().catch((e) => console.warn('clearwood: could not keep the cache', e));
    },
    /**
     * What was kept, ready for `hydrate`. Entries come back paused, so `resumePausedMutations()`
     * sends each one — also one whose answer was lost to the reload, which the server then
     * recognises by its client id.
     */
    restore: async (): Promise<DehydratedState> => {
      const [cache, queue] = await Promise.all([
        readDevice<StoredCache>(CACHE_KEY),
        readDevice<DehydratedState['mutations']>(QUEUE_KEY),
      ]);
      const fresh = cache && cache.build === build && Date.now() - cache.savedAt < CACHE_MAX_AGE_MS;
      return {
        queries: fresh ? cache.queries : [],
        mutations: (queue ?? []).map((m) => ({ ...m, state: { ...m.state, isPaused: true } })),
      };
    },
    remove: async () => {
      if (timer) clearTimeout(timer);
      timer = null;
      await Promise.all([forgetDevice(CACHE_KEY), forgetDevice(QUEUE_KEY)]);
    },
  };
}

let persister: ReturnType<typeof devicePersister> | null = null;

/**
 * Restores what this device kept (before the router's first loader runs, so a page opened
 * offline finds the signed-in user and its data), keeps it up to date from then on, and resumes
 * the entries that were waiting.
 */
export async function restoreDeviceCache(queryClient: QueryClient): Promise<void> {
  if (typeof indexedDB === 'undefined') return;
  persister = devicePersister(queryClient, __APP_BUILD__);
  // Kept reads stay in memory as long as on the device, or they would drop out of it unseen.
  for (const root of keptRoots) queryClient.setQueryDefaults([root], { gcTime: CACHE_MAX_AGE_MS });
  try {
    const [state] = await Promise.all([persister.restore(), loadRefusedEntries()]);
    hydrate(queryClient, state);
  } catch {
    // A store that cannot be read (private mode, quota) leaves the app working online.
  }
  queryClient.getQueryCache().subscribe(persister.schedule);
  queryClient.getMutationCache().subscribe(persister.now);
  // TanStack Query takes the network as there until told otherwise: opened offline, the entries
  // wait (paused) for the "online" event instead of failing their way through retries.
  if (typeof navigator !== 'undefined' && navigator.onLine === false)
    onlineManager.setOnline(false);
  void queryClient.resumePausedMutations();
}

/**
 * The device's cache belongs to one user: when someone else signs in, everything kept for the
 * one before (reads, waiting and refused entries) is forgotten first.
 */
export async function claimDeviceCache(queryClient: QueryClient, userId: number): Promise<void> {
  const owner = await readDevice<number>(OWNER_KEY);
  if (owner === userId) return;
  if (owner !== undefined) await forgetUserData(queryClient, { keepMe: true });
  await writeDevice(OWNER_KEY, userId);
}

/** Signing out: nothing of this user stays on the device. */
export async function clearDeviceCache(queryClient: QueryClient): Promise<void> {
  await forgetUserData(queryClient, { keepMe: false });
  await forgetDevice(OWNER_KEY);
}

async function forgetUserData(queryClient: QueryClient, opts: { keepMe: boolean }) {
  const mutations = queryClient.getMutationCache();
  for (const m of mutations.findAll({ mutationKey: fieldEntryKeys.all })) mutations.remove(m);
  queryClient.removeQueries({
    predicate: (q) => !opts.keepMe || q.queryKey[0] !== authKeys.all[0],
  });
  await Promise.all([refusedEntries.clear(), persister?.remove()]);
}
