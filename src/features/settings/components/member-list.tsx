import { useState } from 'react';
import { roles, type Role } from '@shared/schemas/enums';
import type { Member } from '@shared/schemas/members';
import { Button } from '@/components/ui/button';
import { controlClass } from '@/components/ui/field';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Pager } from '@/components/ui/pager';
import { TableSkeleton } from '@/components/ui/skeleton';
import { roleLabels } from '@/lib/auth';
import { formatDate } from '@/lib/units';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useUpdateMemberRole } from '../api/update-member-role';
import { messageFor } from '../lib/messages';

/** A change waiting for the owner's second click. */
type Pending = { kind: 'role'; member: Member; role: Role } | { kind: 'remove'; member: Member };

function Confirm({
  pending,
  standName,
  isSelf,
  busy,
  onConfirm,
  onKeep,
}: {
  pending: Pending;
  standName: string;
  isSelf: boolean;
  busy: boolean;
  onConfirm: () => void;
  onKeep: () => void;
}) {
  const who = isSelf ? 'yourself' : pending.member.name;
  const question =
    pending.kind === 'remove'
      ? `Remove ${who} from ${standName}? ${isSelf ? 'You lose' : 'They lose'} access at once.`
      : `Make ${who} ${article(pending.role)} ${roleLabels[pending.role].toLowerCase()}?`;
  return (
    <div
      role="group"
      aria-label="Confirm the change"
      className="mt-2 rounded bg-frost/60 px-3 py-2"
    >
      <p>{question}</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="primary" onClick={onConfirm} disabled={busy} aria-busy={busy || undefined}>
          {pending.kind === 'remove' ? 'Remove' : 'Change the role'}
        </Button>
        <Button onClick={onKeep} disabled={busy}>
          Keep as is
        </Button>
      </div>
    </div>
  );
}

const article = (role: Role) => (role === 'owner' ? 'an' : 'a');

/**
 * The people on the stand and their roles. The owner changes a role or removes someone, each
 * with a second click; a change that would leave the stand without an owner is refused.
 */
export function MemberList({
  sugarbushId,
  standName,
  myUserId,
  canManage,
}: {
  sugarbushId: number;
  standName: string;
  myUserId: number | undefined;
  canManage: boolean;
}) {
  const [page, setPage] = useState(1);
  const members = useMembers(sugarbushId, page);
  const changeRole = useUpdateMemberRole(sugarbushId);
  const remove = useRemoveMember(sugarbushId);
  const [pending, setPending] = useState<Pending>();
  const [message, setMessage] = useState<{ userId: number; text: string; failed: boolean }>();

  if (members.isPending) return <TableSkeleton rows={3} label="Loading the team" />;
  if (members.isError)
    return (
      <ErrorState
        title="We couldn't load the team."
        error={members.error}
        onRetry={() => void members.refetch()}
      />
    );
  const list = members.data;
  if (list.total === 0) return <EmptyState title="No one on the team yet" />;

  const busy = changeRole.isPending || remove.isPending;
  const confirm = () => {
    if (!pending) return;
    const { member } = pending;
    const done = (text: string) => {
      setPending(undefined);
      setMessage({ userId: member.userId, text, failed: false });
    };
    const failed = (error: unknown) => {
      setPending(undefined);
      setMessage({ userId: member.userId, text: messageFor(error), failed: true });
    };
    if (pending.kind === 'remove') {
      remove.mutate(member.userId, {
        onSuccess: () => done(`${member.name} is no longer on the team.`),
        onError: failed,
      });
    } else {
      const role = pending.role;
      changeRole.mutate(
        { userId: member.userId, role },
        {
          onSuccess: (m) =>
            done(`${m.name} is now ${article(m.role)} ${roleLabels[m.role].toLowerCase()}.`),
          onError: failed,
        },
      );
    }
  };

  return (
    <div>
      {message && !list.items.some((m) => m.userId === message.userId) && !message.failed && (
        <p role="status" className="mb-2 text-moss">
          {message.text}
        </p>
      )}
      <ul aria-label="Team" className="divide-y divide-rule border-y border-rule">
        {list.items.map((m) => {
          const isSelf = m.userId === myUserId;
          const rowPending = pending?.member.userId === m.userId ? pending : undefined;
          const rowMessage = message?.userId === m.userId ? message : undefined;
          return (
            <li key={m.userId} aria-label={m.name} className="py-3">
              <div className="flex flex-wrap items-center justify-between gap-3">
                <div className="min-w-0">
                  <p className="font-bold">
                    {m.name}
                    {isSelf && <span className="font-normal text-bark"> (you)</span>}
                  </p>
                  <p className="text-sm text-bark">
                    {m.email} · since {formatDate(m.since)}
                  </p>
                </div>
                {canManage ? (
                  <div className="flex flex-wrap items-center gap-2">
                    <label className="sr-only" htmlFor={`role-${m.userId}`}>
                      Role of {m.name}
                    </label>
                    <select
                      id={`role-${m.userId}`}
                      value={rowPending?.kind === 'role' ? rowPending.role : m.role}
                      disabled={busy}
                      onChange={(e) => {
                        const role = roles.find((r) => r === e.target.value);
                        setMessage(undefined);
                        setPending(
                          role && role !== m.role ? { kind: 'role', member: m, role } : undefined,
                        );
                      }}
                      className={controlClass}
                    >
                      {roles.map((r) => (
                        <option key={r} value={r}>
                          {roleLabels[r]}
                        </option>
                      ))}
                    </select>
                    <Button
                      disabled={busy}
                      onClick={() => {
                        setMessage(undefined);
                        setPending({ kind: 'remove', member: m });
                      }}
                      aria-label={`Remove ${m.name}`}
                    >
                      Remove
                    </Button>
                  </div>
                ) : (
                  <p>{roleLabels[m.role]}</p>
                )}
              </div>
              {rowPending && (
                <Confirm
                  pending={rowPending}
                  standName={standName}
                  isSelf={isSelf}
                  busy={busy}
                  onConfirm={confirm}
                  onKeep={() => setPending(undefined)}
                />
              )}
              {rowMessage && (
                <p
                  role={rowMessage.failed ? 'alert' : 'status'}
                  className={rowMessage.failed ? 'mt-2 text-alert' : 'mt-2 text-moss'}
                >
                  {rowMessage.text}
                </p>
              )}
            </li>
          );
        })}
      </ul>
      {list.total > list.pageSize && <Pager label="Team pages" list={list} onPage={setPage} />}
    </div>
  );
}
