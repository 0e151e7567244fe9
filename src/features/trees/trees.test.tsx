import { screen, waitFor, within } from '@testing-library/react';
import { TreeRegisterRoute } from '@/app/routes/tree-register';
import { json, mockApi, type Handler } from '@/test/api-mock';
import { meAs, page, sugarbush, tree } from '@/test/fixtures';
import { renderPage } from '@/test/render';

const LIST = 'GET /api/sugarbushes/3/trees';

const fiftyTrees = Array.from({ length: 50 }, (_, i) =>
  tree({ id: 100 + i, tag: String(i + 1).padStart(4, '0'), latestDbhCm: 30 + i }),
);

const register: Handler = (req) => {
  const q = req.url.searchParams.get('q');
  if (q) return { status: 200, body: page([], { total: 0 }) };
  const p = Number(req.url.searchParams.get('page') ?? 1);
  return { status: 200, body: page(fiftyTrees, { total: 1203, page: p }) };
};

function openRegister(
  routes: Record<string, unknown> = {},
  unitSystem: 'imperial' | 'metric' = 'metric',
  url = '/sugarbushes/3/trees',
) {
  const api = mockApi({
    'GET /api/auth/me': meAs('forester', unitSystem),
    'GET /api/sugarbushes/3': sugarbush(),
    [LIST]: register,
    ...routes,
  });
  const view = renderPage({ path: '/sugarbushes/:id/trees', url, element: <TreeRegisterRoute /> });
  return { api, ...view };
}

const lastListRequest = (api: ReturnType<typeof mockApi>) => api.to(LIST).at(-1)!.url.searchParams;

describe('the tree register', () => {
  it('when the user clicks the DBH header, then the register is sorted by DBH in the URL and the request, and a second click reverses it', async () => {
    const { api, router, user } = openRegister();
    const table = await screen.findByRole('table', { name: 'Tree register' });
    const tagHeader = within(table).getByRole('columnheader', { name: /Tag/ });
    const dbhHeader = within(table).getByRole('columnheader', { name: /DBH/ });
    expect(tagHeader).toHaveAttribute('aria-sort', 'ascending');
    expect(dbhHeader).toHaveAttribute('aria-sort', 'none');

    await user.click(within(dbhHeader).getByRole('button'));
    await waitFor(() => expect(lastListRequest(api).get('sort')).toBe('dbh'));
    expect(router.state.location.search).toContain('sort=dbh');
    await waitFor(() => expect(dbhHeader).toHaveAttribute('aria-sort', 'ascending'));
    expect(tagHeader).toHaveAttribute('aria-sort', 'none');

    await user.click(within(dbhHeader).getByRole('button'));
    await waitFor(() => expect(lastListRequest(api).get('sort')).toBe('-dbh'));
    expect(new URLSearchParams(router.state.location.search).get('sort')).toBe('-dbh');
    await waitFor(() => expect(dbhHeader).toHaveAttribute('aria-sort', 'descending'));
  });

  it('asks for pages of 50 and counts them as "1–50 of 1,203"; Next moves to page 2', async () => {
    const { api, router, user } = openRegister();
    expect(await screen.findByText('1–50 of 1,203')).toBeInTheDocument();
    expect(lastListRequest(api).get('pageSize')).toBe('50');
    expect(screen.getByRole('button', { name: 'Previous' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Next' }));
    expect(await screen.findByText('51–100 of 1,203')).toBeInTheDocument();
    expect(lastListRequest(api).get('page')).toBe('2');
    expect(router.state.location.search).toContain('page=2');
  });

  it('when a search by tag matches nothing, then it says so, after the user pauses typing', async () => {
    const { api, router, user } = openRegister();
    await screen.findByRole('table', { name: 'Tree register' });

    await user.type(screen.getByLabelText('Search by tag'), 'xyz');
    expect(await screen.findByText("No trees match 'xyz'")).toBeInTheDocument();
    expect(
      api
        .to(LIST)
        .filter((r) => r.url.searchParams.has('q'))
        .map((r) => r.url.searchParams.get('q')),
    ).toEqual(['xyz']);
    expect(new URLSearchParams(router.state.location.search).get('q')).toBe('xyz');
  });

  it('when the URL carries filters, then they are sent and shown', async () => {
    const { api } = openRegister(
      {},
      'metric',
      '/sugarbushes/3/trees?status=dead&species=red-maple&sort=-species&page=3',
    );
    await screen.findByRole('table', { name: 'Tree register' });
    const sent = lastListRequest(api);
    expect(Object.fromEntries(sent)).toMatchObject({
      status: 'dead',
      species: 'red-maple',
      sort: '-species',
      page: '3',
    });
    expect(screen.getByLabelText('Status')).toHaveValue('dead');
    expect(screen.getByLabelText('Species')).toHaveValue('red-maple');
  });

  it('when the user works in imperial units, then DBH shows in inches, and the toggle switches to cm and is remembered', async () => {
    const { user } = openRegister({}, 'imperial');
    const table = await screen.findByRole('table', { name: 'Tree register' });
    expect(within(table).getByText('11.8 in')).toBeInTheDocument(); // 30 cm

    await user.click(screen.getByRole('button', { name: 'cm' }));
    expect(within(table).getByText('30.0 cm')).toBeInTheDocument();
    expect(window.localStorage.getItem('clearwood.unitSystem')).toBe('metric');
  });

  it('when the stand has no trees and the user may add them, then it says to add the first one on the map', async () => {
    openRegister({ [LIST]: page([], { total: 0 }) });
    expect(
      await screen.findByText('No trees yet — add the first tree on the map'),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the map' })).toHaveAttribute(
      'href',
      '/sugarbushes/3/map',
    );
  });

  it('when the stand has no trees and the user may not add them, then it says who can', async () => {
    openRegister({ [LIST]: page([], { total: 0 }), 'GET /api/auth/me': meAs('tapper') });
    expect(
      await screen.findByText(/owners and foresters add the trees on the map/),
    ).toBeInTheDocument();
    expect(screen.queryByText(/add the first tree/)).not.toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'Open the map' })).not.toBeInTheDocument();
  });

  it('when the register fails to load, then Retry asks again', async () => {
    let calls = 0;
    const { user } = openRegister({
      [LIST]: ((req) =>
        ++calls === 1
          ? json(500, { error: { code: 'internal', message: 'Something went wrong on our side' } })(
              req,
            )
          : register(req)) satisfies Handler,
    });
    expect(await screen.findByText("We couldn't load the trees.")).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Retry' }));
    expect(await screen.findByRole('table', { name: 'Tree register' })).toBeInTheDocument();
  });

  it('links each row to its tree page', async () => {
    openRegister();
    const link = await screen.findByRole('link', { name: '0001' });
    expect(link).toHaveAttribute('href', '/trees/100');
  });

  // Crown dieback in 5 % classes (USFS Crown Condition Rating Guide, Millers et al. 1992 — P).
  it('when opened from a crown-dieback class of the overview, then it asks for that class of that round and offers every crown again', async () => {
    const { api, user } = openRegister(
      {},
      'metric',
      '/sugarbushes/3/trees?dieback=20&diebackSeason=2024',
    );
    expect(
      await screen.findByText('Crown rated 20 % dieback in the 2024 round'),
    ).toBeInTheDocument();
    expect(lastListRequest(api).get('dieback')).toBe('20');
    expect(lastListRequest(api).get('diebackSeason')).toBe('2024');
    await user.click(screen.getByRole('button', { name: 'Any crown' }));
    await waitFor(() => expect(lastListRequest(api).get('dieback')).toBeNull());
    expect(lastListRequest(api).get('diebackSeason')).toBeNull();
  });
});
