import { screen, waitFor } from '@testing-library/react';
import { SignInRoute } from '@/app/routes/sign-in';
import { api as client } from '@/lib/api-client';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs } from '@/test/fixtures';
import { renderPage } from '@/test/render';

function openSignIn(login: unknown, url = '/sign-in') {
  let token = 0;
  const api = mockApi({
    'GET /api/auth/csrf': (() => ({
      status: 200,
      body: { token: `token-${++token}` },
    })) satisfies Handler,
    'POST /api/auth/login': login,
  });
  const view = renderPage({ path: '/sign-in', url, element: <SignInRoute /> });
  return { api, ...view };
}

describe('signing in', () => {
  it('when the e-mail is not an address, then the field says so and nothing is sent', async () => {
    const { api, user } = openSignIn(meAs('owner'));
    await user.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await user.type(screen.getByLabelText('Password'), 'secret');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter an e-mail address')).toBeInTheDocument();
    expect(api.to('POST /api/auth/login')).toHaveLength(0);
  });

  it('when the password is wrong, then a plain message says so', async () => {
    const { user } = openSignIn(
      json(401, { error: { code: 'invalid-credentials', message: 'E-mail or password is wrong' } }),
    );
    await user.type(screen.getByLabelText('E-mail'), 'owner@example.test');
    await user.type(screen.getByLabelText('Password'), 'wrong');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      "That e-mail and password don't match an account",
    );
  });

  it('when sign-in succeeds, then the user goes to ?next and later requests use a fresh CSRF token', async () => {
    const { api, router, user } = openSignIn(meAs('owner'), '/sign-in?next=%2Ftrees%2F7');
    await user.type(screen.getByLabelText('E-mail'), 'Owner@Example.test ');
    await user.type(screen.getByLabelText('Password'), 'maple-syrup-42');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/trees/7'));
    const [login] = api.to('POST /api/auth/login');
    expect(login.body).toEqual({ email: 'owner@example.test', password: 'maple-syrup-42' });
    expect(login.headers.get('x-csrf-token')).toBe('token-1');

    await client.post('/auth/logout').catch(() => undefined);
    expect(api.to('POST /api/auth/logout')[0].headers.get('x-csrf-token')).toBe('token-2');
  });

  it('ignores a ?next that leads off the site', async () => {
    const { router, user } = openSignIn(meAs('owner'), '/sign-in?next=%2F%2Felsewhere.example');
    await user.type(screen.getByLabelText('E-mail'), 'owner@example.test');
    await user.type(screen.getByLabelText('Password'), 'maple-syrup-42');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/'));
  });

  it('offers a way to a new password and a way to make an account', async () => {
    openSignIn(meAs('owner'));
    expect(await screen.findByRole('link', { name: 'Forgot your password?' })).toHaveAttribute(
      'href',
      '/forgot-password',
    );
    expect(screen.getByRole('link', { name: 'Create an account' })).toHaveAttribute(
      'href',
      '/sign-up',
    );
  });

  it('when the server refuses a field, then its message sits under that field and not above the button', async () => {
    const { user } = openSignIn(
      json(400, {
        error: {
          code: 'validation',
          message: 'Check the highlighted fields',
          fields: { email: 'Use the address your invitation went to' },
        },
      }),
    );
    await user.type(screen.getByLabelText('E-mail'), 'owner@example.test');
    await user.type(screen.getByLabelText('Password'), 'maple-syrup-42');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() =>
      expect(screen.getByLabelText('E-mail')).toHaveAccessibleDescription(
        'Use the address your invitation went to',
      ),
    );
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });
});
