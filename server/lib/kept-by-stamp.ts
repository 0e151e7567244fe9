import type { Knex } from 'knex';

/**
 * Answers derived from a whole stand (a count, totals, an order) kept until the stand changes.
 * The stamp is the stand's `record_seq`, which every write to its trees, their advice or its
 * boundary bumps in the write's own transaction, so a second process on the same database sees
 * the change too. Bounded: the oldest answers go first.
 */
export function keptByStamp(db: Knex, capacity = 64) {
  const kept = new Map<string, Promise<unknown>>();
  return {
    async stamp(sugarbushId: number): Promise<string> {
      const row = await db('sugarbushes').where({ id: sugarbushId }).first('record_seq');
      return `${sugarbushId}@${row?.record_seq ?? 'none'}`;
    },
    keep<T>(key: string, work: () => Promise<T>): Promise<T> {
      let value = kept.get(key) as Promise<T> | undefined;
      if (!value) {
        value = work();
        kept.set(key, value);
        value.catch(() => kept.delete(key));
        while (kept.size > capacity) kept.delete(kept.keys().next().value!);
      }
      return value;
    },
  };
}
