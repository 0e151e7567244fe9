import { randomBytes } from 'node:crypto';
import type { Request, Response } from 'express';

export const ANONYMOUS_COOKIE = 'clearwood.anon';

/** The visitor's cookie-only id before sign-in ('' when there is none yet). */
export const anonymousCsrfId = (req: Request): string =>
  (req.cookies?.[ANONYMOUS_COOKIE] as string | undefined) ?? '';

/**
 * Give a visitor who is not signed in a random id in a cookie (and on this request), so a CSRF
 * token can be bound to it without storing a session.
 */
export function ensureAnonymousId(req: Request, res: Response, secure: boolean): void {
  if (req.user || anonymousCsrfId(req)) return;
  const id = randomBytes(18).toString('base64url');
  res.cookie(ANONYMOUS_COOKIE, id, { httpOnly: true, sameSite: 'lax', secure, path: '/' });
  req.cookies = { ...(req.cookies ?? {}), [ANONYMOUS_COOKIE]: id };
}
