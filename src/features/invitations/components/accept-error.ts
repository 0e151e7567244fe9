import { isApiError } from '@/lib/api-client';

/** What a failed join says when no field is to blame. */
export function acceptErrorMessage(error: unknown): string {
  if (isApiError(error)) {
    if (error.code === 'invitation-other-account')
      return "You're signed in with another account. Sign out, then open this link again.";
    if (error.code === 'already-member')
      return "You're on this sugarbush's team already. Open Clearwood's home page to reach it.";
    if (error.status === 429) return 'Too many attempts. Wait a few minutes, then try again.';
    if (error.status === 0) return error.message;
  }
  return "We couldn't add you to the sugarbush just now. Try again in a moment.";
}
