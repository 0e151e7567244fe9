import { AppError } from '../../errors';
import type { InvitationRow } from './invitations.repository';

/** Why a link no longer works, each with its own status and words; nothing else explains it. */
export function assertInvitationUsable(row: InvitationRow | undefined): InvitationRow {
  if (!row)
    throw new AppError(
      404,
      'invitation-unknown',
      'This invitation link is not known: check the address',
    );
  if (row.accepted_at)
    throw new AppError(409, 'invitation-used', 'This invitation has been used already: sign in');
  if (row.revoked_at)
    throw new AppError(410, 'invitation-revoked', 'This invitation was withdrawn by the owner');
  if (new Date(row.expires_at).getTime() < Date.now())
    throw new AppError(
      410,
      'invitation-expired',
      'This invitation has expired: ask the owner to send a new one',
    );
  return row;
}
