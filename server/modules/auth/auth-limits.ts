import { createHash } from 'node:crypto';
import type { Request } from 'express';
import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import type { Knex } from 'knex';
import type { Config } from '../../config';
import { AppError } from '../../errors';
import { DatabaseRateLimitStore } from './rate-limit-store';

const WINDOW_MS = 15 * 60_000;

/** Longest address an account may have (`emailSchema`); anything longer names no account. */
const MAX_EMAIL = 254;

/**
 * The account an attempt names, as the sign-in compares it. The count runs before the body is
 * checked, so a name no address could be (too long, not text) is counted by its digest: the key
 * stays short enough for the `rate_limits` column whatever was sent.
 */
const accountKey = (req: Request) => {
  const raw = (req.body as { email?: unknown } | undefined)?.email ?? '';
  const email = typeof raw === 'string' ? raw.trim().toLowerCase() : null;
  if (email !== null && email.length <= MAX_EMAIL) return `account:${email}`;
  const text = typeof raw === 'string' ? raw : JSON.stringify(raw);
  return `account-digest:${createHash('sha256')
    .update(text ?? '')
    .digest('hex')}`;
};

/** The client's address: the socket's, or a configured proxy's `X-Forwarded-For` (TRUST_PROXY). */
const addressKey = (req: Request) => `address:${ipKeyGenerator(req.ip ?? '')}`;

function limiter(
  config: Config,
  store: DatabaseRateLimitStore,
  keyGenerator: Options['keyGenerator'],
  extra: Partial<Options>,
) {
  return rateLimit({
    store,
    windowMs: WINDOW_MS,
    limit: config.LOGIN_RATE_LIMIT,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator,
    // The header is ignored unless a proxy is trusted; no need to warn about it in the log.
    validate: { xForwardedForHeader: false },
    handler: (_req, _res, next) =>
      next(new AppError(429, 'too-many-attempts', 'Too many attempts: wait a few minutes')),
    ...extra,
  });
}

/**
 * Throttles for the account routes, built per app: sign-in failures count per address and per
 * account (so neither many accounts from one place nor one account from many places gets far);
 * sign-up and reset requests count per address, reset requests also per account. The counts live
 * in the database, shared by every app process on it.
 */
export function authLimits(config: Config, db: Knex) {
  const failures = { skipSuccessfulRequests: true };
  const store = (name: string) => new DatabaseRateLimitStore(db, `${name}:`);
  return {
    signIn: [
      limiter(config, store('sign-in'), addressKey, failures),
      limiter(config, store('sign-in'), accountKey, failures),
    ],
    signUp: [limiter(config, store('sign-up'), addressKey, {})],
    reset: [
      limiter(config, store('reset'), addressKey, {}),
      limiter(config, store('reset'), accountKey, {}),
    ],
  };
}
