import { createHash, randomBytes } from 'node:crypto';

/** A fresh link token (192 random bits) and the hash that is all the database keeps of it. */
export function newSecretToken(): { token: string; hash: string } {
  const token = randomBytes(24).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
