import { isApiError } from '@/lib/api-client';

/** What failed, in words for the owner, when the answer names no field. */
export function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush cannot change this.';
  if (error.status === 404) return 'You are no longer a member of this sugarbush.';
  if (error.code === 'last-owner')
    return 'A sugarbush always keeps at least one owner. Make someone else an owner first.';
  if (error.code === 'already-member') return 'That person is already on the team.';
  return error.message;
}
