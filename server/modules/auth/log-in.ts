import type { Request } from 'express';
import type { PublicUser } from '../../../shared/schemas/auth';

/** Start a signed-in session (passport regenerates the session id). */
export const logIn = (req: Request, user: PublicUser) =>
  new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
