import { INVITATION_DAYS } from '@shared/schemas/invitation';
import { PublicPage } from '@/components/ui/public-page';
import { ActionLink, TextLink } from '@/components/ui/text-link';
import { paths } from '@/config/paths';

export const goneCodes = [
  'invitation-unknown',
  'invitation-used',
  'invitation-revoked',
  'invitation-expired',
] as const;
export type GoneCode = (typeof goneCodes)[number];

export const isGoneCode = (code: string): code is GoneCode =>
  (goneCodes as readonly string[]).includes(code);

const words: Record<GoneCode, { title: string; body: string }> = {
  'invitation-unknown': {
    title: "We don't know this invitation link",
    body: 'Check that you opened the whole link from the e-mail. If it still fails, ask the owner of the sugarbush to invite you again.',
  },
  'invitation-used': {
    title: 'This invitation has already been used',
    body: 'Each invitation works once. If you accepted it, sign in to reach the sugarbush.',
  },
  'invitation-revoked': {
    title: 'This invitation was withdrawn',
    body: 'The owner of the sugarbush took it back. Ask them for a new one if you should still join.',
  },
  'invitation-expired': {
    title: 'This invitation has expired',
    body: `Invitations last ${INVITATION_DAYS} days. Ask the owner of the sugarbush to send you a new one.`,
  },
};

/** A link that no longer leads anywhere: what happened to it, and where to go instead. */
export function InvitationGone({ code }: { code: GoneCode }) {
  const { title, body } = words[code];
  return (
    <PublicPage title={title}>
      <p>{body}</p>
      {code === 'invitation-used' ? (
        <ActionLink to={paths.signIn.href()}>Sign in</ActionLink>
      ) : (
        <TextLink to={paths.signIn.href()}>Go to sign in</TextLink>
      )}
    </PublicPage>
  );
}
