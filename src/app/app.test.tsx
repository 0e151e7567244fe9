import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router';
import type { Role } from '@shared/schemas/enums';
import { json, mockApi } from '@/test/api-mock';
import { meAs, page, sugarbush, tree } from '@/test/fixtures';
import { createRoutes } from './router';

function openApp(url: string, me: unknown, routes: Record<string, unknown> = {}) {
  const api = mockApi({
    // Nobody signed in: the API answers 401 for /me.
    'GET /api/auth/me':
      me ?? json(401, { error: { code: 'unauthenticated', message: 'Sign in first' } }),
    'GET /api/sugarbushes': page([
      sugarbush({ role: 'tapper' }),
      sugarbush({ id: 8, name: 'Upper Lot', role: 'owner', treeCount: 40 }),
    ]),
    'GET /api/sugarbushes/3': sugarbush(),
    'GET /api/sugarbushes/3/trees': page([tree()]),
    ...routes,
  });
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [url] });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { api, router, user: userEvent.setup() };
}

const asRole = (role: Role) => ({
  ...meAs(role),
  memberships: [
    { sugarbushId: 3, role },
    { sugarbushId: 8, role: 'owner' as const },
  ],
});

describe('the app shell', () => {
  it('when nobody is signed in, then an app page sends them to sign-in and remembers where they were going', async () => {
    const { router } = openApp('/sugarbushes/3/trees?sort=-dbh', null);
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe(
      '/sugarbushes/3/trees?sort=-dbh',
    );
    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
  });

  it("when a signed-in user opens /, then they land on their first sugarbush's trees", async () => {
    const { router } = openApp('/', asRole('tapper'));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/3/trees'));
    expect(await screen.findByRole('table', { name: 'Tree register' })).toBeInTheDocument();
  });

  it('when a tapper signs in, then the rail shows the sections a tapper uses and the phone bar has at most five items', async () => {
    openApp('/sugarbushes/3/trees', asRole('tapper'));
    const [rail, bar] = await screen.findAllByRole('navigation', { name: 'Sections' });
    const names = within(rail)
      .getAllByRole('link')
      .map((l) => l.textContent);
    expect(names).toEqual([
      'Trees',
      'Map',
      'Season plan',
      'Overview',
      'Notes',
      'Season log',
      'Settings',
    ]);
    expect(within(rail).getByRole('link', { name: 'Trees' })).toHaveAttribute(
      'aria-current',
      'page',
    );
    expect(
      within(bar).getAllByRole('link').length + within(bar).getAllByRole('button').length,
    ).toBeLessThanOrEqual(5);
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeInTheDocument();
  });

  it("lists the user's sugarbushes with their role, and switching keeps the section", async () => {
    const { router, user } = openApp('/sugarbushes/3/map', asRole('forester'));
    // The map page loads Leaflet lazily; give it time on a busy machine.
    const switcher = await screen.findByLabelText('Sugarbush', {}, { timeout: 10000 });
    expect(
      within(switcher)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Hollow Creek — Tapper', 'Upper Lot — Owner']);
    await user.selectOptions(switcher, '8');
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/8/map'), {
      timeout: 10000,
    });
  }, 20000);

  it('when a consultant opens the season log, then it is the log itself, read only', async () => {
    openApp('/sugarbushes/3/season', asRole('consultant'), {
      'GET /api/sugarbushes/3/weather': {
        season: 2026,
        items: [],
        total: 0,
        forecast: [],
        forecastSource: null,
        forecastError: null,
      },
      'GET /api/sugarbushes/3/sap': {
        items: [],
        total: 0,
        page: 1,
        pageSize: 500,
        season: 2026,
        totals: {
          volumeL: 0,
          meanSugarPct: null,
          expectedSyrupL: 0,
          expectedSyrupLRevised: 0,
          syrupMadeL: null,
          taps: 0,
          yieldPerTapL: null,
          days: 0,
        },
      },
    });
    expect(
      await screen.findByRole('heading', { name: 'Season log', level: 1 }, { timeout: 10000 }),
    ).toBeInTheDocument();
    expect(await screen.findByText('No sap recorded in 2026 yet')).toBeInTheDocument();
    expect(screen.queryByText('Coming soon in Clearwood')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save sap' })).toBeNull();
  }, 20000);

  it('when nobody is signed in, then the account pages and an invitation open without sending them to sign-in', async () => {
    const { router } = openApp('/forgot-password', null, {
      'GET /api/invitations/invite-token-0123456789': json(410, {
        error: { code: 'invitation-expired', message: 'Expired' },
      }),
    });
    expect(
      await screen.findByRole('heading', { name: 'Forgot your password?' }),
    ).toBeInTheDocument();
    await router.navigate('/sign-up');
    expect(await screen.findByRole('heading', { name: 'Create an account' })).toBeInTheDocument();
    await router.navigate('/reset-password?token=reset-token-0123456789');
    expect(
      await screen.findByRole('heading', { name: 'Choose a new password' }),
    ).toBeInTheDocument();
    await router.navigate('/invitations/invite-token-0123456789');
    expect(
      await screen.findByRole('heading', { name: 'This invitation has expired' }),
    ).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/invitations/invite-token-0123456789');
    expect(screen.queryByRole('navigation', { name: 'Sections' })).not.toBeInTheDocument();
  });

  it('when someone signed in opens the sign-up page, then they go home instead', async () => {
    const { router } = openApp('/sign-up', asRole('tapper'));
    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/3/trees'));
  });

  it('when a new user with no stand starts one from home, then they land on its empty register, told to add the first tree on the map', async () => {
    let memberships: { sugarbushId: number; role: Role }[] = [];
    const created = sugarbush({ id: 9, name: 'Beaver Flats', role: 'owner', treeCount: 0 });
    const { router, user } = openApp('/', null, {
      'GET /api/auth/me': () => ({ status: 200, body: { ...meAs('owner'), memberships } }),
      'GET /api/sugarbushes': () => ({
        status: 200,
        body: page(memberships.length ? [created] : []),
      }),
      'POST /api/sugarbushes': () => {
        memberships = [{ sugarbushId: 9, role: 'owner' }];
        return { status: 201, body: created };
      },
      'GET /api/sugarbushes/9': created,
      'GET /api/sugarbushes/9/trees': page([]),
    });

    const home = await screen.findByRole('main');
    expect(await within(home).findByText("You're not part of a sugarbush yet")).toBeInTheDocument();
    expect(within(home).getByText(/ask its owner to invite you/)).toBeInTheDocument();
    await user.click(within(home).getByRole('link', { name: 'Start a sugarbush' }));
    await user.type(await screen.findByLabelText('Name of the sugarbush'), 'Beaver Flats');
    await user.click(screen.getByRole('button', { name: 'Start the sugarbush' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/sugarbushes/9/trees'));
    expect(
      await screen.findByText('No trees yet — add the first tree on the map'),
    ).toBeInTheDocument();
    const [rail] = await screen.findAllByRole('navigation', { name: 'Sections' });
    expect(within(rail).getByRole('link', { name: 'Settings' })).toBeInTheDocument();
  });
});
