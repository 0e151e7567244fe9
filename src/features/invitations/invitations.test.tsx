import { screen, waitFor } from '@testing-library/react';
import type { MeResponse } from '@shared/schemas/auth';
import type { AcceptInvitationAnswer, InvitationPreview } from '@shared/schemas/invitation';
import { InvitationRoute } from '@/app/routes/invitation';
import { authKeys } from '@/lib/auth';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const TOKEN = 'invite-token-0123456789';
const PREVIEW = `GET /api/invitations/${TOKEN}`;
const ACCEPT = `POST /api/invitations/${TOKEN}/accept`;

const preview = (overrides: Partial<InvitationPreview> = {}): InvitationPreview => ({
  sugarbushName: 'Hollow Creek',
  role: 'tapper',
  email: 'robin@example.test',
  invitedByName: 'Avery Lindqvist',
  expiresAt: '2027-02-09T15:00:00.000Z',
  accountExists: false,
  signedInEmail: null,
  ...overrides,
});

const joined = (me: MeResponse = meAs('tapper')): AcceptInvitationAnswer => ({
  sugarbushId: 3,
  role: 'tapper',
  me,
});

const gone = (status: number, code: string): Handler =>
  json(status, { error: { code, message: 'That invitation cannot be used' } });

function openInvitation(routes: Record<string, unknown>) {
  const api = mockApi(routes);
  const view = renderPage({
    path: '/invitations/:token',
    url: `/invitations/${TOKEN}`,
    element: <InvitationRoute />,
  });
  return { api, ...view };
}

describe('an invitation link', () => {
  it('shows the stand, the role and what it allows, who invited, for whom, and until when', async () => {
    openInvitation({ [PREVIEW]: preview() });
    expect(await screen.findByRole('heading', { name: 'Join Hollow Creek' })).toBeInTheDocument();
    expect(
      screen.getByText('Avery Lindqvist invited you to work in Hollow Creek as a tapper.'),
    ).toBeInTheDocument();
    const rows = screen
      .getAllByRole('term')
      .map((term) => `${term.textContent}: ${term.nextElementSibling?.textContent}`);
    expect(rows).toEqual([
      'Sugarbush: Hollow Creek',
      'Your role: Tapper',
      'Invited by: Avery Lindqvist',
      'For: robin@example.test',
      'Open until: Feb 9, 2027',
    ]);
    expect(screen.getByText('Record tapholes')).toBeInTheDocument();
    expect(screen.queryByText('Record DBH and crown ratings')).not.toBeInTheDocument();
  });

  it('when the invited person is signed in, then Join adds them with an empty request and opens the stand', async () => {
    const { api, router, user, queryClient } = openInvitation({
      [PREVIEW]: preview({ accountExists: true, signedInEmail: 'Robin@Example.test' }),
      [ACCEPT]: joined(),
    });
    await user.click(await screen.findByRole('button', { name: 'Join Hollow Creek' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/3/trees'));
    expect(api.to(ACCEPT)[0].body).toEqual({});
    expect(queryClient.getQueryData(authKeys.me())).toEqual(meAs('tapper'));
  });

  it('when someone else is signed in, then it says so, and after signing out it offers the invited address a way in', async () => {
    let signedOut = false;
    const { api, user } = openInvitation({
      [PREVIEW]: () => ({
        status: 200,
        body: preview({
          accountExists: true,
          signedInEmail: signedOut ? null : 'outsider@elsewhere.example',
        }),
      }),
      'POST /api/auth/logout': () => {
        signedOut = true;
        return { status: 204 };
      },
    });
    expect(
      await screen.findByText(/You're signed in as outsider@elsewhere.example/),
    ).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Join Hollow Creek' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('link', { name: 'Sign in to join' })).toBeInTheDocument();
    expect(api.to('POST /api/auth/logout')).toHaveLength(1);
    expect(api.to(ACCEPT)).toHaveLength(0);
  });

  it('when nobody is signed in and the account exists, then Sign in to join leads to sign-in and back here', async () => {
    openInvitation({ [PREVIEW]: preview({ accountExists: true }) });
    const link = await screen.findByRole('link', { name: 'Sign in to join' });
    const next = new URL(link.getAttribute('href')!, 'http://localhost');
    expect(next.pathname).toBe('/sign-in');
    expect(next.searchParams.get('next')).toBe(`/invitations/${TOKEN}`);
    expect(screen.queryByLabelText('Password')).not.toBeInTheDocument();
  });

  it('when there is no account and the two passwords differ, then the form says so and sends nothing', async () => {
    const { api, user } = openInvitation({ [PREVIEW]: preview() });
    await user.type(await screen.findByLabelText('Your name'), 'Robin Ashdown');
    await user.type(screen.getByLabelText('Password'), 'first-of-march');
    await user.type(screen.getByLabelText('Password again'), 'first-of-april');
    await user.click(screen.getByRole('button', { name: 'Create account and join' }));
    expect(await screen.findByText('The two passwords differ')).toBeInTheDocument();
    expect(api.to(ACCEPT)).toHaveLength(0);
  });

  it('when there is no account, then a name and a password twice make it, sign in and open the stand', async () => {
    const newcomer = { ...meAs('tapper'), user: { ...meAs('tapper').user, name: 'Robin Ashdown' } };
    const { api, router, user, queryClient } = openInvitation({
      [PREVIEW]: preview(),
      [ACCEPT]: joined(newcomer),
    });
    await user.type(await screen.findByLabelText('Your name'), ' Robin Ashdown ');
    await user.type(screen.getByLabelText('Password'), 'first-of-march');
    await user.type(screen.getByLabelText('Password again'), 'first-of-march');
    await user.click(screen.getByRole('button', { name: 'Create account and join' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/3/trees'));
    expect(api.to(ACCEPT)[0].body).toEqual({ name: 'Robin Ashdown', password: 'first-of-march' });
    expect(queryClient.getQueryData(authKeys.me())).toEqual(newcomer);
  });

  it('when the server refuses the name, then its message sits under the name', async () => {
    const { user } = openInvitation({
      [PREVIEW]: preview(),
      [ACCEPT]: json(400, {
        error: {
          code: 'validation',
          message: 'Check the highlighted fields',
          fields: { name: 'Use letters, not only digits' },
        },
      }),
    });
    await user.type(await screen.findByLabelText('Your name'), '12345');
    await user.type(screen.getByLabelText('Password'), 'first-of-march');
    await user.type(screen.getByLabelText('Password again'), 'first-of-march');
    await user.click(screen.getByRole('button', { name: 'Create account and join' }));
    await waitFor(() =>
      expect(screen.getByLabelText('Your name')).toHaveAccessibleDescription(
        'Use letters, not only digits',
      ),
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it.each([
    [404, 'invitation-unknown', "We don't know this invitation link"],
    [409, 'invitation-used', 'This invitation has already been used'],
    [410, 'invitation-revoked', 'This invitation was withdrawn'],
    [410, 'invitation-expired', 'This invitation has expired'],
  ])('when the link answers %i %s, then the page says "%s"', async (status, code, title) => {
    openInvitation({ [PREVIEW]: gone(status, code) });
    expect(await screen.findByRole('heading', { name: title })).toBeInTheDocument();
    expect(screen.queryByRole('button')).not.toBeInTheDocument();
  });

  it('when the invitation is used up while the page is open, then Join ends in the used message', async () => {
    let used = false;
    const { user } = openInvitation({
      [PREVIEW]: () =>
        used
          ? { status: 409, body: { error: { code: 'invitation-used', message: 'Used' } } }
          : {
              status: 200,
              body: preview({ accountExists: true, signedInEmail: 'robin@example.test' }),
            },
      [ACCEPT]: () => {
        used = true;
        return { status: 409, body: { error: { code: 'invitation-used', message: 'Used' } } };
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Join Hollow Creek' }));
    expect(
      await screen.findByRole('heading', { name: 'This invitation has already been used' }),
    ).toBeInTheDocument();
  });

  it('when the invitation cannot be read, then it says what failed and Retry asks again', async () => {
    let calls = 0;
    const { user } = openInvitation({
      [PREVIEW]: () =>
        ++calls === 1
          ? { status: 500, body: { error: { code: 'internal', message: 'Something broke' } } }
          : { status: 200, body: preview() },
    });
    expect(await screen.findByText("We couldn't open this invitation.")).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('heading', { name: 'Join Hollow Creek' })).toBeInTheDocument();
  });
});
