import { screen, waitFor } from '@testing-library/react';
import type { MeResponse } from '@shared/schemas/auth';
import { SignUpRoute } from '@/app/routes/sign-up';
import { authKeys } from '@/lib/auth';
import { json, mockApi } from '@/test/api-mock';
import { meAs } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const TOKEN = 'sap-run-token-0123456789';

const mailSent = json(202, {
  ok: true,
  message: 'If the address can be used, a link is on its way',
});

function openSignUp(routes: Record<string, unknown>, url = '/sign-up', strict = false) {
  const api = mockApi(routes);
  const view = renderPage({ path: '/sign-up', url, element: <SignUpRoute />, strict });
  return { api, ...view };
}

const newcomer: MeResponse = { ...meAs('owner'), memberships: [] };

async function fillSignUp(
  user: ReturnType<typeof openSignUp>['user'],
  values: { name: string; email: string; password: string },
) {
  if (values.name) await user.type(screen.getByLabelText('Your name'), values.name);
  if (values.email) await user.type(screen.getByLabelText('E-mail'), values.email);
  if (values.password) await user.type(screen.getByLabelText('Password'), values.password);
  await user.click(screen.getByRole('button', { name: 'Create account' }));
}

describe('signing up', () => {
  it('when the fields are empty, not an address or too short, then each says what it needs and nothing is sent', async () => {
    const { api, user } = openSignUp({ 'POST /api/auth/register': mailSent });
    await fillSignUp(user, { name: '', email: 'pat-at-example', password: 'short' });
    expect(await screen.findByText('Enter your name')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription('Enter an e-mail address');
    expect(screen.getByLabelText('Password')).toHaveAccessibleDescription(
      'At least 10 characters. Use at least 10 characters',
    );
    expect(api.to('POST /api/auth/register')).toHaveLength(0);
  });

  it('when the form is sent, then the page asks the person to check the inbox at that address', async () => {
    const { api, user } = openSignUp({ 'POST /api/auth/register': mailSent });
    await fillSignUp(user, {
      name: ' Pat Tapper ',
      email: ' Pat@Example.test',
      password: 'sugar-season-27',
    });
    expect(await screen.findByRole('heading', { name: 'Check your inbox' })).toBeInTheDocument();
    expect(screen.getByText("We've sent a message to pat@example.test.")).toBeInTheDocument();
    expect(api.to('POST /api/auth/register')[0].body).toEqual({
      name: 'Pat Tapper',
      email: 'pat@example.test',
      password: 'sugar-season-27',
    });
  });

  it('when one address has an account and another has none, then both get the very same words', async () => {
    const pageFor = async (email: string, answer: string) => {
      const { user, unmount } = openSignUp({
        'POST /api/auth/register': json(202, { ok: true, message: answer }),
      });
      await fillSignUp(user, { name: 'Pat', email, password: 'sugar-season-27' });
      await screen.findByRole('heading', { name: 'Check your inbox' });
      const text = document.body.textContent!.replaceAll(email, '<address>');
      unmount();
      return text;
    };
    const known = await pageFor('known@example.test', 'Sent to a known address');
    const unknown = await pageFor('new@example.test', 'Sent to a new address');
    expect(known).toBe(unknown);
    expect(known).not.toMatch(/already|exists|known|new address/i);
  });

  it('when the server refuses a field, then its message sits under that field', async () => {
    const { user } = openSignUp({
      'POST /api/auth/register': json(400, {
        error: {
          code: 'validation',
          message: 'Check the highlighted fields',
          fields: { password: 'That password is on a list of leaked passwords' },
        },
      }),
    });
    await fillSignUp(user, { name: 'Pat', email: 'pat@example.test', password: 'password123' });
    await waitFor(() =>
      expect(screen.getByLabelText('Password')).toHaveAccessibleDescription(
        'At least 10 characters. That password is on a list of leaked passwords',
      ),
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Check your inbox' })).not.toBeInTheDocument();
  });

  it('when too many sign-ups come from one place, then it asks the person to wait', async () => {
    const { user } = openSignUp({
      'POST /api/auth/register': json(429, {
        error: { code: 'too-many-attempts', message: 'Too many sign-in attempts' },
      }),
    });
    await fillSignUp(user, { name: 'Pat', email: 'pat@example.test', password: 'sugar-season-27' });
    expect(await screen.findByRole('alert')).toHaveTextContent('Wait a few minutes');
  });
});

describe('opening the mailed sign-up link', () => {
  it('when the link is good and the person has no stand yet, then the account is confirmed once, they are signed in and go on to start one', async () => {
    const { api, router, queryClient } = openSignUp(
      { 'POST /api/auth/register/confirm': json(201, newcomer) },
      `/sign-up?token=${TOKEN}`,
      true,
    );
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/new'));
    const confirms = api.to('POST /api/auth/register/confirm');
    expect(confirms).toHaveLength(1);
    expect(confirms[0].body).toEqual({ token: TOKEN });
    expect(queryClient.getQueryData(authKeys.me())).toEqual(newcomer);
  });

  it('when the person already belongs to a stand, then they go home instead', async () => {
    const { router } = openSignUp(
      { 'POST /api/auth/register/confirm': json(201, meAs('tapper')) },
      `/sign-up?token=${TOKEN}`,
    );
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });

  it('when the link was used or has expired, then it says so and offers sign-in or starting again', async () => {
    openSignUp(
      {
        'POST /api/auth/register/confirm': json(400, {
          error: { code: 'token-invalid', message: 'This link is not valid' },
        }),
      },
      `/sign-up?token=${TOKEN}`,
    );
    expect(
      await screen.findByRole('heading', { name: 'This sign-up link no longer works' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(screen.getByRole('link', { name: 'Start again' })).toHaveAttribute('href', '/sign-up');
  });

  it('when the link is cut short, then it says so without asking the server', async () => {
    const { api } = openSignUp({}, '/sign-up?token=abc');
    expect(
      await screen.findByRole('heading', { name: 'This sign-up link no longer works' }),
    ).toBeInTheDocument();
    expect(api.to('POST /api/auth/register/confirm')).toHaveLength(0);
  });

  it('when an account took the address in the meantime, then it offers sign-in and a new password', async () => {
    openSignUp(
      {
        'POST /api/auth/register/confirm': json(409, {
          error: { code: 'email-taken', message: 'An account uses this e-mail' },
        }),
      },
      `/sign-up?token=${TOKEN}`,
    );
    expect(
      await screen.findByRole('heading', { name: 'You already have an account' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Forgot your password?' })).toHaveAttribute(
      'href',
      '/forgot-password',
    );
  });

  it('when the server cannot be reached, then Try again sends the link once more', async () => {
    let calls = 0;
    const { user, router } = openSignUp(
      {
        'POST /api/auth/register/confirm': () =>
          ++calls === 1
            ? { status: 503, body: { error: { code: 'unavailable', message: 'Try later' } } }
            : { status: 201, body: newcomer },
      },
      `/sign-up?token=${TOKEN}`,
    );
    await user.click(await screen.findByRole('button', { name: 'Try again' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/new'));
    expect(calls).toBe(2);
  });
});
