import type Database from 'better-sqlite3';
import type { Knex } from 'knex';

export interface CapturedQuery {
  sql: string;
  bindings: readonly unknown[];
}

/** Every statement the app sends through this Knex instance while `work` runs. */
export async function queriesDuring(db: Knex, work: () => Promise<unknown>) {
  const seen: CapturedQuery[] = [];
  const listener = (q: { sql: string; bindings?: readonly unknown[] }) =>
    seen.push({ sql: q.sql, bindings: q.bindings ?? [] });
  db.on('query', listener);
  try {
    await work();
  } finally {
    db.removeListener('query', listener);
  }
  return seen.filter((q) => !/^\s*(pragma|begin|commit|rollback|savepoint|release)\b/i.test(q.sql));
}

export interface PlanStep {
  detail: string;
}

export async function explain(db: Knex, q: CapturedQuery): Promise<string[]> {
  const rows: PlanStep[] = await db.raw(
    `explain query plan ${q.sql}`,
    q.bindings as Knex.RawBinding[],
  );
  return rows.map((r) => r.detail);
}

export function explainRaw(db: Database.Database, sql: string, params: unknown[]): string[] {
  return (db.prepare(`explain query plan ${sql}`).all(...params) as PlanStep[]).map(
    (r) => r.detail,
  );
}

/** Alias → table, from `from x as y` / `join x y` in the statement. */
function aliases(sql: string): Map<string, string> {
  const map = new Map<string, string>();
  const re = /\b(?:from|join|update|into)\s+[`"]?(\w+)[`"]?(?:\s+(?:as\s+)?[`"]?(\w+)[`"]?)?/gi;
  for (const [, table, alias] of sql.matchAll(re)) {
    map.set(table, table);
    if (alias && !/^(where|on|set|left|inner|join|order|group|limit|values)$/i.test(alias))
      map.set(alias, table);
  }
  return map;
}

/**
 * The steps of a plan that read a whole table of the app's own (`SCAN t`, `SCAN t USING INDEX`
 * walks every row) or make SQLite build an index of its own for want of one. A scan of a
 * subquery's or a CTE's result, or of a statement's own VALUES list, is not one: what a subquery
 * read is judged in its own steps.
 */
export function offIndexSteps(sql: string, plan: readonly string[], ctes: readonly string[] = []) {
  const tables = aliases(sql);
  return plan.filter((step) => {
    if (/AUTOMATIC/.test(step)) return true;
    if (/^SCAN (\d+-ROW VALUES CLAUSE|CONSTANT ROW)/.test(step)) return false;
    const scan = /^SCAN (\w+)/.exec(step);
    if (!scan) return false;
    const table = tables.get(scan[1]) ?? scan[1];
    return !ctes.includes(table) && !ctes.includes(scan[1]);
  });
}

/** Names a `with x as (…)` statement defines. */
export const cteNames = (sql: string) =>
  [...sql.matchAll(/(?:\bwith|,)\s+[`"]?(\w+)[`"]?\s+as\s*\(/gi)].map((m) => m[1]);
