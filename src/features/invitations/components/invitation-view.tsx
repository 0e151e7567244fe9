import type { AcceptInvitationAnswer, InvitationPreview } from '@shared/schemas/invitation';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { PublicPage } from '@/components/ui/public-page';
import { ActionLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { roleLabels } from '@/lib/auth';
import { formatDate } from '@/lib/units';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';
import { acceptErrorMessage } from './accept-error';
import { InvitationGone, isGoneCode } from './invitation-gone';
import { JoinWithNewAccount } from './join-with-new-account';
import { RoleSummary, withArticle } from './role-summary';

interface Props {
  token: string;
  onJoined: (answer: AcceptInvitationAnswer) => void;
  /** Ends the session here; the page then offers what fits someone signed out. */
  onSignOut: () => void;
  signingOut: boolean;
}

/** An invitation link: what it offers, and the one way to take it up that fits who is here. */
export function InvitationView({ token, onJoined, onSignOut, signingOut }: Props) {
  const invitation = useInvitation(token);

  if (invitation.isError) {
    const { error } = invitation;
    if (isApiError(error) && isGoneCode(error.code)) return <InvitationGone code={error.code} />;
    return (
      <PublicPage title="Your invitation">
        <ErrorState
          title="We couldn't open this invitation."
          error={error}
          onRetry={() => void invitation.refetch()}
        />
      </PublicPage>
    );
  }
  if (invitation.isPending) {
    return (
      <PublicPage title="Your invitation">
        <p role="status" className="text-bark">
          Opening your invitation…
        </p>
      </PublicPage>
    );
  }

  const preview = invitation.data;
  const signedIn = preview.signedInEmail;
  const isInvitee = signedIn !== null && signedIn.toLowerCase() === preview.email.toLowerCase();
  return (
    <PublicPage
      wide
      title={`Join ${preview.sugarbushName}`}
      lead={`${preview.invitedByName ?? 'The owner'} invited you to work in ${preview.sugarbushName} as ${withArticle(preview.role)}.`}
    >
      <InvitationDetails preview={preview} />
      <RoleSummary role={preview.role} />
      {isInvitee ? (
        <JoinButton token={token} name={preview.sugarbushName} onJoined={onJoined} />
      ) : signedIn !== null ? (
        <div className="flex flex-col gap-3 rounded border border-rule px-4 py-4">
          <p>
            You're signed in as {signedIn}, but this invitation is for {preview.email}. Sign out,
            and this page lets you join with the invited address.
          </p>
          <Button variant="primary" className="w-full" onClick={onSignOut} disabled={signingOut}>
            Sign out
          </Button>
        </div>
      ) : preview.accountExists ? (
        <div className="flex flex-col gap-3">
          <p>You already have an account with {preview.email}. Sign in, and you come back here.</p>
          <ActionLink to={paths.signIn.href(paths.invitation.href(token))}>
            Sign in to join
          </ActionLink>
        </div>
      ) : (
        <JoinWithNewAccount token={token} email={preview.email} onJoined={onJoined} />
      )}
    </PublicPage>
  );
}

function InvitationDetails({ preview }: { preview: InvitationPreview }) {
  const rows: [string, string][] = [
    ['Sugarbush', preview.sugarbushName],
    ['Your role', roleLabels[preview.role]],
    ['Invited by', preview.invitedByName ?? 'The owner'],
    ['For', preview.email],
    ['Open until', formatDate(preview.expiresAt)],
  ];
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 border-y border-rule py-3">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-bark">{term}</dt>
          <dd className="break-words">{value}</dd>
        </div>
      ))}
    </dl>
  );
}

function JoinButton({
  token,
  name,
  onJoined,
}: {
  token: string;
  name: string;
  onJoined: (answer: AcceptInvitationAnswer) => void;
}) {
  const accept = useAcceptInvitation(token);
  return (
    <div className="flex flex-col gap-3">
      {accept.isError && (
        <p role="alert" className="text-alert">
          {acceptErrorMessage(accept.error)}
        </p>
      )}
      <Button
        variant="primary"
        className="w-full"
        disabled={accept.isPending}
        aria-busy={accept.isPending || undefined}
        onClick={() => accept.mutate({}, { onSuccess: onJoined })}
      >
        Join {name}
      </Button>
    </div>
  );
}
