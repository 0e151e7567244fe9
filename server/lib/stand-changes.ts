import type { Knex } from 'knex';

/**
 * A per-stand change counter, kept in memory per database. Every write that is audited bumps it,
 * so work derived from a stand's record can be shared only between requests that saw the same
 * record.
 */
const counters = new WeakMap<Knex, Map<number, number>>();

export function standChanged(db: Knex, sugarbushId: number): void {
  const map = counters.get(db) ?? new Map<number, number>();
  counters.set(db, map);
  map.set(sugarbushId, (map.get(sugarbushId) ?? 0) + 1);
}

export function standVersion(db: Knex, sugarbushId: number): number {
  return counters.get(db)?.get(sugarbushId) ?? 0;
}

const inFlight = new WeakMap<Knex, Map<string, Promise<unknown>>>();

/**
 * Run `work` once for requests that arrive while the same computation is under way on the same
 * version of the stand; nothing is kept once it settles.
 */
export function shared<T>(db: Knex, key: string, work: () => Promise<T>): Promise<T> {
  const map = inFlight.get(db) ?? new Map<string, Promise<unknown>>();
  inFlight.set(db, map);
  const running = map.get(key) as Promise<T> | undefined;
  if (running) return running;
  const promise = work().finally(() => map.delete(key));
  map.set(key, promise);
  return promise;
}
