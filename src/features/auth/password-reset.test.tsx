import { screen, waitFor } from '@testing-library/react';
import { ForgotPasswordRoute } from '@/app/routes/forgot-password';
import { ResetPasswordRoute } from '@/app/routes/reset-password';
import { json, mockApi } from '@/test/api-mock';
import { renderPage } from '@/test/render';

const TOKEN = 'reset-token-0123456789';

function openForgot(routes: Record<string, unknown>) {
  const api = mockApi(routes);
  const view = renderPage({
    path: '/forgot-password',
    url: '/forgot-password',
    element: <ForgotPasswordRoute />,
  });
  return { api, ...view };
}

function openReset(routes: Record<string, unknown>, url = `/reset-password?token=${TOKEN}`) {
  const api = mockApi(routes);
  const view = renderPage({ path: '/reset-password', url, element: <ResetPasswordRoute /> });
  return { api, ...view };
}

async function choosePassword(
  user: ReturnType<typeof openReset>['user'],
  password: string,
  again: string,
) {
  await user.type(screen.getByLabelText('New password'), password);
  await user.type(screen.getByLabelText('New password again'), again);
  await user.click(screen.getByRole('button', { name: 'Save the new password' }));
}

describe('asking for a reset link', () => {
  it('when the e-mail is not an address, then the field says so and nothing is sent', async () => {
    const { api, user } = openForgot({});
    await user.type(screen.getByLabelText('E-mail'), 'owner at fernside');
    await user.click(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByText('Enter an e-mail address')).toBeInTheDocument();
    expect(api.requests.filter((r) => r.method === 'POST')).toHaveLength(0);
  });

  it('when any address is sent, then the page answers that a link went out if an account uses it', async () => {
    const { api, user } = openForgot({
      'POST /api/auth/password-reset': json(202, { ok: true, message: 'Sent if known' }),
    });
    await user.type(screen.getByLabelText('E-mail'), 'Nobody@Example.test');
    await user.click(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByRole('heading', { name: 'Check your inbox' })).toBeInTheDocument();
    expect(
      screen.getByText(/If an account uses nobody@example.test, we've sent it a link/),
    ).toBeInTheDocument();
    expect(api.to('POST /api/auth/password-reset')[0].body).toEqual({
      email: 'nobody@example.test',
    });
  });

  it('when too many links are asked for, then it asks the person to wait', async () => {
    const { user } = openForgot({
      'POST /api/auth/password-reset': json(429, {
        error: { code: 'too-many-attempts', message: 'Too many attempts' },
      }),
    });
    await user.type(screen.getByLabelText('E-mail'), 'owner@example.test');
    await user.click(screen.getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Wait a few minutes');
    expect(screen.queryByRole('heading', { name: 'Check your inbox' })).not.toBeInTheDocument();
  });
});

describe('choosing a new password from the mailed link', () => {
  it('when the two passwords differ, then the form says so and sends nothing', async () => {
    const { api, user } = openReset({});
    await choosePassword(user, 'first-new-password', 'second-new-password');
    expect(await screen.findByText('The two passwords differ')).toBeInTheDocument();
    expect(api.to('POST /api/auth/password-reset/confirm')).toHaveLength(0);
  });

  it('when the password is too short, then the field says how long it must be', async () => {
    const { api, user } = openReset({});
    await choosePassword(user, 'maple', 'maple');
    expect(screen.getByLabelText('New password')).toHaveAccessibleDescription(
      'At least 10 characters. Use at least 10 characters',
    );
    expect(api.to('POST /api/auth/password-reset/confirm')).toHaveLength(0);
  });

  it('when the new password is saved, then the page says so and leads to sign-in', async () => {
    const { api, user } = openReset({
      'POST /api/auth/password-reset/confirm': { ok: true },
    });
    await choosePassword(user, 'late-frost-2027', 'late-frost-2027');
    expect(
      await screen.findByRole('heading', { name: 'Your password is changed' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(api.to('POST /api/auth/password-reset/confirm')[0].body).toEqual({
      token: TOKEN,
      password: 'late-frost-2027',
    });
  });

  it('when the link was used or has expired, then it says so and offers to ask for a new one', async () => {
    const { user } = openReset({
      'POST /api/auth/password-reset/confirm': json(400, {
        error: { code: 'token-invalid', message: 'This link is not valid' },
      }),
    });
    await choosePassword(user, 'late-frost-2027', 'late-frost-2027');
    expect(
      await screen.findByRole('heading', { name: 'This reset link no longer works' }),
    ).toBeInTheDocument();
    expect(screen.getByText(/already been used/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute(
      'href',
      '/forgot-password',
    );
  });

  it('when the link has no key, then it says so at once and offers a new one', async () => {
    const { api } = openReset({}, '/reset-password');
    expect(
      await screen.findByRole('heading', { name: 'This reset link no longer works' }),
    ).toBeInTheDocument();
    expect(screen.queryByLabelText('New password')).not.toBeInTheDocument();
    expect(api.requests).toHaveLength(0);
  });

  it('when the server refuses the password, then its message sits under the field', async () => {
    const { user } = openReset({
      'POST /api/auth/password-reset/confirm': json(400, {
        error: {
          code: 'validation',
          message: 'Check the highlighted fields',
          fields: { password: 'Choose a password you have not used here before' },
        },
      }),
    });
    await choosePassword(user, 'late-frost-2027', 'late-frost-2027');
    await waitFor(() =>
      expect(screen.getByLabelText('New password')).toHaveAccessibleDescription(
        'At least 10 characters. Choose a password you have not used here before',
      ),
    );
    expect(screen.queryByRole('heading', { name: 'Your password is changed' })).toBeNull();
  });
});
