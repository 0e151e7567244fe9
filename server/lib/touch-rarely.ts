import type { Store } from 'express-session';

/**
 * With rolling sessions every answer would rewrite the session's expiry in the database, so every
 * request of a signed-in user would be a write (and wait for the database's one writer). Renew
 * the stored expiry at most once per `everyMs` for each session; the cookie still rolls on each
 * answer, and the stored expiry lags it by at most `everyMs`.
 */
export function touchRarely<S extends Store>(store: S, everyMs: number): S {
  const renewedAt = new Map<string, number>();
  const touch = store.touch?.bind(store);
  if (!touch) return store;
  store.touch = (sid, session, callback) => {
    const now = Date.now();
    if (now - (renewedAt.get(sid) ?? 0) < everyMs) return callback?.();
    if (renewedAt.size >= 50_000) renewedAt.clear();
    renewedAt.set(sid, now);
    touch(sid, session, callback);
  };
  return store;
}
