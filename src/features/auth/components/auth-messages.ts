import { isApiError } from '@/lib/api-client';

/** What a sign-in or account request that failed as a whole says, in plain words. */
export function accountErrorMessage(error: unknown, otherwise: string): string {
  if (isApiError(error)) {
    if (error.code === 'invalid-credentials')
      return "That e-mail and password don't match an account. Check both and try again.";
    if (error.code === 'too-many-attempts' || error.status === 429)
      return 'Too many attempts. Wait a few minutes, then try again.';
    if (error.status === 0) return error.message;
  }
  return otherwise;
}

/** The link's key is missing, used, expired or unknown: the server answers `token-invalid`. */
export const isDeadLink = (error: unknown) => isApiError(error) && error.code === 'token-invalid';
