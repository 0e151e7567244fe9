import { useState } from 'react';
import type { Invitation } from '@shared/schemas/invitation';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { TableSkeleton } from '@/components/ui/skeleton';
import { isApiError } from '@/lib/api-client';
import { roleLabels } from '@/lib/auth';
import { formatDate } from '@/lib/units';
import { useInvitations } from '../api/get-invitations';
import { useResendInvitation } from '../api/resend-invitation';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { messageFor } from '../lib/messages';

const DAY_MS = 86_400_000;

/** "Expires in 6 days (Mar 14, 2027)", "Expires today", or "Expired Mar 7, 2027". */
export function expiryText(invitation: Pick<Invitation, 'status' | 'expiresAt'>, now = new Date()) {
  const expires = new Date(invitation.expiresAt);
  const date = formatDate(invitation.expiresAt);
  if (invitation.status === 'expired' || expires.getTime() <= now.getTime())
    return `Expired ${date}`;
  const days = Math.floor((expires.getTime() - now.getTime()) / DAY_MS);
  if (days === 0) return `Expires today (${date})`;
  return `Expires in ${days} ${days === 1 ? 'day' : 'days'} (${date})`;
}

/** Invitations not yet taken up: each can be sent again with a fresh link, or withdrawn. */
export function InvitationList({ sugarbushId }: { sugarbushId: number }) {
  const [page, setPage] = useState(1);
  const invitations = useInvitations(sugarbushId, page);
  const resend = useResendInvitation(sugarbushId);
  const revoke = useRevokeInvitation(sugarbushId);
  const [message, setMessage] = useState<{ text: string; failed: boolean }>();

  if (invitations.isPending) return <TableSkeleton rows={2} label="Loading the invitations" />;
  if (invitations.isError)
    return (
      <ErrorState
        title="We couldn't load the invitations."
        error={invitations.error}
        onRetry={() => void invitations.refetch()}
      />
    );
  const list = invitations.data;
  const busy = resend.isPending || revoke.isPending;
  const failed = (error: unknown) =>
    setMessage({
      text:
        isApiError(error) && error.status === 404
          ? 'That invitation was already taken up or withdrawn.'
          : messageFor(error),
      failed: true,
    });

  return (
    <div>
      {message && (
        <p
          role={message.failed ? 'alert' : 'status'}
          className={message.failed ? 'mb-2 text-alert' : 'mb-2 text-moss'}
        >
          {message.text}
        </p>
      )}
      {list.total === 0 ? (
        <p className="text-bark">No invitations waiting. Invite someone above.</p>
      ) : (
        <ul aria-label="Invitations" className="divide-y divide-rule border-y border-rule">
          {list.items.map((inv) => (
            <li
              key={inv.id}
              aria-label={inv.email}
              className="flex flex-wrap items-center justify-between gap-3 py-3"
            >
              <div className="min-w-0">
                <p className="font-bold">
                  {inv.email} <span className="font-normal">· {roleLabels[inv.role]}</span>
                </p>
                <p
                  className={inv.status === 'expired' ? 'text-sm text-alert' : 'text-sm text-bark'}
                >
                  {expiryText(inv)}
                  {inv.invitedBy && ` · invited by ${inv.invitedBy.name}`}
                </p>
              </div>
              <div className="flex flex-wrap gap-2">
                <Button
                  disabled={busy}
                  aria-label={`Resend to ${inv.email}`}
                  onClick={() => {
                    setMessage(undefined);
                    resend.mutate(inv.id, {
                      onSuccess: (fresh) =>
                        setMessage({
                          text: `A new link went to ${fresh.email}; the earlier one no longer works.`,
                          failed: false,
                        }),
                      onError: failed,
                    });
                  }}
                >
                  Resend
                </Button>
                <Button
                  disabled={busy}
                  aria-label={`Revoke the invitation to ${inv.email}`}
                  onClick={() => {
                    setMessage(undefined);
                    revoke.mutate(inv.id, {
                      onSuccess: () =>
                        setMessage({
                          text: `The invitation to ${inv.email} is withdrawn.`,
                          failed: false,
                        }),
                      onError: failed,
                    });
                  }}
                >
                  Revoke
                </Button>
              </div>
            </li>
          ))}
        </ul>
      )}
      {list.total > list.pageSize && (
        <Pager label="Invitation pages" list={list} onPage={setPage} />
      )}
    </div>
  );
}
